// Second-order (P-delta) analysis of the amplified cantilever: fixed-free column of length L,
// lateral tip load H and axial compression P. Closed form (Timoshenko & Gere, Theory of Elastic
// Stability, 2nd ed., section 1.11 "beam-columns", from memory; also the benchmark problem of the
// AISC 360 Commentary, Appendix / C2 "Calculation of required strengths"):
//   alpha = sqrt(P L^2 / (E I)), base moment H L tan(alpha) / alpha,
//   tip deflection H L^3 / (3 E I) * 3 (tan(alpha) - alpha) / alpha^3,
//   moment at distance z below the tip (H / k) sin(k z) / cos(k L), k = alpha / L.
//   Critical load Pcr = pi^2 E I / (4 L^2).
// The closed form neglects axial shortening: A x 1e4 here. 24 segments; the consistent geometric
// stiffness converges fast: tolerance 0.1 % (0.3 % at P/Pcr = 0.8).
import { describe, expect, it } from 'vitest';
import { analyzeCombination } from '../../src/analysis/analyze.ts';
import { UnstableStructureError } from '../../src/errors.ts';
import type { Combination, LoadCase } from '../../src/loads/load-types.ts';
import { FrameBuilder, nodal, roundTube, type Section } from './frame-helpers.ts';

const base = roundTube(0.3, 0.008);
const sec: Section = { ...base, A_m2: base.A_m2 * 1e4 };
const EI = sec.E_Pa * sec.Iz_m4;
const L = 8;
const H = 3e3;
const Pcr = (Math.PI ** 2 * EI) / (4 * L ** 2);

/** lateral: 0 bends the column in its local x-y plane (load along X = local y), 1 in x-z (load along Y = local z). */
function column(P: number, lateral: 0 | 1 = 0) {
  const b = new FrameBuilder();
  const b0 = b.node([0, 0, 0], 'base');
  b.fix(b0);
  const ids = b.member('pole', 'pole', b0, [0, 0, L], 24, () => sec, { tipTag: 'pole-top' });
  const tip = ids[ids.length - 1];
  const cases: LoadCase[] = [
    { id: 'gravity', kind: 'dead', description: 'axial', windAngle_rad: null, loads: [nodal(tip, [0, 0, -P])], steps: [] },
    { id: 'lateral', kind: 'wind', description: 'lateral', windAngle_rad: 0, loads: [nodal(tip, lateral === 0 ? [H, 0, 0] : [0, H, 0])], steps: [] },
  ];
  const combo: Combination = {
    id: 'test-combo', specId: 'test', category: 'strength', description: 'P + H', source: 'test',
    factors: [{ caseId: 'gravity', factor: 1 }, { caseId: 'lateral', factor: 1 }],
  };
  return { model: b.build(), cases, combo, tip };
}

const opts = { secondOrder: true, tolerance: 1e-10, maxIterations: 50, stationSpacing_m: 1 };

