// Geometry of one element: its ends after rigid offsets, clear length and local axes.
import type { FrameElement, FrameModel, Vec3 } from '../model/frame.ts';

export interface ElementGeometry {
  /** Positions of the element's ends i and j (node + rigid offset), global. */
  readonly endI: Vec3;
  readonly endJ: Vec3;
  /** Clear length between the ends. */
  readonly L: number;
  /** Rotation global -> local, row-major 3x3: rows are the local x, y, z unit vectors. */
  readonly R: Float64Array;
}

const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const norm = (a: Vec3): number => Math.sqrt(dot(a, a));
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];

/** Local axes: x along the element; y = refVector made perpendicular to x; z = x cross y.
 * A vertical member needs nothing special: its refVector (given per element) fixes y. */
export function elementGeometry(model: FrameModel, el: FrameElement): ElementGeometry {
  const endI = add(model.nodes[el.i].xyz_m, el.offsetI_m);
  const endJ = add(model.nodes[el.j].xyz_m, el.offsetJ_m);
  const d = sub(endJ, endI);
  const L = norm(d);
  if (!(L > 1e-9)) throw new Error(`element ${el.id} (${el.member}) has zero clear length`);
  const ex: Vec3 = [d[0] / L, d[1] / L, d[2] / L];
  const ref = el.refVector;
  const along = dot(ref, ex);
  const yRaw = sub(ref, [along * ex[0], along * ex[1], along * ex[2]]);
  const ny = norm(yRaw);
  // A reference vector within 0.06 degrees of the axis leaves local y ill-defined.
  if (!(ny > 1e-3 * norm(ref))) {
    throw new Error(`element ${el.id} (${el.member}): refVector is parallel to the element axis`);
  }
  const ey: Vec3 = [yRaw[0] / ny, yRaw[1] / ny, yRaw[2] / ny];
  const ez = cross(ex, ey);
  const R = new Float64Array([...ex, ...ey, ...ez]);
  return { endI, endJ, L, R };
}

/** local = R * global */
export function toLocal3(R: Float64Array, v: Vec3): [number, number, number] {
  return [
    R[0] * v[0] + R[1] * v[1] + R[2] * v[2],
    R[3] * v[0] + R[4] * v[1] + R[5] * v[2],
    R[6] * v[0] + R[7] * v[1] + R[8] * v[2],
  ];
}

/** global = R^T * local */
export function toGlobal3(R: Float64Array, v: Vec3): [number, number, number] {
  return [
    R[0] * v[0] + R[3] * v[1] + R[6] * v[2],
    R[1] * v[0] + R[4] * v[1] + R[7] * v[2],
    R[2] * v[0] + R[5] * v[1] + R[8] * v[2],
  ];
}
