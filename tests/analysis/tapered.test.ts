// Tapered cantilever pole as a chain of prismatic segments against numerical integration of
// M/EI along the exact continuous taper (unit-load / moment-area method, e.g. Hibbeler,
// Structural Analysis, ch. 8-9): tip deflection = integral of P (L - x)^2 / (E I(x)) dx,
// tip rotation = integral of P (L - x) / (E I(x)) dx. The reference uses composite Simpson with
// 20 000 intervals (error far below 1e-8). Discretisation error of the segment chain (I at the
// segment's mid-length diameter) falls as 1/n^2: tolerance 0.2 % at 40 segments.
import { describe, expect, it } from 'vitest';
import { solveLoads } from '../../src/analysis/analyze.ts';
import { FrameBuilder, nodal, roundTube } from './frame-helpers.ts';

const L = 10;
const D0 = 0.45;
const D1 = 0.2;
const t = 0.006;
const E = 200e9;
const P = 4e3;
const diameter = (x: number): number => D0 + ((D1 - D0) * x) / L;
const I = (x: number): number => roundTube(diameter(x), t, E).Iz_m4;

function simpson(f: (x: number) => number, n = 20000): number {
  const hh = L / n;
  let s = f(0) + f(L);
  for (let k = 1; k < n; k++) s += (k % 2 ? 4 : 2) * f(k * hh);
  return (s * hh) / 3;
}

function solve(n: number) {
  const b = new FrameBuilder();
  const base = b.node([0, 0, 0], 'base');
  b.fix(base);
  const ids = b.member('pole', 'pole', base, [0, 0, L], n, (_k, sMid) => roundTube(diameter(sMid), t, E));
  const res = solveLoads(b.build(), [nodal(ids[ids.length - 1], [P, 0, 0])]);
  return res.displacements[ids[ids.length - 1]];
}

describe('tapered cantilever pole vs integration of M/EI on the continuous taper', () => {
  const deflection = simpson((x) => (P * (L - x) ** 2) / (E * I(x)));
  const rotation = simpson((x) => (P * (L - x)) / (E * I(x)));
  it('tip deflection and rotation within 0.2 % at 40 segments, converging as segments grow', () => {
    const u40 = solve(40);
    expect(Math.abs(u40[0] - deflection) / deflection).toBeLessThan(0.002);
    expect(Math.abs(u40[4] - rotation) / rotation).toBeLessThan(0.002);
    const e10 = Math.abs(solve(10)[0] - deflection);
    const e40 = Math.abs(u40[0] - deflection);
    // second-order convergence: quadrupling n cuts the error by about 16 (at least 8 here)
    expect(e40).toBeLessThan(e10 / 8);
  });
});
