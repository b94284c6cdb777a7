import type { Part, Spec } from "../engine/types.ts";
import { PART_DEFAULTS, ROLL_OFF_EXPONENT, saturationFromMaterial } from "../engine/partDefaults.ts";
import { lossDcr } from "../engine/evaluateCorner.ts";
import type { ColumnMapping, Quantity } from "../catalog/types.ts";
import { fmt } from "./fmt.ts";
import type { PartBasis, ReportListSource } from "./types.ts";

export interface PartOrigin {
  list: ReportListSource;
  /** The list's column mapping as imported, null when unknown. */
  mapping: readonly ColumnMapping[] | null;
}

function hasColumn(mapping: readonly ColumnMapping[] | null, quantity: Quantity): boolean | null {
  if (mapping === null) return null;
  return mapping.some((m) => m.status === "mapped" && m.quantity === quantity);
}

/**
 * Where a figure with a default came from: a value other than the default, or a mapped column,
 * is the list's; otherwise the default (unknown mapping: either).
 */
function listedOr(mapping: readonly ColumnMapping[] | null, quantity: Quantity, differs: boolean, defaultText: string): string {
  if (differs || hasColumn(mapping, quantity) === true) return "from the list";
  return mapping === null ? `from the list, or ${defaultText}` : defaultText;
}

/**
 * Which character the engine assumed for a part and why: the user's choice for its series wins,
 * then the material column, then the default (the importer's order, src/catalog/makeRowConverter.ts).
 */
export function saturationBasis(part: Part, origin: PartOrigin | null): string {
  if (part.series !== null && origin !== null) {
    const wanted = part.series.trim().toLowerCase();
    const chosen = Object.entries(origin.list.seriesSaturation).find(([series]) => series.trim().toLowerCase() === wanted);
    if (chosen !== undefined && chosen[1] === part.saturation) return `user's choice for series "${part.series}": ${part.saturation}`;
  }
  const fromMaterial = saturationFromMaterial(part.material);
  if (fromMaterial !== null && fromMaterial === part.saturation) return `from material column: "${part.material}" → ${part.saturation}`;
  if (part.material === null) return `default: ${part.saturation} (no material given)`;
  if (fromMaterial === null && part.saturation === PART_DEFAULTS.saturation) {
    return `default: ${part.saturation} (material "${part.material}" not recognised)`;
  }
  return `${part.saturation} (set for this part)`;
}

/** The figures of one part the evaluation rests on, each with where it came from. */
export function partBasis(spec: Spec, part: Part, origin: PartOrigin | null): PartBasis[] {
  const mapping = origin?.mapping ?? null;
  const tolerance = part.tolerance ?? spec.assumedTolerance;
  const dcr = lossDcr(part);
  const rows: PartBasis[] = [
    { label: "Inductance L0", value: fmt.q(part.inductance, "H", 4), basis: "from the list" },
    {
      label: "Tolerance",
      value: `±${fmt.pct(tolerance)}`,
      basis: part.tolerance === null ? "assumed (the list gives none; spec assumedTolerance)" : part.tolerance === 0 ? "from the list (0: nominal only)" : "from the list",
    },
    {
      label: "DCR used for losses",
      value: dcr === null ? "—" : `${fmt.q(dcr, "Ω", 4)} at ${fmt.n(part.dcrTemp)} °C`,
      basis:
        dcr === null
          ? "not given: winding loss and temperature not modelled"
          : `${part.dcrMax !== null ? "maximum" : "typical (no maximum given)"} from the list; reference temperature ${part.dcrTemp === PART_DEFAULTS.dcrTemp ? "the default (lists rarely state it)" : "from the list"}`,
    },
    {
      label: "Saturation current",
      value: part.isat === null ? "not rated" : `${fmt.q(part.isat, "A", 4)} at ${fmt.pct(part.isatDrop)} drop`,
      basis:
        part.isat === null
          ? "not given: constant inductance, saturation not checked"
          : `Isat from the list; drop ${listedOr(mapping, "isatDrop", part.isatDrop !== PART_DEFAULTS.isatDrop, `default ${fmt.pct(PART_DEFAULTS.isatDrop)} (none given)`)}`,
    },
    {
      label: "Hot saturation current",
      value: part.isatHot === null ? "—" : `${fmt.q(part.isatHot, "A", 4)} at ${fmt.n(part.isatHotTemp)} °C`,
      basis: part.isatHot === null ? "not given: Isat held at its 25 °C value" : "from the list; interpolated linearly from 25 °C",
    },
    { label: "Saturation character", value: part.saturation, basis: saturationBasis(part, origin) },
    {
      label: "Roll-off exponent n",
      value: fmt.n(part.rollOffExponent),
      basis: listedOr(mapping, "rollOffExponent", part.rollOffExponent !== ROLL_OFF_EXPONENT[part.saturation], `default for ${part.saturation} saturation`),
    },
    {
      label: "Rated heating current",
      value: part.irms === null ? "not rated" : `${fmt.q(part.irms, "A", 4)} for ${fmt.n(part.irmsRise)} K rise`,
      basis:
        part.irms === null
          ? "not given: heating and temperature rise not checked"
          : `rating from the list; rise ${listedOr(mapping, "irmsRise", part.irmsRise !== PART_DEFAULTS.irmsRise, `default ${PART_DEFAULTS.irmsRise} K (none given)`)}`,
    },
    { label: "Self-resonant frequency", value: part.srf === null ? "not rated" : fmt.q(part.srf, "Hz"), basis: part.srf === null ? "not given: SRF not checked" : "from the list" },
    {
      label: "AC-resistance factor Fr",
      value: fmt.n(part.acFactor),
      basis: listedOr(mapping, "acFactor", part.acFactor !== PART_DEFAULTS.acFactor, "default (DC resistance for the ripple too)"),
    },
    {
      label: "Core loss data",
      value:
        part.coreLoss === null
          ? "none"
          : `k ${fmt.n(part.coreLoss.k)}, α ${fmt.n(part.coreLoss.alpha)}, β ${fmt.n(part.coreLoss.beta)}, ${fmt.n(part.coreLoss.bPerAmp)} T/A${part.coreLoss.volume === null ? " (lumped k, W)" : `, Ve ${fmt.n(part.coreLoss.volume * 1e9)} mm³`}`,
      basis: part.coreLoss === null ? "core loss not modelled (no data)" : "from the list; iGSE",
    },
    {
      label: "Size",
      value:
        part.length === null && part.width === null && part.height === null
          ? "—"
          : `${fmt.mm(part.length)} × ${fmt.mm(part.width)} × ${fmt.mm(part.height)}`,
      basis: "from the list",
    },
    { label: "Price", value: part.price === null ? "—" : fmt.n(part.price, 4), basis: part.price === null ? "not given" : "from the list (list currency)" },
  ];
  return rows;
}
