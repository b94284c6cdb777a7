import type { Dimension } from "../../catalog/types.ts";

/** Unit spellings offered per dimension (any spelling the importer knows may be typed). */
export const UNIT_CHOICES: Partial<Record<Dimension, string[]>> = {
  inductance: ["H", "mH", "uH", "nH"],
  resistance: ["ohm", "mOhm", "uOhm"],
  current: ["A", "mA"],
  frequency: ["Hz", "kHz", "MHz", "GHz"],
  length: ["mm", "cm", "m", "in", "mil"],
  fraction: ["%", "fraction"],
  temperatureRise: ["K"],
  temperature: ["C", "K"],
  currency: ["USD", "EUR", "GBP", "JPY", "CNY"],
  fluxPerCurrent: ["mT/A", "T/A", "G/A"],
  volume: ["mm3", "cm3", "m3"],
};
