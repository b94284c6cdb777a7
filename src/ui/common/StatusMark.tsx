import type { ResultStatus } from "../../engine/types.ts";

const LOOK: Record<ResultStatus, { symbol: string; word: string }> = {
  pass: { symbol: "✓", word: "pass" },
  incomplete: { symbol: "?", word: "incomplete" },
  fail: { symbol: "✗", word: "fail" },
};

/** A verdict as symbol and word (colour only repeats them). */
export function StatusMark({ status, detail }: { status: ResultStatus; detail?: string }) {
  const look = LOOK[status];
  return (
    <span className={`status status-${status}`}>
      <span aria-hidden="true" className="status-symbol">
        {look.symbol}
      </span>{" "}
      {look.word}
      {detail !== undefined && <span className="status-detail"> {detail}</span>}
    </span>
  );
}

const CHECK_LOOK = { pass: "✓", fail: "✗", unchecked: "–" } as const;
const CHECK_WORD = { pass: "pass", fail: "fail", unchecked: "not checked" } as const;

/** One check's verdict, e.g. "✗ fail". */
export function CheckMark({ status }: { status: "pass" | "fail" | "unchecked" }) {
  return (
    <span className={`status status-check-${status}`}>
      <span aria-hidden="true" className="status-symbol">
        {CHECK_LOOK[status]}
      </span>{" "}
      {CHECK_WORD[status]}
    </span>
  );
}
