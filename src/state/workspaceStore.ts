import { createStore } from "zustand/vanilla";
import { useStore } from "zustand";
import type { Workspace } from "./workspace.ts";
import { freshWorkspace } from "./workspaceDefaults.ts";

/**
 * The designer's inputs (spec, lists as text, shortlist, view). Everything shown is derived
 * from these by engine calls; actions that change them are plain functions in workspaceActions.ts.
 */
export const workspaceStore = createStore<Workspace>(() => freshWorkspace(false));

export function useWorkspace<T>(selector: (w: Workspace) => T): T {
  return useStore(workspaceStore, selector);
}
