import { z } from "zod";
import { parseSpec } from "../engine/parseSpec.ts";
import { isQuantity } from "../catalog/quantities.ts";
import type { MappingOverride } from "../catalog/types.ts";
import type { PartListSource, ViewState, Workspace } from "./workspace.ts";
import { defaultView } from "./workspaceDefaults.ts";
import { defaultExtras, type Extras } from "./extrasStore.ts";

/** The workspace as stored: list texts live under their own keys, so a view change never rewrites megabytes. */
export type StoredWorkspace = Omit<Workspace, "lists"> & { lists: Omit<PartListSource, "text">[] };

const SCREENS = ["design", "parts", "ranking", "detail", "compare", "sweeps", "tradeoff"] as const;

const override = z.object({ header: z.string(), quantity: z.string(), unit: z.string().nullable() });
const list = z.object({
  id: z.string().min(1),
  name: z.string(),
  mapping: z.array(override),
  seriesSaturation: z.record(z.string(), z.enum(["soft", "hard"])),
  addedAt: z.string(),
});
const view = z
  .object({
    screen: z.enum(SCREENS),
    selectedPart: z.string().nullable(),
    rankingSort: z.object({ column: z.string(), descending: z.boolean() }).nullable(),
    rankingFilter: z.object({ passOnly: z.boolean(), text: z.string(), maker: z.string().nullable(), material: z.string().nullable() }),
    cautionsAcknowledged: z.boolean(),
  })
  .partial();
const stored = z.object({
  name: z.string(),
  notes: z.string(),
  spec: z.unknown(),
  lists: z.array(list),
  shortlist: z.array(z.string()),
  view: view,
});

function cleanMapping(raw: z.infer<typeof override>[]): MappingOverride[] {
  return raw.flatMap((o) => (o.quantity === "ignore" || isQuantity(o.quantity) ? [{ header: o.header, quantity: o.quantity as MappingOverride["quantity"], unit: o.unit }] : []));
}

export interface Restored {
  workspace: Workspace;
  problems: string[];
}

/**
 * A stored workspace read back, repaired where it can be: a spec that no longer parses falls back
 * to `fallback.spec`, a list whose text is missing is dropped, and each repair is reported.
 * Null when the record is not a workspace at all.
 */
export function restoreWorkspace(raw: unknown, texts: Record<string, string | undefined>, fallback: Workspace): Restored | null {
  const parsed = stored.safeParse(raw);
  if (!parsed.success) return null;
  const data = parsed.data;
  const problems: string[] = [];
  const spec = parseSpec(data.spec);
  if (!spec.ok) problems.push(`The saved spec could not be read (${spec.errors.map((e) => `${e.key}: ${e.message}`).join("; ")}); the starting spec is shown instead.`);
  const lists: PartListSource[] = [];
  for (const l of data.lists) {
    const text = texts[l.id];
    if (text === undefined) problems.push(`The saved list ${l.name} is missing from browser storage; load the file again.`);
    else lists.push({ ...l, mapping: cleanMapping(l.mapping), text });
  }
  const defaults = defaultView();
  const v: ViewState = {
    screen: data.view.screen ?? defaults.screen,
    selectedPart: data.view.selectedPart ?? null,
    rankingSort: data.view.rankingSort ?? null,
    rankingFilter: data.view.rankingFilter ?? defaults.rankingFilter,
    cautionsAcknowledged: data.view.cautionsAcknowledged ?? false,
  };
  return {
    workspace: { name: data.name, notes: data.notes, spec: spec.ok ? spec.spec : fallback.spec, lists, shortlist: data.shortlist.slice(0, 6), view: v },
    problems,
  };
}

export function storedForm(w: Workspace): StoredWorkspace {
  return { ...w, lists: w.lists.map(({ text: _text, ...rest }) => rest) };
}

const cornerKey = z.object({ vin: z.enum(["min", "nom", "max", "peak-ripple"]), iout: z.enum(["min", "max"]), inductance: z.enum(["min", "nom", "max"]) });
const extras = z
  .object({
    detailCorner: cornerKey.nullable(),
    compareCorner: cornerKey,
    sweeps: z.object({ inductance: z.enum(["min", "nom", "max"]), load: z.enum(["min", "max"]), vin: z.enum(["min", "nom", "max"]) }),
    tradeoffIncomplete: z.boolean(),
    expanded: z.array(z.string()),
  })
  .partial();

export function restoreExtras(raw: unknown): Extras {
  const parsed = extras.safeParse(raw);
  const base = defaultExtras();
  if (!parsed.success) return base;
  const e = parsed.data;
  return {
    detailCorner: e.detailCorner === undefined ? base.detailCorner : e.detailCorner,
    compareCorner: e.compareCorner ?? base.compareCorner,
    sweeps: e.sweeps ?? base.sweeps,
    tradeoffIncomplete: e.tradeoffIncomplete ?? base.tradeoffIncomplete,
    expanded: e.expanded ?? base.expanded,
  };
}

export function restoreDraft(raw: unknown): Record<string, string> | null {
  const parsed = z.record(z.string(), z.string()).safeParse(raw);
  return parsed.success ? parsed.data : null;
}

export function restoreMappings(raw: unknown): Record<string, MappingOverride[]> {
  const parsed = z.record(z.string(), z.array(override)).safeParse(raw);
  if (!parsed.success) return {};
  return Object.fromEntries(Object.entries(parsed.data).map(([k, v]) => [k, cleanMapping(v)]));
}
