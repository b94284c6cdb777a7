import { useSaveStatus } from "../../state/persistence.ts";

const TEXT = { saved: "Kept in this browser", saving: "Saving…", unavailable: "Not kept: browser storage unavailable", failed: "Not saved" } as const;

/** Whether the work is kept: the designer can reload without fear once it says so. */
export function SaveState() {
  const s = useSaveStatus();
  return (
    <span className={`save-state save-${s.state}`} role="status" title={s.message ?? undefined}>
      {TEXT[s.state]}
      {s.state === "failed" && s.message !== null && `: ${s.message}`}
    </span>
  );
}
