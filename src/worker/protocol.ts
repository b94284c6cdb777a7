import type { Part, Spec } from "../engine/types.ts";
import type { ImportResult, MappingOverride } from "../catalog/types.ts";
import type { SliceFigures } from "./screenSlice.ts";
import type { Ranking } from "./finishRanking.ts";

/**
 * Messages between the page and the ranking workers. Each worker keeps its own copy of every
 * loaded list and merges them exactly as the page does (mergeLists over the same order), so a
 * request only names the catalog version and the index range to screen.
 */
export type RankRequest =
  /** A chunk of one list's parts; `first` starts the list afresh. */
  | { type: "list"; id: string; name: string; parts: Part[]; first: boolean }
  | { type: "dropList"; id: string }
  | { type: "catalog"; version: number; order: string[] }
  | { type: "screen"; job: number; version: number; spec: Spec; from: number; to: number }
  | { type: "finish"; job: number; version: number; spec: Spec; slices: SliceFigures[] }
  | { type: "cancel"; job: number };

export type RankReply =
  | { type: "progress"; job: number; done: number }
  | { type: "slice"; job: number; slice: SliceFigures }
  | { type: "ranked"; job: number; ranking: Ranking }
  | { type: "failed"; job: number; message: string };

/** An import result without its parts, which follow in chunks. */
export type ImportSummary = Omit<ImportResult, "parts">;

export interface ImportRequest {
  /** Raw file bytes (decoded in the worker: UTF-8, UTF-16, Windows-1252) or text as pasted. */
  bytes: ArrayBuffer | null;
  text: string | null;
  name: string;
  /** The list's own column choices; null to look the header layout up in `remembered`. */
  mapping: MappingOverride[] | null;
  /** Column choices remembered per header signature (see headerSignature.ts). */
  remembered: Record<string, MappingOverride[]>;
  seriesSaturation: Record<string, "soft" | "hard">;
}

export type ImportPhase = "decoding" | "reading" | "delivering";

export type ImportReply =
  | { type: "phase"; phase: ImportPhase; done: number; total: number }
  | {
      type: "summary";
      /** The decoded text when the request carried bytes, else null (the page has it). */
      text: string | null;
      signature: string | null;
      /** The column choices the import used. */
      mapping: MappingOverride[];
      /** True when they came from `remembered`. */
      rememberedApplied: boolean;
      summary: ImportSummary;
      partCount: number;
    }
  | { type: "parts"; parts: Part[] }
  | { type: "done" }
  | { type: "failed"; message: string };

/** Parts per message: small enough that receiving one costs the page well under a frame. */
export const PART_CHUNK = 4000;
