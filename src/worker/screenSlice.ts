import type { Part, Spec } from "../engine/types.ts";
import { PartScreener } from "../engine/screenParts.ts";
import { MODE_UNKNOWN, modeCode, statusCode } from "./codes.ts";

/**
 * Figures of parts[from, to) in transferable typed arrays: the engine's PartScreener verdict of
 * each part, with the string unions as codes (codes.ts).
 */
export interface SliceFigures {
  from: number;
  /** Status codes (see codes.ts). */
  status: Uint8Array;
  failures: Uint8Array;
  peak: Float64Array;
  irms: Float64Array;
  totalLoss: Float64Array;
  tempRise: Float64Array;
  minMargin: Float64Array;
  unreachable: Uint8Array;
  /** Mode code of the first non-CCM corner at minimum load, CCM when all are, MODE_UNKNOWN when none was reachable. */
  lightLoad: Uint8Array;
  /** Isat(T)/max|i| − 1 and Irated/Irms − 1 at the deciding corners, NaN when not checked. */
  satMargin: Float64Array;
  heatMargin: Float64Array;
}

export function emptySlice(from: number, n: number): SliceFigures {
  return {
    from,
    status: new Uint8Array(n),
    failures: new Uint8Array(n),
    peak: new Float64Array(n),
    irms: new Float64Array(n),
    totalLoss: new Float64Array(n),
    tempRise: new Float64Array(n),
    minMargin: new Float64Array(n),
    unreachable: new Uint8Array(n),
    lightLoad: new Uint8Array(n),
    satMargin: new Float64Array(n),
    heatMargin: new Float64Array(n),
  };
}

/** The typed arrays of a slice, for postMessage's transfer list. */
export function sliceBuffers(s: SliceFigures): ArrayBuffer[] {
  return [s.status, s.failures, s.peak, s.irms, s.totalLoss, s.tempRise, s.minMargin, s.unreachable, s.lightLoad, s.satMargin, s.heatMargin].map(
    (a) => a.buffer as ArrayBuffer,
  );
}

/**
 * Screens parts[from, to) into `out` at offset `from − out.from`, so that a worker can fill one
 * slice in several short steps and stay responsive to a newer request in between. The screener
 * is the caller's, aimed at the job's spec: one per worker (see PartScreener).
 */
export function screenInto(screener: PartScreener, parts: readonly Part[], from: number, to: number, out: SliceFigures): void {
  for (let i = from; i < to; i++) {
    const v = screener.screen(parts[i]!);
    const p = i - out.from;
    out.status[p] = statusCode(v.status);
    out.failures[p] = v.failures;
    out.peak[p] = v.peak;
    out.irms[p] = v.irms;
    out.totalLoss[p] = v.totalLoss;
    out.tempRise[p] = v.tempRise;
    out.minMargin[p] = v.minMargin;
    out.unreachable[p] = v.unreachable ? 1 : 0;
    out.lightLoad[p] = v.lightLoadMode === null ? MODE_UNKNOWN : modeCode(v.lightLoadMode);
    out.satMargin[p] = v.saturationMargin;
    out.heatMargin[p] = v.heatingMargin;
  }
}

/** Screens a whole slice in one go (tests, small lists). */
export function screenSlice(spec: Spec, parts: readonly Part[], from = 0, to = parts.length): SliceFigures {
  const out = emptySlice(from, Math.max(0, to - from));
  screenInto(new PartScreener(spec), parts, from, to, out);
  return out;
}
