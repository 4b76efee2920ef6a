import { describe, expect, it } from 'vitest';
import { buildLoadCases } from '../../src/loads/build-load-cases.ts';
import { expandCombinations } from '../../src/loads/combinations.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { deg, makeDesign, polySection, testArm } from '../model/design-factory.ts';
import { sumForces } from './sum-forces.ts';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('ice', () => {
  it('total ice = q × (member surface + one face of each panel + projected area of each point attachment)', () => {
    // Surface of a tapered round member: π D̄ L; of a regular n-gon across flats: n tan(π/n) D̄ L
    // (perimeter linear in D). The panel and point-attachment rules are those stated in
    // src/loads/load-rules.ts (one face of panels, from memory of AASHTO LRFD-LTS; projected
    // area of point attachments, a polebook assumption).
    const design = makeDesign({ arms: [testArm({ section: polySection(8, 0.3, 0.17, 0.0048) })] });
    const model = buildFrame(design);
    const ice = buildLoadCases(design, model).find((c) => c.id === 'ice')!;
    const q = 144;
    const p = design.pole.section;
    const a = design.arms[0].section;
    const expected =
      q * Math.PI * ((p.rootDiameter_m + p.tipDiameter_m) / 2) * design.pole.height_m +
      q * 8 * Math.tan(Math.PI / 8) * ((a.rootDiameter_m + a.tipDiameter_m) / 2) * design.arms[0].length_m +
      q * 3.6 * 2.4 +
      q * 0.8;
    expect(rel(-sumForces(ice.loads)[2], expected)).toBeLessThan(1e-12);
  });

  it('wind with ice = ice wind factor × wind, per direction', () => {
    const design = makeDesign();
    const cases = buildLoadCases(design, buildFrame(design));
    for (const d of ['090', '000', '045']) {
      const w = sumForces(cases.find((c) => c.id === `wind-${d}`)!.loads);
      const wi = sumForces(cases.find((c) => c.id === `ice-wind-${d}`)!.loads);
      for (let k = 0; k < 3; k++) expect(Math.abs(wi[k] - 0.35 * w[k])).toBeLessThan(1e-9 * (1 + Math.abs(w[k])));
    }
  });
});

describe('combinations', () => {
  it('wind and ice-wind specs expand per direction; the others appear once', () => {
    const design = makeDesign();
    const cases = buildLoadCases(design, buildFrame(design));
    const combos = expandCombinations(design, cases);
    expect(combos.map((c) => c.id)).toEqual([
      'strength-dead',
      'extreme-wind-max@wind-090',
      'extreme-wind-max@wind-000',
      'extreme-wind-max@wind-045',
      'extreme-ice@wind-090',
      'extreme-ice@wind-000',
      'extreme-ice@wind-045',
      'service@wind-090',
      'service@wind-000',
      'service@wind-045',
    ]);
    const ei = combos.find((c) => c.id === 'extreme-ice@wind-045')!;
    expect(ei.factors).toEqual([
      { caseId: 'dead', factor: 1.1 },
      { caseId: 'ice', factor: 1.0 },
      { caseId: 'ice-wind-045', factor: 1.0 },
    ]);
    expect(ei.specId).toBe('extreme-ice');
    expect(ei.category).toBe('extreme-ice');
    const ids = new Set(cases.map((c) => c.id));
    for (const c of combos) for (const f of c.factors) expect(ids.has(f.caseId)).toBe(true);
  });

  it('without ice, combinations that need ice cases are left out', () => {
    const design = makeDesign({ ice: null });
    const combos = expandCombinations(design, buildLoadCases(design, buildFrame(design)));
    expect(combos.some((c) => c.specId === 'extreme-ice')).toBe(false);
    expect(combos).toHaveLength(7);
  });

  it('zero factors are dropped (a spec with wind 0 is not expanded)', () => {
    const design = makeDesign({
      combinations: [{ id: 'd-only', category: 'service', description: 'D', factors: { dead: 1, wind: 0 }, source: 'test data' }],
      wind: { ...makeDesign().wind, directions: [{ angle_rad: deg(90), label: 'n' }] },
    });
    const combos = expandCombinations(design, buildLoadCases(design, buildFrame(design)));
    expect(combos).toEqual([{ id: 'd-only', specId: 'd-only', category: 'service', description: 'D', factors: [{ caseId: 'dead', factor: 1 }], source: 'test data' }]);
  });
});
