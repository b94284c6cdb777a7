import type { ImportPhase } from "../../worker/protocol.ts";
import { useCatalog } from "../../state/catalogStore.ts";
import { cancelImport } from "../../state/catalogController.ts";
import { ProgressBar } from "../common/ProgressBar.tsx";

export function phaseLabel(phase: ImportPhase, size: number): string {
  const mb = size >= 1e5 ? ` (${(size / 1e6).toFixed(1)} MB)` : "";
  switch (phase) {
    case "decoding":
      return `Decoding the file${mb}`;
    case "reading":
      return `Reading rows${mb}`;
    case "delivering":
      return "Receiving parts";
  }
}

/** Files being read, each with its progress and a way to stop it. */
export function PendingImports() {
  const pending = useCatalog((c) => c.pending);
  if (pending.length === 0) return null;
  return (
    <section className="card" aria-label="Imports in progress">
      {pending.map((p) => (
        <div key={p.token} className="button-row">
          <strong>{p.name}</strong>
          <ProgressBar label={phaseLabel(p.phase, p.size)} done={p.done} total={p.phase === "delivering" ? p.total : null} />
          <button type="button" onClick={() => cancelImport(p.token)}>
            Cancel import
          </button>
        </div>
      ))}
    </section>
  );
}
