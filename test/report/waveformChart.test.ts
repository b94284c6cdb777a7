import { describe, expect, it } from "vitest";
import { waveformChart } from "../../src/report/waveformChart.ts";

const triangle = [
  { t: 0, i: 2.5 },
  { t: 0.5e-6, i: 3.5 },
  { t: 2e-6, i: 2.5 },
  { t: 2.5e-6, i: 3.5 },
  { t: 4e-6, i: 2.5 },
];

describe("waveformChart", () => {
  it("waveformChart draws the samples as one polyline inside a figure with its caption", () => {
    const svg = waveformChart({ figure: 2, samples: triangle, isat: 4, caption: "PN-1 at the worst corner" }).value;
    expect(svg.match(/<polyline points="([^"]+)"/)![1]!.split(" ")).toHaveLength(triangle.length);
    expect(svg).toContain("<figcaption>Figure 2. PN-1 at the worst corner</figcaption>");
    expect(svg).toContain("Fig. 2: inductor current i (A)");
    expect(svg).toContain("time t (µs)");
  });

  it("waveformChart draws Isat as a line when it lies near the trace", () => {
    const svg = waveformChart({ figure: 1, samples: triangle, isat: 4, caption: "c" }).value;
    expect(svg).toContain('class="isat"');
    expect(svg).toContain("Isat at corner temperature 4 A");
  });

  it("waveformChart names an Isat far above the trace instead of squashing the trace", () => {
    const svg = waveformChart({ figure: 1, samples: triangle, isat: 20, caption: "c" }).value;
    expect(svg).not.toContain('class="isat"');
    expect(svg).toContain("Isat at this temperature 20 A, above the plotted range");
    expect(waveformChart({ figure: 1, samples: triangle, isat: null, caption: "c" }).value).toContain("Isat not rated");
  });

  it("waveformChart draws the zero line when the current reverses", () => {
    const reversing = triangle.map((s) => ({ t: s.t, i: s.i - 3 }));
    expect(waveformChart({ figure: 1, samples: reversing, isat: null, caption: "c" }).value).toContain('class="zero"');
  });

  it("waveformChart labels time ticks in µs on a 1-2-5 step", () => {
    const svg = waveformChart({ figure: 1, samples: triangle, isat: null, caption: "c" }).value;
    const labels = [...svg.matchAll(/class="tick" text-anchor="middle">([^<]+)</g)].map((m) => m[1]);
    expect(labels).toEqual(["0.0", "0.5", "1.0", "1.5", "2.0", "2.5", "3.0", "3.5", "4.0"]);
  });

  it("waveformChart escapes the caption in the figure and in the aria label", () => {
    const svg = waveformChart({ figure: 1, samples: triangle, isat: null, caption: '<img src=x onerror=alert(1)> "q"' }).value;
    expect(svg).not.toContain("<img");
    expect(svg).toContain('aria-label="&lt;img src=x onerror=alert(1)&gt; &quot;q&quot;"');
  });
});
