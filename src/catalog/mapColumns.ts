import { QUANTITIES } from "./quantities.ts";
import { parseUnit } from "./parseUnit.ts";
import { recogniseHeader, type HeaderGuess } from "./recogniseHeader.ts";
import type { ColumnMapping, MappingOverride, Quantity, RowWarning, Unit } from "./types.ts";

export interface ColumnPlan {
  column: number;
  quantity: Quantity;
  /** Unit of bare numbers; null for text and dimensionless columns. */
  unit: Unit | null;
  /** Conditions written in the header ("Isat (100 °C)", "Isat @ 30 % drop", "Irms (ΔT = 40 K)"). */
  temperature: number | null;
  drop: number | null;
  rise: number | null;
}

export interface ColumnMap {
  mapping: ColumnMapping[];
  plans: ColumnPlan[];
  /** Unique display name per column, used as the key of `extra`. */
  names: string[];
  warnings: RowWarning[];
}

function normaliseHeaderText(text: string): string {
  return text.trim().toLowerCase().replace(/\s+/g, " ");
}

function conditionNote(q: Quantity, g: HeaderGuess): string | null {
  if ((q === "isat" || q === "isatHot") && g.drop !== null) return `Isat defined at ${Math.round(g.drop * 1000) / 10} % drop (from the header)`;
  if (q === "isatHot" && g.temperature !== null) return `hot Isat at ${g.temperature} °C (from the header)`;
  if (q === "irms" && g.rise !== null) return `rated for a ${g.rise} K rise (from the header)`;
  return null;
}

/**
 * Maps each column to a quantity and a unit: overrides first, then recognised headers in column
 * order; a second column for a quantity already taken is kept as a duplicate, never merged.
 */
export function mapColumns(headers: string[], unitRow: string[] | null, overrides: MappingOverride[]): ColumnMap {
  const warnings: RowWarning[] = [];
  const count = Math.max(headers.length, unitRow?.length ?? 0);
  const names: string[] = [];
  const used = new Map<string, number>();
  const guesses: HeaderGuess[] = [];
  for (let i = 0; i < count; i++) {
    const h = (headers[i] ?? "").trim();
    const u = (unitRow?.[i] ?? "").trim();
    let name = h === "" ? `column ${i + 1}` : u === "" ? h : `${h} [${u}]`;
    const n = (used.get(name) ?? 0) + 1;
    used.set(name, n);
    if (n > 1) name = `${name} (${n})`;
    names.push(name);
    guesses.push(recogniseHeader(h, u));
  }

  const overrideAt = new Map<number, MappingOverride>();
  for (const o of overrides) {
    const want = normaliseHeaderText(o.header);
    let hit = false;
    for (let i = 0; i < count; i++) {
      if (normaliseHeaderText(headers[i] ?? "") === want || normaliseHeaderText(names[i] as string) === want) {
        overrideAt.set(i, o);
        hit = true;
      }
    }
    if (!hit) warnings.push({ row: null, field: o.header, message: `mapping override "${o.header}": no column has that header` });
  }

  const wanted: (Quantity | null)[] = guesses.map((g, i) => {
    const o = overrideAt.get(i);
    if (o !== undefined) return o.quantity === "ignore" ? null : o.quantity;
    return g.quantity === "dcr" ? null : g.quantity;
  });
  // A DCR column that says neither "typ" nor "max" is the maximum unless the list has one already
  // (taking the higher figure for losses is the conservative reading).
  const plainDcrNotes = new Map<number, string>();
  guesses.forEach((g, i) => {
    if (g.quantity !== "dcr" || overrideAt.has(i)) return;
    const q: Quantity = wanted.includes("dcrMax") ? (wanted.includes("dcrTyp") ? "dcrMax" : "dcrTyp") : "dcrMax";
    wanted[i] = q;
    plainDcrNotes.set(i, q === "dcrMax" ? "DCR without typ/max taken as the maximum (conservative)" : "DCR without typ/max taken as typical (the list has a maximum column)");
  });

  const claimed = new Map<Quantity, number>();
  const order = [...overrideAt.keys(), ...Array.from({ length: count }, (_, i) => i).filter((i) => !overrideAt.has(i))];
  const owner: (number | null)[] = new Array<number | null>(count).fill(null);
  for (const i of order) {
    const q = wanted[i];
    if (q === null || q === undefined || claimed.has(q)) continue;
    claimed.set(q, i);
    owner[i] = i;
  }

  const mapping: ColumnMapping[] = [];
  const plans: ColumnPlan[] = [];
  for (let i = 0; i < count; i++) {
    const g = guesses[i] as HeaderGuess;
    const o = overrideAt.get(i);
    const q = wanted[i] ?? null;
    const name = names[i] as string;
    if (o !== undefined && o.quantity === "ignore") {
      mapping.push({ column: i, header: name, quantity: null, unit: null, status: "ignored", unitSource: null, note: "ignored by a mapping override; cells kept" });
      continue;
    }
    if (q === null) {
      mapping.push({ column: i, header: name, quantity: null, unit: null, status: "unrecognised", unitSource: null, note: "not recognised; cells kept" });
      continue;
    }
    if (owner[i] === null) {
      const first = claimed.get(q) as number;
      mapping.push({
        column: i,
        header: name,
        quantity: null,
        unit: null,
        status: "duplicate",
        unitSource: null,
        note: `a second ${QUANTITIES[q].label} column; "${names[first]}" is used, these cells are kept`,
      });
      continue;
    }
    const spec = QUANTITIES[q];
    let unit: Unit | null = null;
    let unitSource: ColumnMapping["unitSource"] = null;
    let display: string | null = null;
    if (spec.dimension === "currency") {
      const text = o?.unit ?? (g.unit?.dimension === "currency" ? g.unit.symbol : null);
      display = text;
      unitSource = text === null ? null : o?.unit != null ? "override" : (g.unitSource ?? "header");
    } else if (spec.dimension !== "text" && spec.dimension !== "number") {
      const fromOverride = o?.unit != null ? parseUnit(o.unit, spec.dimension) : null;
      const fromHeader = g.unit !== null && g.unit.dimension === spec.dimension ? g.unit : null;
      unit = fromOverride ?? fromHeader ?? (spec.defaultUnit === null ? null : parseUnit(spec.defaultUnit, spec.dimension));
      unitSource = fromOverride !== null ? "override" : fromHeader !== null ? (g.unitSource ?? "header") : "default";
      display = unit?.symbol ?? null;
    }
    const notes = [o !== undefined ? "set by a mapping override" : null, plainDcrNotes.get(i) ?? null, g.note, conditionNote(q, g), unitSource === "default" ? `no unit given: read as ${display ?? "plain numbers"}` : null].filter(
      (n): n is string => n !== null,
    );
    mapping.push({ column: i, header: name, quantity: q, unit: display, status: "mapped", unitSource, note: notes.length > 0 ? notes.join("; ") : null });
    plans.push({ column: i, quantity: q, unit, temperature: g.temperature, drop: g.drop, rise: g.rise });
  }
  return { mapping, plans, names, warnings };
}
