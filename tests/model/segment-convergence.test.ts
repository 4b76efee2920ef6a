// Convergence of the chain of prismatic segments to the continuous taper.
//
// Reference: the tip deflection of a cantilever by the unit-load (Mohr) integral
// δ = ∫ M(s) m(s) / (E I(s)) ds along the real taper, with M = P (L − s) for a tip load and
// M = w (L − s)² / 2 for a uniform load, m = (L − s) (e.g. Timoshenko & Gere, Mechanics of
// Materials, deflections by the unit-load method; from memory), integrated numerically
// with a composite Gauss-Legendre rule fine enough to be exact to 1e-9.
// For the chain of prismatic segments the same integral has a closed form per segment
// (Euler-Bernoulli, exact for prismatic pieces):
//   tip load:     P/(3E I_k) [(L − s_k)³ − (L − s_k+1)³]
//   uniform load: w/(8E I_k) [(L − s_k)⁴ − (L − s_k+1)⁴]
// The segment I_k are taken from the frame model that buildFrame makes.
import { describe, expect, it } from 'vitest';
import type { TubeSection } from '../../src/design/design.ts';
import { buildFrame, RECOMMENDED_SEGMENTS_PER_MEMBER } from '../../src/model/build-frame.ts';
import type { SegmentRule } from '../../src/model/segment-properties.ts';
import { solveLoads } from '../../src/analysis/index.ts';
import { elementEnds } from '../../src/model/locate.ts';
import { segmentConvergence } from '../../src/model/segment-convergence.ts';
import { makeDesign, polySection, roundSection, testArm, testPole } from './design-factory.ts';

const E = 200e9;
const P = 1000;
const w = 500;

// Second moment of the annulus, written here from its definition (exact).
const Iannulus = (D: number, t: number) => (Math.PI / 64) * (D ** 4 - (D - 2 * t) ** 4);
// Thin-wall regular polygon (n flat plates of width Dm tan(π/n), summed by the parallel-axis
// theorem of any mechanics of materials text, e.g. Gere & Goodno, Mechanics of Materials), for the multisided case only: the study is about
// the segment count, so the reference uses the same section formula as the model.
const Ipolygon = (n: number, D: number, t: number) => {
  const Dm = D - t;
  const b = Dm * Math.tan(Math.PI / n);
  return n * b * t * (Dm * Dm / 8 + b * b / 24);
};

const G4 = [
  [-0.8611363115940526, 0.3478548451374538],
  [-0.3399810435848563, 0.6521451548625461],
  [0.3399810435848563, 0.6521451548625461],
  [0.8611363115940526, 0.3478548451374538],
];

function integrate(f: (s: number) => number, L: number, panels = 2000): number {
  let sum = 0;
  const h = L / panels;
  for (let k = 0; k < panels; k++) {
    const mid = (k + 0.5) * h;
    for (const [x, wt] of G4) sum += (wt * h * f(mid + (x * h) / 2)) / 2;
  }
  return sum;
}

interface Case {
  readonly name: string;
  readonly section: TubeSection;
  readonly L: number;
}

const cases: Case[] = [
  { name: 'pole 9 m, round 400 to 240 mm', section: roundSection(0.4, 0.24, 0.006), L: 9 },
  { name: 'arm 20 m, round 400 to 167 mm (11.7 mm/m taper)', section: roundSection(0.4, 0.167, 0.006), L: 20 },
  { name: 'arm 15 m, round 400 to 100 mm (4:1 taper)', section: roundSection(0.4, 0.1, 0.005), L: 15 },
  { name: 'pole 11 m, 12-sided 450 to 250 mm', section: polySection(12, 0.45, 0.25, 0.008), L: 11 },
];

function exactTip(c: Case): { tipLoad: number; uniform: number } {
  const s = c.section;
  const D = (x: number) => s.rootDiameter_m + ((s.tipDiameter_m - s.rootDiameter_m) * x) / c.L;
  const I = (x: number) => (s.shape === 'round' ? Iannulus(D(x), s.wall_m) : Ipolygon(s.sides!, D(x), s.wall_m));
  return {
    tipLoad: integrate((x) => (P * (c.L - x) ** 2) / (E * I(x)), c.L),
    uniform: integrate((x) => (w * (c.L - x) ** 3) / (2 * E * I(x)), c.L),
  };
}

function chainTip(c: Case, n: number, rule?: SegmentRule): { tipLoad: number; uniform: number } {
  const model = buildFrame(makeDesign({ pole: testPole({ height_m: c.L, section: c.section }), arms: [], attachments: [] }), {
    segmentsPerMember: n,
    segmentRule: rule,
  });
  let tipLoad = 0;
  let uniform = 0;
  for (const e of model.elements) {
    const a = c.L - e.sI_m;
    const b = c.L - e.sJ_m;
    tipLoad += (P * (a ** 3 - b ** 3)) / (3 * E * e.Iz_m4);
    uniform += (w * (a ** 4 - b ** 4)) / (8 * E * e.Iz_m4);
  }
  return { tipLoad, uniform };
}

const relErr = (a: number, b: number) => Math.abs(a / b - 1);

