// Placing the text labels of a figure so that none overlaps another label or a drawn line:
// everything drawn reserves rectangles (lines as chains of small squares), and each label takes
// the first free place of a ring of places around its anchor. Shared by the free-body figures.
import { measureText } from '../charts/text-measure.ts';
import type { Pt } from './svg.ts';

/** [left, top, right, bottom] in drawing units. */
export type Rect = readonly [number, number, number, number];

/** Size of the value labels of the free-body figures. */
export const LABEL_SIZE = 6.8;

export const overlaps = (a: Rect, b: Rect): boolean => a[0] < b[2] && b[0] < a[2] && a[1] < b[3] && b[1] < a[3];

/** Places a label beside (x, y): the first of a ring of places around it, nearest first, that
 * overlaps nothing placed so far and stays inside the figure. `rings` widens the search (each ring
 * one line height further out; `bold` for a label drawn bold); when the ring is full, the nearest
 * free place within CROWDED_REACH (placeLabelNear). The label's rectangle is reserved and returned. */
export function placeLabel(taken: Rect[], x: number, y: number, content: string, bounds: Rect, rings = 7, bold = false): { x: number; y: number; box: Rect } {
  // Measured in the face it is drawn in: a bold label is wider.
  const w = measureText(bold ? { fontSize: LABEL_SIZE, fontWeight: 'bold' } : { fontSize: LABEL_SIZE }, content);
  const h = LABEL_SIZE + 2;
  const rectAt = (left: number, base: number): Rect => [left - 1, base - LABEL_SIZE, left + w + 1, base + 2];
  const candidates: [number, number][] = [];
  for (let ring = 0; ring < rings; ring++) {
    const r = ring * h;
    candidates.push([x + 3, y - 2 - r], [x - w - 3, y - 2 - r], [x + 3, y + LABEL_SIZE + r], [x - w - 3, y + LABEL_SIZE + r], [x - w / 2, y - 4 - r], [x - w / 2, y + LABEL_SIZE + 3 + r]);
  }
  for (const [left, base] of candidates) {
    const r = rectAt(left, base);
    const inside = r[0] >= bounds[0] && r[2] <= bounds[2] && r[1] >= bounds[1] && r[3] <= bounds[3];
    if (inside && !taken.some((t) => overlaps(t, r))) {
      taken.push(r);
      return { x: left, y: base, box: r };
    }
  }
  // Crowded (the loads of an arm seen end-on all land on the pole): the nearest free place of the
  // whole neighbourhood rather than one on top of another label.
  return placeLabelNear(taken, x, y, content, bounds, CROWDED_REACH, null, bold);
}

/** How far from its anchor a crowded label of placeLabel may go, in drawing units. */
const CROWDED_REACH = 140;

/** Places a label as near (x, y) as it fits: over a grid of places around the anchor in every
 * direction, the one whose rectangle comes closest to the anchor that overlaps nothing placed so
 * far and stays inside the figure (up to `reach` away; beyond, at the anchor, overlapping). With
 * `toward` (a page direction) a place on that side of the anchor counts as nearer than one
 * behind it, so that labels of one part of a figure gather on its side. For figures whose
 * anchors crowd, where the ring of placeLabel would stack a label far above (`bold` for a label
 * drawn bold). */
export function placeLabelNear(taken: Rect[], x: number, y: number, content: string, bounds: Rect, reach = 60, toward: Pt | null = null, bold = false): { x: number; y: number; box: Rect } {
  const w = measureText(bold ? { fontSize: LABEL_SIZE, fontWeight: 'bold' } : { fontSize: LABEL_SIZE }, content);
  const rectAt = (left: number, base: number): Rect => [left - 1, base - LABEL_SIZE, left + w + 1, base + 2];
  // Every candidate rectangle lies in this window, so only what is reserved there can be in the
  // way: a figure reserves hundreds of small squares along its lines, most of them far off.
  const window: Rect = [x - reach - w - 1, y - reach - 2 * LABEL_SIZE, x + reach + w + 1, y + reach + LABEL_SIZE + 2];
  const near = taken.filter((t) => overlaps(t, window));
  // The places inside the figure, with their distances; tried nearest first (ties: higher, then
  // further left). Sorting all of them for each label cost a fifth of a second per package, and
  // a label mostly finds room close by: so the places are sorted and tried one band of
  // distance at a time, which tries them in the same order.
  const lefts: number[] = [];
  const bases: number[] = [];
  const dists: number[] = [];
  for (let dy = -reach - LABEL_SIZE; dy <= reach + LABEL_SIZE; dy += 2) {
    for (let dx = -reach - w; dx <= reach; dx += 2) {
      // The rectangle of rectAt, without making one for each of some five thousand places.
      const left = x + dx;
      const base = y + dy;
      const r0 = left - 1;
      const r1 = base - LABEL_SIZE;
      const r2 = left + w + 1;
      const r3 = base + 2;
      if (r0 < bounds[0] || r2 > bounds[2] || r1 < bounds[1] || r3 > bounds[3]) continue;
      // Distance from the anchor to the nearest point of the label's rectangle, plus a little gap.
      const gx = Math.max(r0 - x, 0, x - r2);
      const gy = Math.max(r1 - y, 0, y - r3);
      const dist = Math.hypot(gx, gy);
      if (dist < 2 || dist > reach) continue;
      // How far the rectangle reaches behind the anchor, against `toward`.
      const behind = toward ? Math.max(0, -Math.min((r0 - x) * toward[0], (r2 - x) * toward[0]) - Math.min((r1 - y) * toward[1], (r3 - y) * toward[1])) : 0;
      lefts.push(left);
      bases.push(base);
      dists.push(dist + 0.5 * behind);
    }
  }
  const farthest = dists.reduce((m, d) => Math.max(m, d), 0);
  const BAND = 8;
  for (let from = 0; from <= farthest; from += BAND) {
    const band: number[] = [];
    for (let k = 0; k < dists.length; k++) if (dists[k]! >= from && dists[k]! < from + BAND) band.push(k);
    band.sort((a, b) => dists[a]! - dists[b]! || bases[a]! - bases[b]! || lefts[a]! - lefts[b]!);
    for (const k of band) {
      const r = rectAt(lefts[k]!, bases[k]!);
      if (!near.some((t) => overlaps(t, r))) {
        taken.push(r);
        return { x: lefts[k]!, y: bases[k]!, box: r };
      }
    }
  }
  const box = rectAt(x + 3, y - 2);
  taken.push(box);
  return { x: x + 3, y: y - 2, box };
}

/** Small squares along a drawn segment, so labels keep off it. */
export function segmentRects(a: Pt, b: Pt, half = 2.5): Rect[] {
  const out: Rect[] = [];
  const steps = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / 5));
  for (let k = 0; k <= steps; k++) {
    const x = a[0] + ((b[0] - a[0]) * k) / steps;
    const y = a[1] + ((b[1] - a[1]) * k) / steps;
    out.push([x - half, y - half, x + half, y + half]);
  }
  return out;
}
