// A free-body diagram of the whole structure in one view (elevation or plan), drawn to scale:
// the members as their axes, every applied load group as an arrow ending at its point (length
// proportional to the force component in the view, labelled with that component and its unit),
// components out of the view as a dot (toward the reader) or a cross (away), the wind direction,
// and the base reactions as arrows (forces) and double-headed arrows (moments, right-hand rule).
// Numbers arrive as text (the caller formats them); this file only places them, so that no label
// overlaps another or the structure's axis lines.
import type { Vec3 } from '../../model/frame.ts';
import { measureText } from '../charts/text-measure.ts';
import { LABEL_SIZE, placeLabel, segmentRects, type Rect } from './label-place.ts';
import { boxOf, fitFrame, inView, viewCoords, type Box, type Frame2D, type ViewKind } from './projection.ts';
import type { Scene } from './structure-drawing.ts';
import { arrow, circle, doubleArrow, INK, line, normalMark, rect, svgDocument, text } from './svg.ts';
import { viewAxes } from './view-axes.ts';

export interface FreeBodyLoad {
  readonly at: Vec3;
  /** Force, N (global). */
  readonly force: Vec3;
  /** Short name, e.g. "S1" or "wind on pole". */
  readonly name: string;
}

export interface FreeBodyOptions {
  readonly view: ViewKind;
  /** Formats a force magnitude (N) with its unit. */
  readonly force: (N: number) => string;
  /** Formats a moment magnitude (N m) with its unit. */
  readonly moment: (Nm: number) => string;
  /** The base reactions (by the support on the structure), global, N and N m; null for a load diagram. */
  readonly reaction: { readonly at: Vec3; readonly force: Vec3; readonly moment: Vec3 } | null;
  /** Plan direction the wind blows toward, or null. */
  readonly wind: Vec3 | null;
  readonly windLabel: string;
  /** Names of the view's axes: right and up on the page. */
  readonly axisNames: readonly [string, string];
  readonly width?: number;
  readonly maxHeight?: number;
}

const LOAD_COLOR = INK.load;
const REACTION_COLOR = INK.reaction;
const MAX_ARROW = 62;
const MIN_ARROW = 16;

/** The member axes, so labels keep off the structure. */
function axisRects(f: Frame2D, scene: Scene): Rect[] {
  return scene.members.flatMap((m) => segmentRects(f.at(m.root), f.at(m.tip)));
}

