import { describe, expect, it } from "vitest";
import { listChecksum } from "../../src/report/listChecksum.ts";

describe("listChecksum", () => {
  it.each([
    ["", "811c9dc5"],
    ["a", "e40c292c"],
    ["foobar", "bf9cf968"],
  ])("listChecksum(%j) is the FNV-1a 32-bit test vector %s", (text, hash) => {
    expect(listChecksum(text)).toBe(hash);
  });
});
