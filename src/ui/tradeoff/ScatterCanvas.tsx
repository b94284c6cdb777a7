import { useEffect, useRef, useState } from "react";
import type { TradePoint } from "./tradeoffData.ts";
import { logAxis } from "./logAxis.ts";

const MARGIN = { left: 64, right: 16, top: 14, bottom: 44 };
const HIT_RADIUS = 10;
const COLORS = { dot: "rgba(31, 95, 139, 0.55)", front: "#c58a22", frontEdge: "#5a3d00", selected: "#a12f2f", grid: "#e3ded2", axis: "#56636e", ink: "#1b2630" };

const label = (v: number) => String(Number(v.toPrecision(3)));

/**
 * Loss against volume on log axes, drawn on a canvas: SVG with tens of thousands of points would
 * stall the page. Pareto parts are diamonds joined by a step line; a click picks the nearest part.
 */
export function ScatterCanvas({ points, selected, onSelect }: { points: TradePoint[]; selected: number | null; onSelect: (index: number) => void }) {
  const wrap = useRef<HTMLDivElement>(null);
  const canvas = useRef<HTMLCanvasElement>(null);
  const placed = useRef<{ x: Float32Array; y: Float32Array }>({ x: new Float32Array(0), y: new Float32Array(0) });
  const [size, setSize] = useState({ w: 800, h: 440 });

  useEffect(() => {
    const el = wrap.current;
    if (el === null) return;
    const observer = new ResizeObserver(([entry]) => {
      if (entry !== undefined) setSize({ w: Math.max(200, entry.contentRect.width), h: Math.max(200, entry.contentRect.height) });
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  useEffect(() => {
    const c = canvas.current;
    const ctx = c?.getContext("2d");
    if (c === null || c === undefined || ctx === null || ctx === undefined) return;
    const dpr = window.devicePixelRatio || 1;
    c.width = Math.round(size.w * dpr);
    c.height = Math.round(size.h * dpr);
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    ctx.clearRect(0, 0, size.w, size.h);
    if (points.length === 0) return;
    const vols = points.map((p) => p.volume * 1e9);
    const losses = points.map((p) => p.loss * 1e3);
    const x = logAxis(Math.min(...vols), Math.max(...vols), MARGIN.left, size.w - MARGIN.right);
    const y = logAxis(Math.min(...losses), Math.max(...losses), size.h - MARGIN.bottom, MARGIN.top);
    ctx.font = "12px system-ui, sans-serif";
    ctx.lineWidth = 1;
    for (const t of x.ticks) {
      const px = x.toPixel(t.value);
      ctx.strokeStyle = COLORS.grid;
      ctx.beginPath();
      ctx.moveTo(px, MARGIN.top);
      ctx.lineTo(px, size.h - MARGIN.bottom);
      ctx.stroke();
      ctx.fillStyle = COLORS.axis;
      ctx.textAlign = "center";
      ctx.fillText(label(t.value), px, size.h - MARGIN.bottom + 16);
    }
    for (const t of y.ticks) {
      const py = y.toPixel(t.value);
      ctx.strokeStyle = COLORS.grid;
      ctx.beginPath();
      ctx.moveTo(MARGIN.left, py);
      ctx.lineTo(size.w - MARGIN.right, py);
      ctx.stroke();
      ctx.fillStyle = COLORS.axis;
      ctx.textAlign = "right";
      ctx.fillText(label(t.value), MARGIN.left - 6, py + 4);
    }
    ctx.fillStyle = COLORS.ink;
    ctx.textAlign = "center";
    ctx.fillText("volume (mm³, log scale)", (MARGIN.left + size.w - MARGIN.right) / 2, size.h - 8);
    ctx.save();
    ctx.translate(14, (MARGIN.top + size.h - MARGIN.bottom) / 2);
    ctx.rotate(-Math.PI / 2);
    ctx.fillText("worst-case loss (mW, log scale)", 0, 0);
    ctx.restore();

    const px = new Float32Array(points.length);
    const py = new Float32Array(points.length);
    ctx.fillStyle = COLORS.dot;
    points.forEach((p, k) => {
      px[k] = x.toPixel(vols[k]!);
      py[k] = y.toPixel(losses[k]!);
      if (p.pareto) return;
      ctx.beginPath();
      ctx.arc(px[k]!, py[k]!, 3.2, 0, 2 * Math.PI);
      ctx.fill();
    });
    placed.current = { x: px, y: py };
    const front = points.map((p, k) => ({ p, k })).filter(({ p }) => p.pareto).sort((a, b) => a.p.volume - b.p.volume);
    ctx.strokeStyle = COLORS.frontEdge;
    ctx.setLineDash([5, 3]);
    ctx.beginPath();
    front.forEach(({ k }, n) => {
      if (n === 0) ctx.moveTo(px[k]!, py[k]!);
      else {
        ctx.lineTo(px[k]!, py[front[n - 1]!.k]!);
        ctx.lineTo(px[k]!, py[k]!);
      }
    });
    ctx.stroke();
    ctx.setLineDash([]);
    for (const { k } of front) {
      ctx.beginPath();
      ctx.moveTo(px[k]!, py[k]! - 6);
      ctx.lineTo(px[k]! + 6, py[k]!);
      ctx.lineTo(px[k]!, py[k]! + 6);
      ctx.lineTo(px[k]! - 6, py[k]!);
      ctx.closePath();
      ctx.fillStyle = COLORS.front;
      ctx.fill();
      ctx.strokeStyle = COLORS.frontEdge;
      ctx.stroke();
    }
    const s = points.findIndex((p) => p.index === selected);
    if (s >= 0) {
      ctx.strokeStyle = COLORS.selected;
      ctx.lineWidth = 2.5;
      ctx.beginPath();
      ctx.arc(px[s]!, py[s]!, 10, 0, 2 * Math.PI);
      ctx.stroke();
    }
  }, [points, selected, size]);

  const pick = (event: React.MouseEvent<HTMLCanvasElement>) => {
    const rect = event.currentTarget.getBoundingClientRect();
    const mx = event.clientX - rect.left;
    const my = event.clientY - rect.top;
    const { x, y } = placed.current;
    let best = -1;
    let bestD = HIT_RADIUS * HIT_RADIUS;
    for (let k = 0; k < x.length; k++) {
      const d = (x[k]! - mx) ** 2 + (y[k]! - my) ** 2;
      if (d <= bestD) {
        bestD = d;
        best = k;
      }
    }
    const p = best >= 0 ? points[best] : undefined;
    if (p !== undefined) onSelect(p.index);
  };

  const frontCount = points.filter((p) => p.pareto).length;
  return (
    <div ref={wrap} className="scatter-wrap">
      <canvas
        ref={canvas}
        role="img"
        aria-label={`Worst-case loss against volume for ${points.length} parts, ${frontCount} of them Pareto-optimal (diamonds). The list below the chart has the same parts.`}
        onClick={pick}
      />
    </div>
  );
}
