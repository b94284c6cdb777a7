import { z } from "zod";
import type { Spec } from "./types.ts";
import { makeSpec, type SpecInput } from "./specDefaults.ts";

export interface SpecError {
  /** Dotted key path, e.g. "targets.rippleRatio.min". */
  key: string;
  message: string;
}

export type SpecParse = { ok: true; spec: Spec } | { ok: false; errors: SpecError[] };

const finite = z.number({ error: "must be a number" }).finite("must be a finite number");
const nonNegative = finite.min(0, "must not be negative");
const positive = finite.positive("must be greater than zero");
const fraction = finite.min(0, "must not be negative").max(1, "must be at most 1");
const limit = positive.nullable();

const range = z.union([positive, z.strictObject({ min: positive, nom: positive.optional(), max: positive })]);
const load = z.union([nonNegative, z.strictObject({ min: nonNegative, max: nonNegative })]);

const targets = z.strictObject({
  rippleRatio: z.strictObject({ min: nonNegative.optional(), max: positive.optional() }).optional(),
  saturationMargin: nonNegative.optional(),
  heatingMargin: nonNegative.optional(),
  srfFactor: nonNegative.optional(),
  lightLoadMode: z.enum(["any", "ccm"], { error: 'must be "any" or "ccm"' }).optional(),
  maxTempRise: positive.optional(),
  maxTemperature: finite.nullable().optional(),
  maxLength: limit.optional(),
  maxWidth: limit.optional(),
  maxHeight: limit.optional(),
  maxFootprint: limit.optional(),
  maxPrice: limit.optional(),
});

const weights = z.strictObject({
  loss: nonNegative.optional(),
  footprint: nonNegative.optional(),
  height: nonNegative.optional(),
  price: nonNegative.optional(),
  margin: nonNegative.optional(),
});

const specSchema = z.strictObject({
  topology: z.enum(["buck", "boost", "buck-boost"], { error: 'must be "buck", "boost" or "buck-boost"' }),
  rectifier: z.enum(["diode", "synchronous"], { error: 'must be "diode" or "synchronous"' }).optional(),
  vin: range,
  vout: positive,
  iout: load,
  fsw: positive,
  switchResistance: nonNegative.optional(),
  switchDrop: nonNegative.optional(),
  rectifierDrop: nonNegative.optional(),
  rectifierResistance: nonNegative.optional(),
  ambient: finite.min(-273.15, "must be above absolute zero").optional(),
  thermalExponent: positive.max(3, "must be at most 3").optional(),
  assumedTolerance: fraction.max(0.99, "must be below 1").optional(),
  targets: targets.optional(),
  weights: weights.optional(),
});

function keyOf(path: readonly PropertyKey[]): string {
  return path.map(String).join(".") || "(spec)";
}

/** Cross-field rules the schema cannot state. */
function relationErrors(spec: Spec): SpecError[] {
  const errors: SpecError[] = [];
  const { vin, iout, targets: t } = spec;
  if (vin.min > vin.nom || vin.nom > vin.max) errors.push({ key: "vin", message: "must satisfy min ≤ nom ≤ max" });
  if (iout.min > iout.max) errors.push({ key: "iout", message: "must satisfy min ≤ max" });
  if (iout.max <= 0) errors.push({ key: "iout.max", message: "must be greater than zero" });
  if (spec.topology === "buck" && spec.vout >= vin.min)
    errors.push({ key: "vout", message: `a buck needs vout below vin at every corner (vout ${spec.vout} V ≥ vin.min ${vin.min} V)` });
  if (spec.topology === "boost" && spec.vout <= vin.max)
    errors.push({ key: "vout", message: `a boost needs vout above vin at every corner (vout ${spec.vout} V ≤ vin.max ${vin.max} V)` });
  if (t.rippleRatio.min > t.rippleRatio.max) errors.push({ key: "targets.rippleRatio", message: "must satisfy min ≤ max" });
  const w = spec.weights;
  if (w.loss + w.footprint + w.height + w.price + w.margin <= 0) errors.push({ key: "weights", message: "at least one weight must be above zero" });
  return errors;
}

/**
 * Validates an untrusted spec (a parsed JSON file or the UI's form): unknown keys and impossible
 * values are refused with messages naming the key; vin and iout may be single numbers, and a
 * missing vin.nom is the midpoint of min and max.
 */
export function parseSpec(input: unknown): SpecParse {
  const parsed = specSchema.safeParse(input);
  if (!parsed.success) {
    const errors = parsed.error.issues.map((issue) => {
      if (issue.code === "unrecognized_keys") {
        const prefix = issue.path.length > 0 ? `${keyOf(issue.path)}.` : "";
        return { key: issue.keys.map((k) => prefix + k).join(", "), message: "unknown key" };
      }
      return { key: keyOf(issue.path), message: issue.message };
    });
    return { ok: false, errors };
  }
  const data = parsed.data;
  const vin = typeof data.vin === "number" ? data.vin : { min: data.vin.min, max: data.vin.max, nom: data.vin.nom ?? (data.vin.min + data.vin.max) / 2 };
  const input2: SpecInput = {
    ...(data as Omit<typeof data, "vin">),
    vin,
  } as SpecInput;
  const spec = makeSpec(input2);
  const errors = relationErrors(spec);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, spec };
}

/** One line per error: "key: message". */
export function describeSpecErrors(errors: SpecError[]): string {
  return errors.map((e) => `${e.key}: ${e.message}`).join("; ");
}
