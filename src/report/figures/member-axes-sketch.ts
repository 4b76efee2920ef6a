// Sketch of the axes the package uses: the global axes with the pole and an arm, the local
// axes of each (x along the member from root to tip), and the positive internal forces and
// moments on a cut face whose outward normal is +x. Oblique projection: X to the right,
// Z up, Y drawn receding at 30 degrees.
import { arrow, doubleArrow, INK, line, polygon, svgDocument, text, type Pt } from './svg.ts';

const DEPTH = 0.55;
const COS30 = Math.cos(Math.PI / 6);
const SIN30 = 0.5;

/** Page point of an oblique-projected 3D point (x right, y receding, z up) from an origin. */
function ob(o: Pt, x: number, y: number, z: number): Pt {
  return [o[0] + x + y * DEPTH * COS30, o[1] - z - y * DEPTH * SIN30];
}

function triad(o: Pt, axes: readonly { v: readonly [number, number, number]; label: string }[], len: number, color: string): string[] {
  const out: string[] = [];
  for (const a of axes) {
    const p = ob(o, a.v[0] * len, a.v[1] * len, a.v[2] * len);
    out.push(arrow(o[0], o[1], p[0], p[1], { color, width: 0.9, head: 4.5 }));
    out.push(text(p[0] + (a.v[0] < 0 ? -3 : 3), p[1] + (a.v[2] > 0 ? -2 : 8), a.label, { size: 8, color, italic: true, anchor: a.v[0] < 0 ? 'end' : 'start' }));
  }
  return out;
}

export interface AxesSketchLabels {
  /** Labels drawn as given, e.g. "pole", "arm". */
  readonly pole: string;
  readonly arm: string;
}

export function memberAxesSketch(labels: AxesSketchLabels): { svg: string; width: number; height: number } {
  const width = 480;
  const height = 210;
  const body: string[] = [];
  // (a) structure and axes
  const base: Pt = [70, 185];
  const H = 150;
  const armZ = 128;
  const armL = 150;
  body.push(polygon([ob(base, -5, 0, 0), ob(base, 5, 0, 0), ob(base, 3.5, 0, H), ob(base, -3.5, 0, H)], INK.fill, { color: INK.member, width: 0.8 }));
  body.push(polygon([ob(base, 4, 0, armZ + 3), ob(base, 4 + armL, 0, armZ + 1.5), ob(base, 4 + armL, 0, armZ - 1.5), ob(base, 4, 0, armZ - 3)], INK.fill, { color: INK.member, width: 0.8 }));
  for (let k = -22; k <= 22; k += 5) {
    const p = ob(base, k, 0, 0);
    body.push(line(p[0], p[1], p[0] - 5, p[1] + 6, { width: 0.5 }));
  }
  body.push(line(...ob(base, -24, 0, 0), ...ob(base, 24, 0, 0), { width: 1 }));
  body.push(...triad(base, [{ v: [1, 0, 0], label: 'X' }, { v: [0, 1, 0], label: 'Y' }, { v: [0, 0, 1], label: 'Z' }], 38, INK.text));
  // Below the hatching and clear of the X label at the base.
  body.push(text(base[0] - 26, base[1] + 19, 'origin: centre of the pole base', { size: 6.5, color: INK.muted }));
  // member axes drawn beside each member, tied to its axis by a dashed leader
  const poleAt = ob(base, 0, 0, 80);
  const poleMid = ob(base, 32, 0, 80);
  body.push(line(...poleAt, ...poleMid, { color: INK.light, width: 0.5, dash: '2 2' }));
  body.push(...triad(poleMid, [{ v: [0, 0, 1], label: 'x' }, { v: [1, 0, 0], label: 'y' }, { v: [0, 1, 0], label: 'z' }], 24, INK.accent));
  body.push(text(poleAt[0] - 8, poleAt[1] + 4, labels.pole, { size: 8, bold: true, anchor: 'end' }));
  const armAt = ob(base, 4 + armL * 0.68, 0, armZ);
  const armMid = ob(base, 4 + armL * 0.68, 0, armZ - 48);
  body.push(line(...armAt, ...armMid, { color: INK.light, width: 0.5, dash: '2 2' }));
  body.push(...triad(armMid, [{ v: [1, 0, 0], label: 'x' }, { v: [0, 0, 1], label: 'y' }, { v: [0, -1, 0], label: 'z' }], 24, INK.accent));
  body.push(text(...ob(base, 4 + armL + 4, 0, armZ - 3), labels.arm, { size: 8, bold: true }));
  body.push(text(10, 12, '(a) global axes X, Y, Z and member axes x, y, z', { size: 7.5, bold: true }));

  // (b) positive internal forces and moments on the face of a cut with outward normal +x
  const seg = (o: Pt): string => {
    const r = 9;
    return polygon([ob(o, -60, 0, r), ob(o, 0, 0, r), ob(o, 0, 0, -r), ob(o, -60, 0, -r)], INK.fill, { color: INK.member, width: 0.8 });
  };
  const f0: Pt = [290, 120];
  body.push(seg(f0));
  body.push(arrow(...f0, ...ob(f0, 40, 0, 0), { color: INK.accent, width: 1.1 }), text(...ob(f0, 42, 0, 3), 'N', { size: 8, color: INK.accent, italic: true }));
  body.push(arrow(...f0, ...ob(f0, 0, 0, 36), { color: INK.accent, width: 1.1 }), text(...ob(f0, 4, 0, 34), 'Vy', { size: 8, color: INK.accent, italic: true }));
  body.push(arrow(...f0, ...ob(f0, 0, -46, 0), { color: INK.accent, width: 1.1 }), text(...ob(f0, -6, -50, -4), 'Vz', { size: 8, color: INK.accent, italic: true, anchor: 'end' }));
  const m0: Pt = [420, 120];
  body.push(seg(m0));
  body.push(doubleArrow(...m0, ...ob(m0, 40, 0, 0), { color: INK.accent, width: 1.1 }), text(...ob(m0, 42, 0, 3), 'T', { size: 8, color: INK.accent, italic: true }));
  body.push(doubleArrow(...m0, ...ob(m0, 0, 0, 36), { color: INK.accent, width: 1.1 }), text(...ob(m0, 4, 0, 34), 'My', { size: 8, color: INK.accent, italic: true }));
  body.push(doubleArrow(...m0, ...ob(m0, 0, -46, 0), { color: INK.accent, width: 1.1 }), text(...ob(m0, -6, -50, -4), 'Mz', { size: 8, color: INK.accent, italic: true, anchor: 'end' }));
  for (const o of [f0, m0]) {
    body.push(text(...ob(o, -58, 0, -20), 'x →', { size: 7, color: INK.muted, italic: true }));
  }
  body.push(text(250, 12, '(b) positive forces and moments on a cut', { size: 7.5, bold: true }));
  body.push(text(250, 200, 'face normal +x; moments as double arrows, right-hand rule', { size: 6.5, color: INK.muted }));
  return { svg: svgDocument(width, height, body), width, height };
}
