// Components of a vector, each printed with its unit (for tables with one column per component).
import type { Vec3 } from '../../model/frame.ts';
import type { Dim } from '../../units/units.ts';
import type { Display } from './display.ts';

/** Rounding noise below this fraction of the largest component prints as 0. */
const NOISE = 1e-9;

export function vecText(v: Vec3, dim: Dim, d: Display): [string, string, string] {
  const big = Math.max(Math.abs(v[0]), Math.abs(v[1]), Math.abs(v[2]));
  const one = (x: number) => d.q(Math.abs(x) <= NOISE * big ? 0 : x, dim);
  return [one(v[0]), one(v[1]), one(v[2])];
}
