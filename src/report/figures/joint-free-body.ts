// The free body of a pole-arm joint drawn: the joint node as a small circle, a short stub of each
// member framing into it (pole below, pole above, the arm, other arms), and at the cut end of each
// stub the force and the moment that member end exerts on the joint, in two views side by side:
// an elevation looking square to the arm (the forces in its plane as arrows, the component toward
// or away from the reader as a dot or a cross, the moment about the view normal as a curved
// arrow) and, when anything acts out of that plane, a plan (horizontal forces as arrows, the
// moment about the vertical as a curved arrow, the moment along the arm as a double-headed arrow,
// right-hand rule). The stubs are schematic; arrows are sized per kind against the largest of the
// kind, not to a scale of the structure. Numbers arrive through the caller's formatters.
import type { Vec3 } from '../../model/frame.ts';
import { dot } from '../../model/vec3.ts';
import { withoutRoundOff } from '../sections/round-off.ts';
import { LABEL_SIZE, placeLabelNear, segmentRects, type Rect } from './label-place.ts';
import { inView, type ViewKind } from './projection.ts';
import { arcPoints, arrow, circle, curvedArrow, doubleArrow, INK, line, normalMark, rect, svgDocument, text, type Pt } from './svg.ts';
import { viewAxes } from './view-axes.ts';

export interface JointFigurePart {
  /** Short name printed at its stub: "arm SA", "pole below". */
  readonly name: string;
  /** Global direction from the joint node toward the member (any length); null for loads applied at the node. */
  readonly toward: Vec3 | null;
  /** On the joint node, global, N. */
  readonly force_N: Vec3;
  /** On the joint node about the node, global, N m. */
  readonly moment_Nm: Vec3;
}

export interface JointFigureOptions {
  /** The arm whose joint this is; the elevation looks square to it. */
  readonly arm: string;
  /** Plan direction of that arm (global, horizontal). */
  readonly horizontal: Vec3;
  /** Formats a force magnitude (N) with its unit. */
  readonly force: (N: number) => string;
  /** Formats a moment magnitude (N m) with its unit. */
  readonly moment: (Nm: number) => string;
  /** A component at or below this share of the largest force (moment) of the joint is round-off: neither drawn nor printed. */
  readonly roundOff: number;
  /** Of both views together (each takes half); 480 by default. */
  readonly width?: number;
  /** 200 by default; never less than the drawing needs without its labels. */
  readonly maxHeight?: number;
}

export type JointView = 'elevation' | 'plan';

export interface JointFigureLabel {
  readonly view: JointView;
  /** The part's name. */
  readonly part: string;
  /** 'name' labels a stub; 'force' and 'moment' label an arrow with its value. */
  readonly kind: 'name' | 'force' | 'moment';
  readonly text: string;
  /** Magnitude of the labelled component (N or N m); 0 for a name. */
  readonly value: number;
  readonly box: Rect;
}

export interface JointFigure {
  readonly svg: string;
  readonly width: number;
  readonly height: number;
  readonly views: readonly JointView[];
  readonly labels: readonly JointFigureLabel[];
  /** The elevation's horizontal is not a global axis: its components are named h (along the arm) and n (normal to it). */
  readonly obliqueNames: boolean;
}

const STUB = 38;
const NODE_R = 3.5;
const F_MIN = 13;
const F_MAX = 36;
const M_MIN = 16;
const M_MAX = 30;
const ARC_MIN = 6.5;
const ARC_MAX = 12;
const COS30 = Math.cos(Math.PI / 6);
const TITLE_SIZE = 7;

const dot2 = (a: Pt, b: Pt): number => a[0] * b[0] + a[1] * b[1];
const degOf = (d: Pt): number => (Math.atan2(-d[1], d[0]) * 180) / Math.PI;
const pageDir = (deg: number): Pt => [Math.cos((deg * Math.PI) / 180), -Math.sin((deg * Math.PI) / 180)];
const gap = (a: number, b: number): number => {
  const d = Math.abs((((a - b) % 360) + 360) % 360);
  return Math.min(d, 360 - d);
};

