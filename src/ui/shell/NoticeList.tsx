import { dismissNotice, useNotices } from "../../state/noticeStore.ts";

const MARK = { info: "ℹ", warning: "⚠", error: "✗" } as const;

/** Messages that are not tied to one field (a link, storage, an import), each dismissible. */
export function NoticeList() {
  const notices = useNotices();
  if (notices.length === 0) return null;
  return (
    <div className="notices" role="status" aria-live="polite">
      {notices.map((n) => (
        <p key={n.id} className={`notice notice-${n.tone}`}>
          <span aria-hidden="true">{MARK[n.tone]} </span>
          {n.text}
          <button type="button" className="link-button" onClick={() => dismissNotice(n.id)} aria-label={`Dismiss: ${n.text}`}>
            Dismiss
          </button>
        </p>
      ))}
    </div>
  );
}
