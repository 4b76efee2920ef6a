// Components of a vector, each printed with its unit (for tables with one column per component);
// a component at round-off level of the largest prints as 0.
import type { Vec3 } from '../../model/frame.ts';
import type { Dim } from '../../units/units.ts';
import type { Display } from './display.ts';
import { withoutRoundOff } from './round-off.ts';

/** scale: the size that round-off is judged against, by default the largest component; share: of the scale (round-off.ts). */
export function vecText(v: Vec3, dim: Dim, d: Display, scale?: number, share?: number): [string, string, string] {
  const big = scale ?? Math.max(Math.abs(v[0]), Math.abs(v[1]), Math.abs(v[2]));
  const one = (x: number) => d.q(withoutRoundOff(x, big, share), dim);
  return [one(v[0]), one(v[1]), one(v[2])];
}