/** One component to draw: a vector of one kind in page directions, or along the normal. */
interface Component {
  readonly kind: 'force' | 'moment';
  /** 'in' lies in the view (arrow); 'normal' along the view normal (dot/cross for a force, curved arrow for a moment). */
  readonly how: 'in' | 'normal';
  readonly name: string;
  /** Page direction for 'in'; for 'normal' [sign, 0] with sign +1 toward the reader. */
  readonly dir: Pt;
  readonly value: number;
}

interface Stub {
  readonly part: JointFigurePart;
  /** Page direction from the node to the cut end. */
  readonly s: Pt;
  /** 'solid' a member in its place, 'aside' a member along the view normal drawn aside (dashed), 'applied' the node's own loads (dotted leader). */
  readonly style: 'solid' | 'aside' | 'applied';
  readonly components: readonly Component[];
}

/** Name of a global axis a direction lies along, or null. */
function axisLetter(v: Vec3): string | null {
  const len = Math.hypot(...v);
  for (const [k, name] of [[0, 'x'], [1, 'y'], [2, 'z']] as const) if (Math.abs(Math.abs(v[k]) - len) <= 1e-9 * len) return name;
  return null;
}

/** The components of each part a view shows, round-off left out. */
function componentsOf(view: JointView, part: JointFigurePart, h: Vec3, clean: { F: (v: number) => number; M: (v: number) => number }): Component[] {
  const n: Vec3 = [h[1], -h[0], 0]; // toward the reader of the elevation (projection.ts)
  const hName = axisLetter(h) ?? 'h';
  const nName = axisLetter(n) ?? 'n';
  const out: Component[] = [];
  const push = (kind: 'force' | 'moment', how: 'in' | 'normal', name: string, dir: Pt, raw: number) => {
    const v = kind === 'force' ? clean.F(raw) : clean.M(raw);
    if (v === 0) return;
    out.push({ kind, how, name, dir: how === 'in' ? [dir[0] * Math.sign(v), dir[1] * Math.sign(v)] : [Math.sign(v), 0], value: Math.abs(v) });
  };
  const F = part.force_N;
  const M = part.moment_Nm;
  if (view === 'elevation') {
    push('force', 'in', `F${hName}`, [1, 0], dot(F, h));
    push('force', 'in', 'Fz', [0, -1], F[2]);
    push('force', 'normal', `F${nName}`, [0, 0], dot(F, n));
    push('moment', 'normal', `M${nName}`, [0, 0], dot(M, n));
  } else {
    push('force', 'in', 'Fx', [1, 0], F[0]);
    push('force', 'in', 'Fy', [0, -1], F[1]);
    push('moment', 'normal', 'Mz', [0, 0], M[2]);
    const hv = inView({ kind: 'plan' }, h).d;
    push('moment', 'in', `M${hName}`, hv, dot(M, h));
  }
  return out;
}

/** Page directions of the stubs: members in their place where they show in the view, the others
 * (along the view normal) and the node's own loads drawn aside, where no other stub is. */
function stubsOf(view: JointView, parts: readonly JointFigurePart[], h: Vec3, clean: { F: (v: number) => number; M: (v: number) => number }): Stub[] {
  const kind: ViewKind = view === 'elevation' ? { kind: 'elevation', horizontal: h } : { kind: 'plan' };
  const placed: { part: JointFigurePart; s: Pt | null; style: Stub['style'] }[] = parts.map((part) => {
    if (part.toward === null) return { part, s: null, style: 'applied' };
    const v = inView(kind, part.toward);
    return v.len >= 0.35 * Math.hypot(...part.toward) ? { part, s: v.d, style: 'solid' } : { part, s: null, style: 'aside' };
  });
  const taken = placed.flatMap((p) => (p.s ? [degOf(p.s)] : []));
  for (const p of placed) {
    if (p.s) continue;
    // Preferred places: a member going down (the pole below) lower left, one going up upper left, others lower right.
    const up = p.part.toward ? p.part.toward[2] / Math.hypot(...p.part.toward) : 0;
    const prefer = up < -0.5 ? 240 : up > 0.5 ? 120 : 300;
    let best = 0;
    let bestScore = -Infinity;
    for (let a = 0; a < 360; a += 15) {
      const free = Math.min(90, ...taken.map((t) => gap(a, t)));
      const score = free * 10 - gap(a, prefer) / 18;
      if (score > bestScore) {
        bestScore = score;
        best = a;
      }
    }
    taken.push(best);
    p.s = pageDir(best);
  }
  return placed.map((p) => ({ part: p.part, s: p.s!, style: p.style, components: componentsOf(view, p.part, h, clean) }));
}

