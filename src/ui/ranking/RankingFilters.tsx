import { useEffect, useMemo } from "react";
import type { Part } from "../../engine/types.ts";
import { distinctValues, searchText } from "../../state/rankingView.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { setFilter, sortBy } from "../../state/workspaceActions.ts";

/** Pass only, construction, maker and free text; the counts say how much is hidden. */
export function RankingFilters({ parts, shown, total }: { parts: readonly Part[]; shown: number; total: number }) {
  const f = useWorkspace((w) => w.view.rankingFilter);
  const sort = useWorkspace((w) => w.view.rankingSort);
  const makers = useMemo(() => distinctValues(parts, (p) => p.maker), [parts]);
  const materials = useMemo(() => distinctValues(parts, (p) => p.material), [parts]);
  // The search text of 100 000 parts takes ~50 ms to build: do it while idle, not on the first key.
  useEffect(() => {
    const id = setTimeout(() => searchText(parts), 200);
    return () => clearTimeout(id);
  }, [parts]);
  const active = f.passOnly || f.text !== "" || f.maker !== null || f.material !== null;
  return (
    <div className="filters" role="search" aria-label="Filter the ranking">
      <label className="check-field">
        <input type="checkbox" checked={f.passOnly} onChange={(e) => setFilter({ passOnly: e.target.checked })} /> Passing parts only
      </label>
      <ChoiceFilter id="filter-material" label="Construction" value={f.material} choices={materials} onChange={(material) => setFilter({ material })} />
      <ChoiceFilter id="filter-maker" label="Maker" value={f.maker} choices={makers} onChange={(maker) => setFilter({ maker })} />
      <div className="field">
        <label htmlFor="filter-text">Search</label>
        <input id="filter-text" type="search" value={f.text} placeholder="part number, series…" onChange={(e) => setFilter({ text: e.target.value })} />
      </div>
      <span className="muted" role="status">
        Showing {shown.toLocaleString("en")} of {total.toLocaleString("en")}
      </span>
      {active && (
        <button type="button" onClick={() => setFilter({ passOnly: false, text: "", maker: null, material: null })}>
          Clear filters
        </button>
      )}
      {sort !== null && (
        <button type="button" onClick={() => sortBy(null)}>
          Back to rank order
        </button>
      )}
    </div>
  );
}

/** A select of the values a column takes, "All" meaning no filter (null). */
function ChoiceFilter({ id, label, value, choices, onChange }: { id: string; label: string; value: string | null; choices: readonly string[]; onChange: (value: string | null) => void }) {
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={value ?? ""} onChange={(e) => onChange(e.target.value === "" ? null : e.target.value)}>
        <option value="">All</option>
        {choices.map((m) => (
          <option key={m} value={m}>
            {m}
          </option>
        ))}
      </select>
    </div>
  );
}
