import { useState } from "react";
import { loadDemo, startFresh } from "../../state/workspaceActions.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { specHash } from "../../state/shareLink.ts";
import { ProjectFileControls } from "./ProjectFileControls.tsx";

type Pending = "fresh" | "demo" | null;

/** Workspace commands: share the spec as a link, save or open a project file, start afresh or reopen the demo. */
export function WorkspaceMenu() {
  const spec = useWorkspace((w) => w.spec);
  const [pending, setPending] = useState<Pending>(null);
  const [copied, setCopied] = useState(false);
  const link = `${location.origin}${location.pathname}#${specHash(spec)}`;
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(link);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  };
  return (
    <details className="menu">
      <summary>Workspace</summary>
      <div className="menu-body">
        <section>
          <h2>Share the spec</h2>
          <p className="muted">The link carries the spec only, not the part lists.</p>
          <label htmlFor="share-link">Link</label>
          <input id="share-link" type="text" readOnly value={link} onFocus={(e) => e.target.select()} />
          <button type="button" onClick={() => void copy()}>
            Copy link
          </button>
          {copied && <span role="status"> Copied.</span>}
        </section>
        <ProjectFileControls />
        <section>
          <h2>Start over</h2>
          {pending === null ? (
            <div className="button-row">
              <button type="button" onClick={() => setPending("fresh")}>
                Start a fresh design…
              </button>
              <button type="button" onClick={() => setPending("demo")}>
                Open the demo again…
              </button>
            </div>
          ) : (
            <div className="confirm" role="alertdialog" aria-label="Confirm">
              <p>
                {pending === "fresh"
                  ? "This removes the loaded lists and the shortlist and resets the spec to starting values."
                  : "This replaces the current spec, lists and shortlist with the demo scenario."}
              </p>
              <div className="button-row">
                <button
                  type="button"
                  className="primary"
                  onClick={() => {
                    if (pending === "fresh") startFresh();
                    else loadDemo();
                    setPending(null);
                  }}
                >
                  {pending === "fresh" ? "Start fresh" : "Open the demo"}
                </button>
                <button type="button" onClick={() => setPending(null)}>
                  Keep working
                </button>
              </div>
            </div>
          )}
        </section>
      </div>
    </details>
  );
}
