import { describe, expect, it } from "vitest";
import { csvCell } from "../../src/report/csvCell.ts";

describe("csvCell", () => {
  it.each([
    ["=1+2", `"'=1+2"`],
    ["+1", `"'+1"`],
    ["-5V rail", `"'-5V rail"`],
    ["@SUM(A1:A2)", `"'@SUM(A1:A2)"`],
    ["\tindent", `"'\tindent"`],
    ["\rreturn", `"'\rreturn"`],
    ['=HYPERLINK("http://x","y")', `"'=HYPERLINK(""http://x"",""y"")"`],
  ])("csvCell(%j) neutralises a formula start and keeps the text", (input, expected) => {
    expect(csvCell(input)).toBe(expected);
  });

  it.each([
    ["HV-DRS12060-6U8", `"HV-DRS12060-6U8"`],
    ['say "hi", then go', `"say ""hi"", then go"`],
    ["two\nlines", `"two\nlines"`],
    ["Vin 13.2 V, Iout 3 A, L −20 %", `"Vin 13.2 V, Iout 3 A, L −20 %"`],
    ["", `""`],
  ])("csvCell(%j) quotes text and doubles its quotes (RFC 4180)", (input, expected) => {
    expect(csvCell(input)).toBe(expected);
  });

  it.each([
    [0.0000068, "0.0000068"],
    [-0.4846, "-0.4846"],
    [3, "3"],
    [1e-12, "1e-12"],
  ])("csvCell(%d) writes a number unquoted so it stays a number", (input, expected) => {
    expect(csvCell(input)).toBe(expected);
    expect(Number(csvCell(input))).toBe(input);
  });

  it("csvCell(null), csvCell(NaN) and csvCell(Infinity) give an empty cell", () => {
    expect(csvCell(null)).toBe("");
    expect(csvCell(NaN)).toBe("");
    expect(csvCell(Infinity)).toBe("");
  });
});
