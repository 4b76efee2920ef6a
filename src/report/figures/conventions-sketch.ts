// Sketch of how the input dimensions a structure: (a) an arm's length and positions from the pole
// face or from the pole axis, and its rise; (b) an attachment on the pole, by the height of its
// bracket and the offset of its centroid; (c) the base, fixed or on rotational springs. Not to
// scale; the values are in the caption and the tables beside it.
import { arrow, circle, INK, line, polygon, polyline, svgDocument, text, type Pt } from './svg.ts';

export interface ConventionsSketchOptions {
  /** Springs at the base: about X, about Y (null: the same as X) and in torsion (null: fixed). */
  readonly baseSprings: { readonly aboutY: boolean; readonly torsion: boolean } | null;
}

/** A dimension line between two points with ticks and a label above (or below) its middle. */
function dimension(a: Pt, b: Pt, label: string, below = false): string[] {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  const nx = -dy / len;
  const ny = dx / len;
  const tick = (p: Pt) => line(p[0] + nx * 3, p[1] + ny * 3, p[0] - nx * 3, p[1] - ny * 3, { color: INK.muted, width: 0.6 });
  // The label sits beyond the middle, clear of a pole drawn at the start, off the line by its normal.
  const k = below ? 9 : -3.5;
  const mid: Pt = [a[0] + 0.62 * dx + nx * k, a[1] + 0.62 * dy + ny * k];
  const out = [line(a[0], a[1], b[0], b[1], { color: INK.muted, width: 0.6 }), tick(a), tick(b)];
  if (label) out.push(text(mid[0], mid[1], label, { size: 6.5, anchor: 'middle', color: INK.text }));
  return out;
}

/** A rotational spring drawn as a flat spiral around c. */
function spiral(c: Pt, r: number, color: string): string {
  const pts: Pt[] = [];
  for (let k = 0; k <= 48; k++) {
    const t = (k / 48) * 2.5 * 2 * Math.PI;
    const rr = (r * k) / 48;
    pts.push([c[0] + rr * Math.cos(t), c[1] + rr * Math.sin(t)]);
  }
  return polyline(pts, { color, width: 0.8 });
}

function hatchedGround(x0: number, x1: number, y: number): string[] {
  const out = [line(x0, y, x1, y, { width: 1 })];
  for (let x = x0 + 3; x <= x1; x += 5) out.push(line(x, y, x - 5, y + 6, { width: 0.5 }));
  return out;
}

function armPanel(): string[] {
  const out: string[] = [text(8, 12, '(a) arm: length from the face or the axis', { size: 7.5, bold: true })];
  const axisX = 30;
  const r = 8;
  const z = 82;
  // pole with its axis
  out.push(polygon([[axisX - r, 178], [axisX + r, 178], [axisX + r, 30], [axisX - r, 30]], INK.fill, { color: INK.member, width: 0.8 }));
  out.push(line(axisX, 24, axisX, 184, { color: INK.light, width: 0.5, dash: '5 2 1 2' }));
  // the arm rising from the face
  const rise = (7 * Math.PI) / 180;
  const L = 140;
  const ux = Math.cos(rise);
  const uy = -Math.sin(rise);
  const root: Pt = [axisX + r, z];
  const at = (s: number, d = 0): Pt => [root[0] + s * ux - d * uy, z + s * uy - d * ux];
  const tip = at(L);
  out.push(polygon([[root[0], z - 4], [tip[0], tip[1] - 2.5], [tip[0], tip[1] + 2.5], [root[0], z + 4]], INK.fill, { color: INK.member, width: 0.8 }));
  // horizontal reference and the rise angle
  out.push(line(root[0], z, root[0] + 62, z, { color: INK.light, width: 0.5, dash: '2 2' }));
  const arc: Pt[] = [];
  for (let k = 0; k <= 8; k++) arc.push([root[0] + 50 * Math.cos((rise * k) / 8), z - 50 * Math.sin((rise * k) / 8)]);
  out.push(polyline(arc, { color: INK.accent, width: 0.7 }), text(root[0] + 64, z + 2, 'θ', { size: 7, color: INK.accent, italic: true }));
  // an attachment hanging from the arm at position s
  const s = 0.8 * L;
  const hang = at(s);
  out.push(line(hang[0], hang[1], hang[0], hang[1] + 8, { color: INK.accent, width: 0.6 }), circle(hang[0], hang[1] + 11, 3, INK.accent));
  // dimensions parallel to the arm: above it from the face; below it from the axis
  const fromAxis = (d: number): Pt => [axisX - d * uy, z - d * ux];
  out.push(...dimension(at(0, 12), at(L, 12), 'L_face'));
  out.push(...dimension(fromAxis(-30), at(L, -30), 'L_axis = L_face + r', true));
  out.push(...dimension(fromAxis(-50), at(s, -50), 's: position, same origin', true));
  out.push(...dimension([axisX, 27], [axisX + r, 27], ''), text(axisX + r + 3, 29, 'r', { size: 6.5, italic: true }));
  out.push(text(axisX + r + 6, 150, 'L_face: lengthFrom: face (default)', { size: 6, color: INK.muted }));
  out.push(text(axisX + r + 6, 158, 'L_axis: lengthFrom: axis', { size: 6, color: INK.muted }));
  out.push(text(axisX + r + 6, 166, 'r: pole face radius at the arm', { size: 6, color: INK.muted }));
  out.push(text(axisX + r + 6, 174, 'θ: rise above horizontal', { size: 6, color: INK.muted }));
  return out;
}