interface Drawn {
  readonly svg: string[];
  readonly reserved: Rect[];
  readonly labels: { x: number; y: number; text: string; color: string; part: string; kind: JointFigureLabel['kind']; value: number; toward: Pt | null }[];
  /** Extent of the drawing (not the labels), page units. */
  box: [number, number, number, number];
}

/** Draws one view with the node at `o`; drawn first at the origin, its box tells where it fits. */
function drawView(stubs: readonly Stub[], size: { F: (v: number) => number; M: (v: number) => number; Arc: (v: number) => number }, opts: JointFigureOptions, o: Pt): Drawn {
  const out: Drawn = { svg: [], reserved: [], labels: [], box: [o[0] - NODE_R, o[1] - NODE_R, o[0] + NODE_R, o[1] + NODE_R] };
  const see = (...pts: Pt[]) => {
    for (const [x, y] of pts) out.box = [Math.min(out.box[0], x), Math.min(out.box[1], y), Math.max(out.box[2], x), Math.max(out.box[3], y)];
  };
  const seg = (a: Pt, b: Pt) => {
    out.reserved.push(...segmentRects(a, b, 2));
    see(a, b);
  };
  for (const stub of stubs) {
    const p: Pt = [o[0] + stub.s[0] * STUB, o[1] + stub.s[1] * STUB];
    const from: Pt = [o[0] + stub.s[0] * NODE_R, o[1] + stub.s[1] * NODE_R];
    if (stub.style === 'solid') out.svg.push(line(from[0], from[1], p[0], p[1], { color: INK.member, width: 3 }));
    else out.svg.push(line(from[0], from[1], p[0], p[1], { color: INK.muted, width: stub.style === 'aside' ? 2 : 0.8, dash: stub.style === 'aside' ? '4 2' : '1.5 1.5' }));
    seg(o, p);
    // The stub's name beside its middle.
    out.labels.push({ x: o[0] + stub.s[0] * STUB * 0.55, y: o[1] + stub.s[1] * STUB * 0.55, text: stub.style === 'aside' ? `${stub.part.name} (drawn aside)` : stub.part.name, color: INK.muted, part: stub.part.name, kind: 'name', value: 0, toward: stub.s });
    // Rays from the cut end already used (the stub itself, the arrows), so a moment arrow keeps off them.
    const rays: Pt[] = [[-stub.s[0], -stub.s[1]]];
    const marked = stub.components.some((c) => c.kind === 'force' && c.how === 'normal');
    for (const c of stub.components.filter((c) => c.kind === 'force')) {
      const color = stub.style === 'applied' ? INK.load : INK.reaction;
      const labelText = `${c.name} ${opts.force(c.value)}`;
      if (c.how === 'normal') {
        out.svg.push(normalMark(p[0], p[1], c.dir[0] > 0, color));
        out.reserved.push([p[0] - 3.5, p[1] - 3.5, p[0] + 3.5, p[1] + 3.5]);
        out.labels.push({ x: p[0] + 2, y: p[1], text: labelText, color, part: stub.part.name, kind: 'force', value: c.value, toward: stub.s });
        continue;
      }
      const L = size.F(c.value);
      // Along the stub and away from the node: the arrow starts at the cut and points on outward;
      // otherwise it ends at the cut (a force toward the node along the stub then lies beyond it).
      const outward = dot2(c.dir, stub.s) > COS30;
      // A dot or cross at the cut: the arrow meets its ring, not its centre.
      const ring = marked ? 3.4 : 0;
      const a: Pt = outward ? [p[0] + c.dir[0] * ring, p[1] + c.dir[1] * ring] : [p[0] - c.dir[0] * (L + ring), p[1] - c.dir[1] * (L + ring)];
      const b: Pt = outward ? [p[0] + c.dir[0] * (L + ring), p[1] + c.dir[1] * (L + ring)] : [p[0] - c.dir[0] * ring, p[1] - c.dir[1] * ring];
      out.svg.push(arrow(a[0], a[1], b[0], b[1], { color, width: 1.1, head: 5 }));
      seg(a, b);
      rays.push(outward ? c.dir : [-c.dir[0], -c.dir[1]]);
      const far = outward ? b : a;
      out.labels.push({ x: far[0], y: far[1], text: labelText, color, part: stub.part.name, kind: 'force', value: c.value, toward: stub.s });
    }
    for (const c of stub.components.filter((c) => c.kind === 'moment')) {
      const color = stub.style === 'applied' ? INK.load : INK.moment;
      const labelText = `${c.name} ${opts.moment(c.value)}`;
      if (c.how === 'normal') {
        // Three quarters of a circle about the cut, open toward the node; counter-clockwise on the page for a vector toward the reader.
        const r = size.Arc(c.value);
        const back = degOf([-stub.s[0], -stub.s[1]]);
        const sweep = c.dir[0] > 0 ? 270 : -270;
        const start = c.dir[0] > 0 ? back + 45 : back - 45;
        out.svg.push(curvedArrow(p[0], p[1], r, start, sweep, { color, width: 1, head: 4 }));
        const pts = arcPoints(p[0], p[1], r, start, sweep);
        for (let k = 1; k < pts.length; k++) seg(pts[k - 1]!, pts[k]!);
        const outer: Pt = [p[0] + stub.s[0] * r, p[1] + stub.s[1] * r];
        out.labels.push({ x: outer[0], y: outer[1], text: labelText, color, part: stub.part.name, kind: 'moment', value: c.value, toward: stub.s });
        continue;
      }
      const L = size.M(c.value);
      // A double-headed arrow from the cut; shifted to the side when it would lie on the stub or an arrow.
      const clash = rays.some((r) => dot2(r, c.dir) > COS30);
      const side: Pt = [-c.dir[1] * 8, c.dir[0] * 8];
      const a: Pt = clash ? [p[0] + side[0] + c.dir[0] * 3, p[1] + side[1] + c.dir[1] * 3] : p;
      const b: Pt = [a[0] + c.dir[0] * L, a[1] + c.dir[1] * L];
      out.svg.push(doubleArrow(a[0], a[1], b[0], b[1], { color, width: 1, head: 4.5 }));
      seg(a, b);
      out.labels.push({ x: b[0], y: b[1], text: labelText, color, part: stub.part.name, kind: 'moment', value: c.value, toward: stub.s });
    }
  }
  out.svg.push(circle(o[0], o[1], NODE_R, '#ffffff', { color: INK.member, width: 1.2 }));
  out.reserved.push([o[0] - NODE_R - 1, o[1] - NODE_R - 1, o[0] + NODE_R + 1, o[1] + NODE_R + 1]);
  return out;
}

