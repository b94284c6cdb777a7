import { FIELD_GROUPS } from "../../state/specFields.ts";
import { useDraftReading } from "../../state/draftStore.ts";
import { draftProblemCount } from "../../state/specDraft.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { setName, setNotes } from "../../state/workspaceActions.ts";
import { FieldGroupCard } from "./FieldGroupCard.tsx";
import { InductanceBand } from "./InductanceBand.tsx";

/** The converter spec, every field with its parsed value; the ranking follows each valid change. */
export function DesignScreen() {
  const reading = useDraftReading();
  const name = useWorkspace((w) => w.name);
  const notes = useWorkspace((w) => w.notes);
  const problems = draftProblemCount(reading);
  return (
    <div className="screen design-screen">
      <div className="screen-head">
        <h1>Design</h1>
        <p className={problems > 0 ? "banner banner-warning" : "banner banner-ok"} role="status">
          {problems > 0 ? (
            <>
              <span aria-hidden="true">⚠ </span>
              {problems === 1 ? "1 problem" : `${problems} problems`} in the spec (marked below). The ranking keeps using the last complete spec until they are fixed.
            </>
          ) : (
            <>
              <span aria-hidden="true">✓ </span>The spec is complete: the ranking follows every change.
            </>
          )}
        </p>
      </div>
      <div className="design-layout">
        <div className="design-fields">
          <div className="card field-group">
            <div className="field-grid">
              <div className="field field-wide">
                <label htmlFor="design-name">Design name</label>
                <input id="design-name" type="text" value={name} onChange={(e) => setName(e.target.value)} />
              </div>
              <div className="field field-wide">
                <label htmlFor="design-notes">Notes (go into the report)</label>
                <textarea id="design-notes" rows={2} value={notes} onChange={(e) => setNotes(e.target.value)} />
              </div>
            </div>
          </div>
          {FIELD_GROUPS.map((g) => (
            <FieldGroupCard key={g.id} group={g} />
          ))}
        </div>
        <aside className="design-side">
          <InductanceBand />
          <section className="card">
            <h2>Typing values</h2>
            <p className="muted">
              Engineering notation works everywhere: <code>500k</code>, <code>30m</code>, <code>4.7u</code>, <code>1.2 MHz</code>, <code>4R7</code>. Sizes are in mm,
              margins in %. Each field shows what it was read as.
            </p>
          </section>
        </aside>
      </div>
    </div>
  );
}
