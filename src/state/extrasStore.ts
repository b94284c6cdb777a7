import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";
import type { CornerPoint, InductanceCorner } from "../engine/types.ts";

/** A corner named by its labels, so the same choice applies to every part and survives spec edits. */
export interface CornerKey {
  vin: CornerPoint["vinCorner"];
  iout: CornerPoint["ioutCorner"];
  inductance: InductanceCorner;
}

/** View choices beyond the workspace's ViewState (kept in their own IndexedDB entry). */
export interface Extras {
  /** Corner shown on the detail screen; null = the corner of the worst peak. */
  detailCorner: CornerKey | null;
  /** Corner the compare screen overlays the waveforms at. */
  compareCorner: CornerKey;
  sweeps: { inductance: InductanceCorner; load: "min" | "max"; vin: "min" | "nom" | "max" };
  tradeoffIncomplete: boolean;
  /** Whether a ranking row's reasons are open, by part number. */
  expanded: string[];
}

export function defaultExtras(): Extras {
  return {
    detailCorner: null,
    compareCorner: { vin: "max", iout: "max", inductance: "min" },
    sweeps: { inductance: "min", load: "max", vin: "nom" },
    tradeoffIncomplete: false,
    expanded: [],
  };
}

export const extrasStore = createStore<Extras>(() => defaultExtras());

export function useExtras<T>(selector: (e: Extras) => T): T {
  return useStore(extrasStore, selector);
}

export function setExtras(patch: Partial<Extras>): void {
  extrasStore.setState(patch);
}

export function toggleExpanded(partNumber: string): void {
  extrasStore.setState((e) => ({
    expanded: e.expanded.includes(partNumber) ? e.expanded.filter((p) => p !== partNumber) : [...e.expanded, partNumber].slice(-50),
  }));
}