describe('amplified cantilever (Timoshenko & Gere; AISC 360 Commentary C2 benchmark)', () => {
  for (const [ratio, lateral] of [[0.2, 0], [0.5, 0], [0.8, 0], [0.5, 1], [0.8, 1]] as const) {
    it(`P/Pcr = ${ratio}, lateral load along ${lateral === 0 ? 'X (local y)' : 'Y (local z)'}`, () => {
      const P = ratio * Pcr;
      const { model, cases, combo, tip } = column(P, lateral);
      const r = analyzeCombination(model, cases, combo, opts);
      const alpha = Math.sqrt((P * L ** 2) / EI);
      const tol = ratio > 0.7 ? 0.003 : 0.001;
      const Mbase = (H * L * Math.tan(alpha)) / alpha;
      // base moment from the reaction and from the member's root station
      expect(Math.abs(Math.hypot(r.reactions[0].force[3], r.reactions[0].force[4]) - Mbase) / Mbase).toBeLessThan(tol);
      const root = r.members.pole.stations[0];
      expect(Math.abs(Math.hypot(root.My_Nm, root.Mz_Nm) - Mbase) / Mbase).toBeLessThan(tol);
      // amplification reported against the first-order base moment H L
      expect(Math.abs(r.baseMoment!.amplification! - Math.tan(alpha) / alpha) / (Math.tan(alpha) / alpha)).toBeLessThan(tol);
      expect(Math.abs(r.baseMoment!.firstOrder_Nm - H * L) / (H * L)).toBeLessThan(1e-9);
      // tip deflection
      const d = ((H * L ** 3) / (3 * EI)) * (3 * (Math.tan(alpha) - alpha)) / alpha ** 3;
      expect(Math.abs(r.displacements[tip][lateral] - d) / d).toBeLessThan(tol);
      // member forces carry the second-order effect along the member: M at mid-height
      const k = alpha / L;
      const mid = r.members.pole.stations.find((s) => Math.abs(s.s_m - L / 2) < 1e-9)!;
      const Mmid = ((H / k) * Math.sin((k * L) / 2)) / Math.cos(k * L);
      expect(Math.abs(Math.hypot(mid.My_Nm, mid.Mz_Nm) - Mmid) / Mmid).toBeLessThan(tol);
      // exact extreme = base moment; axial force = -P (compression) everywhere
      expect(Math.abs(r.members.pole.extremes.Mres.max.value - Mbase) / Mbase).toBeLessThan(tol);
      for (const s of r.members.pole.stations) expect(Math.abs(s.N_N + P) / P).toBeLessThan(1e-6);
      // equilibrium in the deformed configuration: base moment = H L + P * tip sway (statics)
      expect(r.statics.configuration).toBe('deformed');
      expect(r.statics.relativeResidual).toBeLessThan(1e-3);
      expect(r.iterations).toBeGreaterThan(1);
      expect(r.convergence.change).toBeLessThan(opts.tolerance);
    });
  }

  it('first-order analysis of the same combination gives H L (no amplification)', () => {
    const { model, cases, combo } = column(0.5 * Pcr);
    const r = analyzeCombination(model, cases, combo, { ...opts, secondOrder: false });
    expect(Math.abs(Math.abs(r.reactions[0].force[4]) - H * L) / (H * L)).toBeLessThan(1e-9);
    expect(r.iterations).toBe(1);
    expect(r.baseMoment!.amplification).toBeCloseTo(1, 12);
  });

  it('past the critical load (P = 1.1 Pcr) the analysis throws UnstableStructureError naming the combination', () => {
    const { model, cases, combo } = column(1.1 * Pcr);
    let caught: unknown = null;
    try {
      analyzeCombination(model, cases, combo, opts);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(UnstableStructureError);
    const err = caught as UnstableStructureError;
    expect(err.message).toContain('test-combo');
    expect(err.detail.combination).toBe('test-combo');
    expect(err.exitCode).toBe(3);
    // The first buckling mode of a fixed-free column, 1 - cos(pi z / 2L) (Timoshenko & Gere,
    // Theory of Elastic Stability, section 2.1), moves most at the free top, z = L.
    expect(err.detail.place).toEqual({ member: 'pole', s_m: L });
    expect(err.message).toContain('the buckling mode moves most on pole, 8 m above base');
  });

  it('an iteration that does not converge (2 solutions allowed at P = 0.97 Pcr) names the combination and the free top', () => {
    const { model, cases, combo } = column(0.97 * Pcr);
    let caught: unknown = null;
    try {
      analyzeCombination(model, cases, combo, { ...opts, maxIterations: 2 });
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(UnstableStructureError);
    const err = caught as UnstableStructureError;
    expect(err.message).toMatch(/^combination test-combo: the second-order analysis did not converge in 2 iterations/);
    // fixed-free column mode 1 - cos(pi z / 2L) (Timoshenko & Gere, as above): largest at z = L
    expect(err.detail.place).toEqual({ member: 'pole', s_m: L });
    expect(err.message).toContain('; the buckling mode moves most on pole, 8 m above base');
  });

  it('just below the critical load (P = 0.97 Pcr) still converges, with amplification about 1/(1 - P/Pcr)', () => {
    const P = 0.97 * Pcr;
    const { model, cases, combo } = column(P);
    const r = analyzeCombination(model, cases, combo, opts);
    const alpha = Math.sqrt((P * L ** 2) / EI);
    // Timoshenko & Gere closed form again; tolerance 1 % this close to Pcr
    expect(Math.abs(r.baseMoment!.amplification! - Math.tan(alpha) / alpha) / (Math.tan(alpha) / alpha)).toBeLessThan(0.01);
  });
});

describe('the place a lost stability is reported at: the largest movement of the buckling mode', () => {
  // Column fixed at the base and held laterally at the top (fixed-hinged). Its first buckling mode
  // (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., chapter 2, column with one end built in
  // and the other hinged; from memory): tan(kL) = kL, kL = 4.4934, Pcr = (kL)² EI / L², shape
  // w(x) = sin kx - kL cos kx - kx + kL, largest where w' = 0: cos kx + kL sin kx = 1, near x = 0.6 L.
  // A lateral load at a quarter of the height moves the column most lower down, so the place comes
  // from the mode and not from the displacements. The place is a node: within one element, L/24.
  it('names the pole and the height of the mode maximum, not the top or the loaded node', () => {
    const kL = 4.4934;
    const PcrFH = (kL ** 2 * EI) / L ** 2;
    const b = new FrameBuilder();
    const b0 = b.node([0, 0, 0], 'base');
    b.fix(b0);
    const ids = b.member('pole', 'pole', b0, [0, 0, L], 24, () => sec, { tipTag: 'pole-top' });
    const top = ids[ids.length - 1];
    b.supports.push({ node: top, fixed: [true, true, false, false, false, false], springs: [0, 0, 0, 0, 0, 0] });
    const quarter = ids[6];
    const cases: LoadCase[] = [
      { id: 'gravity', kind: 'dead', description: 'axial', windAngle_rad: null, loads: [nodal(top, [0, 0, -1.1 * PcrFH])], steps: [] },
      { id: 'lateral', kind: 'wind', description: 'lateral', windAngle_rad: 0, loads: [nodal(quarter, [H, 0, 0])], steps: [] },
    ];
    const combo: Combination = {
      id: 'held-top', specId: 'test', category: 'strength', description: 'P + H', source: 'test',
      factors: [{ caseId: 'gravity', factor: 1 }, { caseId: 'lateral', factor: 1 }],
    };
    // x of the mode maximum by bisection of cos kx + kL sin kx - 1 on (0.3 L, 0.9 L)
    const g = (x: number) => Math.cos((kL * x) / L) + kL * Math.sin((kL * x) / L) - 1;
    let lo = 0.3 * L;
    let hi = 0.9 * L;
    for (let k = 0; k < 60; k++) {
      const mid = (lo + hi) / 2;
      if (Math.sign(g(mid)) === Math.sign(g(lo))) lo = mid;
      else hi = mid;
    }
    let caught: unknown = null;
    try {
      analyzeCombination(b.build(), cases, combo, opts);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(UnstableStructureError);
    const err = caught as UnstableStructureError;
    expect(err.detail.place?.member).toBe('pole');
    expect(Math.abs(err.detail.place!.s_m - lo)).toBeLessThanOrEqual(L / 24 + 1e-9);
    expect(err.message).toMatch(/^combination held-top: .*the buckling mode moves most on pole, [\d.]+ m above base$/);
    expect(err.exitCode).toBe(3);
  });
});
