import type { Spec } from "../engine/types.ts";
import type { MappingOverride } from "../catalog/types.ts";
import { MAX_SHORTLIST, type PartListSource, type ViewState, type Workspace } from "./workspace.ts";
import { workspaceStore } from "./workspaceStore.ts";
import { draftStore, setDraft } from "./draftStore.ts";
import { draftFromSpec } from "./specDraft.ts";
import { demoWorkspace } from "./demoScenario.ts";
import { freshWorkspace } from "./workspaceDefaults.ts";
import { defaultExtras, extrasStore } from "./extrasStore.ts";

const update = (patch: Partial<Workspace> | ((w: Workspace) => Partial<Workspace>)) => workspaceStore.setState(patch);
const updateView = (patch: Partial<ViewState>) => update((w) => ({ view: { ...w.view, ...patch } }));

function sameSpec(a: Spec, b: Spec): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/** The spec as the Design screen produced it (the draft already shows it). */
export function setSpec(spec: Spec): void {
  if (!sameSpec(spec, workspaceStore.getState().spec)) update({ spec });
}

/** A spec from outside the form (a link, a file): the form is rewritten to show it. */
export function loadSpec(spec: Spec): void {
  update({ spec });
  setDraft(draftFromSpec(spec));
}

/** Replaces the whole workspace (a saved project, a reload); the form follows its spec. */
export function replaceWorkspace(workspace: Workspace): void {
  workspaceStore.setState(workspace, true);
  setDraft(draftFromSpec(workspace.spec));
}

/** The demo scenario, as on first start. */
export function loadDemo(): void {
  replaceWorkspace(demoWorkspace(workspaceStore.getState().view.cautionsAcknowledged));
  extrasStore.setState(defaultExtras(), true);
}

/** Clears the demo (or anything else) for a fresh design. */
export function startFresh(): void {
  replaceWorkspace(freshWorkspace(workspaceStore.getState().view.cautionsAcknowledged));
  extrasStore.setState(defaultExtras(), true);
}

export function setName(name: string): void {
  update({ name });
}

export function setNotes(notes: string): void {
  update({ notes });
}

export function showScreen(screen: ViewState["screen"]): void {
  updateView({ screen });
}

/** Opens a part on the detail screen. */
export function openPart(partNumber: string): void {
  updateView({ selectedPart: partNumber, screen: "detail" });
}

export function selectPart(partNumber: string | null): void {
  updateView({ selectedPart: partNumber });
}

/** Sorts by a column; the same column again flips the direction; null returns to rank order. */
export function sortBy(column: string | null, descending?: boolean): void {
  const current = workspaceStore.getState().view.rankingSort;
  if (column === null) return updateView({ rankingSort: null });
  const flip = current?.column === column ? !current.descending : false;
  updateView({ rankingSort: { column, descending: descending ?? flip } });
}

export function setFilter(patch: Partial<ViewState["rankingFilter"]>): void {
  update((w) => ({ view: { ...w.view, rankingFilter: { ...w.view.rankingFilter, ...patch } } }));
}

export function acknowledgeCautions(): void {
  updateView({ cautionsAcknowledged: true });
}

export type ShortlistResult = "added" | "already" | "full";

export function addToShortlist(partNumber: string): ShortlistResult {
  const { shortlist } = workspaceStore.getState();
  if (shortlist.includes(partNumber)) return "already";
  if (shortlist.length >= MAX_SHORTLIST) return "full";
  update({ shortlist: [...shortlist, partNumber] });
  return "added";
}

export function removeFromShortlist(partNumber: string): void {
  update((w) => ({ shortlist: w.shortlist.filter((p) => p !== partNumber) }));
}

export function addListSource(source: PartListSource): void {
  update((w) => ({ lists: [...w.lists, source] }));
}

export function removeListSource(id: string): void {
  update((w) => ({ lists: w.lists.filter((l) => l.id !== id) }));
}

/** Records the column choices a list was (re)imported with. */
export function setListMapping(id: string, mapping: MappingOverride[], seriesSaturation?: Record<string, "soft" | "hard">): void {
  update((w) => ({
    lists: w.lists.map((l) => (l.id === id ? { ...l, mapping, seriesSaturation: seriesSaturation ?? l.seriesSaturation } : l)),
  }));
}

/** The draft's text is not part of the workspace; this says whether it differs from the ranked spec. */
export function draftMatchesSpec(): boolean {
  const spec = draftStore.getState().reading.spec;
  return spec !== null && sameSpec(spec, workspaceStore.getState().spec);
}
