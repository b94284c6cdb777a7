import type { ViewState } from "../../state/workspace.ts";

export const SCREENS: readonly { id: ViewState["screen"]; label: string }[] = [
  { id: "design", label: "Design" },
  { id: "parts", label: "Parts" },
  { id: "ranking", label: "Ranking" },
  { id: "detail", label: "Part detail" },
  { id: "compare", label: "Compare" },
  { id: "sweeps", label: "Sweeps" },
  { id: "tradeoff", label: "Trade-off" },
];
