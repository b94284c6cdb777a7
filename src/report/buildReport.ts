import type { Part, Result, ResultStatus, Spec } from "../engine/types.ts";
import { rankedResults } from "../engine/rankParts.ts";
import { screenParts, type Screening } from "../engine/screenParts.ts";
import { describeCorner, effectiveTolerance } from "../engine/cornerPoints.ts";
import { waveformSamples } from "../engine/waveformSamples.ts";
import { specRows } from "./specRows.ts";
import { reportAssumptions } from "./reportAssumptions.ts";
import { requirementSummary } from "./requirementSummary.ts";
import { partBasis, type PartOrigin } from "./partBasis.ts";
import { listChecksum } from "./listChecksum.ts";
import { METHOD_SOURCES, type SourceKey } from "./methodSources.ts";
import { REPORT_CAUTIONS } from "./reportCautions.ts";
import { CHECK_LABEL } from "../engine/checkLabels.ts";
import type { ListSummary, RankingRow, ReportInput, ReportModel, ShortlistEntry, WaveformView } from "./types.ts";

export const DEFAULT_RANKING_ROWS = 20;
/** Rejected rows listed one by one; beyond this the report gives the count. */
export const REJECTED_ROWS_SHOWN = 200;

const key = (partNumber: string) => partNumber.trim().toUpperCase();

/** Ranked results on demand from whichever form the caller has: full results or a screening. */
interface Ranking {
  count: number;
  counts: Record<ResultStatus, number>;
  top(n: number): Result[];
  /** Full result of the part at this index of `parts`. */
  resultOf(index: number): Result;
}

function fromResults(results: readonly Result[], parts: readonly Part[], spec: Spec): Ranking {
  const byNumber = new Map(results.map((r) => [r.partNumber, r]));
  const counts: Record<ResultStatus, number> = { pass: 0, incomplete: 0, fail: 0 };
  for (const r of results) counts[r.status]++;
  let screening: Screening | null = null;
  return {
    count: results.length,
    counts,
    top: (n) => results.slice(0, n),
    resultOf: (index) => {
      const part = parts[index] as Part;
      const found = byNumber.get(part.partNumber);
      if (found !== undefined) return found;
      // The caller passed only some of the results: rank this one in the full list.
      screening ??= screenParts(spec, parts);
      return fromScreening(screening, parts, spec).resultOf(index);
    },
  };
}

function fromScreening(screening: Screening, parts: readonly Part[], spec: Spec): Ranking {
  const rankOf = new Int32Array(screening.count);
  screening.order.forEach((index, k) => (rankOf[index] = k));
  const counts: Record<ResultStatus, number> = { pass: 0, incomplete: 0, fail: 0 };
  for (const s of screening.status) counts[s]++;
  return {
    count: screening.count,
    counts,
    top: (n) => rankedResults(spec, parts, screening, 0, n),
    resultOf: (index) => rankedResults(spec, parts, screening, rankOf[index]!, rankOf[index]! + 1)[0] as Result,
  };
}

function waveformView(spec: Spec, part: Part, result: Result, labels: string[]): WaveformView | null {
  const index = result.worst.peakMagnitude.cornerIndex;
  const corner = result.corners[index];
  if (corner === undefined || corner.unreachable) return null;
  return {
    cornerIndex: index,
    cornerLabel: labels[index] ?? "",
    why: "the corner with the largest current magnitude, where saturation is closest",
    corner,
    samples: waveformSamples(spec, part, corner, 2),
    isat: corner.isatAtTemp,
  };
}

function listSummaries(input: ReportInput): ListSummary[] {
  const rejectedBy = new Map<string, number>();
  for (const r of input.rejected) rejectedBy.set(r.list, (rejectedBy.get(r.list) ?? 0) + 1);
  const imported = new Map((input.imports ?? []).map((i) => [i.source, i.result]));
  return input.workspace.lists.map((source) => {
    const result = imported.get(source) ?? null;
    return {
      name: source.name,
      checksum: listChecksum(source.text),
      characters: source.text.length,
      dataRows: result?.dataRows ?? null,
      parts: result?.parts.length ?? null,
      rejected: result?.rejected.length ?? rejectedBy.get(source.name) ?? 0,
      warnings: result === null ? [] : result.warnings.map((w) => (w.row === null ? w.message : `line ${w.row}: ${w.message}`)),
      mapping: result?.mapping ?? [],
      seriesSaturation: Object.entries(source.seriesSaturation),
    };
  });
}

/** The list each part came from: the last list holding its number, as mergeLists keeps it. */
function originIndex(input: ReportInput): Map<string, PartOrigin> {
  const origins = new Map<string, PartOrigin>();
  for (const { source, result } of input.imports ?? []) {
    for (const p of result.parts) origins.set(key(p.partNumber), { list: source, mapping: result.mapping });
  }
  return origins;
}

