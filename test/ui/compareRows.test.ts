import { describe, expect, it } from "vitest";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";
import { compareRows } from "../../src/ui/compare/compareRows.ts";
import { demoSpec, part } from "./fixtures.ts";

const items = ["HV-DRS12060-6U8", "QC-PIR6035-6U8", "BF-MCX7040-6U8"].map((pn, k) => ({ part: part(pn), e: evaluatePart(demoSpec, part(pn)), score: [90, 80, 70][k]! }));
const row = (label: string) => compareRows(items).find((r) => r.label === label)!;

describe("compareRows", () => {
  it("compareRows marks the lowest loss and the highest Isat as best", () => {
    const losses = items.map((it) => it.e.worst.totalLoss.value);
    expect(row("Worst loss").best).toEqual([losses.indexOf(Math.min(...losses))]);
    const isats = items.map((it) => it.part.isat!);
    expect(row("Isat").best).toEqual([isats.indexOf(Math.max(...isats))]);
    expect(row("Score").best).toEqual([0]);
  });

  it("compareRows marks nothing where every part is equal or the row is not a comparison", () => {
    expect(row("Inductance").best).toEqual([]);
    expect(row("Tolerance").best).toEqual([]);
  });

  it("compareRows of one part marks nothing", () => {
    expect(compareRows(items.slice(0, 1)).every((r) => r.best.length === 0)).toBe(true);
  });
});

describe("compareRows with a failing part", () => {
  it("compareRows never marks a failing part's score best beside parts that work", () => {
    const failing = "QC-PIR6035-1U";
    const mixed = [...items.slice(0, 2), { part: part(failing), e: evaluatePart(demoSpec, part(failing)), score: 99 }];
    expect(mixed[2]!.e.status).toBe("fail");
    expect(compareRows(mixed).find((r) => r.label === "Score")!.best).toEqual([0]);
  });
});
