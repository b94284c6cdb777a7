import { describe, expect, it } from "vitest";
import { detectDelimiter } from "../../src/catalog/detectDelimiter.ts";

describe("detectDelimiter", () => {
  it.each([
    [",", "Part Number,Inductance (uH),Isat (A)\nA1,4.7,3.2\n"],
    ["\t", "Part Number\tInductance (uH)\tIsat (A)\nA1\t4.7\t3.2\n"],
    [";", "Part Number;Inductance (uH);Isat (A)\nA1;4,7;3,2\nA2;10;2,5\n"],
    ["|", "Part Number|Inductance (uH)|Isat (A)\nA1|4.7|3.2\n"],
    [",", 'Part Number,Material,Inductance (uH)\nA1,"Ferrite; shielded",4.7\n'],
    ["\t", "Stock list\n\nPart Number\tInductance (uH)\tNotes\nA1\t4.7\tlow, flat\n"],
  ])("detectDelimiter finds %j", (delimiter, text) => {
    expect(detectDelimiter(text)).toBe(delimiter);
  });

  it("detectDelimiter without a known header picks the most consistent split", () => {
    expect(detectDelimiter("a;b;c\n1,5;2;3\n4;5,5;6\n")).toBe(";");
  });

  it('detectDelimiter of text with no delimiter at all is ","', () => {
    expect(detectDelimiter("just one column\nof words\n")).toBe(",");
    expect(detectDelimiter("")).toBe(",");
  });
});
