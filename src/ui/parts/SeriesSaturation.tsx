import { useMemo } from "react";
import type { Part } from "../../engine/types.ts";
import type { MappingOverride } from "../../catalog/types.ts";
import { applyMapping } from "../../state/catalogController.ts";

/** Per series: saturate softly (powder, alloy) or hard (ferrite), ahead of the list's material column. */
export function SeriesSaturation({ listId, parts, mapping, chosen }: { listId: string; parts: readonly Part[]; mapping: MappingOverride[]; chosen: Record<string, "soft" | "hard"> }) {
  const series = useMemo(() => {
    const by = new Map<string, { count: number; soft: number }>();
    for (const p of parts) {
      if (p.series === null) continue;
      const s = by.get(p.series) ?? { count: 0, soft: 0 };
      s.count++;
      if (p.saturation === "soft") s.soft++;
      by.set(p.series, s);
    }
    return [...by.entries()].sort((a, b) => a[0].localeCompare(b[0]));
  }, [parts]);
  if (series.length === 0) return <p className="muted">The list names no series.</p>;
  const set = (name: string, value: string) => {
    const next = { ...chosen };
    if (value === "auto") delete next[name];
    else next[name] = value as "soft" | "hard";
    applyMapping(listId, mapping, next);
  };
  return (
    <div className="table-scroll">
      <table className="grid-table">
        <thead>
          <tr>
            <th scope="col">Series</th>
            <th scope="col" className="num">
              Parts
            </th>
            <th scope="col">Read now as</th>
            <th scope="col">Saturation character</th>
          </tr>
        </thead>
        <tbody>
          {series.map(([name, s]) => (
            <tr key={name}>
              <th scope="row">{name}</th>
              <td className="num">{s.count}</td>
              <td>{s.soft === s.count ? "soft" : s.soft === 0 ? "hard" : `mixed (${s.soft} soft)`}</td>
              <td>
                <label className="visually-hidden" htmlFor={`sat-${listId}-${name}`}>
                  Saturation character of series {name}
                </label>
                <select id={`sat-${listId}-${name}`} value={chosen[name] ?? "auto"} onChange={(e) => set(name, e.target.value)}>
                  <option value="auto">From the material column</option>
                  <option value="soft">Soft (powder, alloy, composite)</option>
                  <option value="hard">Hard (ferrite)</option>
                </select>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
