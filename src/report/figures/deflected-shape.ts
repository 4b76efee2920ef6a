// The deflected shape of the structure in one view (elevation or plan): the undeformed member
// axes dashed, the displaced axes (displacements already magnified by the caller) solid, and
// short labels at chosen points. Both shapes share one scale.
import type { Vec3 } from '../../model/frame.ts';
import { boxOf, fitFrame, viewCoords, type ViewKind } from './projection.ts';
import { arrow, circle, INK, polyline, svgDocument, text, type Pt } from './svg.ts';

export interface ShapeLine {
  readonly undeformed: readonly Vec3[];
  readonly deformed: readonly Vec3[];
}

export interface ShapeLabel {
  /** Where the label points (a deformed position). */
  readonly at: Vec3;
  readonly text: string;
}

export interface ShapeViewOptions {
  readonly view: ViewKind;
  /** Names of the page axes, e.g. ["+X", "Z"]. */
  readonly axisNames: readonly [string, string];
  readonly width?: number;
  readonly maxHeight?: number;
}

export function deflectedShapeView(lines: readonly ShapeLine[], labels: readonly ShapeLabel[], opts: ShapeViewOptions): { svg: string; width: number; height: number } {
  const width = opts.width ?? 480;
  const maxHeight = opts.maxHeight ?? 330;
  const pts: Pt[] = [];
  for (const l of lines) for (const p of [...l.undeformed, ...l.deformed]) pts.push(viewCoords(opts.view, p));
  const box = boxOf(pts);
  const padX = 70;
  const padY = 26;
  const availW = width - 2 * padX;
  const bw = Math.max(box.uMax - box.uMin, 1e-6);
  const bh = Math.max(box.vMax - box.vMin, 1e-6);
  const scale = Math.min(availW / bw, (maxHeight - 2 * padY) / bh);
  const height = Math.max(90, bh * scale + 2 * padY);
  const f = fitFrame(opts.view, box, padX, padY, availW, height - 2 * padY);
  const body: string[] = [];
  for (const l of lines) body.push(polyline(l.undeformed.map((p) => f.at(p)), { color: INK.light, width: 0.8, dash: '4 3' }));
  for (const l of lines) body.push(polyline(l.deformed.map((p) => f.at(p)), { color: INK.accent, width: 1.4 }));
  for (const lab of labels) {
    const [x, y] = f.at(lab.at);
    body.push(circle(x, y, 1.8, INK.text));
    const right = x < width - padX - 10;
    body.push(text(right ? x + 5 : x - 5, y - 4, lab.text, { size: 7, anchor: right ? 'start' : 'end' }));
  }
  const ox = 16;
  const oy = height - 10;
  body.push(arrow(ox, oy, ox + 18, oy, { width: 0.7, head: 4 }), arrow(ox, oy, ox, oy - 18, { width: 0.7, head: 4 }));
  body.push(text(ox + 20, oy + 2.5, opts.axisNames[0], { size: 7 }), text(ox + 3, oy - 20, opts.axisNames[1], { size: 7 }));
  return { svg: svgDocument(width, height, body), width, height };
}

/** A round magnification (1, 2 or 5 times a power of ten) that draws the largest displacement near `target_m`. */
export function magnificationFor(maxDisplacement_m: number, target_m: number): number {
  if (!(maxDisplacement_m > 0) || !(target_m > 0)) return 1;
  const raw = target_m / maxDisplacement_m;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  const k = m >= 5 ? 5 : m >= 2 ? 2 : 1;
  return Math.max(k * p, 1);
}
