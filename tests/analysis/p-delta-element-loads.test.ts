// Second order with the loads applied the way the package applies them: an attachment at a node is
// an element point load at the end of the element that carries it, self-weight is a distributed
// load. The geometric stiffness must use the axial force each element really carries.
//
// Closed forms (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., from memory):
// - amplified cantilever (section 1.11): fixed-free column of length L, axial compression P and lateral
//   tip load H; kL = (pi / 2) sqrt(P / Pcr), Pcr = pi^2 E I / (4 L^2);
//   base moment H L tan(kL) / kL, tip deflection H L^3 / (3 E I) * 3 (tan kL - kL) / (kL)^3.
//   At P = 0.5 Pcr: 1.81683 and 1.98629; at 0.8 Pcr: 4.25262 and 4.94339 (tan computed here).
// - heavy column (section 2.10, the column under its own weight): a fixed-free column of uniform
//   weight q per length buckles at (q L)cr = 7.837 E I / L^2.
// Round tube D = 500 mm, t = 8 mm, L = 4 m, E = 200 GPa (typical steel, verify).
import { describe, expect, it } from 'vitest';
import { analyzeCombination } from '../../src/analysis/analyze.ts';
import { UnstableStructureError } from '../../src/errors.ts';
import type { AppliedLoad, Combination, LoadCase } from '../../src/loads/load-types.ts';
import type { Vec3 } from '../../src/model/frame.ts';
import { FrameBuilder, roundTube, uniformOn } from './frame-helpers.ts';

const sec = roundTube(0.5, 0.008);
const EI = sec.E_Pa * sec.Iz_m4;
const L = 4;
const Pcr = (Math.PI ** 2 * EI) / (4 * L ** 2);
const H = 1e3;
const opts = { secondOrder: true, tolerance: 1e-12, maxIterations: 100, stationSpacing_m: 1 };

const tipForce = (element: number, a_m: number, direction: Vec3, value: number): AppliedLoad => ({
  kind: 'point-force', element, axes: 'global', direction, value, a_m, origin: { source: 'test' },
});

const combo: Combination = {
  id: 'c', specId: 'c', category: 'strength', description: 'test', source: 'test',
  factors: [{ caseId: 'all', factor: 1 }],
};
const oneCase = (loads: AppliedLoad[]): LoadCase[] => [{ id: 'all', kind: 'dead', description: 'test', windAngle_rad: null, loads, steps: [] }];

/** A cantilever along `axis` from the origin in n elements; the loads at its tip act on the last
 * element at a = L/n (its end), as the package places an attachment at a node. */
function cantileverWithEndLoads(n: number, axis: Vec3, axial: Vec3, lateral: Vec3, P: number) {
  const b = new FrameBuilder();
  const base = b.node([0, 0, 0], 'base');
  b.fix(base);
  const nodes = b.member('m', axis[2] === 1 ? 'pole' : 'arm', base, [axis[0] * L, axis[1] * L, axis[2] * L], n, () => sec);
  const last = n - 1;
  const loads = [tipForce(last, L / n, axial, P), tipForce(last, L / n, lateral, H)];
  const r = analyzeCombination(b.build(), oneCase(loads), combo, opts);
  return { r, tip: nodes[nodes.length - 1] };
}

function amplifications(ratio: number) {
  const kL = (Math.PI / 2) * Math.sqrt(ratio);
  return { moment: Math.tan(kL) / kL, tip: (3 * (Math.tan(kL) - kL)) / kL ** 3 };
}

