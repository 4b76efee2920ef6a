// Small 3-vector helpers for the CalculiX harness (the analysis keeps its own; the reference
// side must not borrow code from the program it checks).
import type { Vec3 } from '../../../src/model/frame.ts';

export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const scale = (a: Vec3, k: number): Vec3 => [a[0] * k, a[1] * k, a[2] * k];
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
export const norm = (a: Vec3): number => Math.sqrt(dot(a, a));
export function unit(a: Vec3): Vec3 {
  const n = norm(a);
  if (n === 0) throw new Error('CalculiX harness: zero-length vector');
  return scale(a, 1 / n);
}
/** Unit vector perpendicular to axis, in the plane of axis and ref (Gram-Schmidt). */
export function perpendicularIn(axis: Vec3, ref: Vec3): Vec3 {
  const x = unit(axis);
  const y = sub(ref, scale(x, dot(ref, x)));
  if (norm(y) < 1e-9 * norm(ref)) throw new Error('CalculiX harness: reference vector parallel to member');
  return unit(y);
}
/** Any unit vector perpendicular to axis (for stubs whose roll does not matter). */
export function anyPerpendicular(axis: Vec3): Vec3 {
  const x = unit(axis);
  const trial: Vec3 = Math.abs(x[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
  return perpendicularIn(x, trial);
}
