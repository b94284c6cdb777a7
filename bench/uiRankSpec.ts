import { readFileSync } from "node:fs";
import { parseSpec } from "../src/engine/parseSpec.ts";
import type { Spec } from "../src/engine/types.ts";

/** The demo spec, read the way the app reads it. */
export function demoSpecForBench(): Spec {
  const parsed = parseSpec(JSON.parse(readFileSync(new URL("../sample-parts/demo-spec.json", import.meta.url), "utf8")));
  if (!parsed.ok) throw new Error("demo spec is invalid");
  return parsed.spec;
}
