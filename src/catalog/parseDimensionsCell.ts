import { parseNumberCell, type CellContext } from "./parseNumberCell.ts";
import { parseUnit } from "./parseUnit.ts";

export type DimensionsResult =
  | { kind: "missing" }
  | { kind: "value"; length: number; width: number; height: number | null }
  | { kind: "error"; reason: string };

const SEPARATOR = /\s*[x×X*]\s*/;
const TRAILING_UNIT = /^(.*?\d)\s*([A-Za-zµμ"']+)$/;
/** "(L)", "L:" and similar axis labels written beside each figure. */
const AXIS_LABEL = /\(\s*[LWHTlwht]\s*\)|\b[LWHTlwht]\s*[:=]/g;

/**
 * Reads one "L x W x H" cell ("5.0 x 5.0 x 3.0", "5,0×5,0×3,0 mm", "4 x 4"): two or three
 * figures; a unit written once after the last figure applies to all of them.
 */
export function parseDimensionsCell(raw: string, ctx: CellContext): DimensionsResult {
  const s = raw.replace(AXIS_LABEL, " ").trim();
  if (s === "" || /^(?:-+|—|–|n\/?a|tbd)$/i.test(s)) return { kind: "missing" };
  const pieces = s.split(SEPARATOR).filter((p) => p !== "");
  if (pieces.length < 2 || pieces.length > 3) {
    return { kind: "error", reason: `"${raw}" is not of the form L x W x H` };
  }
  let pieceCtx = ctx;
  const last = TRAILING_UNIT.exec(pieces[pieces.length - 1] as string);
  if (last !== null) {
    const unit = parseUnit(last[2] as string, "length");
    if (unit !== null) {
      pieceCtx = { ...ctx, unit };
      pieces[pieces.length - 1] = last[1] as string;
    }
  }
  const values: number[] = [];
  for (const piece of pieces) {
    const r = parseNumberCell(piece, pieceCtx);
    if (r.kind === "error") return { kind: "error", reason: `"${raw}": ${r.reason}` };
    if (r.kind === "missing") return { kind: "error", reason: `"${raw}" has an empty figure` };
    values.push(r.value);
  }
  return { kind: "value", length: values[0] as number, width: values[1] as number, height: values[2] ?? null };
}
