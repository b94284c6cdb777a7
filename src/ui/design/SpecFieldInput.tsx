import type { FieldKind, SpecField } from "../../state/specFields.ts";
import { useDraftReading, useDraftText } from "../../state/draftStore.ts";
import { fieldErrors } from "../../state/specDraft.ts";
import { editField } from "../../state/designActions.ts";

function unitTag(kind: FieldKind): string | null {
  switch (kind.type) {
    case "quantity":
      return kind.unit;
    case "mm":
      return "mm";
    case "mm2":
      return "mm²";
    case "percent":
      return "%";
    case "celsius":
      return "°C";
    case "kelvin":
      return "K";
    default:
      return null;
  }
}

/** One spec field: the text as typed, what it reads as, and any complaint beside it. */
export function SpecFieldInput({ field, idPrefix = "spec" }: { field: SpecField; idPrefix?: string }) {
  const text = useDraftText(field.key);
  const reading = useDraftReading();
  const errors = fieldErrors(reading, field.key);
  const read = reading.fields[field.key];
  const id = `${idPrefix}-${field.key.replace(/\./g, "-")}`;
  const unit = unitTag(field.kind);
  const described = [`${id}-read`, errors.length > 0 ? `${id}-error` : null, field.hint !== undefined ? `${id}-hint` : null].filter((x) => x !== null).join(" ");
  return (
    <div className={`field${errors.length > 0 ? " field-bad" : ""}`}>
      <label htmlFor={id}>{field.label}</label>
      <div className="field-input">
        {field.kind.type === "choice" ? (
          <select id={id} value={text} onChange={(e) => editField(field.key, e.target.value)} aria-describedby={described}>
            {field.kind.options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        ) : (
          <input
            id={id}
            type="text"
            value={text}
            spellCheck={false}
            autoComplete="off"
            aria-invalid={errors.length > 0}
            aria-describedby={described}
            onChange={(e) => editField(field.key, e.target.value)}
          />
        )}
        {unit !== null && (
          <span className="field-unit" aria-hidden="true">
            {unit}
          </span>
        )}
      </div>
      <span id={`${id}-read`} className="field-read">
        {read?.ok === true && field.kind.type !== "choice" ? `= ${read.shown}` : ""}
      </span>
      {errors.length > 0 && (
        <span id={`${id}-error`} className="field-error">
          <span aria-hidden="true">⚠ </span>
          {errors.join("; ")}
        </span>
      )}
      {field.hint !== undefined && (
        <span id={`${id}-hint`} className="field-hint">
          {field.hint}
        </span>
      )}
    </div>
  );
}
