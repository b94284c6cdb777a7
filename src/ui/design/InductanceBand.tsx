import { nominalInductanceRange, requiredInductance } from "../../engine/requiredInductance.ts";
import { useDraftReading } from "../../state/draftStore.ts";
import { useCatalog } from "../../state/catalogStore.ts";
import { amps, henries, volts } from "../common/format.ts";

/** The inductance the ripple window asks for, live from the form. */
export function InductanceBand() {
  const spec = useDraftReading().spec;
  const parts = useCatalog((c) => c.merged.parts);
  if (spec === null) {
    return (
      <section className="card band" aria-labelledby="band-title">
        <h2 id="band-title">Required inductance</h2>
        <p className="muted">Complete the spec (see the marked fields) to see the band.</p>
      </section>
    );
  }
  const band = requiredInductance(spec);
  const t = spec.targets.rippleRatio;
  if (band === null) {
    return (
      <section className="card band" aria-labelledby="band-title">
        <h2 id="band-title">Required inductance</h2>
        <p className="field-error">
          <span aria-hidden="true">⚠ </span>No band: at nominal input and full load the converter cannot reach its output with these drops.
        </p>
      </section>
    );
  }
  const tol = spec.assumedTolerance;
  const nominal = nominalInductanceRange(band, tol);
  const fitting = nominal === null ? 0 : parts.reduce((n, p) => n + (p.inductance >= nominal.min && p.inductance <= nominal.max ? 1 : 0), 0);
  return (
    <section className="card band" aria-labelledby="band-title" aria-live="polite">
      <h2 id="band-title">Required inductance</h2>
      <p className="band-figure">
        <strong>
          {henries(band.min)} – {Number.isFinite(band.max) ? henries(band.max) : "no upper limit"}
        </strong>
      </p>
      <p className="muted">
        Actual inductance for a ripple ratio of {t.min}–{t.max} at {volts(band.vin)} in and {amps(band.iout)} out (constant L, before DC-bias roll-off).
      </p>
      <p>
        {nominal === null
          ? `No ±${Math.round(tol * 100)} % part fits: the band is narrower than that tolerance.`
          : `Nominal value for a ±${Math.round(tol * 100)} % part: ${henries(nominal.min)} – ${Number.isFinite(nominal.max) ? henries(nominal.max) : "no upper limit"}.`}
        {nominal !== null && parts.length > 0 && ` ${fitting.toLocaleString("en")} of the ${parts.length.toLocaleString("en")} loaded parts are in this range.`}
      </p>
    </section>
  );
}
