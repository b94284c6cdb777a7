import { seriesStyle } from "./chartStyle.ts";

/** A legend that shows each line's dash and marker beside its name. */
export function SeriesLegend({ names }: { names: string[] }) {
  return (
    <ul className="legend" aria-label="Legend">
      {names.map((n, k) => {
        const s = seriesStyle(k);
        return (
          <li key={n} className="legend-item">
            <svg width="34" height="10" aria-hidden="true">
              <line x1="0" y1="5" x2="34" y2="5" stroke={s.color} strokeWidth="2.5" strokeDasharray={s.dash} />
            </svg>
            <span aria-hidden="true" style={{ color: s.color }}>
              {s.marker}
            </span>
            {n}
          </li>
        );
      })}
    </ul>
  );
}
