// Line plots of a quantity along a member: one or more panels stacked over a shared
// horizontal axis (distance along the member). Values arrive already in the units they are
// printed in; this file only places them. A jump is two points with the same x.
import { niceTicks, tickLabel, type Ticks } from './axis-ticks.ts';
import { circle, INK, line, polygon, polyline, svgDocument, text, type Pt } from './svg.ts';

export interface PlotMark {
  readonly x: number;
  readonly y: number;
  /** Printed beside the point, e.g. "187.2 kip·ft at 0 ft". */
  readonly label: string;
}

export interface PlotPanel {
  /** Panel title, e.g. "Resultant moment Mres (kip·ft)". */
  readonly title: string;
  readonly points: readonly Pt[];
  readonly marks: readonly PlotMark[];
}

export interface StackedPlotOptions {
  /** Horizontal axis title with its unit. */
  readonly xTitle: string;
  readonly xMin: number;
  readonly xMax: number;
  readonly width?: number;
  readonly panelHeight?: number;
}

const LEFT = 58;
const RIGHT = 14;
const TITLE_H = 14;
const TICK_H = 12;

function yRange(panel: PlotPanel): Ticks {
  let lo = 0;
  let hi = 0;
  for (const [, y] of panel.points) {
    lo = Math.min(lo, y);
    hi = Math.max(hi, y);
  }
  return niceTicks(lo, hi, 4);
}

function panelSvg(panel: PlotPanel, x: Ticks, top: number, width: number, height: number): string[] {
  const out: string[] = [];
  const y = yRange(panel);
  const plotTop = top + TITLE_H;
  const plotH = height - TITLE_H - TICK_H;
  const plotW = width - LEFT - RIGHT;
  const px = (v: number) => LEFT + ((v - x.min) / (x.max - x.min)) * plotW;
  const py = (v: number) => plotTop + plotH - ((v - y.min) / (y.max - y.min)) * plotH;
  out.push(text(LEFT, top + 10, panel.title, { size: 8, bold: true }));
  for (const v of y.values) {
    out.push(line(LEFT, py(v), LEFT + plotW, py(v), { color: INK.grid, width: 0.4 }));
    out.push(text(LEFT - 4, py(v) + 2.6, tickLabel(v, y.decimals), { size: 7, anchor: 'end', color: INK.muted }));
  }
  for (const v of x.values) {
    out.push(line(px(v), plotTop, px(v), plotTop + plotH, { color: INK.grid, width: 0.4 }));
    out.push(text(px(v), plotTop + plotH + 9, tickLabel(v, x.decimals), { size: 7, anchor: 'middle', color: INK.muted }));
  }
  if (panel.points.length > 1) {
    const first = panel.points[0];
    const last = panel.points[panel.points.length - 1];
    const area: Pt[] = [[px(first[0]), py(0)], ...panel.points.map(([a, b]): Pt => [px(a), py(b)]), [px(last[0]), py(0)]];
    out.push(polygon(area, INK.fill));
    out.push(polyline(panel.points.map(([a, b]): Pt => [px(a), py(b)]), { color: INK.accent, width: 1.2 }));
  }
  out.push(line(LEFT, py(0), LEFT + plotW, py(0), { color: INK.text, width: 0.7 }));
  out.push(line(LEFT, plotTop, LEFT, plotTop + plotH, { color: INK.text, width: 0.7 }));
  panel.marks.forEach((m) => {
    const cx = px(m.x);
    const cy = py(m.y);
    out.push(circle(cx, cy, 1.8, INK.text));
    const rightHalf = cx > LEFT + plotW * 0.6;
    const above = m.y >= 0 ? cy - 4 : cy + 9;
    const ty = Math.min(Math.max(above, plotTop + 7), plotTop + plotH - 2);
    out.push(text(rightHalf ? cx - 4 : cx + 6, ty, m.label, { size: 7, anchor: rightHalf ? 'end' : 'start' }));
  });
  return out;
}

/** Panels one above the other, each with its own vertical scale, over one horizontal axis. */
export function stackedLinePlots(panels: readonly PlotPanel[], opts: StackedPlotOptions): { svg: string; width: number; height: number } {
  const width = opts.width ?? 480;
  const panelHeight = opts.panelHeight ?? 96;
  // the horizontal axis spans the member exactly; ticks fall inside it
  const t = niceTicks(opts.xMin, opts.xMax, 8);
  const span = opts.xMax - opts.xMin;
  const x: Ticks = { ...t, min: opts.xMin, max: opts.xMax, values: t.values.filter((v) => v >= opts.xMin - 1e-9 * span && v <= opts.xMax + 1e-9 * span) };
  const body: string[] = [];
  panels.forEach((p, k) => body.push(...panelSvg(p, x, k * panelHeight, width, panelHeight)));
  const height = panels.length * panelHeight + 16;
  body.push(text(LEFT + (width - LEFT - RIGHT) / 2, height - 4, opts.xTitle, { size: 7.5, anchor: 'middle' }));
  return { svg: svgDocument(width, height, body), width, height };
}
