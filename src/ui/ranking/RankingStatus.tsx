import { useRanking } from "../../state/rankingStore.ts";
import { useDraftReading } from "../../state/draftStore.ts";
import { draftProblemCount } from "../../state/specDraft.ts";
import { showScreen } from "../../state/workspaceActions.ts";
import { ProgressBar } from "../common/ProgressBar.tsx";
import { BUSY_MARK_DELAY_MS } from "../common/busyMark.ts";
import { useDelayedFlag } from "../common/useDelayedFlag.ts";

/** What the table shows: counts, how long the ranking took, a re-ranking in progress, a spec with problems. */
export function RankingStatus() {
  const s = useRanking((r) => r);
  const showProgress = useDelayedFlag(s.status === "ranking", BUSY_MARK_DELAY_MS);
  const problems = draftProblemCount(useDraftReading());
  const r = s.ranking;
  const incomplete = r === null ? 0 : r.status.reduce((n, code) => n + (code === 1 ? 1 : 0), 0);
  return (
    <div className="table-meta">
      {r !== null && (
        <span role="status">
          {r.count.toLocaleString("en")} parts: <span className="status status-pass">✓ {r.passCount.toLocaleString("en")} pass</span>,{" "}
          <span className="status status-incomplete">? {incomplete.toLocaleString("en")} incomplete</span>,{" "}
          <span className="status status-fail">✗ {(r.count - r.passCount - incomplete).toLocaleString("en")} fail</span>
          {s.elapsed !== null && <span className="muted"> · ranked in {Math.round(s.elapsed).toLocaleString("en")} ms</span>}
        </span>
      )}
      {showProgress && <ProgressBar label={`Ranking ${s.total.toLocaleString("en")} parts`} done={s.done} total={s.total} />}
      {s.status === "failed" && (
        <span className="field-error">
          <span aria-hidden="true">✗ </span>Ranking failed: {s.message}
        </span>
      )}
      {problems > 0 && (
        <span className="banner banner-warning">
          <span aria-hidden="true">⚠ </span>The spec has {problems === 1 ? "a problem" : `${problems} problems`}: this ranking is for the last complete spec.{" "}
          <button type="button" className="link-button" onClick={() => showScreen("design")}>
            Fix on Design
          </button>
        </span>
      )}
    </div>
  );
}
