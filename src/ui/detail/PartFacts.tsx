import type { Part } from "../../engine/types.ts";
import { amps, henries, hertz, mm3, ohms, priceText, sizeText, toleranceText, volumeOf } from "../common/format.ts";

/** The part as the list gives it (and the stated defaults where it is silent). */
export function PartFacts({ part, extra }: { part: Part; extra: Record<string, string> | null }) {
  const rows: [string, string][] = [
    ["Inductance", `${henries(part.inductance)} ${toleranceText(part)}`],
    ["DCR typical", ohms(part.dcrTyp)],
    ["DCR maximum", ohms(part.dcrMax)],
    ["Isat (25 °C)", part.isat === null ? "not given" : `${amps(part.isat)} at ${Math.round(part.isatDrop * 100)} % drop`],
    ["Isat hot", part.isatHot === null ? "not given" : `${amps(part.isatHot)} at ${part.isatHotTemp ?? "?"} °C`],
    ["Rated current", part.irms === null ? "not given" : `${amps(part.irms)} for ${part.irmsRise} K`],
    ["SRF", hertz(part.srf)],
    ["Size", sizeText(part)],
    ["Volume", mm3(volumeOf(part))],
    ["Price", priceText(part.price)],
    ["Saturation", `${part.saturation}, n = ${part.rollOffExponent}`],
    ["AC-resistance factor", String(part.acFactor)],
    ["Core loss", part.coreLoss === null ? "not modelled (no data)" : `k ${part.coreLoss.k}, α ${part.coreLoss.alpha}, β ${part.coreLoss.beta}`],
  ];
  const other = extra === null ? [] : Object.entries(extra);
  return (
    <>
      <dl className="facts">
        {rows.map(([k, v]) => (
          <div key={k}>
            <dt>{k}</dt>
            <dd>{v}</dd>
          </div>
        ))}
      </dl>
      {other.length > 0 && (
        <>
          <h3>Other columns of the list</h3>
          <dl className="facts">
            {other.map(([k, v]) => (
              <div key={k}>
                <dt>{k}</dt>
                <dd>{v}</dd>
              </div>
            ))}
          </dl>
        </>
      )}
    </>
  );
}
