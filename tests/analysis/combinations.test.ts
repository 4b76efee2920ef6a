// Combinations: each is its own analysis with loads combined before solving; results are frozen
// and keyed by combination id; the envelope names the governing combination and place.
// Reference values: the cantilever closed forms (AISC Steel Construction Manual, Table 3-23:
// cantilever beam, concentrated load at free end / uniformly distributed load) and the amplified
// cantilever (Timoshenko & Gere, Theory of Elastic Stability, beam-column; from memory).
import { describe, expect, it } from 'vitest';
import { analyzeAll } from '../../src/analysis/analyze.ts';
import { envelope } from '../../src/analysis/envelope.ts';
import type { Combination, LoadCase } from '../../src/loads/load-types.ts';
import { cantilever, nodal, roundTube, type Section } from './frame-helpers.ts';

const base = roundTube(0.3, 0.008);
const sec: Section = { ...base, A_m2: base.A_m2 * 1e4 }; // closed forms neglect axial shortening
const EI = sec.E_Pa * sec.Iz_m4;
const L = 8;
const { model, nodes } = cantilever(L, 16, [0, 0, 1], sec);
const tip = nodes[nodes.length - 1];
const W = 40e3; // vertical load at the top
const H = 2e3; // lateral load at the top

const cases: LoadCase[] = [
  { id: 'dead', kind: 'dead', description: 'top weight', windAngle_rad: null, loads: [nodal(tip, [0, 0, -W])], steps: [] },
  { id: 'wind-000', kind: 'wind', description: 'wind +X', windAngle_rad: 0, loads: [nodal(tip, [H, 0, 0])], steps: [] },
];
const combo = (id: string, d: number, w: number): Combination => ({
  id, specId: id.split('@')[0], category: 'strength', description: id, source: 'test',
  factors: [{ caseId: 'dead', factor: d }, { caseId: 'wind-000', factor: w }],
});
const combos = [combo('a@wind-000', 1.2, 1.0), combo('b@wind-000', 0.9, 1.6), combo('c@wind-000', 1.0, -1.0)];

describe('analyzeAll and envelope', () => {
  it('first order: each combination equals the closed form of its combined loads; envelope names the governing one', () => {
    const res = analyzeAll(model, cases, combos, { secondOrder: false, tolerance: 1e-9, maxIterations: 20, stationSpacing_m: 0.5 });
    expect(Object.keys(res)).toEqual(combos.map((c) => c.id));
    for (const c of combos) {
      const h = c.factors[1].factor * H;
      // AISC Table 3-23: tip deflection H L^3 / (3 E I), base moment H L
      expect(Math.abs(res[c.id].displacements[tip][0] - (h * L ** 3) / (3 * EI))).toBeLessThan(1e-9 * Math.abs((h * L ** 3) / (3 * EI)));
      expect(Math.abs(res[c.id].members.m.extremes.Mres.max.value - Math.abs(h) * L)).toBeLessThan(1e-9 * Math.abs(h) * L);
    }
    const env = envelope(res, 'm', 'Mres');
    expect(env.max.combination).toBe('b@wind-000');
    expect(env.max.value).toBeCloseTo(1.6 * H * L, 6);
    expect(env.max.s_m).toBeCloseTo(0, 9);
    const n = envelope(res, 'm', 'N');
    // the most compressive axial force comes from 1.2 x dead
    expect(n.min.combination).toBe('a@wind-000');
    expect(n.min.value).toBeCloseTo(-1.2 * W, 6);
  });

  it('results are immutable', () => {
    const res = analyzeAll(model, cases, combos.slice(0, 1), { secondOrder: false, tolerance: 1e-9, maxIterations: 20, stationSpacing_m: 1 });
    const r = res['a@wind-000'];
    expect(Object.isFrozen(res)).toBe(true);
    expect(Object.isFrozen(r.displacements)).toBe(true);
    expect(Object.isFrozen(r.displacements[tip])).toBe(true);
    expect(Object.isFrozen(r.members.m.stations[0])).toBe(true);
    expect(() => {
      (r.displacements as unknown as number[][])[tip][0] = 1;
    }).toThrow();
  });

  it('second order: loads are combined before solving (superposing case results would be wrong)', () => {
    const opts = { secondOrder: true, tolerance: 1e-10, maxIterations: 50, stationSpacing_m: 1 };
    const res = analyzeAll(model, cases, combos, opts);
    for (const c of combos) {
      const P = c.factors[0].factor * W;
      const h = Math.abs(c.factors[1].factor * H);
      const alpha = Math.sqrt((P * L ** 2) / EI);
      // Timoshenko & Gere: base moment H L tan(alpha) / alpha; 0.1 % at 16 segments
      const M = (h * L * Math.tan(alpha)) / alpha;
      expect(Math.abs(res[c.id].members.m.extremes.Mres.max.value - M) / M).toBeLessThan(0.001);
    }
    // wind alone gives no P-delta: superposing 'dead' and 'wind' results would give H L, not the above
    const single = analyzeAll(model, cases, [combo('w', 0, 1.0)], opts);
    const sum = single.w.members.m.extremes.Mres.max.value;
    expect(Math.abs(sum - H * L) / (H * L)).toBeLessThan(1e-6);
    expect(res['a@wind-000'].members.m.extremes.Mres.max.value).toBeGreaterThan(1.05 * H * L);
  });

  it('a combination naming a missing case is an error', () => {
    const bad: Combination = { ...combo('x', 1, 1), factors: [{ caseId: 'ice', factor: 1 }] };
    expect(() => analyzeAll(model, cases, [bad], { secondOrder: false, tolerance: 1e-9, maxIterations: 20, stationSpacing_m: 1 })).toThrow(/ice/);
  });
});
