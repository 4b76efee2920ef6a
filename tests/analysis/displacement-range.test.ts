// Results outside the small-displacement method: a member tip that moves more than a tenth of its
// member's length is reported, with the member, the combination and the movement. The movements
// are checked against closed forms of first-order beam theory (Euler-Bernoulli, small displacements):
// - a prismatic cantilever with a tip load P: tip deflection P L³ / (3 E I) (Timoshenko & Gere,
//   Mechanics of Materials, cantilever beam deflections; any mechanics text);
// - an L-frame (vertical pole of height H, fixed at its base, with a horizontal arm of length a at
//   its top) with a vertical load P at the arm tip: the arm tip drops P a³ / (3 E I) as a cantilever
//   plus the rotation of the pole top P a H / (E I) times a, and moves sideways with the pole top,
//   P a H² / (2 E I) (moment-area theorems, e.g. Hibbeler, Structural Analysis, ch. 8; from memory).
// Axial areas are scaled by 1e4 so the shortening the closed forms neglect is negligible: about
// I / (1e4 A a²) ~ 1e-8 of the L-frame's movement, hence 1e-7 there; cubic elements under end loads
// are exact, so the cantilever (no axial force) is held to 1e-9 relative (round-off).
import { describe, expect, it } from 'vitest';
import { analyzeCombination } from '../../src/analysis/analyze.ts';
import { largeMovements, SMALL_DISPLACEMENT_LIMIT, worstPerMember } from '../../src/analysis/displacement-range.ts';
import type { Combination, LoadCase } from '../../src/loads/load-types.ts';
import type { AnalysisResults } from '../../src/analysis/analysis-types.ts';
import { FrameBuilder, nodal, roundTube, type Section } from './frame-helpers.ts';

const base = roundTube(0.3, 0.008);
const sec: Section = { ...base, A_m2: base.A_m2 * 1e4 };
const EI = sec.E_Pa * sec.Iz_m4;
const opts = { secondOrder: false, tolerance: 1e-10, maxIterations: 50, stationSpacing_m: 0.5 };

function combo(id: string, loads: LoadCase['loads']): { cases: LoadCase[]; combo: Combination } {
  return {
    cases: [{ id: `${id}-case`, kind: 'dead', description: 'tip load', windAngle_rad: null, loads, steps: [] }],
    combo: { id, specId: 'test', category: 'strength', description: 'tip load', source: 'test', factors: [{ caseId: `${id}-case`, factor: 1 }] },
  };
}

describe('movements beyond a tenth of the length (first-order closed forms)', () => {
  const L = 8;
  function cantileverUnder(ratio: number, id: string) {
    const b = new FrameBuilder();
    const b0 = b.node([0, 0, 0], 'base');
    b.fix(b0);
    const ids = b.member('pole', 'pole', b0, [0, 0, L], 12, () => sec, { tipTag: 'pole-top' });
    const P = (3 * EI * ratio * L) / L ** 3; // so that P L³ / (3 E I) = ratio x L
    const { cases, combo: c } = combo(id, [nodal(ids[ids.length - 1]!, [P, 0, 0])]);
    const model = b.build();
    const results: AnalysisResults = { [id]: analyzeCombination(model, cases, c, opts) };
    return { model, results, P };
  }

  it('a cantilever whose tip moves 0.15 L is reported with the member, the combination and P L³ / (3 E I)', () => {
    const { model, results, P } = cantileverUnder(0.15, 'push-hard');
    const found = largeMovements(model, results);
    expect(found).toHaveLength(1);
    const x = found[0]!;
    expect(x.member).toBe('pole');
    expect(x.combination).toBe('push-hard');
    const expected = (P * L ** 3) / (3 * EI);
    expect(Math.abs(x.movement_m - expected) / expected).toBeLessThan(1e-9);
    expect(x.length_m).toBe(L);
    expect(Math.abs(x.ratio - 0.15)).toBeLessThan(1e-9);
  });

  it('the same cantilever moving 0.08 L is not reported', () => {
    const { model, results } = cantileverUnder(0.08, 'push-soft');
    expect(largeMovements(model, results)).toEqual([]);
  });

  it('an arm tip is judged by its total movement, with the pole, against the arm length', () => {
    const H = 6;
    const a = 4;
    const b = new FrameBuilder();
    const b0 = b.node([0, 0, 0], 'base');
    b.fix(b0);
    const pole = b.member('pole', 'pole', b0, [0, 0, H], 12, () => sec, { tipTag: 'pole-top' });
    const arm = b.member('A1', 'arm', pole[pole.length - 1]!, [a, 0, H], 8, () => sec, { tipTag: 'arm-tip:A1' });
    const model = b.build();
    // closed form per unit load: vertical and horizontal movement of the arm tip, sideways of the pole top
    const down = (a ** 3 / 3 + a * a * H) / EI;
    const side = (a * H ** 2) / (2 * EI);
    const P = (0.15 * a) / Math.hypot(down, side); // arm tip moves 0.15 a; the pole top P side, about 0.05 H
    const results: AnalysisResults = {};
    for (const [id, factor] of [['light', 0.5], ['heavy', 1]] as const) {
      const { cases, combo: c } = combo(id, [nodal(arm[arm.length - 1]!, [0, 0, -factor * P])]);
      (results as Record<string, unknown>)[id] = analyzeCombination(model, cases, c, opts);
    }
    const found = largeMovements(model, results);
    expect(found.map((x) => [x.member, x.combination])).toEqual([['A1', 'heavy']]);
    const expected = P * Math.hypot(down, side);
    expect(Math.abs(found[0]!.movement_m - expected) / expected).toBeLessThan(1e-7);
    expect((P * side) / H).toBeLessThan(SMALL_DISPLACEMENT_LIMIT); // so the pole is rightly absent
    expect(worstPerMember(model, found)).toEqual(found);
  });
});
