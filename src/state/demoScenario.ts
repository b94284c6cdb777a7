import demoPartsText from "../../sample-parts/demo-parts.csv?raw";
import demoSpecJson from "../../sample-parts/demo-spec.json";
import type { Spec } from "../engine/types.ts";
import { parseSpec } from "../engine/parseSpec.ts";
import { importPartList } from "../catalog/importPartList.ts";
import type { ImportResult } from "../catalog/types.ts";

export interface DemoScenario {
  name: string;
  spec: Spec;
  list: ImportResult;
}

/** The invented demo: a 12 V → 3.3 V, 3 A buck and the sample catalog. */
export function loadDemoScenario(): DemoScenario {
  const parsed = parseSpec(demoSpecJson);
  if (!parsed.ok) throw new Error(`demo spec is invalid: ${parsed.errors.map((e) => `${e.key}: ${e.message}`).join("; ")}`);
  return { name: "Demo: 12 V to 3.3 V point-of-load buck", spec: parsed.spec, list: importPartList(demoPartsText, { name: "demo-parts.csv" }) };
}
