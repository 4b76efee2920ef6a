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
 * one line height further out; `bold` for a label drawn bold). The label's rectangle is reserved and returned. */
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
  const box = rectAt(x + 3, y - 2);
  taken.push(box);
  return { x: x + 3, y: y - 2, box };
}

/** Places a label as near (x, y) as it fits: over a grid of places around the anchor in every
 * direction, the one whose rectangle comes closest to the anchor that overlaps nothing placed so
 * far and stays inside the figure (up to `reach` away; beyond, at the anchor, overlapping). With
 * `toward` (a page direction) a place on that side of the anchor counts as nearer than one
 * behind it, so that labels of one part of a figure gather on its side. For figures whose
 * anchors crowd, where the ring of placeLabel would stack a label far above. */
export function placeLabelNear(taken: Rect[], x: number, y: number, content: string, bounds: Rect, reach = 60, toward: Pt | null = null): { x: number; y: number; box: Rect } {
  const w = measureText({ fontSize: LABEL_SIZE }, content);
  const rectAt = (left: number, base: number): Rect => [left - 1, base - LABEL_SIZE, left + w + 1, base + 2];
  const candidates: { left: number; base: number; dist: number }[] = [];
  for (let dy = -reach - LABEL_SIZE; dy <= reach + LABEL_SIZE; dy += 2) {
    for (let dx = -reach - w; dx <= reach; dx += 2) {
      const r = rectAt(x + dx, y + dy);
      // Distance from the anchor to the nearest point of the label's rectangle, plus a little gap.
      const gx = Math.max(r[0] - x, 0, x - r[2]);
      const gy = Math.max(r[1] - y, 0, y - r[3]);
      const dist = Math.hypot(gx, gy);
      if (dist < 2 || dist > reach) continue;
      // How far the rectangle reaches behind the anchor, against `toward`.
      const behind = toward ? Math.max(0, -Math.min((r[0] - x) * toward[0], (r[2] - x) * toward[0]) - Math.min((r[1] - y) * toward[1], (r[3] - y) * toward[1])) : 0;
      candidates.push({ left: x + dx, base: y + dy, dist: dist + 0.5 * behind });
    }
  }
  candidates.sort((a, b) => a.dist - b.dist || a.base - b.base || a.left - b.left);
  for (const c of candidates) {
    const r = rectAt(c.left, c.base);
    const inside = r[0] >= bounds[0] && r[2] <= bounds[2] && r[1] >= bounds[1] && r[3] <= bounds[3];
    if (inside && !taken.some((t) => overlaps(t, r))) {
      taken.push(r);
      return { x: c.left, y: c.base, box: r };
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
