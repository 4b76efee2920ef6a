// The structure drawn from the model: an elevation looking square to the main arm, and a
// plan. Members are drawn to scale as tapered outlines; sign panels as rectangles, point
// attachments as round marks hung from the member axis; the base is hatched. Dimension text
// comes from the caller (already in the user's units): this file only places it.
import type { Vec3 } from '../../model/frame.ts';
import { boxOf, fitFrame, viewCoords, type Box, type Frame2D, type ViewKind } from './projection.ts';
import { measureText } from '../charts/text-measure.ts';
import { overlaps, type Rect } from './label-place.ts';
import { arrow, arrowhead, circle, group, INK, line, polygon, rect, svgDocument, text, type Pt } from './svg.ts';

export interface SceneMember {
  readonly id: string;
  readonly label: string;
  readonly kind: 'pole' | 'arm';
  /** Axis points at s = 0 (pole base, arm root at the pole face) and at the tip. */
  readonly root: Vec3;
  readonly tip: Vec3;
  readonly rootDiameter_m: number;
  readonly tipDiameter_m: number;
  /** Flat sides of a multisided tube, null for round. */
  readonly sides: number | null;
  /** For an arm, the pole-axis point its rigid root offset starts from. */
  readonly link?: Vec3;
}

export interface SceneAttachment {
  readonly label: string;
  readonly kind: 'panel' | 'point';
  readonly centre: Vec3;
  /** Where it hangs from: the point on the member axis at its position. */
  readonly anchor: Vec3;
  /** Horizontal unit vector along the panel width (panels only). */
  readonly widthDir: Vec3;
  readonly width_m: number;
  readonly height_m: number;
}

export interface Scene {
  readonly members: readonly SceneMember[];
  readonly attachments: readonly SceneAttachment[];
  /** Text beside the hatched base, e.g. "fixed base". */
  readonly baseLabel: string;
}

/** A dimension parallel to the member between two axis points, text already formatted. */
export interface AlignedDim {
  readonly from: Vec3;
  readonly to: Vec3;
  readonly text: string;
}

export interface MemberDims {
  readonly side: 'above' | 'below';
  /** Distance from the member axis that the first row must clear (attachments), m. */
  readonly clearance_m: number;
  readonly rows: readonly AlignedDim[];
}

export interface HeightDim {
  readonly z_m: number;
  readonly text: string;
}

export interface ElevationOptions {
  /** Plan unit vector that points to the right on the page. */
  readonly horizontal: Vec3;
  /** Name of that direction, e.g. "+X". */
  readonly horizontalLabel: string;
  readonly heightDims: readonly HeightDim[];
  readonly memberDims: readonly MemberDims[];
  readonly width?: number;
  readonly maxHeight?: number;
}

const ROW = 13;
const DIM_GAP = 8;
const HEIGHT_DIM_STEP = 17;

function sceneBox(view: ViewKind, scene: Scene): Box {
  const pts: Pt[] = [];
  for (const m of scene.members) {
    pts.push(viewCoords(view, m.root), viewCoords(view, m.tip));
  }
  for (const a of scene.attachments) {
    const c = viewCoords(view, a.centre);
    if (a.kind === 'point') {
      pts.push(c);
      continue;
    }
    const half: Vec3 = [(a.widthDir[0] * a.width_m) / 2, (a.widthDir[1] * a.width_m) / 2, 0];
    const e1 = viewCoords(view, [a.centre[0] + half[0], a.centre[1] + half[1], a.centre[2] + a.height_m / 2]);
    const e2 = viewCoords(view, [a.centre[0] - half[0], a.centre[1] - half[1], a.centre[2] - a.height_m / 2]);
    pts.push(e1, e2);
  }
  const b = boxOf(pts);
  const pole = scene.members.find((m) => m.kind === 'pole');
  const r = pole ? pole.rootDiameter_m / 2 : 0;
  return { uMin: Math.min(b.uMin, -r), uMax: Math.max(b.uMax, r), vMin: Math.min(b.vMin, 0), vMax: b.vMax };
}

