import type { CliOptions } from "../main.ts";
import type { CornerPoint, InductanceCorner } from "../../engine/types.ts";
import { CliError } from "../cliError.ts";
import { readSpec } from "../readSpec.ts";
import { readParts } from "../readParts.ts";
import { requireSpec } from "./rankCommand.ts";
import { evaluateCorner } from "../../engine/evaluateCorner.ts";
import { effectiveTolerance } from "../../engine/cornerPoints.ts";
import { waveformSamples } from "../../engine/waveformSamples.ts";

function numberOption(name: string, text: string | undefined, fallback: number): number {
  if (text === undefined) return fallback;
  const value = Number(text);
  if (!Number.isFinite(value) || value < 0) throw new CliError(`--${name} "${text}" is not a non-negative number`);
  return value;
}

/** `waveform`: inductor current over two periods at one operating point of one part. */
export function waveformCommand(args: string[], options: CliOptions): string {
  if (args.length > 0) throw new CliError(`waveform takes no positional arguments; unexpected "${args.join(" ")}"`);
  const spec = readSpec(requireSpec(options));
  if (options.part === undefined) throw new CliError("--part <part number> is required");
  const loaded = readParts(options.parts, options.map ?? []);
  const part = loaded.parts.find((p) => p.partNumber === options.part);
  if (part === undefined) throw new CliError(`--part "${options.part}": no such part in ${(options.parts ?? []).join(", ")}`);
  const vin = numberOption("vin", options.vin, spec.vin.nom);
  const iout = numberOption("iout", options.iout, spec.iout.max);
  if (vin <= 0) throw new CliError("--vin must be above zero");
  const which = (options.inductance ?? "nom") as InductanceCorner;
  if (!["min", "nom", "max"].includes(which)) throw new CliError(`--inductance "${options.inductance}" must be min, nom or max`);
  const tolerance = effectiveTolerance(spec, part);
  const factor = which === "min" ? 1 - tolerance : which === "max" ? 1 + tolerance : 1;
  const point: CornerPoint = {
    vin,
    iout,
    vinCorner: vin === spec.vin.min ? "min" : vin === spec.vin.max ? "max" : "nom",
    ioutCorner: iout === spec.iout.min ? "min" : "max",
    inductanceCorner: which,
    inductance: part.inductance * factor,
  };
  const corner = evaluateCorner(spec, part, point);
  const samples = waveformSamples(spec, part, corner, 2);
  if (options.json) return JSON.stringify({ samples, corner }, null, 2);
  return [
    `${part.partNumber} at Vin ${vin} V, Iout ${iout} A, L ${which}: ${corner.mode}, D ${corner.duty.toFixed(4)}`,
    `peak ${corner.ipk.toFixed(4)} A, valley ${corner.ivalley.toFixed(4)} A, average ${corner.iavg.toFixed(4)} A, RMS ${corner.irms.toFixed(4)} A`,
    "t (µs)\ti (A)",
    ...samples.map((s) => `${(s.t * 1e6).toFixed(4)}\t${s.i.toFixed(5)}`),
  ].join("\n");
}
