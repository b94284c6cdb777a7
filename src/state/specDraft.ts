import type { Spec } from "../engine/types.ts";
import { parseSpec, type SpecError } from "../engine/parseSpec.ts";
import { FIELD_GROUPS, SPEC_FIELDS, type FieldGroup } from "./specFields.ts";
import { readField, valueText, type FieldReading } from "./readField.ts";

/** The Design screen's text, field by field (keyed by spec key), kept even when it does not parse. */
export type Draft = Record<string, string>;

export interface DraftReading {
  fields: Record<string, FieldReading>;
  /** parseSpec's complaints (cross-field rules), by key; empty while a field does not read. */
  specErrors: SpecError[];
  /** The spec the draft describes, null while anything is wrong. */
  spec: Spec | null;
}

function get(spec: Spec, key: string): unknown {
  let at: unknown = spec;
  for (const part of key.split(".")) at = at === null || typeof at !== "object" ? undefined : (at as Record<string, unknown>)[part];
  return at;
}

function set(target: Record<string, unknown>, key: string, value: unknown): void {
  const parts = key.split(".");
  let at = target;
  parts.slice(0, -1).forEach((p) => {
    at = (at[p] ??= {}) as Record<string, unknown>;
  });
  at[parts[parts.length - 1]!] = value;
}

/** The texts that show a spec, every field filled in. */
export function draftFromSpec(spec: Spec): Draft {
  const draft: Draft = {};
  for (const field of SPEC_FIELDS) draft[field.key] = valueText(field.kind, get(spec, field.key) as number | string | null);
  return draft;
}

/** Reads every field and, when they all read, asks parseSpec about the whole. */
export function readDraft(draft: Draft): DraftReading {
  const fields: Record<string, FieldReading> = {};
  const input: Record<string, unknown> = {};
  let allRead = true;
  for (const field of SPEC_FIELDS) {
    const reading = readField(field, draft[field.key] ?? "");
    fields[field.key] = reading;
    if (!reading.ok) allRead = false;
    else if (reading.value !== undefined) set(input, field.key, reading.value);
  }
  if (!allRead) return { fields, specErrors: [], spec: null };
  const parsed = parseSpec(input);
  return parsed.ok ? { fields, specErrors: [], spec: parsed.spec } : { fields, specErrors: parsed.errors, spec: null };
}

const FIELD_KEYS = new Set(SPEC_FIELDS.map((f) => f.key));

/** parseSpec errors that belong to one field. */
export function fieldErrors(reading: DraftReading, key: string): string[] {
  const own = reading.fields[key];
  const messages = own !== undefined && !own.ok ? [own.message] : [];
  for (const e of reading.specErrors) if (e.key === key) messages.push(e.message);
  return messages;
}

/** parseSpec errors about a group as a whole, or about keys no field shows (listed with their key). */
export function groupErrors(reading: DraftReading, group: FieldGroup): string[] {
  const messages: string[] = [];
  for (const e of reading.specErrors) {
    if (group.groupKeys.includes(e.key)) messages.push(e.key === "(spec)" ? e.message : `${e.key}: ${e.message}`);
    else if (group === FIELD_GROUPS[0] && !FIELD_KEYS.has(e.key) && !FIELD_GROUPS.some((g) => g.groupKeys.includes(e.key))) messages.push(`${e.key}: ${e.message}`);
  }
  return messages;
}

/** Every problem in the draft, for the summary at the top of the screen. */
export function draftProblemCount(reading: DraftReading): number {
  return Object.values(reading.fields).filter((f) => !f.ok).length + reading.specErrors.length;
}