/** Outline of a tapered member between its projected ends, widths at scale (at least a hairline). */
function memberOutline(f: Frame2D, m: SceneMember, view: ViewKind): string {
  const a = f.at(m.root);
  const b = f.at(m.tip);
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  if (len < 0.5) {
    // seen end-on: a round mark of the root diameter
    return circle(a[0], a[1], Math.max((m.rootDiameter_m * f.scale) / 2, 1.5), INK.fill, { color: INK.member, width: 0.8 });
  }
  const nx = -dy / len;
  const ny = dx / len;
  const ra = Math.max((m.rootDiameter_m * f.scale) / 2, 0.8);
  const rb = Math.max((m.tipDiameter_m * f.scale) / 2, 0.8);
  const pts: Pt[] = [
    [a[0] + nx * ra, a[1] + ny * ra],
    [b[0] + nx * rb, b[1] + ny * rb],
    [b[0] - nx * rb, b[1] - ny * rb],
    [a[0] - nx * ra, a[1] - ny * ra],
  ];
  void view;
  return polygon(pts, INK.fill, { color: INK.member, width: 0.9 });
}

function hatchedBase(f: Frame2D, halfWidth_m: number, label: string): string {
  const [cx, cy] = f.atUV(0, 0);
  const half = halfWidth_m * f.scale + 16;
  const out = [line(cx - half, cy, cx + half, cy, { color: INK.text, width: 1.2 })];
  for (let x = cx - half + 2; x <= cx + half; x += 5) out.push(line(x, cy, x - 5, cy + 6, { color: INK.text, width: 0.5 }));
  out.push(text(cx + half + 4, cy + 7, label, { size: 7, color: INK.muted }));
  return out.join('');
}

function readableAngle(dx: number, dy: number): number {
  let deg = (Math.atan2(dy, dx) * 180) / Math.PI;
  if (deg > 90) deg -= 180;
  if (deg <= -90) deg += 180;
  return deg;
}

/** Baseline dimensions parallel to a member, stacked in rows away from it. */
function memberDimsSvg(f: Frame2D, d: MemberDims): string {
  const out: string[] = [];
  d.rows.forEach((row, k) => {
    const a = f.at(row.from);
    const b = f.at(row.to);
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const len = Math.hypot(dx, dy);
    if (len < 1) return;
    let nx = -dy / len;
    let ny = dx / len;
    // 'above' is up the page (negative y)
    if ((d.side === 'above' && ny > 0) || (d.side === 'below' && ny < 0)) {
      nx = -nx;
      ny = -ny;
    }
    const off = d.clearance_m * f.scale + DIM_GAP + k * ROW;
    const A: Pt = [a[0] + nx * off, a[1] + ny * off];
    const B: Pt = [b[0] + nx * off, b[1] + ny * off];
    out.push(line(a[0] + nx * 2, a[1] + ny * 2, A[0] + nx * 3, A[1] + ny * 3, { color: INK.light, width: 0.4 }));
    out.push(line(b[0] + nx * 2, b[1] + ny * 2, B[0] + nx * 3, B[1] + ny * 3, { color: INK.light, width: 0.4 }));
    out.push(line(A[0], A[1], B[0], B[1], { color: INK.muted, width: 0.5 }));
    out.push(arrowhead(A[0], A[1], -dx, -dy, 4, INK.muted), arrowhead(B[0], B[1], dx, dy, 4, INK.muted));
    const mx = (A[0] + B[0]) / 2 + nx * 2;
    const my = (A[1] + B[1]) / 2 + ny * 2;
    // text on the far side of the line from the member
    const tx = mx + (ny < 0 ? 0 : nx * 7);
    const ty = my + (ny < 0 ? -1.5 : ny * 7);
    out.push(text(tx, ty, row.text, { size: 7, anchor: 'middle', rotate: readableAngle(dx, dy) }));
  });
  return out.join('');
}

