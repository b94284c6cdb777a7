import type { Spec } from "../engine/types.ts";
import { formatQuantity } from "../engine/formatQuantity.ts";

const TOPOLOGY_NAMES: Record<Spec["topology"], string> = { buck: "Buck", boost: "Boost", "buck-boost": "Inverting buck-boost" };

export function SpecSummary({ spec }: { spec: Spec }) {
  const v = (x: number) => formatQuantity(x, "V");
  const rows: [string, string][] = [
    ["Topology", `${TOPOLOGY_NAMES[spec.topology]}, ${spec.rectifier === "diode" ? "diode rectifier" : "synchronous rectifier"}`],
    ["Input", `${v(spec.vin.min)} – ${v(spec.vin.max)} (nominal ${v(spec.vin.nom)})`],
    ["Output", `${v(spec.vout)}, ${formatQuantity(spec.iout.min, "A")} – ${formatQuantity(spec.iout.max, "A")}`],
    ["Switching", formatQuantity(spec.fsw, "Hz")],
    ["Ambient", `${spec.ambient} °C, rise limit ${spec.targets.maxTempRise} K`],
    ["Targets", `ripple ratio ${spec.targets.rippleRatio.min}–${spec.targets.rippleRatio.max}, Isat margin ${spec.targets.saturationMargin * 100} %, SRF ≥ ${spec.targets.srfFactor}·fsw`],
  ];
  return (
    <dl className="spec-summary">
      {rows.map(([k, value]) => (
        <div key={k}>
          <dt>{k}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
