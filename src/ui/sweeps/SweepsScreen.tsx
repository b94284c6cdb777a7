import { useMemo } from "react";
import type { InductanceCorner } from "../../engine/types.ts";
import { useWorkspace } from "../../state/workspaceStore.ts";
import { findPart, useCatalog } from "../../state/catalogStore.ts";
import { setExtras, useExtras } from "../../state/extrasStore.ts";
import { showScreen } from "../../state/workspaceActions.ts";
import { amps, kelvin, volts, watts } from "../common/format.ts";
import { loadSweep, vinSweep } from "./sweepData.ts";
import { SweepChart, type Series } from "./SweepChart.tsx";

/** The shortlist across the input range and the load range, computed corner by corner with the engine. */
export function SweepsScreen() {
  const shortlist = useWorkspace((w) => w.shortlist);
  const spec = useWorkspace((w) => w.spec);
  const merged = useCatalog((c) => c.merged);
  const s = useExtras((e) => e.sweeps);
  const data = useMemo(() => {
    const parts = shortlist.flatMap((pn) => {
      const f = findPart(merged, pn);
      return f === null ? [] : [f.part];
    });
    return parts.map((p) => ({ name: p.partNumber, vin: vinSweep(spec, p, s.inductance, s.load), load: loadSweep(spec, p, s.inductance, s.vin) }));
  }, [shortlist, merged, spec, s]);
  if (data.length === 0) {
    return (
      <div className="screen">
        <h1>Sweeps</h1>
        <div className="card empty">
          <p>Sweeps are drawn for the shortlisted parts; the shortlist is empty.</p>
          <button type="button" className="primary" onClick={() => showScreen("ranking")}>
            Go to the ranking
          </button>
        </div>
      </div>
    );
  }
  const pick = (key: "vin" | "load", get: "peak" | "ripple" | "loss" | "rise"): Series[] => data.map((d) => ({ name: d.name, data: d[key].map((p) => ({ x: p.x, y: p[get] })) }));
  const A = (y: number | null) => amps(y);
  return (
    <div className="screen">
      <div className="screen-head">
        <h1>Sweeps</h1>
        <span className="muted">{data.length} shortlisted parts</span>
      </div>
      <section className="card corner-picker" aria-label="Sweep settings">
        <div className="field">
          <label htmlFor="sweep-l">Inductance corner</label>
          <select id="sweep-l" value={s.inductance} onChange={(e) => setExtras({ sweeps: { ...s, inductance: e.target.value as InductanceCorner } })}>
            <option value="min">−tolerance (most ripple)</option>
            <option value="nom">nominal</option>
            <option value="max">+tolerance</option>
          </select>
        </div>
        <div className="field">
          <label htmlFor="sweep-load">Load for the input sweep</label>
          <select id="sweep-load" value={s.load} onChange={(e) => setExtras({ sweeps: { ...s, load: e.target.value as "min" | "max" } })}>
            <option value="max">maximum: {amps(spec.iout.max)}</option>
            <option value="min">minimum: {amps(spec.iout.min)}</option>
          </select>
        </div>
        <div className="field">
          <label htmlFor="sweep-vin">Input for the load sweep</label>
          <select id="sweep-vin" value={s.vin} onChange={(e) => setExtras({ sweeps: { ...s, vin: e.target.value as "min" | "nom" | "max" } })}>
            <option value="min">minimum: {volts(spec.vin.min)}</option>
            <option value="nom">nominal: {volts(spec.vin.nom)}</option>
            <option value="max">maximum: {volts(spec.vin.max)}</option>
          </select>
        </div>
      </section>
      <div className="sweep-grid">
        <SweepChart title="Peak current against input voltage" xLabel="input voltage (V)" yLabel="peak |i| (A)" series={pick("vin", "peak")} format={A} xFormat={(x) => volts(x)} />
        <SweepChart title="Ripple current against input voltage" xLabel="input voltage (V)" yLabel="ripple, peak to peak (A)" series={pick("vin", "ripple")} format={A} xFormat={(x) => volts(x)} />
        <SweepChart
          title="Loss against load current"
          xLabel="load current (A)"
          yLabel="loss (W)"
          series={pick("load", "loss")}
          markers={[{ at: spec.iout.max, label: "full load", axis: "x" }]}
          format={(y) => watts(y)}
          xFormat={(x) => amps(x)}
        />
        <SweepChart
          title="Temperature rise against load current"
          xLabel="load current (A)"
          yLabel="rise (K)"
          series={pick("load", "rise")}
          markers={[
            { at: spec.iout.max, label: "full load", axis: "x" },
            { at: spec.targets.maxTempRise, label: `limit ${spec.targets.maxTempRise} K`, axis: "y" },
          ]}
          format={(y) => kelvin(y)}
          xFormat={(x) => amps(x)}
        />
      </div>
    </div>
  );
}
