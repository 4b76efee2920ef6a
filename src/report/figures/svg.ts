// The few SVG pieces our figures are made of, written as plain strings with fixed number
// formatting so the same model always gives the same bytes. Text is one run per element
// (no mixed text and tspan, which pdfmake re-serialises badly); arrowheads are polygons
// (markers are not reliably drawn by the PDF renderer).

/** Family registered with the PDF renderer for SVG text (DejaVu Sans, embedded). */
export const SVG_FONT = 'DejaVuSans';

export const INK = {
  text: '#1a1a1a',
  muted: '#5c6166',
  grid: '#d5d9dd',
  member: '#1a1a1a',
  accent: '#24507a',
  fill: '#eaf0f6',
  light: '#9aa0a6',
  /** Applied loads in the free-body figures. */
  load: '#b03a2e',
  /** Reactions and member-end forces in the free-body figures. */
  reaction: '#1f5f8b',
  /** Member-end moments in the joint free body. */
  moment: '#6a3d8f',
} as const;

/** Coordinates with two decimals; '-0.00' is written as '0.00'. */
export function n(v: number): string {
  if (!Number.isFinite(v)) throw new RangeError(`SVG coordinate is not a finite number: ${v}`);
  const s = v.toFixed(2);
  return s === '-0.00' ? '0.00' : s;
}