function usedSources(model: Pick<ReportModel, "assumptions">): { key: SourceKey; citation: string }[] {
  const keys = new Set<SourceKey>(model.assumptions.flatMap((a) => a.sources));
  return (Object.keys(METHOD_SOURCES) as SourceKey[]).filter((k) => keys.has(k)).map((k) => ({ key: k, citation: METHOD_SOURCES[k] }));
}

/** The first failed check as "Label: reason", else the first check that lacked data. */
function firstProblem(r: Result): string {
  const failed = r.checks.find((c) => c.status === "fail");
  if (failed !== undefined) return `${CHECK_LABEL[failed.name]}: ${failed.reason}`;
  return r.unchecked[0] ?? "";
}

function iso(at: Date | string): string {
  const date = typeof at === "string" ? new Date(at) : at;
  if (Number.isNaN(date.getTime())) throw new RangeError(`generatedAt: "${String(at)}" is not a valid time`);
  return date.toISOString();
}

/**
 * The selection report as plain data: spec, assumptions with sources, requirement summary,
 * the shortlisted parts in full (corners, checks, waveform at the worst corner), the top of the
 * ranking and the rejected rows. Pure: the same input gives the same model in Node and the browser.
 */
export function buildReport(input: ReportInput): ReportModel {
  const { spec, parts, workspace } = input;
  const generatedAt = iso(input.generatedAt);
  const ranking =
    input.results !== undefined
      ? fromResults(input.results, parts, spec)
      : fromScreening(input.screening ?? screenParts(spec, parts), parts, spec);
  const indexOf = new Map<string, number>();
  parts.forEach((p, i) => {
    if (!indexOf.has(p.partNumber)) indexOf.set(p.partNumber, i);
  });
  const indexByKey = new Map<string, number>();
  parts.forEach((p, i) => {
    if (!indexByKey.has(key(p.partNumber))) indexByKey.set(key(p.partNumber), i);
  });
  const origins = originIndex(input);

  const shortlist: ShortlistEntry[] = [];
  const missingShortlist: string[] = [];
  const seen = new Set<number>();
  for (const wanted of workspace.shortlist) {
    const index = indexOf.get(wanted) ?? indexByKey.get(key(wanted));
    if (index === undefined) {
      missingShortlist.push(wanted);
      continue;
    }
    if (seen.has(index)) continue;
    seen.add(index);
    const part = parts[index] as Part;
    const result = ranking.resultOf(index);
    const tolerance = effectiveTolerance(spec, part);
    const cornerLabels = result.corners.map((c) => describeCorner(c, tolerance));
    const origin = origins.get(key(part.partNumber)) ?? null;
    shortlist.push({
      part,
      result,
      list: origin?.list.name ?? null,
      basis: partBasis(spec, part, origin),
      cornerLabels,
      waveform: waveformView(spec, part, result, cornerLabels),
    });
  }
  const shortlisted = new Set(shortlist.map((s) => s.part.partNumber));

  const rows = input.rankingRows ?? DEFAULT_RANKING_ROWS;
  const byNumber = new Map(parts.map((p) => [p.partNumber, p]));
  const finite = (x: number) => (Number.isFinite(x) ? x : null);
  const rankingRows: RankingRow[] = ranking.top(rows).map((r) => {
    const p = byNumber.get(r.partNumber);
    return {
      rank: r.rank,
      partNumber: r.partNumber,
      maker: p?.maker ?? null,
      status: r.status,
      score: r.score,
      inductance: p?.inductance ?? NaN,
      isat: p?.isat ?? null,
      irated: p?.irms ?? null,
      peak: finite(r.worst.peakMagnitude.value),
      irms: finite(r.worst.irms.value),
      totalLoss: finite(r.worst.totalLoss.value),
      tempRise: r.worst.tempRise === null ? null : finite(r.worst.tempRise.value),
      firstProblem: firstProblem(r),
      shortlisted: shortlisted.has(r.partNumber),
    };
  });

  const assumptions = reportAssumptions(spec, parts);
  return {
    title: "Inductor selection report",
    designName: workspace.name,
    notes: workspace.notes,
    generatedAt,
    version: input.version,
    spec,
    specRows: specRows(spec),
    assumptions,
    sources: usedSources({ assumptions }),
    requirement: requirementSummary(spec),
    lists: listSummaries(input),
    partsConsidered: ranking.count,
    counts: ranking.counts,
    shortlist,
    missingShortlist,
    ranking: rankingRows,
    rejected: input.rejected.slice(0, REJECTED_ROWS_SHOWN),
    rejectedTotal: input.rejected.length,
    duplicates: [...(input.duplicates ?? [])],
    cautions: [...REPORT_CAUTIONS],
  };
}
