import { useState } from "react";
import { useWorkspace } from "../state/workspaceStore.ts";
import { acknowledgeCautions } from "../state/workspaceActions.ts";
import type { ViewState } from "../state/workspace.ts";
import { assertNever } from "../engine/assertNever.ts";
import { TopBar } from "./shell/TopBar.tsx";
import { ScreenTabs } from "./shell/ScreenTabs.tsx";
import { NoticeList } from "./shell/NoticeList.tsx";
import { CautionsOverlay } from "./shell/CautionsOverlay.tsx";
import { DesignScreen } from "./design/DesignScreen.tsx";
import { PartsScreen } from "./parts/PartsScreen.tsx";
import { RankingScreen } from "./ranking/RankingScreen.tsx";
import { DetailScreen } from "./detail/DetailScreen.tsx";
import { CompareScreen } from "./compare/CompareScreen.tsx";
import { SweepsScreen } from "./sweeps/SweepsScreen.tsx";
import { TradeoffScreen } from "./tradeoff/TradeoffScreen.tsx";

function Screen({ screen }: { screen: ViewState["screen"] }) {
  switch (screen) {
    case "design":
      return <DesignScreen />;
    case "parts":
      return <PartsScreen />;
    case "ranking":
      return <RankingScreen />;
    case "detail":
      return <DetailScreen />;
    case "compare":
      return <CompareScreen />;
    case "sweeps":
      return <SweepsScreen />;
    case "tradeoff":
      return <TradeoffScreen />;
    default:
      return assertNever(screen);
  }
}

export function App() {
  const screen = useWorkspace((w) => w.view.screen);
  const acknowledged = useWorkspace((w) => w.view.cautionsAcknowledged);
  const [cautionsOpen, setCautionsOpen] = useState(false);
  const showCautions = cautionsOpen || !acknowledged;
  const close = () => {
    acknowledgeCautions();
    setCautionsOpen(false);
  };
  return (
    <div className="app">
      <TopBar onCautions={() => setCautionsOpen(true)} />
      <ScreenTabs />
      {showCautions && <CautionsOverlay onClose={close} />}
      <NoticeList />
      <main>
        <Screen screen={screen} />
      </main>
      <footer className="footnote">
        Estimates only: verify against the maker's datasheet and on the bench.{" "}
        <button type="button" className="link-button" onClick={() => setCautionsOpen(true)}>
          Read the cautions
        </button>
      </footer>
    </div>
  );
}
