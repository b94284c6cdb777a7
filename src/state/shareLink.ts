import type { Spec } from "../engine/types.ts";
import { parseSpec } from "../engine/parseSpec.ts";
import { makeSpec } from "../engine/specDefaults.ts";

/** The hash parameter that carries a spec: #spec=<base64url of the JSON of its non-default keys>. */
export const SPEC_PARAM = "spec";

/** Keys of `value` that differ from `base` (nested objects compared key by key). */
function difference(value: Record<string, unknown>, base: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(value)) {
    const b = base[key];
    if (v !== null && typeof v === "object" && b !== null && typeof b === "object") {
      const inner = difference(v as Record<string, unknown>, b as Record<string, unknown>);
      if (Object.keys(inner).length > 0) out[key] = inner;
    } else if (v !== b) out[key] = v;
  }
  return out;
}

/** The spec with every key at its default left out; parseSpec fills them back in. */
export function compactSpec(spec: Spec): Record<string, unknown> {
  const base = makeSpec({ topology: spec.topology, vin: spec.vin, vout: spec.vout, iout: spec.iout, fsw: spec.fsw });
  const extra = difference(spec as unknown as Record<string, unknown>, base as unknown as Record<string, unknown>);
  // rippleRatio is one object: parseSpec reads its two ends together.
  return { topology: spec.topology, vin: spec.vin, vout: spec.vout, iout: spec.iout, fsw: spec.fsw, ...extra };
}

function toBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let binary = "";
  for (const b of bytes) binary += String.fromCharCode(b);
  return btoa(binary).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64Url(text: string): string {
  const b64 = text.replace(/-/g, "+").replace(/_/g, "/");
  const binary = atob(b64 + "=".repeat((4 - (b64.length % 4)) % 4));
  return new TextDecoder("utf-8", { fatal: true }).decode(Uint8Array.from(binary, (c) => c.charCodeAt(0)));
}

/** "spec=…" for a URL's hash. */
export function specHash(spec: Spec): string {
  return `${SPEC_PARAM}=${toBase64Url(JSON.stringify(compactSpec(spec)))}`;
}

export type HashSpec = { ok: true; spec: Spec } | { ok: false; message: string };

/** The spec a URL hash carries; null when it carries none. Bad input gets a message, never a throw. */
export function specFromHash(hash: string): HashSpec | null {
  const params = new URLSearchParams(hash.replace(/^#/, ""));
  const encoded = params.get(SPEC_PARAM);
  if (encoded === null) return null;
  let json: unknown;
  try {
    json = JSON.parse(fromBase64Url(encoded));
  } catch {
    return { ok: false, message: "the link's spec is damaged (it may have been cut short when copied)" };
  }
  const parsed = parseSpec(json);
  if (!parsed.ok) return { ok: false, message: `the link's spec is not valid: ${parsed.errors.map((e) => `${e.key}: ${e.message}`).join("; ")}` };
  return { ok: true, spec: parsed.spec };
}
