import { describe, expect, it } from "vitest";
import { parseUnit, toSiText } from "../../src/catalog/parseUnit.ts";
import type { Dimension } from "../../src/catalog/types.ts";
import { close, si } from "./siReference.ts";

// One case per spelling: [our spelling, dimension, the same unit as mathjs writes it, SI unit].
// Source of every expected factor: mathjs unit conversion.
const CASES: [string, Dimension, string, string][] = [
  ["mΩ", "resistance", "mohm", "ohm"],
  ["mOhm", "resistance", "mohm", "ohm"],
  ["milliohm", "resistance", "milliohm", "ohm"],
  ["mohm", "resistance", "mohm", "ohm"],
  ["Ohm", "resistance", "ohm", "ohm"],
  ["Ω", "resistance", "ohm", "ohm"],
  ["Ω", "resistance", "ohm", "ohm"], // U+2126 OHM SIGN
  ["kΩ", "resistance", "kohm", "ohm"],
  ["uH", "inductance", "uH", "H"],
  ["µH", "inductance", "uH", "H"], // U+00B5 MICRO SIGN
  ["μH", "inductance", "uH", "H"], // U+03BC GREEK SMALL LETTER MU
  ["nH", "inductance", "nH", "H"],
  ["mH", "inductance", "mH", "H"],
  ["microhenry", "inductance", "microhenry", "H"],
  ["A", "current", "A", "A"],
  ["mA", "current", "mA", "A"],
  ["milliamps", "current", "milliampere", "A"],
  ["Hz", "frequency", "Hz", "Hz"],
  ["kHz", "frequency", "kHz", "Hz"],
  ["MHz", "frequency", "MHz", "Hz"],
  ["GHz", "frequency", "GHz", "Hz"],
  ["mm", "length", "mm", "m"],
  ["cm", "length", "cm", "m"],
  ["in", "length", "in", "m"],
  ["inch", "length", "inch", "m"],
  ["mil", "length", "mil", "m"],
  ["mils", "length", "mil", "m"],
  ["µm", "length", "um", "m"],
  ["mm³", "volume", "mm^3", "m^3"],
  ["mm^3", "volume", "mm^3", "m^3"],
  ["cm3", "volume", "cm^3", "m^3"],
  ["mT/A", "fluxPerCurrent", "mT/A", "T/A"],
  // mathjs has no percent unit; "%" is checked in parseNumberCell against its % operator.
];

describe("parseUnit", () => {
  it.each(CASES)("parseUnit(%j) converts like mathjs", (spelling, dimension, mathjsUnit, siUnit) => {
    const u = parseUnit(spelling, dimension);
    expect(u).not.toBeNull();
    expect(close(toSiText("1", u!), si(`1 ${mathjsUnit}`, siUnit))).toBe(true);
    expect(close(toSiText("4.7", u!), si(`4.7 ${mathjsUnit}`, siUnit), 1e-15)).toBe(true);
  });

  it('parseUnit("[mΩ]") and "(uH)" read the unit inside brackets', () => {
    expect(parseUnit("[mΩ]")?.symbol).toBe("mΩ");
    expect(parseUnit("(uH)")?.symbol).toBe("µH");
  });

  it('parseUnit("mhz") reads sloppy lower case as MHz, but "MΩ" stays a megohm', () => {
    expect(parseUnit("mhz")?.factor).toBe(si("1 MHz", "Hz")); // mathjs
    expect(parseUnit("MΩ")?.factor).toBe(si("1 Mohm", "ohm")); // mathjs
  });

  it("parseUnit(°C) is a temperature rise equal to K, and K as a temperature is offset", () => {
    expect(toSiText("40", parseUnit("°C", "temperatureRise")!)).toBe(40);
    // mathjs: 373.15 K = 100 °C
    expect(close(toSiText("373.15", parseUnit("K", "temperature")!), si("373.15 K", "degC"))).toBe(true);
  });

  it("parseUnit returns null for a unit of another dimension or an unknown word", () => {
    expect(parseUnit("mA", "resistance")).toBeNull();
    expect(parseUnit("furlong")).toBeNull();
    expect(parseUnit("")).toBeNull();
  });

  it('toSiText("13.3", mΩ) is the double nearest 0.0133', () => {
    // The decimal 0.0133 written directly is the reference.
    expect(toSiText("13.3", parseUnit("mOhm")!)).toBe(0.0133);
    expect(toSiText("1.5e3", parseUnit("nH")!)).toBe(1.5e-6);
  });
});
