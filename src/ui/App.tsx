import { useMemo, useState } from "react";
import { loadDemoScenario } from "../state/demoScenario.ts";
import { rankParts } from "../engine/rankParts.ts";
import { requiredInductance } from "../engine/requiredInductance.ts";
import { formatQuantity } from "../engine/formatQuantity.ts";
import { RankingTable } from "./ranking/RankingTable.tsx";
import { Cautions } from "./cautions/Cautions.tsx";
import { SpecSummary } from "./SpecSummary.tsx";

export function App() {
  const scenario = useMemo(() => loadDemoScenario(), []);
  const results = useMemo(() => rankParts(scenario.spec, scenario.list.parts), [scenario]);
  const band = useMemo(() => requiredInductance(scenario.spec), [scenario]);
  const [cautionsOpen, setCautionsOpen] = useState(true);
  const passing = results.filter((r) => r.pass).length;
  return (
    <div className="app">
      <header className="topbar">
        <div className="brand">
          <span className="brand-mark" aria-hidden="true">∿</span> Coilsift
          <span className="brand-sub">inductor selection workbench</span>
        </div>
        <button type="button" className="link-button" onClick={() => setCautionsOpen(true)}>
          Cautions
        </button>
      </header>
      {cautionsOpen && <Cautions onClose={() => setCautionsOpen(false)} />}
      <main>
        <section aria-labelledby="scenario-title" className="panel">
          <h1 id="scenario-title">{scenario.name}</h1>
          <SpecSummary spec={scenario.spec} />
          <p className="band">
            Inductance for the ripple window at nominal input and full load:{" "}
            <strong>{band === null ? "no solution" : `${formatQuantity(band.min, "H")} – ${formatQuantity(band.max, "H")}`}</strong>
          </p>
        </section>
        <section aria-labelledby="ranking-title" className="panel">
          <h2 id="ranking-title">
            Ranking <span className="count">{results.length} parts from {scenario.list.name}, {passing} pass every check</span>
          </h2>
          <RankingTable results={results} parts={scenario.list.parts} />
        </section>
      </main>
      <footer className="footnote">Estimates only — verify against the maker's datasheet and on the bench.</footer>
    </div>
  );
}
