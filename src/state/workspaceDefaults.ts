import type { Spec } from "../engine/types.ts";
import { makeSpec } from "../engine/specDefaults.ts";
import type { ViewState, Workspace } from "./workspace.ts";

export function defaultView(screen: ViewState["screen"] = "ranking"): ViewState {
  return {
    screen,
    selectedPart: null,
    rankingSort: null,
    rankingFilter: { passOnly: false, text: "", maker: null, material: null },
    cautionsAcknowledged: false,
  };
}

/** Where a fresh design starts: generic values to overwrite, so every screen has a spec to show. */
export function freshSpec(): Spec {
  return makeSpec({ topology: "buck", vin: { min: 9, nom: 12, max: 16 }, vout: 5, iout: { min: 0.1, max: 2 }, fsw: 400e3 });
}

/** An empty workspace for a fresh design; the cautions stay acknowledged if they were. */
export function freshWorkspace(cautionsAcknowledged: boolean): Workspace {
  return {
    name: "New design",
    notes: "",
    spec: freshSpec(),
    lists: [],
    shortlist: [],
    view: { ...defaultView("design"), cautionsAcknowledged },
  };
}

/** A list id unique within the workspace and across reloads. */
export function newListId(): string {
  return `list-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
}