function heightDimsSvg(f: Frame2D, box: Box, dims: readonly HeightDim[]): string {
  const out: string[] = [];
  const [leftX] = f.atUV(box.uMin, 0);
  const sorted = [...dims].sort((p, q) => p.z_m - q.z_m);
  sorted.forEach((d, k) => {
    const x = leftX - 12 - k * HEIGHT_DIM_STEP;
    const [, y0] = f.atUV(0, 0);
    const [, y1] = f.atUV(0, d.z_m);
    const [px] = f.atUV(0, d.z_m);
    out.push(line(px - 2, y1, x - 3, y1, { color: INK.light, width: 0.4 }));
    out.push(line(x, y0, x, y1, { color: INK.muted, width: 0.5 }));
    out.push(arrowhead(x, y0, 0, 1, 4, INK.muted), arrowhead(x, y1, 0, -1, 4, INK.muted));
    out.push(text(x - 2.5, (y0 + y1) / 2, d.text, { size: 7, anchor: 'middle', rotate: -90 }));
  });
  return out.join('');
}

/** Where a point attachment's label may go, from its mark's centre: below right first, then above
 * right, below left, above left, then a line further out (x of the text's start, or of its end
 * for the left places). */
const POINT_LABEL_PLACES: readonly (readonly [number, number, 'start' | 'end'])[] = [
  [5, 9, 'start'],
  [5, -5, 'start'],
  [-5, 9, 'end'],
  [-5, -5, 'end'],
  [5, 17, 'start'],
  [5, -13, 'start'],
  [-5, 17, 'end'],
  [-5, -13, 'end'],
];

/** The rectangle of a bold label centred on x with its baseline at y. */
function middleLabelBox(x: number, y: number, label: string, size: number): Rect {
  const w = measureText({ fontSize: size, fontWeight: 'bold' }, label);
  return [x - w / 2 - 1, y - 0.8 * size, x + w / 2 + 1, y + 0.25 * size];
}

/** Panels first: their labels have fixed places, which the point attachments' labels then avoid. */
const panelsFirst = (attachments: readonly SceneAttachment[]): SceneAttachment[] => [...attachments.filter((a) => a.kind === 'panel'), ...attachments.filter((a) => a.kind !== 'panel')];

/** Draws an attachment. A point attachment's label takes the first of its places clear of
 * `reserved` (the arms' names, the labels placed before), and its mark and label are reserved;
 * a panel's label is reserved where it is. */
