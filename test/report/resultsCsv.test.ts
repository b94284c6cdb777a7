import { describe, expect, it } from "vitest";
import { resultsCsv } from "../../src/report/resultsCsv.ts";
import { loadWorkspaceParts } from "../../src/report/loadWorkspaceParts.ts";
import { rankParts } from "../../src/engine/rankParts.ts";
import { demoWorkspace } from "./fixtures.ts";

/** A small RFC 4180 reader: quoted fields may hold commas, quotes and line breaks. */
function readCsv(text: string): { cells: string[][]; quoted: boolean[][] } {
  const cells: string[][] = [];
  const quoted: boolean[][] = [];
  let row: string[] = [];
  let rowQuoted: boolean[] = [];
  let i = 0;
  while (i < text.length) {
    let field = "";
    let q = false;
    if (text[i] === '"') {
      q = true;
      i++;
      for (;;) {
        if (text[i] === '"' && text[i + 1] === '"') {
          field += '"';
          i += 2;
        } else if (text[i] === '"') {
          i++;
          break;
        } else field += text[i++];
      }
    } else while (i < text.length && text[i] !== "," && text[i] !== "\r") field += text[i++];
    row.push(field);
    rowQuoted.push(q);
    if (text[i] === ",") i++;
    else {
      i += 2; // CRLF
      cells.push(row);
      quoted.push(rowQuoted);
      row = [];
      rowQuoted = [];
    }
  }
  return { cells, quoted };
}

const ws = demoWorkspace();
const loaded = loadWorkspaceParts(ws);
const results = rankParts(ws.spec, loaded.parts);
const csv = resultsCsv(ws.spec, results, loaded.parts);

describe("resultsCsv", () => {
  it("resultsCsv starts with a UTF-8 byte-order mark and ends every line with CRLF", () => {
    expect(csv.startsWith("\uFEFF")).toBe(true);
    expect(csv.endsWith("\r\n")).toBe(true);
  });

  it("resultsCsv names SI units in its headers and writes one row per result in rank order", () => {
    const { cells } = readCsv(csv.slice(1));
    const header = cells[0]!;
    for (const h of ["inductance (H)", "DCR used for losses (ohm)", "Isat (A)", "SRF (Hz)", "length (m)", "worst total loss (W)", "worst temperature rise (K)"]) {
      expect(header).toContain(h);
    }
    expect(cells).toHaveLength(results.length + 1);
    expect(cells.slice(1).map((r) => Number(r[0]))).toEqual(results.map((r) => r.rank));
    expect(cells[1]![1]).toBe(results[0]!.partNumber);
  });

  it("resultsCsv writes numbers unquoted in SI and text quoted", () => {
    const { cells, quoted } = readCsv(csv.slice(1));
    const header = cells[0]!;
    const col = (name: string) => header.indexOf(name);
    const first = cells[1]!;
    expect(quoted[1]![col("inductance (H)")]).toBe(false);
    expect(Number(first[col("inductance (H)")])).toBeCloseTo(6.8e-6, 15);
    expect(quoted[1]![col("part number")]).toBe(true);
    expect(first[col("worst core loss (W)")]).toBe("");
    expect(first[col("status")]).toBe("pass");
  });

  it("resultsCsv neutralises a part number that starts like a formula and keeps it", () => {
    const part = { ...loaded.parts[0]!, partNumber: "=cmd|'/c calc'!A1" };
    const out = resultsCsv(ws.spec, rankParts(ws.spec, [part]), [part]);
    expect(out).toContain(`"'=cmd|'/c calc'!A1"`);
  });
});
