import { readFileSync } from "node:fs";
import { importPartList } from "../../src/catalog/importPartList.ts";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import type { Spec } from "../../src/engine/types.ts";

export const demoSpec = (parseSpec(JSON.parse(readFileSync("sample-parts/demo-spec.json", "utf8"))) as { ok: true; spec: Spec }).spec;
export const demoParts = importPartList(readFileSync("sample-parts/demo-parts.csv", "utf8")).parts;
export const part = (pn: string) => demoParts.find((p) => p.partNumber === pn)!;