function attachmentSvg(f: Frame2D, view: ViewKind, a: SceneAttachment, reserved: Rect[]): string {
  const c = f.at(a.centre);
  const h = f.at(a.anchor);
  const out: string[] = [];
  if (a.kind === 'point') {
    out.push(line(h[0], h[1], c[0], c[1], { color: INK.muted, width: 0.6 }));
    out.push(circle(c[0], c[1], 3, '#ffffff', { color: INK.accent, width: 1 }));
    const w = measureText({ fontSize: 7, fontWeight: 'bold' }, a.label);
    const boxAt = ([dx, dy, anchor]: readonly [number, number, 'start' | 'end']): Rect => {
      const x0 = anchor === 'start' ? c[0] + dx : c[0] + dx - w;
      return [x0 - 1, c[1] + dy - 6, x0 + w + 1, c[1] + dy + 2];
    };
    const place = POINT_LABEL_PLACES.find((p) => !reserved.some((r) => overlaps(r, boxAt(p)))) ?? POINT_LABEL_PLACES[0]!;
    out.push(text(c[0] + place[0], c[1] + place[1], a.label, { size: 7, color: INK.accent, bold: true, anchor: place[2] }));
    reserved.push([c[0] - 3.5, c[1] - 3.5, c[0] + 3.5, c[1] + 3.5], boxAt(place));
    return out.join('');
  }
  const half: Vec3 = [(a.widthDir[0] * a.width_m) / 2, (a.widthDir[1] * a.width_m) / 2, 0];
  if (view.kind === 'plan') {
    const p = f.at([a.centre[0] + half[0], a.centre[1] + half[1], 0]);
    const q = f.at([a.centre[0] - half[0], a.centre[1] - half[1], 0]);
    out.push(line(h[0], h[1], c[0], c[1], { color: INK.muted, width: 0.6 }));
    out.push(line(p[0], p[1], q[0], q[1], { color: INK.accent, width: 2.2 }));
    if (Math.abs(q[1] - p[1]) > Math.abs(q[0] - p[0])) {
      // A panel seen edge-on up the page (facing along X): its label beside the mark, not on it.
      const x = Math.max(p[0], q[0]) + 4;
      out.push(text(x, c[1] + 3, a.label, { size: 7, color: INK.accent, bold: true }));
      const w = measureText({ fontSize: 7, fontWeight: 'bold' }, a.label);
      reserved.push([x - 1, c[1] + 3 - 6, x + w + 1, c[1] + 3 + 2]);
      return out.join('');
    }
    const y = c[1] + (c[1] >= h[1] ? 10 : -5);
    out.push(text(c[0], y, a.label, { size: 7, anchor: 'middle', color: INK.accent, bold: true }));
    reserved.push(middleLabelBox(c[0], y, a.label, 7));
    return out.join('');
  }
  const [u0] = viewCoords(view, [a.centre[0] - half[0], a.centre[1] - half[1], 0]);
  const [u1] = viewCoords(view, [a.centre[0] + half[0], a.centre[1] + half[1], 0]);
  const [, v] = viewCoords(view, a.centre);
  const p = f.atUV(Math.min(u0, u1), v + a.height_m / 2);
  const q = f.atUV(Math.max(u0, u1), v - a.height_m / 2);
  const w = Math.max(q[0] - p[0], 1.2);
  out.push(polygon([p, [p[0] + w, p[1]], [p[0] + w, q[1]], [p[0], q[1]]], 'none', { color: INK.accent, width: 1 }));
  // the label sits in the upper part of the panel, clear of the member axis it usually crosses
  const inside = q[1] - p[1] > 24;
  const y = inside ? p[1] + 11 : p[1] - 3;
  out.push(text(p[0] + w / 2, y, a.label, { size: 8, anchor: 'middle', color: INK.accent, bold: true }));
  reserved.push(middleLabelBox(p[0] + w / 2, y, a.label, 8));
  return out.join('');
}

/** Where an arm's name is printed, beyond its tip (memberLabel), as a rectangle. */
function armLabelBox(f: Frame2D, m: SceneMember): Rect {
  const a = f.at(m.root);
  const b = f.at(m.tip);
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy) || 1;
  const w = measureText({ fontSize: 8, fontWeight: 'bold' }, m.label);
  const x0 = b[0] + (dx / len) * 6;
  const y = b[1] + (dy / len) * 6 + 3;
  return dx >= 0 ? [x0 - 1.5, y - 8, x0 + w + 1.5, y + 3] : [x0 - w - 1.5, y - 8, x0 + 1.5, y + 3];
}

/** Heights up the pole (shares of its length) tried for its label, nearest the preferred first. */
const POLE_LABEL_PLACES = [0.15, 0.08, 0.25, 0.35, 0.45, 0.55];

