import type { Mode } from "../engine/types.ts";
import { assertNever } from "../engine/assertNever.ts";

/** Short conduction-mode names; FCCM is forced-continuous (synchronous rectifier, current reverses). */
export function modeLabel(mode: Mode): string {
  switch (mode) {
    case "ccm":
      return "CCM";
    case "bcm":
      return "BCM";
    case "dcm":
      return "DCM";
    case "forced-continuous":
      return "FCCM";
    default:
      return assertNever(mode);
  }
}
