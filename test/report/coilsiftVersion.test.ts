import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { COILSIFT_VERSION } from "../../src/report/coilsiftVersion.ts";

describe("COILSIFT_VERSION", () => {
  it("COILSIFT_VERSION is package.json's version", () => {
    expect(COILSIFT_VERSION).toBe(JSON.parse(readFileSync("package.json", "utf8")).version);
  });
});
