import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";
import type { Part } from "../engine/types.ts";
import type { MergeDuplicate } from "../catalog/mergeLists.ts";
import type { ImportPhase, ImportSummary } from "../worker/protocol.ts";

/** One workspace list as imported (derived from its text and column choices). */
export interface LoadedList {
  id: string;
  name: string;
  state: "loading" | "ready" | "failed";
  phase: ImportPhase | null;
  done: number;
  total: number;
  summary: ImportSummary | null;
  parts: Part[];
  signature: string | null;
  /** The column choices came from the memory of an earlier file with the same header. */
  rememberedApplied: boolean;
  message: string | null;
  /** A re-import with new column choices is running; the current parts stay until it ends. */
  reimporting: boolean;
  /** What the list was imported from (text length, choices), to notice when the workspace changes it. */
  sourceKey: string;
}

/** A file or pasted text being imported, not yet part of the workspace. */
export interface PendingImport {
  token: number;
  name: string;
  phase: ImportPhase;
  done: number;
  total: number;
  /** Bytes or characters of input, for the progress text. */
  size: number;
}

/** Every ready list merged in workspace order (a later list wins a duplicate part number). */
export interface MergedCatalog {
  version: number;
  parts: Part[];
  duplicates: MergeDuplicate[];
  /** Upper-case part number → index in parts. */
  index: Map<string, number>;
}

export interface CatalogState {
  lists: Record<string, LoadedList>;
  pending: PendingImport[];
  merged: MergedCatalog;
}

export const catalogStore = createStore<CatalogState>(() => ({
  lists: {},
  pending: [],
  merged: { version: 0, parts: [], duplicates: [], index: new Map() },
}));

export function useCatalog<T>(selector: (c: CatalogState) => T): T {
  return useStore(catalogStore, selector);
}

export function partKey(partNumber: string): string {
  return partNumber.trim().toUpperCase();
}

/** The merged part with this number, or null. */
export function findPart(merged: MergedCatalog, partNumber: string): { part: Part; index: number } | null {
  const index = merged.index.get(partKey(partNumber));
  const part = index === undefined ? undefined : merged.parts[index];
  return part === undefined || index === undefined ? null : { part, index };
}
