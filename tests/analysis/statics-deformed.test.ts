// Statics check in the deformed configuration (second order): the force balance is exact, and the
// moment residual is exactly what the axial-force-only geometric stiffness leaves out.
//
// Fixed-free column of length L, tip loads P (down) and H (along X). Exact statics of the deformed
// column (equilibrium of the whole column about its base, any statics text, e.g. Hibbeler,
// Engineering Mechanics: Statics): the loads act at the displaced tip (Delta, 0, L - delta), so
//   applied moment about the base, component y:  H (L - delta) + P Delta.
// The geometric stiffness balances the axial force through the transverse displacement, P Delta,
// and nothing else, so the base moment of the analysis is H L + P Delta and the check is left with
//   residual moment, component y:  -H delta,   delta = P L / (E A)
// (axial shortening of a prismatic bar, Hooke's law, e.g. Gere & Timoshenko, Mechanics of
// Materials, section 2.2). The tip deflection Delta of the beam-column is the closed form of
// Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., section 1.11 (from memory):
//   Delta = H L^3 / (3 E I) * 3 (tan(alpha) - alpha) / alpha^3,  alpha = sqrt(P L^2 / (E I)).
import { describe, expect, it } from 'vitest';
import { analyzeCombination, solveLoads } from '../../src/analysis/analyze.ts';
import type { AppliedLoad, Combination, LoadCase } from '../../src/loads/load-types.ts';
import type { FrameModel } from '../../src/model/frame.ts';
import { FrameBuilder, nodal, roundTube } from './frame-helpers.ts';

const sec = roundTube(0.3, 0.008);
const EI = sec.E_Pa * sec.Iz_m4;
const EA = sec.E_Pa * sec.A_m2;
const L = 8;
const H = 3e3;
const P = 0.5 * ((Math.PI ** 2 * EI) / (4 * L ** 2));
const opts = { secondOrder: true, tolerance: 1e-12, maxIterations: 60, stationSpacing_m: 1 };

/** One combination of all the loads (factor 1), second order. */
function secondOrder(model: FrameModel, loads: AppliedLoad[]) {
  const cases: LoadCase[] = [{ id: 'all', kind: 'dead', description: 'all loads', windAngle_rad: null, loads, steps: [] }];
  const combo: Combination = {
    id: 'c', specId: 'c', category: 'strength', description: 'test', source: 'test', factors: [{ caseId: 'all', factor: 1 }],
  };
  return analyzeCombination(model, cases, combo, opts);
}

function column(n: number) {
  const b = new FrameBuilder();
  const base = b.node([0, 0, 0], 'base');
  b.fix(base);
  const ids = b.member('pole', 'pole', base, [0, 0, L], n, () => sec, { tipTag: 'pole-top' });
  return { model: b.build(), tip: ids[ids.length - 1] };
}

describe('deformed-configuration statics of a beam-column (statics; Hooke; Timoshenko & Gere 1.11)', () => {
  const { model, tip } = column(16);
  const s = secondOrder(model, [nodal(tip, [H, 0, -P])]).statics;

  it('force balance is exact (round-off)', () => {
    expect(s.configuration).toBe('deformed');
    expect(s.relativeForceResidual).toBeLessThan(1e-12);
  });

  it('moment residual equals -H P L / (E A): the shear through the axial shortening, left out by the method', () => {
    const expected = (-H * P * L) / EA;
    // 1e-6: round-off of moment sums about 1e4 times larger than the residual
    expect(Math.abs(s.residualMoment_Nm[1] - expected) / Math.abs(expected)).toBeLessThan(1e-6);
    expect(Math.abs(s.residualMoment_Nm[0])).toBeLessThan(1e-9 * H * L);
    expect(Math.abs(s.residualMoment_Nm[2])).toBeLessThan(1e-9 * H * L);
    expect(s.relativeResidual).toBe(Math.max(s.relativeForceResidual, s.relativeMomentResidual));
  });

  it('reports the residual as a share of the moment the displacements add: H delta / ((P + H) |u_tip|)', () => {
    const alpha = Math.sqrt((P * L ** 2) / EI);
    const Delta = ((H * L ** 3) / (3 * EI)) * ((3 * (Math.tan(alpha) - alpha)) / alpha ** 3);
    const delta = (P * L) / EA;
    // the sum of |applied forces| is |(H, 0, -P)|: one load
    const share = (H * delta) / (Math.hypot(H, P) * Math.hypot(Delta, delta));
    // 0.2 %: the discretised beam-column against the closed form (tests/analysis/p-delta.test.ts uses 0.1 %)
    expect(Math.abs(s.momentResidualShare! - share) / share).toBeLessThan(0.002);
    expect(s.displacementMoment_Nm).toBeGreaterThan(0);
  });
});

describe('the same beam-column with the tip loads on the end of the top element, as the package places an attachment (statics; Hooke)', () => {
  // A load at an element end is carried by that element in full; the residual is then the same
  // -H P L / (E A) as with nodal loads, and nothing of the P-delta moment is missing from it.
  it('moment residual equals -H P L / (E A) at 4 and 16 elements', () => {
    for (const n of [4, 16]) {
      const { model } = column(n);
      const top = model.elements.length - 1;
      const at = (direction: [number, number, number], value: number): AppliedLoad => ({
        kind: 'point-force', element: top, axes: 'global', direction, value, a_m: L / n, origin: { source: 'test' },
      });
      const st = secondOrder(model, [at([1, 0, 0], H), at([0, 0, -1], P)]).statics;
      const expected = (-H * P * L) / EA;
      // 1e-6 as above: round-off of moment sums about 1e4 times the residual
      expect(Math.abs(st.residualMoment_Nm[1] - expected) / Math.abs(expected), `${n} elements`).toBeLessThan(1e-6);
    }
  });
});

describe('3D pole and arm in second order: forces balance exactly, moments leave a small share (statics)', () => {
  it('weight on the arm tip and a lateral load across the arm', () => {
    const b = new FrameBuilder();
    const base = b.node([0, 0, 0], 'base');
    b.fix(base);
    const pole = b.member('pole', 'pole', base, [0, 0, 7], 10, () => sec, { tipTag: 'pole-top' });
    const top = pole[pole.length - 1];
    const arm = b.member('A1', 'arm', top, [9.15, 0, 7], 12, () => sec, { offsetRoot: [0.15, 0, 0], tipTag: 'arm-tip:A1' });
    const s = secondOrder(b.build(), [nodal(arm[arm.length - 1], [0, 4e3, -6e3]), nodal(top, [0, 0, -2e4])]).statics;
    // statics: the geometric stiffness adds only self-balanced end forces. 1e-10: round-off of
    // reactions rebuilt from end forces of stiff elements (a left-out term would be ~1e-4 here)
    expect(s.relativeForceResidual).toBeLessThan(1e-10);
    // the omitted terms are products of forces and displacements, a part of the displacement moment
    expect(s.relativeMomentResidual).toBeGreaterThan(1e-12);
    expect(s.momentResidualShare!).toBeLessThan(1);
  });
});

describe('first order stays exact in both balances (statics)', () => {
  it('relative force and moment residuals at round-off; no displacement share', () => {
    const { model, tip } = column(4);
    const s = solveLoads(model, [nodal(tip, [H, 0, -P])]).statics;
    expect(s.configuration).toBe('undeformed');
    expect(s.relativeForceResidual).toBeLessThan(1e-12);
    expect(s.relativeMomentResidual).toBeLessThan(1e-12);
    expect(s.displacementMoment_Nm).toBe(0);
    expect(s.momentResidualShare).toBeNull();
  });
});
