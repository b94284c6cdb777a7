import { evaluate } from "mathjs";
import { describe, expect, it } from "vitest";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { ROLL_OFF_EXPONENT, PART_DEFAULTS } from "../../src/engine/partDefaults.ts";
import { close, si } from "./siReference.ts";

const HEADER = "Part Number,Inductance (uH),DCR max (mOhm),Isat (A)";

function balanced(r: ReturnType<typeof importPartList>): void {
  expect(r.parts.length + r.rejected.length).toBe(r.dataRows);
}

describe("importPartList", () => {
  it("importPartList(csv) gives engine Parts in SI with defaults filled", () => {
    const r = importPartList(`${HEADER}\nA1,4.7,45,3.2\n`);
    balanced(r);
    const p = r.parts[0]!;
    expect(close(p.inductance, si("4.7 uH", "H"))).toBe(true); // mathjs
    expect(close(p.dcrMax, si("45 mohm", "ohm"))).toBe(true); // mathjs
    expect(p.isat).toBe(3.2);
    expect(p.isatDrop).toBe(PART_DEFAULTS.isatDrop);
    expect(p.saturation).toBe(PART_DEFAULTS.saturation);
    expect(p.dcrTyp).toBeNull();
  });

  it("importPartList detects tab, semicolon and pipe delimiters", () => {
    for (const d of ["\t", ";", "|"]) {
      const r = importPartList(`${HEADER.split(",").join(d)}\nA1${d}4.7${d}45${d}3.2\n`);
      expect(r.delimiter).toBe(d);
      expect(r.parts).toHaveLength(1);
    }
  });

  it("importPartList reads a semicolon file with decimal commas", () => {
    const r = importPartList("Part Number;Inductance (uH);DCR max (mOhm);Isat (A)\nA1;4,7;45,5;3,2\nA2;10;1.250;2,5\n");
    expect(r.delimiter).toBe(";");
    expect(r.decimalComma).toBe(true);
    expect(close(r.parts[0]!.inductance, si("4.7 uH", "H"))).toBe(true); // mathjs
    expect(close(r.parts[1]!.dcrMax, si("1250 mohm", "ohm"))).toBe(true); // mathjs: "1.250" groups thousands here
  });

  it("importPartList keeps quoted cells with delimiters and newlines, and counts lines through them", () => {
    const text = `Part Number,Series,Inductance (uH)\r\n"A1","Drum, shielded\r\nsecond line",4.7\r\nA2,plain,x\r\n`;
    const r = importPartList(text);
    balanced(r);
    expect(r.parts[0]!.series).toBe("Drum, shielded\r\nsecond line");
    // The record of A2 starts on line 4 (the quoted cell spans lines 2–3).
    expect(r.rejected[0]!.row).toBe(4);
  });

  it("importPartList skips blank and comment lines and reports rows by their line in the file", () => {
    const r = importPartList(`# exported list, "quotes" are fine\n\n${HEADER}\n\nA1,4.7,45,3.2\n# a comment\nA2,,45,3.2\n`);
    balanced(r);
    expect(r.dataRows).toBe(2);
    expect(r.headerRow).toBe(3);
    expect(r.rejected).toEqual([expect.objectContaining({ row: 7, field: "inductance", reason: "missing inductance" })]);
  });

  it("importPartList finds the header under a title row and uses a unit row below it", () => {
    const r = importPartList("Spring list of a distributor\nPart Number;Inductance;Isat;SRF\n;nH;mA;kHz\nA1;4700;3200;45000\n");
    balanced(r);
    expect(r.title).toBe("Spring list of a distributor");
    const p = r.parts[0]!;
    expect(close(p.inductance, si("4700 nH", "H"))).toBe(true); // mathjs
    expect(close(p.isat, si("3200 mA", "A"))).toBe(true); // mathjs
    expect(close(p.srf, si("45000 kHz", "Hz"))).toBe(true); // mathjs
    expect(r.mapping.find((m) => m.quantity === "inductance")?.unitSource).toBe("unit row");
  });

  it("importPartList uses a unit row above the header", () => {
    const r = importPartList(",µH,mΩ\nPart Number,Inductance,DCR max\nA1,4.7,45\n");
    expect(close(r.parts[0]!.dcrMax, si("45 mohm", "ohm"))).toBe(true); // mathjs
    expect(r.dataRows).toBe(1);
  });

  it("importPartList rejects each bad row with its line, field and reason", () => {
    const text = [HEADER, "A1,4.7,45,3.2", ",4.7,45,3.2", "A3,,45,3.2", "A4,abc,45,3.2", "A5,0,45,3.2", "A6,4.7,-3,3.2", "A7,4.7,45,zero"].join("\n");
    const r = importPartList(text);
    balanced(r);
    expect(r.parts.map((p) => p.partNumber)).toEqual(["A1"]);
    expect(r.rejected.map((x) => [x.row, x.field])).toEqual([
      [3, "partNumber"],
      [4, "inductance"],
      [5, "inductance"],
      [6, "inductance"],
      [7, "dcrMax"],
      [8, "isat"],
    ]);
    expect(r.rejected[0]!.reason).toBe("missing part number");
    expect(r.rejected[1]!.reason).toBe("missing inductance");
    expect(r.rejected[2]!.reason).toMatch(/unparseable inductance.*"abc"/);
    expect(r.rejected[3]!.reason).toMatch(/zero or negative/);
    expect(r.rejected[5]!.header).toBe("Isat (A)");
    expect(r.rejected[5]!.cells).toEqual(["A7", "4.7", "45", "zero"]);
  });

  it("importPartList rejects every row of a list without an inductance or part number column, saying how to map one", () => {
    const noL = importPartList("Part Number,Isat (A)\nA1,3\nA2,4\n");
    balanced(noL);
    expect(noL.rejected[0]!.reason).toMatch(/no inductance column.*Header=inductance/);
    const noPn = importPartList("Inductance (uH),Isat (A)\n4.7,3\n");
    expect(noPn.rejected[0]!.field).toBe("partNumber");
  });

  it("importPartList warns about an implausible value instead of rejecting it", () => {
    const rows = ["A1,4.7", "A2,10", "A3,2.2", "A4,4700000"].join("\n");
    const r = importPartList(`Part Number,Inductance (uH)\n${rows}\n`);
    expect(r.parts).toHaveLength(4);
    const w = r.warnings.filter((x) => x.field === "inductance");
    expect(w).toHaveLength(1);
    expect(w[0]!.row).toBe(5);
    expect(w[0]!.message).toMatch(/A4.*check the unit/);
  });

  it("importPartList keeps the later of two rows with the same part number and reports both", () => {
    const r = importPartList(`${HEADER}\nA1,4.7,45,3.2\nA2,10,80,2\na1,6.8,60,2.8\n`);
    balanced(r);
    expect(r.parts.map((p) => p.partNumber)).toEqual(["A2", "a1"]);
    expect(close(r.parts[1]!.inductance, si("6.8 uH", "H"))).toBe(true); // mathjs
    expect(r.rejected[0]).toMatchObject({ row: 2, field: "partNumber" });
    expect(r.rejected[0]!.reason).toMatch(/duplicate.*line 4/);
    expect(r.warnings.some((w) => w.row === 4 && /duplicate/.test(w.message))).toBe(true);
  });

  it("importPartList gives a replaced duplicate its own cells, also after a multi-line cell, CRLF ends and a third copy", () => {
    const text = `Part,L (uH),DCR (mOhm),Isat (A),Note\r\nB1,4.7,45,3.2,"two\r\nlines"\r\nB2,10,80,2,x\r\nb1,6.8,60,2.8,y\r\nB1,3.3,30,4,z\r\n`;
    const r = importPartList(text);
    balanced(r);
    expect(r.parts.map((p) => p.partNumber)).toEqual(["B2", "B1"]);
    expect(r.rejected.map((x) => [x.row, x.cells])).toEqual([
      [2, ["B1", "4.7", "45", "3.2", "two\r\nlines"]],
      [5, ["b1", "6.8", "60", "2.8", "y"]],
    ]);
  });

  it("importPartList keeps unrecognised columns as extra cells and lists them in the mapping", () => {
    const r = importPartList("Part Number,Inductance (uH),Stock,Notes\nA1,4.7,1200,low profile\nA2,10,,\n");
    expect(r.extra["A1"]).toEqual({ Stock: "1200", Notes: "low profile" });
    expect(r.extra["A2"]).toBeUndefined();
    expect(r.mapping.filter((m) => m.status === "unrecognised").map((m) => m.header)).toEqual(["Stock", "Notes"]);
  });

  it("importPartList keeps a second column of the same quantity as a duplicate, not merged", () => {
    const r = importPartList("Part Number,Inductance (uH),Inductance (nH)\nA1,4.7,4700\n");
    expect(r.mapping[2]!.status).toBe("duplicate");
    expect(r.extra["A1"]).toEqual({ "Inductance (nH)": "4700" });
  });

  it("importPartList applies mapping overrides, as objects or Header=quantity:unit text", () => {
    const text = "Part Number,Value,Code\nA1,4700,X\n";
    const r = importPartList(text, { mapping: ["Value=inductance:nH", "Code=ignore", "Nope=isat", "Value=bogus"] });
    expect(close(r.parts[0]!.inductance, si("4700 nH", "H"))).toBe(true); // mathjs
    expect(r.mapping[1]).toMatchObject({ quantity: "inductance", unit: "nH", unitSource: "override" });
    expect(r.mapping[2]!.status).toBe("ignored");
    const fileWarnings = r.warnings.filter((w) => w.row === null).map((w) => w.message);
    expect(fileWarnings.some((m) => /"Nope".*no column/.test(m))).toBe(true);
    expect(fileWarnings.some((m) => /unknown quantity "bogus"/.test(m))).toBe(true);
  });

  it("importPartList takes the saturation character from the material, or from seriesSaturation", () => {
    const text = "Part Number,Series,Material,Inductance (uH)\nA1,DX,Ferrite drum,4.7\nA2,MX,Metal composite molded,4.7\nA3,PX,Powdered iron,4.7\nA4,PX,,4.7\n";
    const r = importPartList(text, { seriesSaturation: { dx: "soft" } });
    expect(r.parts.map((p) => p.saturation)).toEqual(["soft", "soft", "soft", "hard"]);
    expect(r.parts[1]!.rollOffExponent).toBe(ROLL_OFF_EXPONENT.soft);
    expect(importPartList(text).parts[0]!.saturation).toBe("hard");
  });

  it("importPartList reads optional columns: hot Isat, roll-off exponent, AC factor and core-loss data", () => {
    const text =
      "Part Number,Inductance (uH),Isat (A),Isat (100°C) (A),Roll-off exponent,AC factor,Steinmetz k,Steinmetz alpha,Steinmetz beta,B per amp (mT/A),Core volume (mm³)\n" +
      "A1,4.7,5,4.2,3.5,1.4,12,1.4,2.5,25,120\nA2,4.7,5,,,,12,1.4,,,\n";
    const r = importPartList(text);
    const p = r.parts[0]!;
    expect(p.isatHot).toBe(4.2);
    expect(p.isatHotTemp).toBe(100);
    expect(p.rollOffExponent).toBe(3.5);
    expect(p.acFactor).toBe(1.4);
    expect(p.coreLoss?.k).toBe(12);
    expect(close(p.coreLoss?.bPerAmp, si("25 mT", "T"))).toBe(true); // mathjs
    expect(close(p.coreLoss?.volume, si("120 mm^3", "m^3"))).toBe(true); // mathjs
    expect(r.parts[1]!.coreLoss).toBeNull();
    expect(r.warnings.some((w) => w.row === 3 && /core-loss data incomplete/.test(w.message))).toBe(true);
  });

  it("importPartList reads conditions written in the Isat and Irms headers", () => {
    const r = importPartList("Part Number,Inductance (uH),Isat (A) @ 20% drop,Irms (ΔT=20K) [A]\nA1,4.7,5,4\n");
    expect(r.parts[0]!.isatDrop).toBeCloseTo(evaluate("20%"), 12); // mathjs % operator
    expect(r.parts[0]!.irmsRise).toBe(20);
  });

  it('importPartList reads one "L x W x H" column in the unit of its header or cell', () => {
    const r = importPartList('Part Number,Inductance (uH),L x W x H (mil),Size\nA1,4.7,197 x 197 x 118,\nA2,4.7,"5.0 x 5.0 x 3.0 mm",\n');
    expect(close(r.parts[0]!.length, si("197 mil", "m"))).toBe(true); // mathjs
    expect(close(r.parts[0]!.height, si("118 mil", "m"))).toBe(true); // mathjs
    expect(close(r.parts[1]!.width, si("5 mm", "m"))).toBe(true); // mathjs
  });

  it("importPartList takes a DCR column without typ/max as the maximum, or as typical beside a maximum", () => {
    expect(importPartList("Part Number,Inductance (uH),DCR (mOhm)\nA1,4.7,45\n").parts[0]!.dcrMax).toBeCloseTo(0.045, 15);
    const both = importPartList("Part Number,Inductance (uH),DCR (mOhm),DCR max (mOhm)\nA1,4.7,40,45\n").parts[0]!;
    expect(both.dcrTyp).toBeCloseTo(0.04, 15);
    expect(both.dcrMax).toBeCloseTo(0.045, 15);
  });

  it("importPartList guesses a missing unit when the values leave no doubt, and says so", () => {
    const r = importPartList("Part Number,Inductance,DCR,Isat\nA1,4.7,0.045,3200\nA2,10,0.080,2100\n");
    expect(close(r.parts[0]!.dcrMax, si("0.045 ohm", "ohm"))).toBe(true); // mathjs
    expect(close(r.parts[0]!.isat, si("3200 mA", "A"))).toBe(true); // mathjs
    expect(r.mapping.find((m) => m.quantity === "isat")?.unitSource).toBe("guessed");
    expect(r.mapping.find((m) => m.quantity === "inductance")?.unitSource).toBe("default");
  });

  it("importPartList notes a range it read and the end it took", () => {
    const r = importPartList("Part Number,Inductance (uH),Isat (A)\nA1,4.7,4.5-5.5\n");
    expect(r.parts[0]!.isat).toBe(4.5);
    expect(r.warnings.some((w) => w.field === "isat" && /lower end/.test(w.message))).toBe(true);
  });

  it("importPartList of empty or header-only text has no data rows", () => {
    expect(importPartList("").dataRows).toBe(0);
    expect(importPartList("\n\n# nothing\n").dataRows).toBe(0);
    const h = importPartList(`${HEADER}\n`);
    expect(h.dataRows).toBe(0);
    expect(h.mapping).toHaveLength(4);
  });

  it("importPartList reports an unclosed quote", () => {
    const r = importPartList(`${HEADER}\nA1,4.7,45,3.2\n"A2,4.7,45,3.2\nA3,1,2,3\n`);
    balanced(r);
    expect(r.warnings.some((w) => /not closed/.test(w.message))).toBe(true);
  });

  it("importPartList numbers lines exactly in a long file read in chunks, across multi-line cells", () => {
    const records = ["Part Number,Notes,Inductance (uH)"];
    const badNumbers: string[] = [];
    for (let i = 0; i < 60_000; i++) {
      if (i % 997 === 0) records.push(`P${i},"two\nlines",4.7`, "");
      else if (i % 1009 === 0) {
        records.push(`P${i},x,not a number`);
        badNumbers.push(`P${i},x,`);
      } else records.push(`P${i},plain note,${(i % 90) + 1}`);
    }
    const text = records.join("\n") + "\n";
    expect(text.length).toBeGreaterThan(2 * 512 * 1024);
    // Reference: the line of each bad record, counted in the text itself.
    const expected = badNumbers.map((start) => text.slice(0, text.indexOf(`\n${start}`) + 1).split("\n").length);
    const r = importPartList(text);
    balanced(r);
    expect(r.rejected.map((x) => x.row)).toEqual(expected);
    expect(r.parts.find((p) => p.partNumber === "P997")?.inductance).toBeCloseTo(4.7e-6, 18);
  });

  it("importPartList finds a header below many blank lines", () => {
    const r = importPartList(`${"\n".repeat(2000)}${HEADER}\nA1,4.7,45,3.2\n`);
    expect(r.headerRow).toBe(2001);
    expect(r.parts).toHaveLength(1);
  });

  it('importPartList keeps a "#" column (a cell, not a comment) and skips "#" comment lines', () => {
    const r = importPartList("#,Part Number,Inductance (uH)\n1,A1,4.7\n# note, with a \"quote\n2,A2,10\n");
    balanced(r);
    expect(r.parts.map((p) => p.partNumber)).toEqual(["A1", "A2"]);
    expect(r.extra["A1"]).toEqual({ "#": "1" });
  });
});

describe("importPartList unit rows", () => {
  it("importPartList keeps a first part that looks like units (A,1) as a part, not a unit row", () => {
    const r = importPartList("Part Number,Inductance (uH)\nA,1\nB,2.2\n");
    expect(r.parts.map((p) => p.partNumber)).toEqual(["A", "B"]);
    expect(r.parts[0]!.inductance).toBeCloseTo(1e-6, 15);
    expect(r.parts.length + r.rejected.length).toBe(r.dataRows);
  });

  it("importPartList still reads a real unit row under the header", () => {
    const r = importPartList("Part Number,Inductance,DCR\n,uH,mOhm\nP1,4.7,20\n");
    expect(r.parts).toHaveLength(1);
    expect(r.parts[0]!.inductance).toBeCloseTo(4.7e-6, 15);
    expect(r.parts[0]!.dcrMax ?? r.parts[0]!.dcrTyp).toBeCloseTo(0.02, 15);
  });
});
