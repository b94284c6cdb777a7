import type { FieldGroup } from "../../state/specFields.ts";
import { useDraftReading } from "../../state/draftStore.ts";
import { groupErrors } from "../../state/specDraft.ts";
import { SpecFieldInput } from "./SpecFieldInput.tsx";

/** A titled group of spec fields with the errors that concern the group as a whole. */
export function FieldGroupCard({ group }: { group: FieldGroup }) {
  const reading = useDraftReading();
  const errors = groupErrors(reading, group);
  return (
    <fieldset className="card field-group">
      <legend>{group.title}</legend>
      {group.note !== undefined && <p className="group-note">{group.note}</p>}
      {errors.length > 0 && (
        <p className="field-error group-error">
          <span aria-hidden="true">⚠ </span>
          {errors.join("; ")}
        </p>
      )}
      <div className="field-grid">
        {group.fields.map((f) => (
          <SpecFieldInput key={f.key} field={f} />
        ))}
      </div>
    </fieldset>
  );
}
