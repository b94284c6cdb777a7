import { draftStore, setDraft } from "./draftStore.ts";
import { setSpec } from "./workspaceActions.ts";

/**
 * One field edited on the Design screen. The text is kept whatever it says; when the whole
 * draft reads as a valid spec, that spec goes to the workspace (and the ranking follows).
 */
export function editField(key: string, text: string): void {
  setDraft({ ...draftStore.getState().draft, [key]: text });
  const spec = draftStore.getState().reading.spec;
  if (spec !== null) setSpec(spec);
}
