import { describe, expect, it } from "vitest";
import { detectDecimalComma } from "../../src/catalog/detectDecimalComma.ts";

const decide = (cells: string[]) => detectDecimalComma([cells], [0], cells.map((_, i) => i));

describe("detectDecimalComma", () => {
  // ISO 80000-1: the decimal sign is a point or a comma; the last mark in "1.234,5" is the decimal sign.
  it.each([
    [["4,7", "3,2", "10"], true],
    [["4.7", "3.2", "10"], false],
    [["1.234,50"], true],
    [["1,234.50"], false],
    [["4.700", "3,2"], true],
    [["1,250", "1.250"], false],
    [["±20 %", "typ 4,7"], true],
    [[""], false],
  ])("detectDecimalComma(%j) is %s", (cells, expected) => {
    expect(decide(cells)).toBe(expected);
  });
});
