import { useWorkspace } from "../../state/workspaceStore.ts";
import { showScreen } from "../../state/workspaceActions.ts";
import { useCatalog } from "../../state/catalogStore.ts";
import { useRanking } from "../../state/rankingStore.ts";
import { SCREENS } from "./screens.ts";

/** The screens, as a row of buttons; the current one is marked for assistive technology and by shape. */
export function ScreenTabs() {
  const screen = useWorkspace((w) => w.view.screen);
  const shortlist = useWorkspace((w) => w.shortlist.length);
  const parts = useCatalog((c) => c.merged.parts.length);
  const ranking = useRanking((r) => r.status);
  const count = (id: string): string | null => {
    if (id === "parts") return parts > 0 ? parts.toLocaleString("en") : null;
    if (id === "compare") return shortlist > 0 ? String(shortlist) : null;
    if (id === "ranking" && ranking === "ranking") return "…";
    return null;
  };
  return (
    <nav className="tabs" aria-label="Screens">
      {SCREENS.map((s) => {
        const c = count(s.id);
        return (
          <button key={s.id} type="button" className="tab" aria-current={screen === s.id ? "page" : undefined} onClick={() => showScreen(s.id)}>
            {s.label}
            {c !== null && <span className="tab-count">{c}</span>}
          </button>
        );
      })}
    </nav>
  );
}
