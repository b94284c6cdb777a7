import type { ReactNode } from "react";
import type { Part } from "../../engine/types.ts";
import type { Ranking } from "../../worker/finishRanking.ts";
import { modeOfCode, statusOfCode } from "../../worker/codes.ts";
import { amps, henries, kelvin, known, MODE_SHORT, ohms, percent, sizeText, watts } from "../common/format.ts";
import { StatusMark } from "../common/StatusMark.tsx";

export interface CellContext {
  parts: readonly Part[];
  r: Ranking;
  /** The first reason of a failure or a missing check (from the row's evaluation). */
  reason: string | null;
}

export interface Column {
  id: string;
  label: string;
  /** Tooltip and accessible description of the header. */
  title: string;
  width: number;
  num?: boolean;
  /** False for columns without a key over the whole list (reasons are written only for rows on screen). */
  sortable?: boolean;
  cell(index: number, c: CellContext): ReactNode;
}

const part = (i: number, c: CellContext) => c.parts[i]!;

/** The ranking table's columns, left to right. Their ids are the sort keys of state/rankingColumns.ts. */
export const COLUMNS: readonly Column[] = [
  { id: "rank", label: "#", title: "Rank: passing parts first, then incomplete data, then failures (fewest failed checks first); by score within each", width: 52, num: true, cell: (i, c) => (c.r.rankOf[i] ?? 0) + 1 },
  { id: "part", label: "Part", title: "Part number", width: 176, cell: () => null },
  {
    id: "result",
    label: "Result",
    title: "Pass, incomplete (data missing) or fail, with the number of failed checks; hover or open Why for the reasons",
    width: 118,
    cell: (i, c) => {
      const failures = c.r.failures[i] ?? 0;
      return <StatusMark status={statusOfCode(c.r.status[i] ?? 2)} {...(failures > 1 ? { detail: `(${failures})` } : {})} />;
    },
  },
  { id: "actions", label: "Actions", title: "Reasons and shortlist", width: 178, sortable: false, cell: () => null },
  { id: "inductance", label: "L", title: "Nominal inductance at zero bias", width: 70, num: true, cell: (i, c) => henries(part(i, c).inductance) },
  { id: "dcr", label: "DCR", title: "DC resistance: the maximum where the list gives one, else the typical", width: 74, num: true, cell: (i, c) => ohms(part(i, c).dcrMax ?? part(i, c).dcrTyp) },
  { id: "isat", label: "Isat", title: "Saturation current at 25 °C", width: 66, num: true, cell: (i, c) => amps(part(i, c).isat) },
  { id: "rated", label: "Rated", title: "Rated (heating) current", width: 70, num: true, cell: (i, c) => amps(part(i, c).irms) },
  { id: "peak", label: "Peak", title: "Worst-case peak |i| over every corner", width: 68, num: true, cell: (i, c) => amps(known(c.r.peak[i])) },
  { id: "rms", label: "RMS", title: "Worst-case RMS current", width: 68, num: true, cell: (i, c) => amps(known(c.r.irms[i])) },
  { id: "loss", label: "Loss", title: "Worst-case total loss (winding + core where modelled)", width: 74, num: true, cell: (i, c) => watts(known(c.r.totalLoss[i])) },
  { id: "rise", label: "Rise", title: "Worst-case temperature rise", width: 64, num: true, cell: (i, c) => kelvin(known(c.r.tempRise[i])) },
  { id: "satMargin", label: "Isat margin", title: "Isat(T) / peak − 1 at the deciding corner", width: 116, num: true, cell: (i, c) => percent(known(c.r.satMargin[i])) },
  { id: "heatMargin", label: "Heat margin", title: "Rated current / RMS − 1 at the deciding corner", width: 116, num: true, cell: (i, c) => percent(known(c.r.heatMargin[i])) },
  {
    id: "lightLoad",
    label: "Light load",
    title: "Conduction mode at minimum load (the first corner that is not continuous)",
    width: 76,
    cell: (i, c) => {
      const m = modeOfCode(c.r.lightLoad[i] ?? 255);
      return m === null ? "—" : MODE_SHORT[m];
    },
  },
  { id: "score", label: "Score", title: "0–100 against the best passing part, by the Design screen's weights", width: 60, num: true, cell: (i, c) => (c.r.score[i] ?? 0).toFixed(1) },
  { id: "size", label: "Size", title: "Length × width × height (sorts by volume)", width: 124, cell: (i, c) => sizeText(part(i, c)) },
  { id: "maker", label: "Maker", title: "Maker and series", width: 150, cell: (i, c) => [part(i, c).maker, part(i, c).series].filter((x) => x !== null).join(" · ") || "—" },
  { id: "reason", label: "First reason", title: "The first failed or unchecked check, naming its corner", width: 420, sortable: false, cell: (_i, c) => <span className="reason">{c.reason ?? "—"}</span> },
];

export const GRID_TEMPLATE = COLUMNS.map((c) => `${c.width}px`).join(" ");
export const TABLE_WIDTH = COLUMNS.reduce((w, c) => w + c.width, 0);
