import { describe, expect, it } from "vitest";
import { recogniseHeader } from "../../src/catalog/recogniseHeader.ts";

// [header, expected quantity, expected unit symbol or null]. The spellings are the common ways
// a header is written; units are checked by symbol (their factors are cross-checked in parseUnit.test.ts).
const CASES: [string, string | null, string | null][] = [
  ["Part Number", "partNumber", null],
  ["Part No.", "partNumber", null],
  ["P/N", "partNumber", null],
  ["MPN", "partNumber", null],
  ["Article", "partNumber", null],
  ["Ordering code", "partNumber", null],
  ["Manufacturer", "maker", null],
  ["Mfr", "maker", null],
  ["Vendor", "maker", null],
  ["Series", "series", null],
  ["Product line", "series", null],
  ["Family", "series", null],
  ["Material", "material", null],
  ["Core material", "material", null],
  ["Construction", "material", null],
  ["Shielded", "shielding", null],
  ["Shielding", "shielding", null],
  ["Inductance (uH)", "inductance", "µH"],
  ["Inductance [µH]", "inductance", "µH"],
  ["Inductance (μH)", "inductance", "µH"],
  ["L (nH)", "inductance", "nH"],
  ["L0 [nH]", "inductance", "nH"],
  ["L / µH", "inductance", "µH"],
  ["Inductance uH", "inductance", "µH"],
  ["Inductance @ 100 kHz (µH)", "inductance", "µH"],
  ["Tolerance (%)", "tolerance", "%"],
  ["Tol.", "tolerance", null],
  ["L tol", "tolerance", null],
  ["DCR typ (mOhm)", "dcrTyp", "mΩ"],
  ["DCR max (mOhm)", "dcrMax", "mΩ"],
  ["DCR (mΩ) max", "dcrMax", "mΩ"],
  ["DCR [mΩ, typ]", "dcrTyp", "mΩ"],
  ["Typical DCR (Ohm)", "dcrTyp", "Ω"],
  ["Rdc max. [Ω]", "dcrMax", "Ω"],
  ["DC resistance max (milliohm)", "dcrMax", "mΩ"],
  ["DCR mOhm", "dcr", "mΩ"],
  ["Isat (A)", "isat", "A"],
  ["I sat [mA]", "isat", "mA"],
  ["Saturation current", "isat", null],
  ["Isat (25°C) (A)", "isat", "A"],
  ["Isat hot (A)", "isatHot", "A"],
  ["Isat (100°C)", "isatHot", null],
  ["Isat @ 125 °C [A]", "isatHot", "A"],
  ["Isat drop (%)", "isatDrop", "%"],
  ["ΔL at Isat [%]", "isatDrop", "%"],
  ["Inductance drop", "isatDrop", null],
  ["Irms (A)", "irms", "A"],
  ["Rated current [mA]", "irms", "mA"],
  ["Heating current (A)", "irms", "A"],
  ["I rated", "irms", null],
  ["Idc (A)", "irms", "A"],
  ["Irms rise (K)", "irmsRise", "K"],
  ["ΔT at I rated [K]", "irmsRise", "K"],
  ["Temperature rise (°C)", "irmsRise", "K"],
  ["SRF (MHz)", "srf", "MHz"],
  ["SRF min [kHz]", "srf", "kHz"],
  ["Self-resonant frequency", "srf", null],
  ["Length (mm)", "length", "mm"],
  ["L (mm)", "length", "mm"],
  ["Length in mm", "length", "mm"],
  ["Width (in)", "width", "in"],
  ["W [mil]", "width", "mil"],
  ["Height (mm)", "height", "mm"],
  ["Max height (mm)", "height", "mm"],
  ["Thickness", "height", null],
  ["L x W x H (mm)", "dimensions", "mm"],
  ["LxWxH [mil]", "dimensions", "mil"],
  ["Size (mm)", "dimensions", "mm"],
  ["Price (USD)", "price", "USD"],
  ["Unit price @1k [USD]", "price", "USD"],
  ["Roll-off exponent", "rollOffExponent", null],
  ["AC factor", "acFactor", null],
  ["Rac/Rdc", "acFactor", null],
  ["Steinmetz k", "coreK", null],
  ["Steinmetz k (W/m³)", "coreK", null],
  ["α", "coreAlpha", null],
  ["Steinmetz beta", "coreBeta", null],
  ["B per amp (mT/A)", "bPerAmp", "mT/A"],
  ["Core volume (mm³)", "coreVolume", "mm³"],
  ["Ve [mm3]", "coreVolume", "mm³"],
  ["Stock", null, null],
  ["Notes", null, null],
  ["", null, null],
];

describe("recogniseHeader", () => {
  it.each(CASES)("recogniseHeader(%j) is %s in %s", (header, quantity, unit) => {
    const g = recogniseHeader(header);
    expect(g.quantity).toBe(quantity);
    expect(g.unit?.symbol ?? null).toBe(unit);
  });

  it("recogniseHeader takes the unit from a unit-row cell when the header has none", () => {
    const g = recogniseHeader("Inductance", "µH");
    expect(g.quantity).toBe("inductance");
    expect(g.unit?.symbol).toBe("µH");
    expect(g.unitSource).toBe("unit row");
    expect(recogniseHeader("L", "mm").quantity).toBe("length");
  });

  it("recogniseHeader reads conditions written in the header", () => {
    expect(recogniseHeader("Isat (A) @ 30% drop").drop).toBeCloseTo(0.3, 12);
    expect(recogniseHeader("Isat (ΔL = 20 %)").drop).toBeCloseTo(0.2, 12);
    expect(recogniseHeader("Irms (ΔT=40K) [A]").rise).toBe(40);
    expect(recogniseHeader("Isat (100 °C)").temperature).toBe(100);
  });

  it("recogniseHeader maps an unknown name by an unmistakable unit and says so", () => {
    const g = recogniseHeader("Lx (µH)");
    expect(g.quantity).toBe("inductance");
    expect(g.note).toMatch(/by its unit/);
  });

  it("recogniseHeader ignores a unit that does not fit the name, with a note", () => {
    const g = recogniseHeader("Isat (mm)");
    expect(g.quantity).toBe("isat");
    expect(g.unit).toBeNull();
    expect(g.note).toMatch(/does not fit/);
  });
});