function memberLabel(f: Frame2D, m: SceneMember, keepOff: readonly Rect[] = []): string {
  const a = f.at(m.root);
  const b = f.at(m.tip);
  if (m.kind === 'pole') {
    const r = (m.rootDiameter_m * f.scale) / 2;
    const w = measureText({ fontSize: 8, fontWeight: 'bold' }, m.label);
    // Low on the pole, below the arms and the dimension rows hung under them; higher, or on the
    // left, where an attachment on the pole has its mark or label there.
    for (const t of POLE_LABEL_PLACES) {
      const x = a[0] + (b[0] - a[0]) * t;
      const y = a[1] + (b[1] - a[1]) * t;
      const right: Rect = [x + r + 4, y - 7, x + r + 6 + w, y + 2];
      if (!keepOff.some((k) => overlaps(k, right))) return text(x + r + 5, y, m.label, { size: 8, bold: true });
      const left: Rect = [x - r - 6 - w, y - 7, x - r - 4, y + 2];
      if (!keepOff.some((k) => overlaps(k, left))) return text(x - r - 5, y, m.label, { size: 8, bold: true, anchor: 'end' });
    }
    return text(a[0] + (b[0] - a[0]) * 0.15 + r + 5, a[1] + (b[1] - a[1]) * 0.15, m.label, { size: 8, bold: true });
  }
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy) || 1;
  const right = dx >= 0;
  // a white ground, as wide as the label is estimated (about 0.6 em per bold character), where it crosses lines
  const w = m.label.length * 8 * 0.62 + 3;
  const x0 = b[0] + (dx / len) * 6;
  const ground = rect(right ? x0 - 1.5 : x0 - w + 1.5, b[1] + (dy / len) * 6 - 6, w, 11, '#ffffff');
  return ground + text(b[0] + (dx / len) * 6, b[1] + (dy / len) * 6 + 3, m.label, { size: 8, bold: true, anchor: right ? 'start' : 'end' });
}

/** Elevation looking square to `horizontal` (which points right on the page), Z up. */
export function elevationDrawing(scene: Scene, opts: ElevationOptions): { svg: string; width: number; height: number } {
  const view: ViewKind = { kind: 'elevation', horizontal: opts.horizontal };
  const width = opts.width ?? 480;
  const maxHeight = opts.maxHeight ?? 430;
  const box0 = sceneBox(view, scene);
  const left = 30 + opts.heightDims.length * HEIGHT_DIM_STEP;
  const right = 40;
  const top = 16;
  const bottom = 24;
  // Dimension rows take page space: grow the box by their extent at a first scale, then fit again.
  const rowsAbove = Math.max(0, ...opts.memberDims.filter((d) => d.side === 'above').map((d) => DIM_GAP + d.rows.length * ROW));
  const clearAbove = Math.max(0, ...opts.memberDims.filter((d) => d.side === 'above').map((d) => d.clearance_m));
  const availW = width - left - right;
  const s0 = Math.min(availW / Math.max(box0.uMax - box0.uMin, 1e-6), (maxHeight - top - bottom) / Math.max(box0.vMax - box0.vMin, 1e-6));
  const box: Box = { ...box0, vMax: Math.max(box0.vMax, box0.vMax + clearAbove + (rowsAbove + 10) / s0), vMin: box0.vMin };
  const s1 = Math.min(availW / (box.uMax - box.uMin), (maxHeight - top - bottom) / (box.vMax - box.vMin));
  const height = Math.min(maxHeight, (box.vMax - box.vMin) * s1 + top + bottom);
  const f = fitFrame(view, box, left, top, availW, height - top - bottom);
  const body: string[] = [];
  const pole = scene.members.find((m) => m.kind === 'pole');
  body.push(hatchedBase(f, pole ? pole.rootDiameter_m / 2 : 0.2, scene.baseLabel));
  for (const m of scene.members) body.push(memberOutline(f, m, view));
  for (const m of scene.members) {
    if (m.link) {
      const p = f.at(m.link);
      const q = f.at(m.root);
      body.push(line(p[0], p[1], q[0], q[1], { color: INK.member, width: 1.6 }));
    }
  }
  // The arms' names first, then the attachments' labels clear of them, then the pole's name clear of both.
  const reserved: Rect[] = scene.members.filter((m) => m.kind === 'arm').map((m) => armLabelBox(f, m));
  for (const a of panelsFirst(scene.attachments)) body.push(attachmentSvg(f, view, a, reserved));
  for (const m of scene.members) body.push(memberLabel(f, m, reserved));
  for (const d of opts.memberDims) body.push(memberDimsSvg(f, d));
  body.push(heightDimsSvg(f, box0, opts.heightDims));
  // view axes, bottom right
  const ox = width - 30;
  const oy = height - 10;
  body.push(group([arrow(ox, oy, ox + 18, oy, { width: 0.7, head: 4 }), arrow(ox, oy, ox, oy - 18, { width: 0.7, head: 4 })]));
  body.push(text(ox + 20, oy + 2.5, opts.horizontalLabel, { size: 7 }), text(ox - 2, oy - 20, 'Z', { size: 7, anchor: 'end' }));
  return { svg: svgDocument(width, height, body), width, height };
}

