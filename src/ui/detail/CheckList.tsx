import type { Check } from "../../engine/types.ts";
import { CheckMark } from "../common/StatusMark.tsx";
import { CHECK_LABEL, percent } from "../common/format.ts";

/** Each check with its verdict (symbol and word), margin and reason. */
export function CheckList({ checks }: { checks: readonly Check[] }) {
  return (
    <ul className="checks">
      {checks.map((c) => (
        <li key={c.name}>
          <strong>{CHECK_LABEL[c.name]}</strong>
          <span>
            <CheckMark status={c.status} />
            {c.margin !== null && c.status !== "unchecked" && <span className="muted"> {percent(c.margin)}</span>}
          </span>
          <span>{c.reason}</span>
        </li>
      ))}
    </ul>
  );
}
