// Views of the 3D structure on the page: an elevation looking square to a plan direction,
// and a plan looking down. A view maps global coordinates (m) to drawing units, with one
// scale for both page directions so shapes are not distorted.
import type { Vec3 } from '../../model/frame.ts';
import type { Pt } from './svg.ts';

export type ViewKind = { readonly kind: 'elevation'; readonly horizontal: Vec3 } | { readonly kind: 'plan' };

/** Page coordinates before scaling: u to the right, v up, in metres. */
export function viewCoords(view: ViewKind, p: Vec3): Pt {
  if (view.kind === 'plan') return [p[0], p[1]];
  const h = view.horizontal;
  return [p[0] * h[0] + p[1] * h[1], p[2]];
}

/** Page direction of a global vector in the view (unit, y down the page), its length in the view,
 * and its component along the view normal, toward the reader positive: up in plan; in elevation
 * right x up = (h_y, -h_x, 0), the reader looking along (-h_y, h_x). */
export function inView(view: ViewKind, v: Vec3): { d: Pt; len: number; normal: number } {
  const [u, w] = viewCoords(view, v);
  const len = Math.hypot(u, w);
  const normal = view.kind === 'plan' ? v[2] : v[0] * view.horizontal[1] - v[1] * view.horizontal[0];
  return { d: len > 0 ? [u / len, -w / len] : [0, 0], len, normal };
}

export interface Frame2D {
  /** Drawing units per metre. */
  readonly scale: number;
  /** Page point of a global point. */
  at(p: Vec3): Pt;
  /** Page point of view coordinates (u right, v up, metres). */
  atUV(u: number, v: number): Pt;
}

export interface Box {
  readonly uMin: number;
  readonly uMax: number;
  readonly vMin: number;
  readonly vMax: number;
}

export function boxOf(points: readonly Pt[]): Box {
  let uMin = Infinity;
  let uMax = -Infinity;
  let vMin = Infinity;
  let vMax = -Infinity;
  for (const [u, v] of points) {
    uMin = Math.min(uMin, u);
    uMax = Math.max(uMax, u);
    vMin = Math.min(vMin, v);
    vMax = Math.max(vMax, v);
  }
  return { uMin, uMax, vMin, vMax };
}

/** Fits a box of view coordinates into the page rectangle [left, top, width, height], centred. */
export function fitFrame(view: ViewKind, box: Box, left: number, top: number, width: number, height: number): Frame2D {
  const bw = Math.max(box.uMax - box.uMin, 1e-6);
  const bh = Math.max(box.vMax - box.vMin, 1e-6);
  const scale = Math.min(width / bw, height / bh);
  const x0 = left + (width - bw * scale) / 2;
  const y0 = top + (height - bh * scale) / 2;
  const atUV = (u: number, v: number): Pt => [x0 + (u - box.uMin) * scale, y0 + (box.vMax - v) * scale];
  return {
    scale,
    atUV,
    at: (p) => {
      const [u, v] = viewCoords(view, p);
      return atUV(u, v);
    },
  };
}
