import { z } from "zod";
import { QUANTITY_KEYS } from "../catalog/quantities.ts";
import type { Quantity } from "../catalog/types.ts";
import { MAX_SHORTLIST, type Workspace } from "./workspace.ts";

/** Name and current version of Coilsift's own project format. */
export const PROJECT_FORMAT = "coilsift-project";
export const PROJECT_VERSION = 1;

const num = z.number({ error: "must be a number" });
const text = z.string({ error: "must be text" });
const nullableNum = num.nullable();

/** A complete engine Spec as the workspace holds it; the engine's parseSpec then checks the relations. */
export const specV1 = z.strictObject({
  topology: z.enum(["buck", "boost", "buck-boost"]),
  rectifier: z.enum(["diode", "synchronous"]),
  vin: z.strictObject({ min: num, nom: num, max: num }),
  vout: num,
  iout: z.strictObject({ min: num, max: num }),
  fsw: num,
  switchResistance: num,
  switchDrop: num,
  rectifierDrop: num,
  rectifierResistance: num,
  ambient: num,
  thermalExponent: num,
  assumedTolerance: num,
  targets: z.strictObject({
    rippleRatio: z.strictObject({ min: num, max: num }),
    saturationMargin: num,
    heatingMargin: num,
    srfFactor: num,
    lightLoadMode: z.enum(["any", "ccm"]),
    maxTempRise: num,
    maxTemperature: nullableNum,
    maxLength: nullableNum,
    maxWidth: nullableNum,
    maxHeight: nullableNum,
    maxFootprint: nullableNum,
    maxPrice: nullableNum,
  }),
  weights: z.strictObject({ loss: num, footprint: num, height: num, price: num, margin: num }),
});

export const mappingV1 = z.strictObject({
  header: text,
  quantity: z.enum(["ignore", ...QUANTITY_KEYS] as [Quantity | "ignore", ...(Quantity | "ignore")[]]),
  unit: text.nullable(),
});

type Character = "soft" | "hard";

/**
 * Copies a record with own properties only: a series named "__proto__" stays a key (an
 * assignment would set the prototype instead, and z.record drops such a key unchecked).
 */
function ownRecord(source: Record<string, Character>): Record<string, Character> {
  const out: Record<string, Character> = {};
  for (const [k, v] of Object.entries(source)) Object.defineProperty(out, k, { value: v, enumerable: true, writable: true, configurable: true });
  return out;
}

const seriesSaturationV1 = z
  .custom<Record<string, Character>>(
    (v) => typeof v === "object" && v !== null && !Array.isArray(v) && Object.values(v).every((c) => c === "soft" || c === "hard"),
    { error: 'must map each series name to "soft" or "hard"' },
  )
  .transform(ownRecord);

const isoTime = text.refine((s) => !Number.isNaN(Date.parse(s)), "must be a date and time (ISO 8601)");

export const listV1 = z.strictObject({
  id: text.min(1, "must not be empty"),
  name: text,
  text,
  mapping: z.array(mappingV1),
  seriesSaturation: seriesSaturationV1,
  addedAt: isoTime,
});

export const viewV1 = z.strictObject({
  screen: z.enum(["design", "parts", "ranking", "detail", "compare", "sweeps", "tradeoff"]),
  selectedPart: text.nullable(),
  rankingSort: z.strictObject({ column: text, descending: z.boolean() }).nullable(),
  rankingFilter: z.strictObject({ passOnly: z.boolean(), text, maker: text.nullable(), material: text.nullable() }),
  cautionsAcknowledged: z.boolean(),
});

export const workspaceV1 = z.strictObject({
  name: text,
  notes: text,
  spec: specV1,
  lists: z.array(listV1).refine((lists) => new Set(lists.map((l) => l.id)).size === lists.length, "list ids must be unique"),
  shortlist: z.array(text).max(MAX_SHORTLIST, `holds at most ${MAX_SHORTLIST} parts`),
  view: viewV1,
});

export const projectV1 = z.strictObject({
  format: z.literal(PROJECT_FORMAT),
  version: z.literal(PROJECT_VERSION),
  workspace: workspaceV1,
});

// The schema must describe exactly the Workspace type: a field added to one and not the other fails typechecking here.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
export const SCHEMA_MATCHES_WORKSPACE: Same<z.infer<typeof workspaceV1>, Workspace> = true;