describe('segment count convergence (tapered cantilever tip deflection)', () => {
  for (const c of cases) {
    const exact = exactTip(c);
    it(`${c.name}: the default count is within 0.5 % of the continuous taper`, () => {
      const chain = chainTip(c, RECOMMENDED_SEGMENTS_PER_MEMBER);
      expect(relErr(chain.tipLoad, exact.tipLoad)).toBeLessThan(0.005);
      expect(relErr(chain.uniform, exact.uniform)).toBeLessThan(0.005);
    });
    it(`${c.name}: a very fine chain reaches the continuous value (converged)`, () => {
      const chain = chainTip(c, 400);
      expect(relErr(chain.tipLoad, exact.tipLoad)).toBeLessThan(1e-4);
      expect(relErr(chain.uniform, exact.uniform)).toBeLessThan(1e-4);
    });
    it(`${c.name}: the error falls as 1/n² (second order: ratio 0.2 to 0.3 when n doubles)`, () => {
      const e10 = relErr(chainTip(c, 10).tipLoad, exact.tipLoad);
      const e20 = relErr(chainTip(c, 20).tipLoad, exact.tipLoad);
      expect(e20 / e10).toBeGreaterThan(0.2);
      expect(e20 / e10).toBeLessThan(0.3);
    });
    it(`${c.name}: the mid-length rule is closer than the flexibility-equivalent rule`, () => {
      for (const n of [6, 10, 20]) {
        const mid = chainTip(c, n, 'mid-length');
        const flex = chainTip(c, n, 'flexibility');
        expect(relErr(mid.tipLoad, exact.tipLoad)).toBeLessThan(relErr(flex.tipLoad, exact.tipLoad));
        expect(relErr(mid.uniform, exact.uniform)).toBeLessThan(relErr(flex.uniform, exact.uniform));
      }
    });
  }
});

// The same study through the frame analysis (src/analysis solveLoads): the model that
// buildFrame makes, solved by the direct stiffness method. Euler-Bernoulli elements are
// exact for prismatic pieces, so the solver must reproduce the closed-form chain sum, and
// at the default count it must lie within 0.5 % of the continuous taper.
describe('segment count convergence through the frame analysis', () => {
  for (const c of cases) {
    it(`${c.name}: tip deflection under a tip load and a uniform load`, () => {
      const exact = exactTip(c);
      const design = makeDesign({ pole: testPole({ height_m: c.L, section: c.section }), arms: [], attachments: [], material: { E_Pa: E, G_Pa: 77e9, Fy_Pa: 345e6, density_kgm3: 7850 } });
      const model = buildFrame(design, { segmentsPerMember: RECOMMENDED_SEGMENTS_PER_MEMBER });
      const top = model.nodes.length - 1;
      const tip = solveLoads(model, [{ kind: 'nodal', node: top, F_N: [P, 0, 0], M_Nm: [0, 0, 0], origin: { source: 'test tip load' } }]).displacements[top][0];
      const uni = solveLoads(
        model,
        model.elements.map((e) => ({ kind: 'distributed' as const, element: e.id, axes: 'global' as const, direction: [1, 0, 0] as const, wA_Npm: w, wB_Npm: w, a_m: 0, b_m: elementEnds(model, e).length_m, origin: { source: 'test uniform load' } })),
      ).displacements[top][0];
      const chain = chainTip(c, RECOMMENDED_SEGMENTS_PER_MEMBER);
      expect(relErr(tip, chain.tipLoad)).toBeLessThan(1e-8);
      expect(relErr(uni, chain.uniform)).toBeLessThan(1e-8);
      expect(relErr(tip, exact.tipLoad)).toBeLessThan(0.005);
      expect(relErr(uni, exact.uniform)).toBeLessThan(0.005);
    });
  }

  it('pole and arm frame: arm-tip drop and pole-top sway at the default count are within 0.5 % of a 200-segment model', () => {
    const design = makeDesign({ arms: [testArm({ length_m: 15, section: roundSection(0.36, 0.14, 0.005), rise_rad: 0 })], attachments: [] });
    const solve = (n: number) => {
      const model = buildFrame(design, { segmentsPerMember: n });
      const tipNode = model.elements[model.members.find((m) => m.id === 'A1')!.elements.at(-1)!].j;
      const topNode = model.elements[model.members.find((m) => m.id === 'pole')!.elements.at(-1)!].j;
      const d = solveLoads(model, [{ kind: 'nodal', node: tipNode, F_N: [0, 0, -5000], M_Nm: [0, 0, 0], origin: { source: 'test tip load' } }]).displacements;
      return { drop: -d[tipNode][2], sway: d[topNode][0] };
    };
    const fine = solve(200);
    const dflt = solve(RECOMMENDED_SEGMENTS_PER_MEMBER);
    expect(fine.drop).toBeGreaterThan(0);
    expect(relErr(dflt.drop, fine.drop)).toBeLessThan(0.005);
    expect(relErr(dflt.sway, fine.sway)).toBeLessThan(0.005);
  });
});

describe('segmentConvergence (the evidence printed in the package)', () => {
  it('reports, per member, the chain against the continuous taper as the test computes them', () => {
    for (const c of cases) {
      const design = makeDesign({ pole: testPole({ height_m: c.L, section: c.section }), arms: [], attachments: [], material: { E_Pa: E, G_Pa: 77e9, Fy_Pa: 345e6, density_kgm3: 7850 } });
      for (const n of [5, RECOMMENDED_SEGMENTS_PER_MEMBER]) {
        const r = segmentConvergence(design, buildFrame(design, { segmentsPerMember: n }));
        const expected = chainTip(c, n).tipLoad / exactTip(c).tipLoad - 1;
        expect(r.members).toHaveLength(1);
        expect(Math.abs(r.members[0].relativeDifference - expected)).toBeLessThan(1e-8);
        expect(r.steps[0].result.si).toBe(r.members[0].relativeDifference);
      }
    }
  });
});
