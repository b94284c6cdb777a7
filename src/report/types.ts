import type { CornerResult, Part, Result, ResultStatus, Spec } from "../engine/types.ts";
import type { Screening } from "../engine/screenParts.ts";
import type { InductanceBand } from "../engine/requiredInductance.ts";
import type { WaveformSample } from "../engine/waveformSamples.ts";
import type { ColumnMapping, ImportResult, MappingOverride } from "../catalog/types.ts";
import type { SourceKey } from "./methodSources.ts";

/**
 * The part of a workspace (src/state/workspace.ts) the report reads. Declared here because the
 * report must not depend on state; a Workspace is assignable to it (checked in the tests).
 */
export interface ReportListSource {
  id: string;
  name: string;
  text: string;
  mapping: readonly MappingOverride[];
  seriesSaturation: Readonly<Record<string, "soft" | "hard">>;
  addedAt: string;
}

export interface ReportWorkspace {
  name: string;
  notes: string;
  spec: Spec;
  lists: readonly ReportListSource[];
  shortlist: readonly string[];
}

/** A row of a part list that did not become a part, with the list it came from. */
export interface ReportRejectedRow {
  list: string;
  row: number;
  field: string | null;
  reason: string;
}

/** One list as imported, so the report can show its column mapping and each part's data basis. */
export interface ImportedList {
  source: ReportListSource;
  result: ImportResult;
}

export interface ReportInput {
  workspace: ReportWorkspace;
  spec: Spec;
  /** The merged parts that were ranked. */
  parts: readonly Part[];
  /** Full results in rank order (rankParts); or give `screening`; with neither the report screens the parts itself. */
  results?: readonly Result[];
  screening?: Screening;
  rejected: readonly ReportRejectedRow[];
  imports?: readonly ImportedList[];
  /** Readable messages about part numbers found in more than one list. */
  duplicates?: readonly string[];
  generatedAt: Date | string;
  /** Coilsift version (package.json). */
  version: string;
  /** How many ranks the ranking table shows (default 20). */
  rankingRows?: number;
}

export interface SpecRow {
  /** Spec file key, e.g. "targets.rippleRatio.min". */
  key: string;
  label: string;
  /** Formatted value with its unit. */
  value: string;
  /** Formatted default, null when the key has none (a required key). */
  defaultValue: string | null;
  isDefault: boolean;
}

export interface Assumption {
  topic: string;
  statement: string;
  sources: SourceKey[];
}

/** Why one figure of a part is what the engine used: from the list, a user's choice or a default. */
export interface PartBasis {
  label: string;
  value: string;
  basis: string;
}

export interface ListSummary {
  name: string;
  /** FNV-1a 32-bit of the list text, so a reviewer can tell whether a list file is the one used. */
  checksum: string;
  characters: number;
  dataRows: number | null;
  parts: number | null;
  rejected: number;
  warnings: string[];
  mapping: ColumnMapping[];
  seriesSaturation: [string, "soft" | "hard"][];
}

export interface RequirementSummary {
  band: InductanceBand | null;
  /** Nominal values whose ± assumed tolerance stays in the band, null when none does. */
  nominalRange: { min: number; max: number } | null;
  assumedTolerance: number;
  /** Largest average inductor current at full load over the input range (CCM, lossless duty). */
  inductorCurrent: { value: number; vin: number };
  /** Isat guide for a part at the band's lower edge: (1 + m)·IL·(1 + rmax/2). */
  isatGuide: number;
  /** Heating-current guide: (1 + m)·IL·√(1 + rmax²/12). */
  heatingGuide: number;
  srfMin: number;
  limits: string[];
}

export interface WaveformView {
  cornerIndex: number;
  cornerLabel: string;
  /** Why this corner: the largest current magnitude over all corners. */
  why: string;
  corner: CornerResult;
  samples: WaveformSample[];
  /** Saturation current at the corner's temperature, A, null when not rated. */
  isat: number | null;
}

export interface ShortlistEntry {
  part: Part;
  result: Result;
  /** Where the part came from, null when unknown. */
  list: string | null;
  basis: PartBasis[];
  /** Readable name of each corner, index-aligned with result.corners. */
  cornerLabels: string[];
  waveform: WaveformView | null;
}

export interface RankingRow {
  rank: number;
  partNumber: string;
  maker: string | null;
  status: ResultStatus;
  score: number;
  inductance: number;
  isat: number | null;
  irated: number | null;
  peak: number | null;
  irms: number | null;
  totalLoss: number | null;
  tempRise: number | null;
  firstProblem: string;
  shortlisted: boolean;
}

export interface ReportModel {
  title: string;
  designName: string;
  notes: string;
  /** ISO 8601, UTC. */
  generatedAt: string;
  version: string;
  spec: Spec;
  specRows: SpecRow[];
  assumptions: Assumption[];
  sources: { key: SourceKey; citation: string }[];
  requirement: RequirementSummary;
  lists: ListSummary[];
  partsConsidered: number;
  counts: { pass: number; incomplete: number; fail: number };
  shortlist: ShortlistEntry[];
  /** Shortlisted part numbers that are in none of the lists. */
  missingShortlist: string[];
  ranking: RankingRow[];
  rejected: ReportRejectedRow[];
  rejectedTotal: number;
  duplicates: string[];
  cautions: string[];
}
