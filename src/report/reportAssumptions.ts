import type { Part, Spec } from "../engine/types.ts";
import { PART_DEFAULTS, ROLL_OFF_EXPONENT, saturationFromMaterial } from "../engine/partDefaults.ts";
import { RATING_AMBIENT } from "../engine/thermal.ts";
import { COPPER_ALPHA20 } from "../engine/copper.ts";
import { DEFAULT_THERMAL_EXPONENT } from "../engine/specDefaults.ts";
import { fmt } from "./fmt.ts";
import type { Assumption } from "./types.ts";

function count(parts: readonly Part[], test: (p: Part) => boolean): number {
  let n = 0;
  for (const p of parts) if (test(p)) n++;
  return n;
}

/**
 * Every model, default and rule the evaluation used, each with its source. The counts say how
 * many of the considered parts a default touched, so a reviewer can weigh it.
 */
export function reportAssumptions(spec: Spec, parts: readonly Part[]): Assumption[] {
  const t = spec.targets;
  const n = parts.length;
  const of = (k: number) => `${k} of ${n} parts`;
  const noTolerance = count(parts, (p) => p.tolerance === null);
  const noCore = count(parts, (p) => p.coreLoss === null);
  const defaultHard = count(parts, (p) => p.saturation === PART_DEFAULTS.saturation && saturationFromMaterial(p.material) === null);
  const noIsat = count(parts, (p) => p.isat === null);
  const noRated = count(parts, (p) => p.irms === null);
  const noSrf = count(parts, (p) => p.srf === null);
  const thermalNote =
    spec.thermalExponent === DEFAULT_THERMAL_EXPONENT
      ? `k = ${spec.thermalExponent} (default), between laminar natural convection (h ∝ ΔT^0.25 gives k = 0.8) and McLyman's surface rule ΔT = 450·ψ^0.826`
      : `k = ${spec.thermalExponent} (set in the spec; default ${DEFAULT_THERMAL_EXPONENT})`;
  return [
    {
      topic: "Waveform",
      statement:
        "Inductor current solved in flux linkage λ: with a constant voltage across the inductor λ moves linearly in time, volt-second balance fixes the swing and the load fixes the level. With constant inductance this is the textbook piecewise-linear CCM/DCM result.",
      sources: ["erickson"],
    },
    {
      topic: "Inductance vs. current",
      statement: `Differential inductance L(i) = L0/(1 + (|i|/Ik)^n), Ik chosen so that L(Isat) = L0·(1 − drop). n = ${ROLL_OFF_EXPONENT.hard} for hard (ferrite-like) and ${ROLL_OFF_EXPONENT.soft} for soft (powder, alloy, metal composite) saturation unless a list gives a roll-off exponent; fits of this law give hard ≈ 6–10, soft ≈ 1.5–3. A part without Isat is modelled with constant inductance.`,
      sources: ["textbook", "practice"],
    },
    {
      topic: "Saturation character",
      statement: `From the user's choice for the series, else from the material/construction column (ferrite, MnZn, NiZn → hard; powder, iron, alloy, composite, metal, moulded → soft), else the default: ${PART_DEFAULTS.saturation}, the conservative cliff-like knee (${of(defaultHard)} by default). Each shortlisted part states its own basis below.`,
      sources: ["practice"],
    },
    {
      topic: "Isat definition",
      statement: `Isat is the DC current at which L has fallen by the stated drop; a list that gives no drop is read as ${fmt.pct(PART_DEFAULTS.isatDrop)}, which predicts more roll-off below Isat than 10 % or 20 % would. A hot Isat given without a temperature is taken at ${PART_DEFAULTS.isatHotTemp} °C; between 25 °C and that point Isat is interpolated linearly.`,
      sources: ["iec62024", "practice"],
    },
    {
      topic: "Operating corners",
      statement: `Every combination of Vin {min, nom, max}${spec.topology === "boost" ? " (and Vo/2, where a boost's ripple peaks, when it lies in the range)" : ""}, Iout {min, max} and inductance {−tol, nominal, +tol}, each with its own thermal state. Worst cases name the corner that produced them. Parts without a tolerance are evaluated at ±${fmt.pct(spec.assumedTolerance)} (${of(noTolerance)}); a list tolerance of 0 means nominal only.`,
      sources: ["erickson", "practice"],
    },
    {
      topic: "Drops and duty",
      statement:
        "Switch and rectifier drops and the winding resistance enter the segment voltages at the average inductor current (first order), so the duty shifts as it does on the bench.",
      sources: ["erickson"],
    },
    {
      topic: "Winding resistance",
      statement: `R(T) = R20·(1 + α20·(T − 20 °C)), α20 = ${COPPER_ALPHA20} /K for annealed copper. Losses use the maximum DCR where the list gives it, else the typical. A DCR without a stated temperature is taken at ${PART_DEFAULTS.dcrTemp} °C. The ripple part of the current sees R·Fr, Fr = ${PART_DEFAULTS.acFactor} unless the list gives an AC-resistance factor.`,
      sources: ["iec60028", "erickson", "practice"],
    },
    {
      topic: "Core loss",
      statement: `Improved generalised Steinmetz equation (iGSE) over the two-ramp flux waveform when a part carries Steinmetz data (k, α, β and flux per ampere). Otherwise core loss is shown as "not modelled (no data)", never as zero (${of(noCore)} have no data).`,
      sources: ["igse"],
    },
    {
      topic: "Temperature rise",
      statement: `ΔT = ΔTrated·(P/Prated)^k with Prated = Irated²·DCR at the rating temperature (${RATING_AMBIENT} °C ambient plus the rated rise); ${thermalNote}. DCR and temperature are iterated to a fixed point. A rated rise not given by the list is ${PART_DEFAULTS.irmsRise} K.`,
      sources: ["mclyman", "textbook", "practice"],
    },
    {
      topic: "Saturation check",
      statement: `Isat at the corner's temperature ≥ (1 + ${fmt.pct(t.saturationMargin)})·max(|Ipk|, |Ivalley|) at every corner; 20–50 % headroom is common practice. Not checked for ${of(noIsat)} (no Isat).`,
      sources: ["practice"],
    },
    {
      topic: "Heating check",
      statement: `Rated heating current ≥ (1 + ${fmt.pct(t.heatingMargin)})·Irms at every corner, and temperature rise ≤ ${fmt.n(t.maxTempRise)} K${t.maxTemperature === null ? "" : `, hot spot ≤ ${fmt.n(t.maxTemperature)} °C`}. Not checked for ${of(noRated)} (no rated current).`,
      sources: ["iec62024", "practice"],
    },
    {
      topic: "Ripple window",
      statement: `Ripple ratio r = ΔI/IL between ${fmt.n(t.rippleRatio.min)} and ${fmt.n(t.rippleRatio.max)} at nominal input and full load, across the tolerance corners (0.2–0.4 typical, 0.3–0.5 optimum).`,
      sources: ["maniktala"],
    },
    {
      topic: "Self-resonance",
      statement: `SRF ≥ ${fmt.n(t.srfFactor)}·fsw = ${fmt.q(t.srfFactor * spec.fsw, "Hz")}; a part without a rated SRF is "not rated", not failed (${of(noSrf)}).`,
      sources: ["practice"],
    },
    {
      topic: "Light load",
      statement:
        t.lightLoadMode === "ccm"
          ? "Continuous conduction is required at minimum load."
          : `Any conduction mode is accepted at minimum load (${spec.rectifier === "diode" ? "a diode rectifier enters DCM at light load" : "a synchronous rectifier stays forced-continuous"}).`,
      sources: ["erickson"],
    },
    {
      topic: "Verdict and score",
      statement:
        "pass only when every check ran and passed; incomplete when nothing failed but a check lacked data; fail otherwise. The score (0–100) weighs worst-case loss, footprint, height, price and current margin against the best of the passing parts with the spec's weights; a missing figure scores zero for its term. Passing parts rank first, then incomplete ones, then failing parts with the fewest failed checks.",
      sources: ["coilsift"],
    },
  ];
}