/** Plan looking down, X to the right and Y up the page. */
export function planDrawing(scene: Scene, opts: { readonly width?: number; readonly maxHeight?: number } = {}): { svg: string; width: number; height: number } {
  const view: ViewKind = { kind: 'plan' };
  const width = opts.width ?? 480;
  const maxHeight = opts.maxHeight ?? 300;
  const b = sceneBox(view, scene);
  const pad = 34;
  const availW = width - 2 * pad - 30;
  const s0 = Math.min(availW / Math.max(b.uMax - b.uMin, 1e-6), (maxHeight - 2 * pad) / Math.max(b.vMax - b.vMin, 1e-6));
  const height = Math.min(maxHeight, Math.max(110, (b.vMax - b.vMin) * s0 + 2 * pad));
  const f = fitFrame(view, b, pad, pad, availW, height - 2 * pad);
  const body: string[] = [];
  for (const m of scene.members) {
    if (m.kind === 'pole') {
      const [cx, cy] = f.at([0, 0, 0]);
      body.push(tubeMark(cx, cy, (m.rootDiameter_m * f.scale) / 2, m.sides, INK.fill, 0.9, ''));
      body.push(tubeMark(cx, cy, (m.tipDiameter_m * f.scale) / 2, m.sides, 'none', 0.6, '2 1.5'));
      continue;
    }
    body.push(memberOutline(f, m, view));
    if (m.link) {
      const p = f.at(m.link);
      const q = f.at(m.root);
      body.push(line(p[0], p[1], q[0], q[1], { color: INK.member, width: 1.2 }));
    }
  }
  const reserved: Rect[] = scene.members.filter((m) => m.kind === 'arm').map((m) => armLabelBox(f, m));
  for (const a of panelsFirst(scene.attachments)) body.push(attachmentSvg(f, view, a, reserved));
  for (const m of scene.members) if (m.kind === 'arm') body.push(memberLabel(f, m));
  const pole = scene.members.find((m) => m.kind === 'pole');
  if (pole) {
    const [cx, cy] = f.at([0, 0, 0]);
    // below and to the left of the pole, where arms seldom are
    const r = (pole.rootDiameter_m * f.scale) / 2;
    body.push(text(cx - r - 4, cy + r + 9, pole.label, { size: 8, bold: true, anchor: 'end' }));
  }
  const ox = width - 34;
  const oy = height - 12;
  body.push(arrow(ox, oy, ox + 18, oy, { width: 0.7, head: 4 }), arrow(ox, oy, ox, oy - 18, { width: 0.7, head: 4 }));
  body.push(text(ox + 20, oy + 2.5, 'X', { size: 7 }), text(ox - 2, oy - 20, 'Y', { size: 7, anchor: 'end' }));
  return { svg: svgDocument(width, height, body), width, height };
}

/** A round tube as a circle, a multisided one as its polygon (across flats = 2 r). */
function tubeMark(cx: number, cy: number, r: number, sides: number | null, fill: string, width: number, dash: string): string {
  const s = { color: INK.member, width, ...(dash ? { dash } : {}) };
  const rr = Math.max(r, 1.5);
  if (sides === null) return circle(cx, cy, rr, fill, s);
  const R = rr / Math.cos(Math.PI / sides);
  const pts: Pt[] = [];
  for (let k = 0; k < sides; k++) {
    const t = Math.PI / sides + (2 * Math.PI * k) / sides;
    pts.push([cx + R * Math.cos(t), cy - R * Math.sin(t)]);
  }
  return polygon(pts, fill, s);
}
