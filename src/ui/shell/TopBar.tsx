import { useWorkspace } from "../../state/workspaceStore.ts";
import { SaveState } from "./SaveState.tsx";
import { WorkspaceMenu } from "./WorkspaceMenu.tsx";

export function TopBar({ onCautions }: { onCautions: () => void }) {
  const name = useWorkspace((w) => w.name);
  return (
    <header className="topbar">
      <div className="brand">
        <span className="brand-mark" aria-hidden="true">
          ∿
        </span>{" "}
        Coilsift
        <span className="brand-sub">inductor selection workbench</span>
      </div>
      <div className="topbar-design" title={name}>
        {name}
      </div>
      <div className="topbar-tools">
        <SaveState />
        <WorkspaceMenu />
        <button type="button" className="topbar-button" onClick={onCautions}>
          Cautions
        </button>
      </div>
    </header>
  );
}
