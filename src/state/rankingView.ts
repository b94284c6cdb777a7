import type { Part } from "../engine/types.ts";
import type { Ranking } from "../worker/finishRanking.ts";
import type { ViewState } from "./workspace.ts";
import { SORT_KEYS } from "./rankingColumns.ts";

export type RankingFilter = ViewState["rankingFilter"];
export type RankingSort = ViewState["rankingSort"];

const haystacks = new WeakMap<readonly Part[], string[]>();

/** Lower-case search text per part (number, maker, series, material), computed once per catalog. */
export function searchText(parts: readonly Part[]): string[] {
  let h = haystacks.get(parts);
  if (h === undefined) {
    h = parts.map((p) => `${p.partNumber} ${p.maker ?? ""} ${p.series ?? ""} ${p.material ?? ""}`.toLowerCase());
    haystacks.set(parts, h);
  }
  return h;
}

/** Distinct non-empty values of a text field, sorted, for the filter menus. */
export function distinctValues(parts: readonly Part[], pick: (p: Part) => string | null): string[] {
  const seen = new Set<string>();
  for (const p of parts) {
    const v = pick(p);
    if (v !== null && v !== "") seen.add(v);
  }
  return [...seen].sort((a, b) => a.localeCompare(b));
}

/** Rank order narrowed by the filters (all words of the text must appear). */
export function filteredOrder(r: Ranking, parts: readonly Part[], f: RankingFilter): Int32Array {
  const words = f.text.toLowerCase().split(/\s+/).filter((w) => w !== "");
  const text = words.length > 0 ? searchText(parts) : null;
  const out = new Int32Array(r.count);
  let n = 0;
  for (let k = 0; k < r.count; k++) {
    const i = r.order[k]!;
    if (f.passOnly && r.status[i] !== 0) continue;
    const part = parts[i];
    if (part === undefined) continue;
    if (f.maker !== null && part.maker !== f.maker) continue;
    if (f.material !== null && part.material !== f.material) continue;
    if (text !== null) {
      const h = text[i]!;
      if (!words.every((w) => h.includes(w))) continue;
    }
    out[n++] = i;
  }
  return out.slice(0, n);
}

/** The filtered order sorted by a column; ties and equal keys keep rank order; no data sorts last either way. */
export function sortedOrder(indices: Int32Array, r: Ranking, parts: readonly Part[], sort: RankingSort): Int32Array {
  if (sort === null || sort.column === "rank") return sort?.descending ? indices.slice().reverse() : indices;
  const key = SORT_KEYS[sort.column];
  if (key === undefined) return indices;
  const n = indices.length;
  const keys = new Array<number | string | null>(n);
  for (let k = 0; k < n; k++) keys[k] = key(indices[k]!, parts, r);
  const positions = Array.from({ length: n }, (_, k) => k);
  const sign = sort.descending ? -1 : 1;
  positions.sort((a, b) => {
    const x = keys[a]!;
    const y = keys[b]!;
    if (x === null || y === null) return x === y ? a - b : x === null ? 1 : -1;
    const c = typeof x === "number" && typeof y === "number" ? x - y : String(x).localeCompare(String(y));
    return c !== 0 ? sign * c : a - b;
  });
  return Int32Array.from(positions, (k) => indices[k]!);
}
