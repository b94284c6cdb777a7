import type { CornerResult } from "../../engine/types.ts";
import type { CornerKey } from "../../state/extrasStore.ts";
import { IOUT_LABEL, L_LABEL, VIN_LABEL, keyOf } from "./cornerChoice.ts";
import { amps, henries, volts } from "../common/format.ts";

/** Input voltage, load and inductance corner, from the labels the spec and part actually have. */
export function CornerPicker({ corners, shown, onPick, onWorst, idPrefix }: { corners: readonly CornerResult[]; shown: number; onPick: (key: CornerKey) => void; onWorst?: () => void; idPrefix: string }) {
  const current = corners[shown];
  if (current === undefined) return null;
  const key = keyOf(current);
  const distinct = <T extends string>(pick: (c: CornerResult) => T) => [...new Set(corners.map(pick))];
  const vinOf = (v: CornerKey["vin"]) => corners.find((c) => c.vinCorner === v)?.vin ?? null;
  const ioutOf = (i: CornerKey["iout"]) => corners.find((c) => c.ioutCorner === i)?.iout ?? null;
  const lOf = (l: CornerKey["inductance"]) => corners.find((c) => c.inductanceCorner === l)?.inductance ?? null;
  return (
    <div className="corner-picker" role="group" aria-label="Operating corner">
      <div className="field">
        <label htmlFor={`${idPrefix}-vin`}>Input voltage</label>
        <select id={`${idPrefix}-vin`} value={key.vin} onChange={(e) => onPick({ ...key, vin: e.target.value as CornerKey["vin"] })}>
          {distinct((c) => c.vinCorner).map((v) => (
            <option key={v} value={v}>
              {VIN_LABEL[v]}: {volts(vinOf(v))}
            </option>
          ))}
        </select>
      </div>
      <div className="field">
        <label htmlFor={`${idPrefix}-iout`}>Load</label>
        <select id={`${idPrefix}-iout`} value={key.iout} onChange={(e) => onPick({ ...key, iout: e.target.value as CornerKey["iout"] })}>
          {distinct((c) => c.ioutCorner).map((v) => (
            <option key={v} value={v}>
              {IOUT_LABEL[v]}: {amps(ioutOf(v))}
            </option>
          ))}
        </select>
      </div>
      <div className="field">
        <label htmlFor={`${idPrefix}-l`}>Inductance</label>
        <select id={`${idPrefix}-l`} value={key.inductance} onChange={(e) => onPick({ ...key, inductance: e.target.value as CornerKey["inductance"] })}>
          {distinct((c) => c.inductanceCorner).map((v) => (
            <option key={v} value={v}>
              {L_LABEL[v]}: {henries(lOf(v))}
            </option>
          ))}
        </select>
      </div>
      {onWorst !== undefined && (
        <button type="button" onClick={onWorst}>
          Corner of the worst peak
        </button>
      )}
    </div>
  );
}