export function esc(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

export interface Stroke {
  readonly color?: string;
  readonly width?: number;
  readonly dash?: string;
}

function strokeAttrs(s: Stroke = {}): string {
  const dash = s.dash ? ` stroke-dasharray="${s.dash}"` : '';
  return `stroke="${s.color ?? INK.member}" stroke-width="${n(s.width ?? 1)}"${dash}`;
}

export function line(x1: number, y1: number, x2: number, y2: number, s?: Stroke): string {
  return `<line x1="${n(x1)}" y1="${n(y1)}" x2="${n(x2)}" y2="${n(y2)}" ${strokeAttrs(s)}/>`;
}

export type Pt = readonly [number, number];

export function polyline(points: readonly Pt[], s?: Stroke): string {
  const p = points.map(([x, y]) => `${n(x)},${n(y)}`).join(' ');
  return `<polyline points="${p}" fill="none" ${strokeAttrs(s)} stroke-linejoin="round"/>`;
}

export function polygon(points: readonly Pt[], fill: string, s?: Stroke): string {
  const p = points.map(([x, y]) => `${n(x)},${n(y)}`).join(' ');
  const stroke = s ? ` ${strokeAttrs(s)}` : ' stroke="none"';
  return `<polygon points="${p}" fill="${fill}"${stroke}/>`;
}

export function rect(x: number, y: number, w: number, h: number, fill: string, s?: Stroke): string {
  const stroke = s ? ` ${strokeAttrs(s)}` : ' stroke="none"';
  return `<rect x="${n(x)}" y="${n(y)}" width="${n(w)}" height="${n(h)}" fill="${fill}"${stroke}/>`;
}

export function circle(cx: number, cy: number, r: number, fill: string, s?: Stroke): string {
  const stroke = s ? ` ${strokeAttrs(s)}` : ' stroke="none"';
  return `<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r)}" fill="${fill}"${stroke}/>`;
}

export interface TextStyle {
  readonly size?: number;
  readonly anchor?: 'start' | 'middle' | 'end';
  readonly color?: string;
  readonly bold?: boolean;
  readonly italic?: boolean;
  /** Rotation in degrees about the text's anchor point (counter-clockwise on the page is negative). */
  readonly rotate?: number;
}

/** One run of text; `y` is the baseline. */
export function text(x: number, y: number, content: string, t: TextStyle = {}): string {
  const attrs = [
    `x="${n(x)}"`,
    `y="${n(y)}"`,
    `font-family="${SVG_FONT}"`,
    `font-size="${n(t.size ?? 8)}"`,
    `fill="${t.color ?? INK.text}"`,
  ];
  if (t.anchor && t.anchor !== 'start') attrs.push(`text-anchor="${t.anchor}"`);
  if (t.bold) attrs.push('font-weight="bold"');
  if (t.italic) attrs.push('font-style="italic"');
  if (t.rotate) attrs.push(`transform="rotate(${n(t.rotate)} ${n(x)} ${n(y)})"`);
  return `<text ${attrs.join(' ')}>${esc(content)}</text>`;
}

/** A filled triangular arrowhead with its tip at (x, y), pointing along (dx, dy). */
export function arrowhead(x: number, y: number, dx: number, dy: number, size = 5, fill: string = INK.text): string {
  const len = Math.hypot(dx, dy);
  if (len === 0) return '';
  const ux = dx / len;
  const uy = dy / len;
  const bx = x - ux * size;
  const by = y - uy * size;
  const hw = size * 0.38;
  return polygon(
    [
      [x, y],
      [bx - uy * hw, by + ux * hw],
      [bx + uy * hw, by - ux * hw],
    ],
    fill,
  );
}

/** A straight arrow from (x1, y1) to (x2, y2) with a head at the end. */
export function arrow(x1: number, y1: number, x2: number, y2: number, s: Stroke & { head?: number } = {}): string {
  const head = s.head ?? 5;
  const len = Math.hypot(x2 - x1, y2 - y1);
  const k = len > head ? (len - head * 0.8) / len : 0;
  return line(x1, y1, x1 + (x2 - x1) * k, y1 + (y2 - y1) * k, s) + arrowhead(x2, y2, x2 - x1, y2 - y1, head, s.color ?? INK.text);
}

/** A moment vector drawn as a double-headed arrow (right-hand rule). */
export function doubleArrow(x1: number, y1: number, x2: number, y2: number, s: Stroke & { head?: number } = {}): string {
  const head = s.head ?? 5;
  const dx = x2 - x1;
  const dy = y2 - y1;
  const len = Math.hypot(dx, dy);
  const ux = dx / len;
  const uy = dy / len;
  return arrow(x1, y1, x2, y2, s) + arrowhead(x2 - ux * head * 0.9, y2 - uy * head * 0.9, dx, dy, head, s.color ?? INK.text);
}

/** A vector along the view normal: a ring with a dot (toward the reader) or a cross (away). */
export function normalMark(x: number, y: number, towardReader: boolean, color: string): string {
  const r = 3.2;
  const ring = circle(x, y, r, '#ffffff', { color, width: 0.9 });
  if (towardReader) return ring + circle(x, y, 0.9, color);
  return ring + line(x - 2.2, y - 2.2, x + 2.2, y + 2.2, { color, width: 0.8 }) + line(x - 2.2, y + 2.2, x + 2.2, y - 2.2, { color, width: 0.8 });
}

/** The points of a circular arc about (cx, cy), angles in degrees counter-clockwise on the page from the right. */
export function arcPoints(cx: number, cy: number, r: number, fromDeg: number, sweepDeg: number): Pt[] {
  const steps = Math.max(2, Math.ceil(Math.abs(sweepDeg) / 12));
  const out: Pt[] = [];
  for (let k = 0; k <= steps; k++) {
    const a = ((fromDeg + (sweepDeg * k) / steps) * Math.PI) / 180;
    out.push([cx + r * Math.cos(a), cy - r * Math.sin(a)]);
  }
  return out;
}

/** A moment about the view normal: an arc about (cx, cy) with a head at its end; a positive sweep
 * turns counter-clockwise on the page (a moment vector toward the reader, right-hand rule). */
export function curvedArrow(cx: number, cy: number, r: number, fromDeg: number, sweepDeg: number, s: Stroke & { head?: number } = {}): string {
  const head = s.head ?? 5;
  const toDeg = fromDeg + sweepDeg;
  // The arc stops short of the head's tip, which sits on the arc's end, pointing along its tangent.
  const shortBy = ((head * 0.8) / r) * (180 / Math.PI) * Math.sign(sweepDeg);
  const a = (toDeg * Math.PI) / 180;
  const tip: Pt = [cx + r * Math.cos(a), cy - r * Math.sin(a)];
  const sign = Math.sign(sweepDeg);
  const tangent: Pt = [-Math.sin(a) * sign, -Math.cos(a) * sign];
  return polyline(arcPoints(cx, cy, r, fromDeg, sweepDeg - shortBy), s) + arrowhead(tip[0], tip[1], tangent[0], tangent[1], head, s.color ?? INK.text);
}

export function group(children: readonly string[], attrs = ''): string {
  return `<g${attrs ? ` ${attrs}` : ''}>${children.join('')}</g>`;
}

/** The whole document: a white page of width x height user units. */
export function svgDocument(width: number, height: number, children: readonly string[]): string {
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(width)}" height="${n(height)}" viewBox="0 0 ${n(width)} ${n(height)}">` +
    children.join('') +
    '</svg>'
  );
}
