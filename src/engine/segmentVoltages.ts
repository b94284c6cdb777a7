import type { Topology } from "./types.ts";
import { assertNever } from "./assertNever.ts";

export interface Drops {
  switchResistance: number;
  switchDrop: number;
  rectifierDrop: number;
  rectifierResistance: number;
  /** Inductor winding resistance at its present temperature, Ω. */
  dcr: number;
}

export interface SegmentVoltages {
  /** Inductor voltage while the switch is on (> 0 for a reachable point). */
  on: number;
  /** Inductor voltage while the rectifier conducts (< 0 for a reachable point). */
  off: number;
}

/**
 * Inductor voltage in each interval, with the switch, rectifier and winding drops taken at the
 * average inductor current il (first order). Current positive in the direction it ramps up while
 * the switch is on. Buck: on Vin − Vsw − Vo, off −(Vo + VD); boost: on Vin − Vsw, off Vin − Vo − VD;
 * inverting buck-boost: on Vin − Vsw, off −(Vo + VD) (Erickson & Maksimović, ch. 2–3, with the
 * drops by volt-second balance).
 */
export function segmentVoltages(
  topology: Topology,
  vin: number,
  vout: number,
  il: number,
  d: Drops,
  out: SegmentVoltages = { on: 0, off: 0 },
): SegmentVoltages {
  const vSwitch = d.switchDrop + d.switchResistance * il;
  const vRectifier = d.rectifierDrop + d.rectifierResistance * il;
  const vWinding = d.dcr * il;
  switch (topology) {
    case "buck":
      out.on = vin - vSwitch - vout - vWinding;
      out.off = -(vout + vRectifier + vWinding);
      return out;
    case "boost":
      out.on = vin - vSwitch - vWinding;
      out.off = vin - vWinding - vout - vRectifier;
      return out;
    case "buck-boost":
      out.on = vin - vSwitch - vWinding;
      out.off = -(vout + vRectifier + vWinding);
      return out;
    default:
      return assertNever(topology);
  }
}

/** Average inductor current in CCM: buck Iout; boost and inverting Iout/(1 − D) (charge balance). */
export function inductorCurrentCcm(topology: Topology, iout: number, duty: number): number {
  switch (topology) {
    case "buck":
      return iout;
    case "boost":
    case "buck-boost":
      return iout / (1 - duty);
    default:
      return assertNever(topology);
  }
}

/** Lossless CCM duty: buck Vo/Vin, boost 1 − Vin/Vo, inverting Vo/(Vin + Vo) (Erickson & Maksimović ch. 2). */
export function idealDuty(topology: Topology, vin: number, vout: number): number {
  switch (topology) {
    case "buck":
      return vout / vin;
    case "boost":
      return 1 - vin / vout;
    case "buck-boost":
      return vout / (vin + vout);
    default:
      return assertNever(topology);
  }
}