export function freeBodyDiagram(scene: Scene, loads: readonly FreeBodyLoad[], opts: FreeBodyOptions): { svg: string; width: number; height: number } {
  const width = opts.width ?? 480;
  const maxHeight = opts.maxHeight ?? 360;
  const view = opts.view;
  const drawn = loads.map((l) => ({ l, v: inView(view, l.force) }));
  const reactionF = opts.reaction ? inView(view, opts.reaction.force) : null;
  const biggest = Math.max(1e-9, ...drawn.map((x) => x.v.len), reactionF?.len ?? 0);
  const arrowLength = (len: number) => MIN_ARROW + (MAX_ARROW - MIN_ARROW) * (len / biggest);
  // Fit the structure with room around it for the arrows and their labels.
  const pts = scene.members.flatMap((m) => [viewCoords(view, m.root), viewCoords(view, m.tip)]);
  pts.push(viewCoords(view, [0, 0, 0]));
  const box0: Box = boxOf(pts);
  const pad = MAX_ARROW + 12;
  const boxH = box0.vMax - box0.vMin;
  const boxW = box0.uMax - box0.uMin;
  const scale = Math.min((width - 2 * pad) / Math.max(boxW, 1e-6), (maxHeight - 2 * pad) / Math.max(boxH, 1e-6));
  const height = Math.min(maxHeight, boxH * scale + 2 * pad);
  const f = fitFrame(view, box0, pad, pad, width - 2 * pad, height - 2 * pad);
  const bounds: Rect = [2, 2, width - 2, height - 2];
  const taken: Rect[] = axisRects(f, scene);
  const body: string[] = [];
  // Members: axis lines; the base: a short hatched line in elevation, a circle in plan.
  for (const m of scene.members) {
    const a = f.at(m.root);
    const b = f.at(m.tip);
    body.push(line(a[0], a[1], b[0], b[1], { color: INK.member, width: 2 }));
    if (m.link) {
      const p = f.at(m.link);
      body.push(line(p[0], p[1], a[0], a[1], { color: INK.member, width: 2 }));
    }
  }
  const [bx, by] = f.at([0, 0, 0]);
  if (view.kind === 'elevation') {
    body.push(line(bx - 14, by, bx + 14, by, { color: INK.text, width: 1 }));
    for (let k = -12; k <= 12; k += 6) body.push(line(bx + k, by, bx + k - 4, by + 5, { color: INK.text, width: 0.6 }));
    taken.push([bx - 16, by - 2, bx + 16, by + 7]);
  } else {
    body.push(circle(bx, by, 4, 'none', { color: INK.text, width: 0.8 }));
  }
  // Applied loads: the arrows first (reserved, so no label covers one), then their labels.
  const labels: { x: number; y: number; content: string; color: string; bold?: boolean }[] = [];
  for (const { l, v } of drawn) {
    const [px, py] = f.at(l.at);
    const size3 = Math.hypot(...l.force);
    const outOfView = Math.abs(v.normal) > 0.05 * size3 && Math.abs(v.normal) > 1e-9 * biggest;
    if (v.len > 0.05 * size3 && v.len > 1e-9 * biggest) {
      const L = arrowLength(v.len);
      const tx = px - v.d[0] * L;
      const ty = py - v.d[1] * L;
      body.push(arrow(tx, ty, px, py, { color: LOAD_COLOR, width: 1.1, head: 5 }));
      taken.push(...segmentRects([tx, ty], [px, py], 2));
      labels.push({ x: tx, y: ty, content: `${l.name} ${opts.force(v.len)}`, color: LOAD_COLOR });
    }
    // In plan the vertical components (weights) are not marked: they are the elevation's.
    if (outOfView && view.kind === 'elevation') {
      // Out of the view: a dot (toward the reader) or a cross (away), labelled with that component.
      const r = 3.2;
      body.push(normalMark(px, py, v.normal > 0, LOAD_COLOR));
      taken.push([px - r, py - r, px + r, py + r]);
      labels.push({ x: px + 2, y: py, content: `${l.name} ${opts.force(Math.abs(v.normal))}`, color: LOAD_COLOR });
    }
  }
  // Base reactions: the force in the view ending at the base, the moment in the view as a
  // double-headed arrow (its vector).
  if (opts.reaction && reactionF) {
    const drop = view.kind === 'elevation' ? 6 : 0;
    if (reactionF.len > 1e-9 * biggest) {
      const L = arrowLength(reactionF.len);
      const tx = bx - reactionF.d[0] * L;
      const ty = by - reactionF.d[1] * L + drop;
      body.push(arrow(tx, ty, bx, by + drop, { color: REACTION_COLOR, width: 1.3, head: 6 }));
      taken.push(...segmentRects([tx, ty], [bx, by + drop], 2));
      labels.push({ x: tx, y: ty, content: `R ${opts.force(reactionF.len)}`, color: REACTION_COLOR, bold: true });
    }
    const m = inView(view, opts.reaction.moment);
    if (m.len > 1e-9) {
      const L = 34;
      const ox = bx + 24;
      const oy = by + drop + 12;
      const ex = ox + m.d[0] * L;
      const ey = oy + m.d[1] * L;
      body.push(doubleArrow(ox, oy, ex, ey, { color: REACTION_COLOR, width: 1.1, head: 5 }));
      taken.push(...segmentRects([ox, oy], [ex, ey], 2));
      labels.push({ x: ex, y: ey, content: `M ${opts.moment(m.len)}`, color: REACTION_COLOR, bold: true });
    }
  }
  // Wind direction, top left, and the view's axes, bottom right.
  if (opts.wind) {
    const w = inView(view, opts.wind);
    const x0 = 12;
    const y0 = 14;
    if (w.len > 0.2) {
      body.push(arrow(x0 + 16 - w.d[0] * 14, y0 + 8 - w.d[1] * 14, x0 + 16 + w.d[0] * 14, y0 + 8 + w.d[1] * 14, { color: INK.text, width: 1.4, head: 6 }));
    } else {
      body.push(circle(x0 + 16, y0 + 8, 5, '#ffffff', { color: INK.text, width: 1 }));
      if (w.normal > 0) body.push(circle(x0 + 16, y0 + 8, 1.2, INK.text));
      else body.push(line(x0 + 13, y0 + 5, x0 + 19, y0 + 11, { color: INK.text, width: 0.9 }), line(x0 + 13, y0 + 11, x0 + 19, y0 + 5, { color: INK.text, width: 0.9 }));
    }
    body.push(text(x0 + 36, y0 + 11, opts.windLabel, { size: 7 }));
    taken.push([x0, y0, x0 + 40 + measureText({ fontSize: 7 }, opts.windLabel), y0 + 16]);
  }
  // The view's axes, bottom left.
  const axes = viewAxes(14, height - 10, opts.axisNames);
  body.push(axes.svg);
  taken.push(axes.box);
  for (const lb of labels) {
    const at = placeLabel(taken, lb.x, lb.y, lb.content, bounds, undefined, lb.bold === true);
    body.push(text(at.x, at.y, lb.content, { size: LABEL_SIZE, color: lb.color, bold: lb.bold }));
  }
  body.unshift(rect(0, 0, width, height, '#ffffff'));
  return { svg: svgDocument(width, height, body), width, height };
}
