import { unit } from "mathjs";

/**
 * The independent reference for unit conversion in these tests: mathjs (a general-purpose
 * units library, dev dependency only). `si("4.7 uH", "H")` is 4.7e-6.
 */
export function si(expression: string, siUnit: string): number {
  return unit(expression).toNumber(siUnit);
}

/** Relative closeness; doubles from different conversion paths can differ in the last bit. */
export function close(actual: number | null | undefined, expected: number, relative = 1e-12): boolean {
  if (actual === null || actual === undefined) return false;
  return Math.abs(actual - expected) <= relative * Math.max(Math.abs(expected), Number.MIN_VALUE);
}
