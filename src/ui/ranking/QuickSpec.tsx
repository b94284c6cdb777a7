import { fieldByKey } from "../../state/specFields.ts";
import { SpecFieldInput } from "../design/SpecFieldInput.tsx";

const KEYS = ["vin.min", "vin.nom", "vin.max", "vout", "iout.min", "iout.max", "fsw"];

/** The operating point beside the table, so a what-if is one edit away; the same fields as on Design. */
export function QuickSpec() {
  return (
    <details className="card" open>
      <summary>
        <strong>Operating point</strong> <span className="muted">(the ranking follows each edit; every other setting is on the Design screen)</span>
      </summary>
      <div className="quick-spec">
        {KEYS.map((k) => {
          const f = fieldByKey(k);
          if (f === undefined) return null;
          const label = k.startsWith("vin.") ? `Vin ${f.label.toLowerCase()}` : k.startsWith("iout.") ? `Iout ${f.label.toLowerCase()}` : f.label;
          return <SpecFieldInput key={k} field={{ ...f, label }} idPrefix="quick" />;
        })}
      </div>
    </details>
  );
}
