import type { Spec } from "../engine/types.ts";
import type { MappingOverride } from "../catalog/types.ts";

/**
 * Everything a designer has open: the spec, the part lists (kept as the text they came in, with
 * the user's column choices, so that re-importing reproduces every part and every rejected row),
 * the shortlist, notes and the view. This is what the project file saves and IndexedDB keeps.
 */
export interface Workspace {
  /** Design name shown in the title and the report. */
  name: string;
  notes: string;
  spec: Spec;
  lists: PartListSource[];
  /** Part numbers, in the order they were added (at most six are compared side by side). */
  shortlist: string[];
  view: ViewState;
}

export interface PartListSource {
  /** Stable id within the workspace. */
  id: string;
  /** File name or "Pasted list N". */
  name: string;
  /** The list exactly as read (decoded text). */
  text: string;
  /** Column reassignments the user made for this list. */
  mapping: MappingOverride[];
  /** Saturation character chosen per series, ahead of the material column. */
  seriesSaturation: Record<string, "soft" | "hard">;
  /** ISO time the list was added; a later list wins a duplicate part number. */
  addedAt: string;
}

export interface ViewState {
  screen: "design" | "parts" | "ranking" | "detail" | "compare" | "sweeps" | "tradeoff";
  /** Part shown on the detail screen. */
  selectedPart: string | null;
  rankingSort: { column: string; descending: boolean } | null;
  rankingFilter: { passOnly: boolean; text: string; maker: string | null; material: string | null };
  cautionsAcknowledged: boolean;
}

export const MAX_SHORTLIST = 6;
