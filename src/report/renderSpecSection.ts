import { html, type SafeHtml } from "./html.ts";
import { fmt } from "./fmt.ts";
import type { ReportModel } from "./types.ts";

/** The converter spec, key by key with its default, and the requirement summary derived from it. */
export function renderSpecSection(model: ReportModel): SafeHtml {
  const r = model.requirement;
  const band = r.band;
  const t = model.spec.targets;
  return html`<section id="spec">
<h2>Converter specification</h2>
<p class="muted">Every key of the spec as evaluated, in the spec file's names. Greyed rows hold Coilsift's default.</p>
<table class="spec keep">
<thead><tr><th>Key</th><th>Meaning</th><th class="num">Value</th><th class="num">Default</th></tr></thead>
<tbody>
${model.specRows.map(
  (row) =>
    html`<tr class="${row.isDefault ? "default" : "set"}"><td><code>${row.key}</code></td><td>${row.label}</td><td class="num">${row.value}</td><td class="num">${row.defaultValue ?? "required"}</td></tr>`,
)}
</tbody>
</table>
</section>
<section id="requirements" class="keep">
<h2>Requirement summary</h2>
<table class="keep">
<tbody>
<tr><th scope="row">Required inductance band</th><td>${
    band === null
      ? "no solution: the operating point at nominal input and full load cannot be reached"
      : html`<strong>${fmt.q(band.min, "H")} – ${fmt.q(band.max, "H")}</strong> actual (zero-bias) inductance for a ripple ratio of ${fmt.n(t.rippleRatio.min)}–${fmt.n(t.rippleRatio.max)} at Vin ${fmt.q(band.vin, "V")}, Iout ${fmt.q(band.iout, "A")}: ΔI = Von·D/(fsw·L) in CCM with the switch and rectifier drops, so r ∝ 1/L <span class="src">(Erickson &amp; Maksimović ch. 2; Maniktala)</span>`
  }</td></tr>
<tr><th scope="row">Nominal inductance for ±${fmt.pct(r.assumedTolerance)}</th><td>${
    r.nominalRange === null
      ? band === null
        ? "—"
        : "none: the band is narrower than the tolerance spread; every part leaves it at one tolerance corner"
      : html`${fmt.q(r.nominalRange.min, "H")} – ${fmt.q(r.nominalRange.max, "H")} keeps the whole tolerance span inside the band`
  }</td></tr>
<tr><th scope="row">Inductor DC current at full load</th><td>${fmt.q(r.inductorCurrent.value, "A")} at Vin ${fmt.q(r.inductorCurrent.vin, "V")} <span class="src">(charge balance, lossless duty; Erickson &amp; Maksimović ch. 2)</span></td></tr>
<tr><th scope="row">Saturation current guide</th><td>Isat ≥ ${fmt.q(r.isatGuide, "A")} = (1 + ${fmt.pct(t.saturationMargin)})·IL·(1 + r<sub>max</sub>/2) for a part at the band's lower edge; each part is checked at every corner with its own roll-off</td></tr>
<tr><th scope="row">Heating current guide</th><td>Irated ≥ ${fmt.q(r.heatingGuide, "A")} = (1 + ${fmt.pct(t.heatingMargin)})·IL·√(1 + r<sub>max</sub>²/12)</td></tr>
<tr><th scope="row">Self-resonance</th><td>SRF ≥ ${fmt.q(r.srfMin, "Hz")} (${fmt.n(t.srfFactor)}·fsw)</td></tr>
<tr><th scope="row">Temperature</th><td>rise ≤ ${fmt.n(t.maxTempRise)} K in ${fmt.n(model.spec.ambient)} °C ambient</td></tr>
${r.limits.length === 0 ? null : html`<tr><th scope="row">Other limits</th><td>${r.limits.join("; ")}</td></tr>`}
</tbody>
</table>
</section>`;
}
