import { describe, expect, it } from "vitest";
import { engineeringText, parseEngineering } from "../../src/state/engNotation.ts";

const ok = (text: string, unit: string, value: number) => {
  const r = parseEngineering(text, unit);
  expect(r.ok, `${text} → ${JSON.stringify(r)}`).toBe(true);
  if (r.ok) expect(r.value).toBeCloseTo(value, 15);
};

describe("parseEngineering", () => {
  it.each([
    ["12", "V", 12],
    ["10.8 V", "V", 10.8],
    ["500k", "Hz", 500e3],
    ["500 kHz", "Hz", 500e3],
    ["1.2MHz", "Hz", 1.2e6],
    ["1.2 meg", "Hz", 1.2e6],
    ["30m", "ohm", 0.03],
    ["30 mΩ", "ohm", 0.03],
    ["30mohm", "ohm", 0.03],
    ["4.7u", "H", 4.7e-6],
    ["4.7 µH", "H", 4.7e-6],
    ["470n", "H", 470e-9],
    ["4R7", "H", 4.7],
    ["R033", "ohm", 0.033],
    ["1e-6", "H", 1e-6],
    ["3,3", "V", 3.3],
    [".5", "A", 0.5],
    ["-40", "C", -40],
    ["85 °C", "C", 85],
  ])('parseEngineering("%s", %s) reads %d', (text, unit, value) => ok(text, unit, value));

  it("parseEngineering keeps m as milli and M as mega", () => {
    ok("2m", "A", 2e-3);
    ok("2M", "Hz", 2e6);
  });

  it.each([
    ["", /enter a value/],
    ["abc", /not a number/],
    ["5x", /not a unit/],
    ["5 V", /not a unit/],
    ["1,000", /ambiguous/],
  ])('parseEngineering("%s", A) refuses it with a message', (text, message) => {
    const r = parseEngineering(text, "A");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });
});

describe("engineeringText", () => {
  it.each([
    [500000, "500k"],
    [0.03, "30m"],
    [12, "12"],
    [4.7e-6, "4.7u"],
    [0, "0"],
    [10.8, "10.8"],
  ])("engineeringText(%d) is %s and reads back", (value, text) => {
    expect(engineeringText(value)).toBe(text);
    const r = parseEngineering(text, "x");
    expect(r.ok && r.value).toBeCloseTo(value, 12);
  });
});
