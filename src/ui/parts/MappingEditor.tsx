import { useState } from "react";
import type { ColumnMapping, MappingOverride, Quantity } from "../../catalog/types.ts";
import { QUANTITIES, QUANTITY_KEYS } from "../../catalog/quantities.ts";
import { applyMapping } from "../../state/catalogController.ts";
import { choiceOf, overridesAfter, unitProblem, type ColumnChoice } from "./mappingEdits.ts";
import { UNIT_CHOICES } from "./unitChoices.ts";

const STATUS_TEXT: Record<ColumnMapping["status"], string> = {
  mapped: "✓ read",
  unrecognised: "? not recognised",
  duplicate: "= second column for a quantity",
  ignored: "– ignored",
};

const SOURCE_TEXT: Record<NonNullable<ColumnMapping["unitSource"]>, string> = {
  header: "from the header",
  "unit row": "from the unit row",
  override: "your choice",
  default: "assumed (default)",
  guessed: "guessed from the values",
};

/**
 * How each column was read, with a control to read it as another quantity or in another unit.
 * Edits apply together: the list is read again in the background and the choice is remembered
 * for files with the same header layout.
 */
export function MappingEditor({ listId, listName, mapping, overrides }: { listId: string; listName: string; mapping: ColumnMapping[]; overrides: MappingOverride[] }) {
  const [edits, setEdits] = useState<Record<number, ColumnChoice>>({});
  const edit = (column: number, choice: ColumnChoice) => setEdits({ ...edits, [column]: choice });
  const problems = mapping.map((m) => {
    const c = edits[m.column];
    return c === undefined ? null : unitProblem(c.quantity, c.unit);
  });
  const changed = Object.keys(edits).length;
  const blocked = problems.some((p) => p !== null);
  return (
    <div className="mapping">
      <div className="table-scroll">
        <table className="grid-table mapping-table">
          <caption className="visually-hidden">Column mapping of {listName}</caption>
          <thead>
            <tr>
              <th scope="col">Column</th>
              <th scope="col">Header in the file</th>
              <th scope="col">Read as</th>
              <th scope="col">Unit of bare numbers</th>
              <th scope="col">State</th>
              <th scope="col">Note</th>
            </tr>
          </thead>
          <tbody>
            {mapping.map((m, k) => {
              const c = edits[m.column] ?? choiceOf(m);
              const q = c.quantity === "ignore" ? null : QUANTITIES[c.quantity];
              const takesUnit = q !== null && q.dimension !== "text" && q.dimension !== "number";
              const id = `map-${listId}-${m.column}`;
              const listIdUnits = `${id}-units`;
              return (
                <tr key={m.column} className={edits[m.column] !== undefined ? "changed" : undefined}>
                  <td className="num">{m.column + 1}</td>
                  <th scope="row">{m.header}</th>
                  <td>
                    <label htmlFor={`${id}-q`} className="visually-hidden">
                      Read column {m.header} as
                    </label>
                    <select id={`${id}-q`} value={c.quantity} onChange={(e) => edit(m.column, { quantity: e.target.value as Quantity | "ignore", unit: "" })}>
                      <option value="ignore">— not used</option>
                      {QUANTITY_KEYS.map((key) => (
                        <option key={key} value={key}>
                          {QUANTITIES[key].label}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td>
                    {takesUnit ? (
                      <>
                        <label htmlFor={`${id}-u`} className="visually-hidden">
                          Unit of column {m.header}
                        </label>
                        <input
                          id={`${id}-u`}
                          type="text"
                          list={listIdUnits}
                          value={c.unit}
                          placeholder="as detected"
                          className={problems[k] !== null ? "bad" : undefined}
                          aria-invalid={problems[k] !== null}
                          onChange={(e) => edit(m.column, { quantity: c.quantity, unit: e.target.value })}
                        />
                        <datalist id={listIdUnits}>
                          {(UNIT_CHOICES[q.dimension] ?? []).map((u) => (
                            <option key={u} value={u} />
                          ))}
                        </datalist>
                        {problems[k] !== null && (
                          <div className="field-error">
                            <span aria-hidden="true">⚠ </span>
                            {problems[k]}
                          </div>
                        )}
                        {edits[m.column] === undefined && m.unitSource !== null && <div className="muted">{SOURCE_TEXT[m.unitSource]}</div>}
                      </>
                    ) : (
                      <span className="muted">—</span>
                    )}
                  </td>
                  <td>{STATUS_TEXT[m.status]}</td>
                  <td className="muted wrap">{m.note ?? ""}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div className="button-row">
        <button type="button" className="primary" disabled={changed === 0 || blocked} onClick={() => applyMapping(listId, overridesAfter(overrides, mapping, edits))}>
          Apply {changed > 0 ? `${changed} change${changed > 1 ? "s" : ""}` : "changes"} and read the list again
        </button>
        {changed > 0 && (
          <button type="button" onClick={() => setEdits({})}>
            Undo edits
          </button>
        )}
        {overrides.length > 0 && (
          <button type="button" onClick={() => applyMapping(listId, [])}>
            Back to the detected mapping
          </button>
        )}
        {blocked && <span className="field-error">Fix the marked unit first.</span>}
      </div>
    </div>
  );
}
