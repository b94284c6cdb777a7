import type { Mode, ResultStatus } from "../engine/types.ts";

/**
 * Small integer codes for the string unions that cross the worker boundary in typed arrays:
 * a Uint8Array is transferred without copying, an array of 100 000 strings is cloned.
 */
export const STATUS_CODES: readonly ResultStatus[] = ["pass", "incomplete", "fail"];
export const MODE_CODES: readonly Mode[] = ["ccm", "bcm", "dcm", "forced-continuous"];
/** Mode code meaning "no reachable corner at minimum load". */
export const MODE_UNKNOWN = 255;

export function statusCode(status: ResultStatus): number {
  return STATUS_CODES.indexOf(status);
}

export function statusOfCode(code: number): ResultStatus {
  return STATUS_CODES[code] ?? "fail";
}

export function modeCode(mode: Mode): number {
  return MODE_CODES.indexOf(mode);
}

export function modeOfCode(code: number): Mode | null {
  return MODE_CODES[code] ?? null;
}
