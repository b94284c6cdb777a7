import type { CheckName } from "./types.ts";

/** Readable names of the checks, shared by the workbench, the report and the exports. */
export const CHECK_LABEL: Readonly<Record<CheckName, string>> = {
  operatingPoint: "Operating point",
  saturation: "Saturation",
  heating: "Heating current",
  temperatureRise: "Temperature rise",
  temperature: "Hot-spot temperature",
  rippleRatio: "Ripple ratio",
  lightLoadMode: "Light-load mode",
  srf: "Self-resonance",
  length: "Length",
  width: "Width",
  height: "Height",
  footprint: "Footprint",
  price: "Price",
};