export function jointFreeBodyFigure(parts: readonly JointFigurePart[], opts: JointFigureOptions): JointFigure {
  const h = opts.horizontal;
  const bigF = Math.max(0, ...parts.map((p) => Math.hypot(...p.force_N)));
  const bigM = Math.max(0, ...parts.map((p) => Math.hypot(...p.moment_Nm)));
  const clean = { F: (v: number) => withoutRoundOff(v, bigF, opts.roundOff), M: (v: number) => withoutRoundOff(v, bigM, opts.roundOff) };
  const elevation = stubsOf('elevation', parts, h, clean);
  // A plan only when something acts out of the elevation's plane: a force along its normal, a
  // moment about the vertical or along the arm.
  const plan = stubsOf('plan', parts, h, clean);
  const outOfPlane = elevation.some((s) => s.components.some((c) => c.how === 'normal' && c.kind === 'force')) || plan.some((s) => s.components.some((c) => c.kind === 'moment'));
  const views: JointView[] = outOfPlane ? ['elevation', 'plan'] : ['elevation'];
  // Arrow sizes per kind, against the largest component drawn of that kind in either view.
  const all = [...elevation, ...(outOfPlane ? plan : [])].flatMap((s) => s.components);
  const maxF = Math.max(1e-300, ...all.filter((c) => c.kind === 'force').map((c) => c.value));
  const maxM = Math.max(1e-300, ...all.filter((c) => c.kind === 'moment').map((c) => c.value));
  const size = {
    F: (v: number) => F_MIN + (F_MAX - F_MIN) * (v / maxF),
    M: (v: number) => M_MIN + (M_MAX - M_MIN) * (v / maxM),
    Arc: (v: number) => ARC_MIN + (ARC_MAX - ARC_MIN) * (v / maxM),
  };
  const panelW = (opts.width ?? 480) / 2;
  const width = panelW * views.length;
  const stubsIn = (v: JointView) => (v === 'elevation' ? elevation : plan);
  const drawn = views.map((v) => drawView(stubsIn(v), size, opts, [0, 0]));
  // One height for both panels: the taller drawing with room for its labels and the panel title.
  const room = 2 * (LABEL_SIZE + 6);
  const tallest = Math.max(...drawn.map((d) => d.box[3] - d.box[1]));
  const needed = tallest + 2 * room + TITLE_SIZE + 6;
  // maxHeight gives way only to the drawing itself (at most about 160 units tall), never cut.
  const height = Math.max(Math.min(opts.maxHeight ?? 200, Math.max(120, needed)), tallest + TITLE_SIZE + 12);
  const body: string[] = [rect(0, 0, width, height, '#ffffff')];
  const labels: JointFigureLabel[] = [];
  const hName = axisLetter(h);
  views.forEach((view, k) => {
    const x0 = k * panelW;
    const d0 = drawn[k]!;
    const top = TITLE_SIZE + 6;
    // Centre the drawing in its panel below the title.
    const dx = x0 + panelW / 2 - (d0.box[0] + d0.box[2]) / 2;
    const dy = top + (height - top) / 2 - (d0.box[1] + d0.box[3]) / 2;
    const d = drawView(stubsIn(view), size, opts, [dx, dy]);
    const bounds: Rect = [x0 + 2, top, x0 + panelW - 2, height - 2];
    const title = view === 'elevation' ? `Elevation, looking square to arm ${opts.arm}` : 'Plan, looking down';
    body.push(text(x0 + 6, TITLE_SIZE + 2, title, { size: TITLE_SIZE, bold: true }));
    if (k > 0) body.push(line(x0, 4, x0, height - 4, { color: INK.grid, width: 0.6 }));
    body.push(...d.svg);
    const axes = viewAxes(x0 + 12, height - 8, view === 'elevation' ? [hName ? `+${hName.toUpperCase()}, along ${opts.arm}` : `h, along ${opts.arm}`, '+Z'] : ['+X', '+Y']);
    body.push(axes.svg);
    const taken: Rect[] = [...d.reserved, axes.box];
    // Names first (beside their stubs), then the values, largest first within each kind.
    const order = [...d.labels].sort((a, b) => (a.kind === 'name' ? 0 : 1) - (b.kind === 'name' ? 0 : 1) || (a.kind === b.kind ? b.value - a.value : a.kind === 'force' ? -1 : 1));
    for (const lb of order) {
      const at = placeLabelNear(taken, lb.x, lb.y, lb.text, bounds, 60, lb.toward);
      body.push(text(at.x, at.y, lb.text, { size: LABEL_SIZE, color: lb.color }));
      labels.push({ view, part: lb.part, kind: lb.kind, text: lb.text, value: lb.value, box: at.box });
    }
  });
  return { svg: svgDocument(width, height, body), width, height, views, labels, obliqueNames: hName === null };
}