function polePanel(): string[] {
  const out: string[] = [text(196, 12, '(b) attachment on the pole', { size: 7.5, bold: true })];
  const axisX = 232;
  const r = 8;
  out.push(polygon([[axisX - r, 190], [axisX + r, 190], [axisX + r - 2, 30], [axisX - r + 2, 30]], INK.fill, { color: INK.member, width: 0.8 }));
  out.push(line(axisX, 24, axisX, 196, { color: INK.light, width: 0.5, dash: '5 2 1 2' }));
  out.push(...hatchedGround(axisX - 22, axisX + 22, 190));
  const bracketZ = 120;
  const centroid: Pt = [axisX + 48, bracketZ - 26];
  // bracket from the face out to below the centroid, then up to it
  out.push(line(axisX + r, bracketZ, centroid[0], bracketZ, { width: 1.2 }), line(centroid[0], bracketZ, centroid[0], centroid[1] + 6, { width: 1.2 }));
  out.push(polygon([[centroid[0] - 6, centroid[1] - 6], [centroid[0] + 6, centroid[1] - 6], [centroid[0] + 6, centroid[1] + 6], [centroid[0] - 6, centroid[1] + 6]], INK.fill, { color: INK.accent, width: 0.8 }));
  out.push(circle(centroid[0], centroid[1], 1.6, INK.accent));
  out.push(...dimension([axisX - 16, 190], [axisX - 16, bracketZ], ''), text(axisX - 19, (190 + bracketZ) / 2, 'position', { size: 6.5, anchor: 'end' }));
  out.push(...dimension([centroid[0] + 14, bracketZ], [centroid[0] + 14, centroid[1]], ''), text(centroid[0] + 18, (bracketZ + centroid[1]) / 2 + 2, 'vertical', { size: 6.5 }));
  out.push(...dimension([axisX, bracketZ + 12], [centroid[0], bracketZ + 12], 'lateral', true));
  out.push(text(axisX + 14, 40, 'lateral: from the pole axis,', { size: 6, color: INK.muted }), text(axisX + 14, 48, 'toward the offset direction', { size: 6, color: INK.muted }));
  out.push(text(axisX + 14, 58, 'vertical: + up from the bracket', { size: 6, color: INK.muted }));
  return out;
}

function basePanel(opts: ConventionsSketchOptions): string[] {
  const out: string[] = [text(340, 12, '(c) base', { size: 7.5, bold: true })];
  const axisX = 400;
  const r = 10;
  const y = 150;
  out.push(polygon([[axisX - r, y], [axisX + r, y], [axisX + r - 2, 40], [axisX - r + 2, 40]], INK.fill, { color: INK.member, width: 0.8 }));
  out.push(line(axisX - 22, y, axisX + 22, y, { width: 1.6 }));
  if (!opts.baseSprings) {
    out.push(...hatchedGround(axisX - 30, axisX + 30, y + 2));
    out.push(text(axisX, y + 22, 'fixed: all six restrained', { size: 6.5, anchor: 'middle' }));
    out.push(text(axisX, y + 31, '(rigid plate, bolts, foundation)', { size: 6, anchor: 'middle', color: INK.muted }));
    return out;
  }
  out.push(...hatchedGround(axisX - 30, axisX + 30, y + 24));
  out.push(spiral([axisX - 14, y + 12], 8, INK.accent), spiral([axisX + 14, y + 12], 8, INK.accent));
  out.push(text(axisX - 26, y + 14, 'about X', { size: 6.5, anchor: 'end', color: INK.accent }));
  out.push(text(axisX + 26, y + 14, opts.baseSprings.aboutY ? 'about Y' : 'about Y (= X)', { size: 6.5, color: INK.accent }));
  if (opts.baseSprings.torsion) {
    out.push(arrow(axisX + 30, y - 16, axisX - 30, y - 16, { color: INK.accent, width: 0.7, head: 4 }));
    out.push(text(axisX, y - 20, 'torsion spring about Z', { size: 6.5, anchor: 'middle', color: INK.accent }));
  } else {
    out.push(text(axisX, y - 20, 'fixed in torsion', { size: 6.5, anchor: 'middle', color: INK.muted }));
  }
  out.push(text(axisX, y + 36, 'translations fixed; springs as', { size: 6, anchor: 'middle', color: INK.muted }));
  out.push(text(axisX, y + 44, 'entered (values in Supports)', { size: 6, anchor: 'middle', color: INK.muted }));
  return out;
}

export function conventionsSketch(opts: ConventionsSketchOptions): { svg: string; width: number; height: number } {
  const width = 480;
  const height = 205;
  return { svg: svgDocument(width, height, [...armPanel(), ...polePanel(), ...basePanel(opts)]), width, height };
}
