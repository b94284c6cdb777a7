import { describe, expect, it } from "vitest";
import { decodeText } from "../../src/catalog/decodeText.ts";

// Reference encodings come from Node's Buffer (utf8, utf16le, latin1), outside the project.
const TEXT = "Part Number;Inductance (µH);DCR (mΩ)\nA1;4,7;45\n";

function utf16be(text: string): Uint8Array {
  const le = Buffer.from(text, "utf16le");
  const be = Buffer.alloc(le.length);
  for (let i = 0; i < le.length; i += 2) {
    be[i] = le[i + 1]!;
    be[i + 1] = le[i]!;
  }
  return be;
}

describe("decodeText", () => {
  it("decodeText(UTF-8 without BOM) is the text", () => {
    expect(decodeText(Buffer.from(TEXT, "utf8"))).toBe(TEXT);
  });

  it("decodeText(UTF-8 with BOM) drops the BOM", () => {
    expect(decodeText(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(TEXT, "utf8")]))).toBe(TEXT);
  });

  it("decodeText(UTF-16 LE with BOM) is the text", () => {
    expect(decodeText(Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(TEXT, "utf16le")]))).toBe(TEXT);
  });

  it("decodeText(UTF-16 BE with BOM) is the text", () => {
    expect(decodeText(Buffer.concat([Buffer.from([0xfe, 0xff]), utf16be(TEXT)]))).toBe(TEXT);
  });

  it("decodeText(UTF-16 LE without BOM) is recognised by its zero bytes", () => {
    const ascii = "Part Number,Inductance (uH)\nA1,4.7\n";
    expect(decodeText(Buffer.from(ascii, "utf16le"))).toBe(ascii);
    expect(decodeText(utf16be(ascii))).toBe(ascii);
  });

  it("decodeText(Windows-1252 bytes) reads µ written as the single byte 0xB5", () => {
    const latin = "Inductance (µH)\n4,7\n";
    expect(decodeText(Buffer.from(latin, "latin1"))).toBe(latin);
  });

  it("decodeText(empty) is empty", () => {
    expect(decodeText(new Uint8Array())).toBe("");
  });
});
