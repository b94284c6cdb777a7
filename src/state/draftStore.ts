import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";
import { draftFromSpec, readDraft, type Draft, type DraftReading } from "./specDraft.ts";
import { freshSpec } from "./workspaceDefaults.ts";

interface DraftState {
  draft: Draft;
  /** The draft read (derived, kept beside it so every field reads it once per edit). */
  reading: DraftReading;
}

function stateOf(draft: Draft): DraftState {
  return { draft, reading: readDraft(draft) };
}

/** The Design screen's text as typed, valid or not: nothing typed is lost, not even across a reload. */
export const draftStore = createStore<DraftState>(() => stateOf(draftFromSpec(freshSpec())));

export function setDraft(draft: Draft): void {
  draftStore.setState(stateOf(draft));
}

export function useDraftText(key: string): string {
  return useStore(draftStore, (s) => s.draft[key] ?? "");
}

export function useDraftReading(): DraftReading {
  return useStore(draftStore, (s) => s.reading);
}
