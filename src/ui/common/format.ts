import type { Mode, Part } from "../../engine/types.ts";
import { formatPercent, formatQuantity } from "../../engine/formatQuantity.ts";

export const amps = (x: number | null) => formatQuantity(x, "A");
export const henries = (x: number | null) => formatQuantity(x, "H");
export const ohms = (x: number | null) => formatQuantity(x, "Ω");
export const watts = (x: number | null) => formatQuantity(x, "W");
export const hertz = (x: number | null) => formatQuantity(x, "Hz");
export const volts = (x: number | null) => formatQuantity(x, "V");
export const percent = (x: number | null) => formatPercent(x);

/** NaN (the screening's "no value") as null. */
export const known = (x: number | undefined): number | null => (x === undefined || Number.isNaN(x) ? null : x);

export function kelvin(x: number | null): string {
  return x === null || Number.isNaN(x) ? "—" : `${x.toFixed(1)} K`;
}

const mm = (x: number) => String(Number((x * 1e3).toPrecision(3)));

/** "2.5 × 2 × 1.2 mm", or what is known of it. */
export function sizeText(p: Part): string {
  if (p.length === null && p.width === null && p.height === null) return "—";
  return `${p.length === null ? "?" : mm(p.length)} × ${p.width === null ? "?" : mm(p.width)} × ${p.height === null ? "?" : mm(p.height)} mm`;
}

export function volumeOf(p: Part): number | null {
  return p.length !== null && p.width !== null && p.height !== null ? p.length * p.width * p.height : null;
}

export function mm3(x: number | null): string {
  return x === null ? "—" : `${Number((x * 1e9).toPrecision(3))} mm³`;
}

export const MODE_SHORT: Record<Mode, string> = { ccm: "CCM", bcm: "BCM", dcm: "DCM", "forced-continuous": "FCCM" };
export const MODE_LONG: Record<Mode, string> = {
  ccm: "continuous conduction (CCM)",
  bcm: "boundary conduction (BCM)",
  dcm: "discontinuous conduction (DCM): the current rests at zero",
  "forced-continuous": "forced-continuous (FCCM): the current goes negative",
};

export function priceText(x: number | null): string {
  return x === null ? "—" : Number(x.toPrecision(4)).toString();
}

export function toleranceText(p: Part): string {
  return p.tolerance === null ? "tol. not given" : `±${Number((p.tolerance * 100).toPrecision(3))} %`;
}

export { CHECK_LABEL } from "../../engine/checkLabels.ts";
