import demoPartsText from "../../sample-parts/demo-parts.csv?raw";
import demoSpecJson from "../../sample-parts/demo-spec.json";
import type { Spec } from "../engine/types.ts";
import { parseSpec } from "../engine/parseSpec.ts";
import type { Workspace } from "./workspace.ts";
import { defaultView } from "./workspaceDefaults.ts";

export const DEMO_NAME = "Demo: 12 V to 3.3 V point-of-load buck";
export const DEMO_LIST_NAME = "demo-parts.csv";

/** The invented demo spec: a 12 V → 3.3 V, 3 A buck. */
export function demoSpec(): Spec {
  const parsed = parseSpec(demoSpecJson);
  if (!parsed.ok) throw new Error(`demo spec is invalid: ${parsed.errors.map((e) => `${e.key}: ${e.message}`).join("; ")}`);
  return parsed.spec;
}

/** First start: the demo spec and the invented sample catalog, opened on the ranking. */
export function demoWorkspace(cautionsAcknowledged = false): Workspace {
  return {
    name: DEMO_NAME,
    notes: "",
    spec: demoSpec(),
    lists: [{ id: "demo-parts", name: DEMO_LIST_NAME, text: demoPartsText, mapping: [], seriesSaturation: {}, addedAt: "2026-01-01T00:00:00.000Z" }],
    shortlist: [],
    view: { ...defaultView("ranking"), cautionsAcknowledged },
  };
}

