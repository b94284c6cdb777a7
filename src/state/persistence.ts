import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";
import type { Workspace } from "./workspace.ts";
import { workspaceStore } from "./workspaceStore.ts";
import { draftStore } from "./draftStore.ts";
import { extrasStore } from "./extrasStore.ts";
import { mappingMemory } from "./mappingMemory.ts";
import { restoreDraft, restoreExtras, restoreMappings, restoreWorkspace, storedForm } from "./savedWorkspace.ts";
import type { Extras } from "./extrasStore.ts";
import type { Draft } from "./specDraft.ts";
import type { MappingOverride } from "../catalog/types.ts";

/** The key-value storage the app keeps its work in (IndexedDB in the browser, a Map in tests). */
export interface KeyValueStore {
  get(key: string): Promise<unknown>;
  set(key: string, value: unknown): Promise<void>;
  del(key: string): Promise<void>;
}

export const KEYS = {
  workspace: "coilsift/v1/workspace",
  draft: "coilsift/v1/draft",
  mappings: "coilsift/v1/mappings",
  extras: "coilsift/v1/extras",
  list: (id: string) => `coilsift/v1/list/${id}`,
} as const;

export const saveStatus = createStore<{ state: "saved" | "saving" | "unavailable" | "failed"; message: string | null }>(() => ({
  state: "saved",
  message: null,
}));

export function useSaveStatus() {
  return useStore(saveStatus, (s) => s);
}

export interface Loaded {
  workspace: Workspace;
  draft: Draft | null;
  extras: Extras;
  mappings: Record<string, MappingOverride[]>;
  problems: string[];
}

/** Reads the saved work; null on first start (nothing saved yet). */
export async function loadSaved(store: KeyValueStore, fallback: Workspace): Promise<Loaded | null> {
  const raw = await store.get(KEYS.workspace);
  if (raw === undefined) return null;
  const ids = Array.isArray((raw as { lists?: unknown }).lists) ? ((raw as { lists: { id?: unknown }[] }).lists.map((l) => l.id).filter((id) => typeof id === "string") as string[]) : [];
  const texts: Record<string, string | undefined> = {};
  for (const id of ids) {
    const text = await store.get(KEYS.list(id));
    texts[id] = typeof text === "string" ? text : undefined;
  }
  const restored = restoreWorkspace(raw, texts, fallback);
  if (restored === null) return null;
  const [draft, extras, mappings] = await Promise.all([store.get(KEYS.draft), store.get(KEYS.extras), store.get(KEYS.mappings)]);
  return { workspace: restored.workspace, draft: restoreDraft(draft), extras: restoreExtras(extras), mappings: restoreMappings(mappings), problems: restored.problems };
}

/**
 * Saves every change a moment after it happens (one write per burst of edits). List texts are
 * written once, when a list first appears, and deleted with it.
 */
export interface Saver {
  stop(): void;
  /** Writes now whatever is waiting. */
  flush(): Promise<void>;
  /** Saves soon even without a change (first start). */
  saveSoon(): void;
}

export function startSaving(store: KeyValueStore, alreadySaved: readonly string[], delayMs = 250): Saver {
  const savedLists = new Set(alreadySaved);
  let timer: ReturnType<typeof setTimeout> | null = null;
  let writing: Promise<void> = Promise.resolve();

  const write = async () => {
    timer = null;
    const w = workspaceStore.getState();
    try {
      for (const l of w.lists) {
        if (savedLists.has(l.id)) continue;
        await store.set(KEYS.list(l.id), l.text);
        savedLists.add(l.id);
      }
      await store.set(KEYS.workspace, storedForm(w));
      await store.set(KEYS.draft, draftStore.getState().draft);
      await store.set(KEYS.extras, extrasStore.getState());
      await store.set(KEYS.mappings, mappingMemory.getState().bySignature);
      for (const id of [...savedLists]) {
        if (w.lists.some((l) => l.id === id)) continue;
        await store.del(KEYS.list(id));
        savedLists.delete(id);
      }
      if (timer === null) saveStatus.setState({ state: "saved", message: null });
    } catch (error) {
      saveStatus.setState({ state: "failed", message: error instanceof Error ? error.message : String(error) });
    }
  };
  const schedule = () => {
    saveStatus.setState({ state: "saving", message: null });
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(() => {
      writing = writing.then(write);
    }, delayMs);
  };
  const stops = [workspaceStore.subscribe(schedule), draftStore.subscribe(schedule), extrasStore.subscribe(schedule), mappingMemory.subscribe(schedule)];
  return {
    saveSoon: schedule,
    stop: () => {
      stops.forEach((s) => s());
      if (timer !== null) clearTimeout(timer);
    },
    flush: async () => {
      if (timer !== null) {
        clearTimeout(timer);
        writing = writing.then(write);
      }
      await writing;
    },
  };
}
