import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { blankComments, previewRecords, readRecords } from "../../src/catalog/readRecords.ts";

const CHUNK = 512 * 1024;

/** Reference: papaparse over the whole text at once, and line starts counted in the text. */
function reference(text: string): { rows: string[][]; lines: number[] } {
  const rows = Papa.parse<string[]>(text, { delimiter: ",", skipEmptyLines: false }).data;
  const lines: number[] = [];
  let line = 1;
  for (const row of rows) {
    lines.push(line);
    line += 1 + row.join(",").split("\n").length - 1;
  }
  return { rows, lines };
}

function streamed(text: string): { rows: string[][]; lines: number[] } {
  const rows: string[][] = [];
  const lines: number[] = [];
  readRecords(text, ",", (chunk) => {
    expect(chunk.start).toBe(rows.length);
    rows.push(...chunk.rows);
    lines.push(...chunk.lines);
  });
  return { rows, lines };
}

describe("readRecords", () => {
  it.each([-7, -3, -1, 0, 1, 4])("readRecords with a multi-line quoted cell %i characters around a chunk boundary matches one whole parse", (offset) => {
    const filler = "A1,plain,4.7\n".repeat(Math.floor((CHUNK + offset) / 13));
    const text = `${filler}B1,"one\ntwo\r\nthree, four",4.7\nC1,last,1\n${filler}D1,end,2`;
    expect(streamed(text)).toEqual(reference(text));
  });

  it("readRecords of CRLF text without quotes numbers records as lines", () => {
    const text = "a,b\r\nc,d\r\n\r\ne,f\r\n";
    const r = streamed(text);
    expect(r.lines).toEqual([1, 2, 3, 4, 5]);
  });

  it("readRecords reports an unclosed quote with the line it starts on", () => {
    const problems = readRecords('a,b\n"c,d\ne,f\n', ",", () => undefined);
    expect(problems).toEqual([expect.objectContaining({ line: 2, message: expect.stringMatching(/not closed/) })]);
  });

  it("previewRecords reads the first records and says whether there are more", () => {
    const p = previewRecords("a\nb\nc\n", ",", 2);
    expect(p.chunk.rows).toEqual([["a"], ["b"]]);
    expect(p.truncated).toBe(true);
  });

  it("blankComments blanks # lines but keeps the line count and a '#' cell", () => {
    expect(blankComments('# x, "y\na,b\n#,c\n#\n', ",")).toBe("\na,b\n#,c\n\n");
    expect(blankComments("\ufeffa\n", ",")).toBe("a\n");
  });
});
