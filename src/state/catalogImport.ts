import type { PartListSource } from "./workspace.ts";
import { addListSource } from "./workspaceActions.ts";
import { catalogStore } from "./catalogStore.ts";
import { mappingMemory } from "./mappingMemory.ts";
import { notify } from "./noticeStore.ts";
import { newListId } from "./workspaceDefaults.ts";
import { startImport } from "../worker/importClient.ts";
import { catalog, loadingList, patchPending, received, running, sourceKey } from "./catalogInternals.ts";

export interface NewListInput {
  name: string;
  bytes?: ArrayBuffer;
  text?: string;
}

/**
 * Imports a file or pasted text as a new list. It joins the workspace only once read, so a
 * cancelled import leaves nothing behind. Returns the token that cancels it.
 */
export function importNewList(input: NewListInput): number {
  const token = catalog.nextToken++;
  const deps = catalog.deps;
  if (deps === null) return token;
  const size = input.bytes?.byteLength ?? input.text?.length ?? 0;
  catalogStore.setState((c) => ({ pending: [...c.pending, { token, name: input.name, phase: input.bytes !== undefined ? "decoding" : "reading", done: 0, total: size, size }] }));
  const finish = () => {
    running.delete(token);
    catalogStore.setState((c) => ({ pending: c.pending.filter((p) => p.token !== token) }));
  };
  running.set(
    token,
    startImport(
      deps.spawnImport,
      {
        bytes: input.bytes ?? null,
        text: input.bytes !== undefined ? null : (input.text ?? ""),
        name: input.name,
        mapping: null,
        remembered: mappingMemory.getState().bySignature,
        seriesSaturation: {},
      },
      {
        onPhase: (phase, done, total) => patchPending(token, { phase, done, total }),
        onDone: (outcome) => {
          finish();
          const source: PartListSource = {
            id: newListId(),
            name: input.name,
            text: outcome.text,
            mapping: outcome.mapping,
            seriesSaturation: {},
            addedAt: new Date().toISOString(),
          };
          const key = sourceKey(source);
          catalogStore.setState((c) => ({ lists: { ...c.lists, [source.id]: loadingList(source, null, 0) } }));
          addListSource(source);
          received(source.id, outcome, key);
          if (outcome.rememberedApplied) notify("info", `${input.name}: the column choices saved for this header layout were applied.`);
        },
        onFailed: (message) => {
          finish();
          notify("error", `${input.name} could not be imported: ${message}`);
        },
      },
    ),
  );
  return token;
}

export function cancelImport(token: number): void {
  running.get(token)?.cancel();
  running.delete(token);
  catalogStore.setState((c) => ({ pending: c.pending.filter((p) => p.token !== token) }));
}
