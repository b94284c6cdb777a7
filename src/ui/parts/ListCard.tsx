import { useState } from "react";
import type { PartListSource } from "../../state/workspace.ts";
import type { LoadedList } from "../../state/catalogStore.ts";
import { removeListSource } from "../../state/workspaceActions.ts";
import { cancelReimport } from "../../state/catalogController.ts";
import { ProgressBar } from "../common/ProgressBar.tsx";
import { MappingEditor } from "./MappingEditor.tsx";
import { RejectedRows, Warnings } from "./RejectedRows.tsx";
import { SeriesSaturation } from "./SeriesSaturation.tsx";
import { phaseLabel } from "./PendingImports.tsx";

const DELIMITER: Record<string, string> = { ",": "comma", ";": "semicolon", "\t": "tab", "|": "pipe" };

/** One loaded list: what was read from it, how, what was refused, and the controls to change it. */
export function ListCard({ source, loaded }: { source: PartListSource; loaded: LoadedList | undefined }) {
  const [confirming, setConfirming] = useState(false);
  const s = loaded?.summary ?? null;
  const parts = loaded?.parts.length ?? 0;
  const busy = loaded === undefined || loaded.state === "loading" || loaded.reimporting;
  return (
    <article className="card list-card" aria-labelledby={`list-${source.id}`}>
      <div className="list-head">
        <h2 id={`list-${source.id}`}>{source.name}</h2>
        {s?.title !== null && s?.title !== undefined && <span className="muted">“{s.title}”</span>}
        <span className="muted">added {new Date(source.addedAt).toLocaleString("en-GB")}</span>
        <span style={{ marginLeft: "auto" }} />
        {confirming ? (
          <span className="button-row" role="group" aria-label="Confirm removal">
            <span>Remove this list?</span>
            <button type="button" className="primary" onClick={() => removeListSource(source.id)}>
              Remove
            </button>
            <button type="button" onClick={() => setConfirming(false)}>
              Keep
            </button>
          </span>
        ) : (
          <button type="button" onClick={() => setConfirming(true)} aria-label={`Remove list ${source.name}`}>
            Remove list
          </button>
        )}
      </div>
      {busy && loaded !== undefined && (
        <div className="button-row">
          <ProgressBar label={phaseLabel(loaded.phase ?? "reading", source.text.length)} done={loaded.done} total={loaded.phase === "delivering" ? loaded.total : null} />
          {loaded.reimporting && (
            <button type="button" onClick={() => cancelReimport(source.id)}>
              Cancel
            </button>
          )}
        </div>
      )}
      {loaded?.state === "failed" && (
        <p className="field-error">
          <span aria-hidden="true">✗ </span>
          {loaded.message}
        </p>
      )}
      {s !== null && (
        <>
          <div className="counts" role="status">
            <span>
              <strong>{parts.toLocaleString("en")}</strong> parts
            </span>
            <span>{s.dataRows.toLocaleString("en")} data rows</span>
            <span className={s.rejected.length > 0 ? "status status-fail" : undefined}>
              {s.rejected.length > 0 ? "✗ " : ""}
              {s.rejected.length.toLocaleString("en")} rejected
            </span>
            <span className={s.warnings.length > 0 ? "status status-incomplete" : undefined}>
              {s.warnings.length > 0 ? "⚠ " : ""}
              {s.warnings.length.toLocaleString("en")} warnings
            </span>
            <span className="muted">
              {DELIMITER[s.delimiter] ?? `“${s.delimiter}”`}-separated{s.decimalComma ? ", decimal commas" : ""}
              {s.headerRow !== null && s.headerRow > 1 ? `, header on line ${s.headerRow}` : ""}
            </span>
            {source.mapping.length > 0 && <span className="muted">{source.mapping.length} column choice(s) of yours</span>}
            {loaded?.rememberedApplied === true && <span className="muted">choices remembered from an earlier file applied</span>}
          </div>
          {parts === 0 && (
            <p className="banner banner-warning">
              <span aria-hidden="true">⚠ </span>No part could be read from this list. Open the column mapping below and say which column holds the part number and the
              inductance.
            </p>
          )}
          <details open={parts === 0}>
            <summary>Column mapping ({s.mapping.filter((m) => m.status === "mapped").length} of {s.mapping.length} columns read)</summary>
            <MappingEditor key={loaded?.sourceKey} listId={source.id} listName={source.name} mapping={s.mapping} overrides={source.mapping} />
          </details>
          <details>
            <summary>Rejected rows ({s.rejected.length.toLocaleString("en")})</summary>
            <RejectedRows listName={source.name} rows={s.rejected} />
          </details>
          <details>
            <summary>Warnings ({s.warnings.length.toLocaleString("en")})</summary>
            <Warnings warnings={s.warnings} />
          </details>
          <details>
            <summary>Saturation character by series</summary>
            <SeriesSaturation listId={source.id} parts={loaded?.parts ?? []} mapping={source.mapping} chosen={source.seriesSaturation} />
          </details>
        </>
      )}
    </article>
  );
}
