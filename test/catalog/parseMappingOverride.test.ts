import { describe, expect, it } from "vitest";
import { parseMappingOverride } from "../../src/catalog/parseMappingOverride.ts";

describe("parseMappingOverride", () => {
  it.each([
    ["L (nH)=inductance:nH", { header: "L (nH)", quantity: "inductance", unit: "nH" }],
    ["Value=inductance", { header: "Value", quantity: "inductance", unit: null }],
    ["R = dcrMax : mOhm", { header: "R", quantity: "dcrMax", unit: "mOhm" }],
    ["Code=ignore", { header: "Code", quantity: "ignore", unit: null }],
    ["a=b=isat:mA", { header: "a=b", quantity: "isat", unit: "mA" }],
    ["Cost=price:EUR", { header: "Cost", quantity: "price", unit: "EUR" }],
    ["Size=dimensions:mil", { header: "Size", quantity: "dimensions", unit: "mil" }],
    ["PN=PARTNUMBER", { header: "PN", quantity: "partNumber", unit: null }],
  ])("parseMappingOverride(%j) is the override", (text, expected) => {
    expect(parseMappingOverride(text)).toEqual(expected);
  });

  it.each([
    ["no equals sign", /expected "Header=quantity:unit"/],
    ["=inductance", /expected|no header/],
    ["X=inductanc", /unknown quantity "inductanc"/],
    ["X=inductance:mA", /current.*inductance/],
    ["X=inductance:furlong", /unknown unit "furlong"/],
    ["X=maker:mm", /takes no unit/],
    ["X=ignore:mm", /takes no unit/],
  ])("parseMappingOverride(%j) is a message", (text, message) => {
    const r = parseMappingOverride(text);
    expect(typeof r).toBe("string");
    expect(r).toMatch(message);
  });
});