describe('amplified cantilever with the head load on the top element (Timoshenko & Gere 1.11)', () => {
  it('the closed forms give the printed amplifications', () => {
    // The values the closed form gives at 0.5 and 0.8 Pcr, printed to 6 figures (evaluated by hand).
    expect(amplifications(0.5).moment).toBeCloseTo(1.81683, 5);
    expect(amplifications(0.8).moment).toBeCloseTo(4.25262, 5);
    expect(amplifications(0.5).tip).toBeCloseTo(1.98629, 5);
    expect(amplifications(0.8).tip).toBeCloseTo(4.94339, 5);
  });

  for (const ratio of [0.5, 0.8]) {
    it(`P = ${ratio} Pcr: base moment within 0.01 %, tip deflection within 0.02 % at 4 segments`, () => {
      const exact = amplifications(ratio);
      const { r, tip } = cantileverWithEndLoads(4, [0, 0, 1], [0, 0, -1], [1, 0, 0], ratio * Pcr);
      const M = Math.hypot(r.reactions[0].force[3], r.reactions[0].force[4]);
      // Tolerance 0.01 % on the base moment: a consistent geometric stiffness with the right axial
      // force is this close at 4 elements (measured 0.0007 % at 0.5 Pcr, 0.008 % at 0.8 Pcr). The tip
      // deflection converges a little more slowly (measured 0.0016 % and 0.0105 %): 0.02 %.
      expect(Math.abs(M / (H * L) / exact.moment - 1)).toBeLessThan(1e-4);
      expect(Math.abs(r.baseMoment!.amplification! / exact.moment - 1)).toBeLessThan(1e-4);
      const d1 = (H * L ** 3) / (3 * EI);
      expect(Math.abs(r.displacements[tip][0] / d1 / exact.tip - 1)).toBeLessThan(2e-4);
      // Every element carries the whole head load: its geometric stiffness uses -P.
      for (const e of r.elementEndForces) expect(Math.abs(e.Ngeometric_N / (-ratio * Pcr) - 1)).toBeLessThan(1e-9);
    });
  }

  it('the error falls at least as 1/n^2 when the segments double (P = 0.8 Pcr)', () => {
    const exact = amplifications(0.8).moment;
    const error = (n: number): number => {
      const { r } = cantileverWithEndLoads(n, [0, 0, 1], [0, 0, -1], [1, 0, 0], 0.8 * Pcr);
      return Math.abs(r.baseMoment!.amplification! - exact);
    };
    const [e2, e4, e8] = [error(2), error(4), error(8)];
    // 1/n^2 divides the error by 4 per halving of the element length; a method that counts half of
    // an end load (1/n) divides it by 2. Measured: about 16 (1/n^4, the order of the cubic
    // element with its consistent geometric stiffness).
    expect(e2 / e4).toBeGreaterThan(4);
    expect(e4 / e8).toBeGreaterThan(4);
  });

  it('a load anywhere along the top element counts only below its point (P at mid-element)', () => {
    // Two elements; the head load at mid-length of the top element: the lower element carries P,
    // the top element carries P over half its length, so its length-weighted mean is P / 2.
    const b = new FrameBuilder();
    const base = b.node([0, 0, 0], 'base');
    b.fix(base);
    b.member('m', 'pole', base, [0, 0, L], 2, () => sec);
    const P = 0.3 * Pcr;
    const r = analyzeCombination(b.build(), oneCase([tipForce(1, L / 4, [0, 0, -1], P), tipForce(1, L / 2, [1, 0, 0], H)]), combo, opts);
    expect(r.elementEndForces[0].Ngeometric_N / -P).toBeCloseTo(1, 9);
    expect(r.elementEndForces[1].Ngeometric_N / -P).toBeCloseTo(0.5, 9);
  });
});

describe('an arm loaded along its axis (the same closed form, horizontal)', () => {
  for (const ratio of [0.5, 0.8]) {
    it(`horizontal cantilever, axial tip load ${ratio} Pcr toward the root and a vertical tip load: base moment within 0.01 %`, () => {
      const exact = amplifications(ratio);
      const { r, tip } = cantileverWithEndLoads(4, [1, 0, 0], [-1, 0, 0], [0, 0, -1], ratio * Pcr);
      // Tolerances as for the pole above (0.01 % moment, 0.02 % deflection at 4 elements).
      expect(Math.abs(r.baseMoment!.amplification! / exact.moment - 1)).toBeLessThan(1e-4);
      const d1 = (H * L ** 3) / (3 * EI);
      expect(Math.abs(-r.displacements[tip][2] / d1 / exact.tip - 1)).toBeLessThan(2e-4);
      for (const e of r.elementEndForces) expect(Math.abs(e.Ngeometric_N / (-ratio * Pcr) - 1)).toBeLessThan(1e-9);
    });
  }
});

describe('heavy column: buckling under its own weight (Timoshenko & Gere 2.10, (qL)cr = 7.837 EI/L^2)', () => {
  const qcr = (7.837 * EI) / L ** 3;
  /** Self-weight-like load q on each of n elements, plus a small lateral tip load. */
  const heavy = (q: number, n: number) => {
    const b = new FrameBuilder();
    const base = b.node([0, 0, 0], 'base');
    b.fix(base);
    b.member('m', 'pole', base, [0, 0, L], n, () => sec);
    const loads: AppliedLoad[] = Array.from({ length: n }, (_, e) => uniformOn(e, L / n, [0, 0, -1], q));
    loads.push(tipForce(n - 1, L / n, [1, 0, 0], H));
    return () => analyzeCombination(b.build(), oneCase(loads), combo, opts);
  };
  // Tolerance 0.5 %: 7.837 is printed to 4 figures (0.01 %); 16 elements are well converged.
  it('stable at 0.995 of the critical weight', () => {
    expect(() => heavy(0.995 * qcr, 16)()).not.toThrow();
  });
  it('unstable at 1.005 of the critical weight', () => {
    expect(() => heavy(1.005 * qcr, 16)()).toThrow(UnstableStructureError);
  });
  it('the axial force of each element is the weight above its mid-length', () => {
    const n = 8;
    const q = 0.3 * qcr;
    const r = heavy(q, n)();
    r.elementEndForces.forEach((e, k) => {
      const above = q * (L - ((k + 0.5) * L) / n);
      expect(e.Ngeometric_N / -above).toBeCloseTo(1, 9);
    });
  });
});
