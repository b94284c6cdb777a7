/**
 * Series looks for up to six parts: each differs in dash pattern and marker as well as colour,
 * so lines stay apart in grey print and for colour-blind readers.
 */
export const SERIES = [
  { color: "#1f5f8b", dash: "", marker: "●" },
  { color: "#b3541e", dash: "8 4", marker: "▲" },
  { color: "#2e7d4f", dash: "2 3", marker: "■" },
  { color: "#7a3f9d", dash: "12 4 3 4", marker: "◆" },
  { color: "#8a6d00", dash: "4 2 1 2", marker: "▼" },
  { color: "#3b4a55", dash: "1 4", marker: "✚" },
] as const;

export function seriesStyle(k: number) {
  return SERIES[k % SERIES.length]!;
}

export const AXIS = { stroke: "#56636e", fontSize: 12 } as const;
export const GRID = "#e3ded2";
export const REF = { zero: "#56636e", isat: "#a12f2f", peak: "#1f3a4d", valley: "#1f3a4d", average: "#8a6d00", shade: "#c7d9e6" } as const;
