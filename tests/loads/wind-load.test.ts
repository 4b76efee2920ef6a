// Wind loads against hand formulas: p × projected area for members normal to the wind and
// for panels facing it; the cross-flow rule q D sin²θ normal to the axis for a member at an
// angle θ to the wind (Hoerner, Fluid-Dynamic Drag, 1965, ch. 3, from memory; the rule
// polebook documents in src/loads/load-rules.ts); the cosine rule for panels; force × offset
// for the torque of a panel hung off the arm axis.
import { describe, expect, it } from 'vitest';
import { buildLoadCases } from '../../src/loads/build-load-cases.ts';
import { directionKey } from '../../src/loads/case-ids.ts';
import type { AppliedLoad, ElementPointLoad } from '../../src/loads/load-types.ts';
import { windLoadCase } from '../../src/loads/wind-load.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { deg, makeDesign, testArm, testHead, testPanel } from '../model/design-factory.ts';
import { sumForces } from './sum-forces.ts';

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const meanD = (s: { rootDiameter_m: number; tipDiameter_m: number }) => (s.rootDiameter_m + s.tipDiameter_m) / 2;
const pm = 1200; // member pressure, factory input
const pp = 1500; // panel pressure
const pa = 1300; // point-attachment pressure

describe('wind on the whole structure', () => {
  it('wind normal to the sign: total = p × projected areas (pole, arm, panel, head)', () => {
    const design = makeDesign();
    const model = buildFrame(design);
    const c = windLoadCase(design, model, { angle_rad: deg(90), label: 'normal' });
    expect(c.id).toBe('wind-090');
    const arm = design.arms[0];
    // Pole vertical and arm (along X, rising) are both normal to a wind toward +Y: full projected area D̄ L.
    const expected = pm * meanD(design.pole.section) * design.pole.height_m + pm * meanD(arm.section) * arm.length_m + pp * 3.6 * 2.4 + pa * 0.8;
    const F = sumForces(c.loads);
    expect(rel(F[1], expected)).toBeLessThan(1e-12);
    expect(Math.abs(F[0]) + Math.abs(F[2])).toBeLessThan(1e-9 * expected);
    expect(rel(c.steps.find((s) => s.symbol === 'ΣF_w')!.result.si, expected)).toBeLessThan(1e-12);
  });

  it('wind along a horizontal arm: no load on the arm or on a panel facing across it', () => {
    const design = makeDesign({ arms: [testArm({ rise_rad: 0 })] });
    const model = buildFrame(design);
    const c = windLoadCase(design, model, { angle_rad: 0, label: 'along arm' });
    const expected = pm * meanD(design.pole.section) * design.pole.height_m + pa * 0.8;
    const F = sumForces(c.loads);
    expect(rel(F[0], expected)).toBeLessThan(1e-12);
    expect(c.loads.some((l) => l.origin.source.includes('arm A1'))).toBe(false);
    expect(c.loads.some((l) => l.origin.source.includes('panel S1'))).toBe(false);
  });
});

describe('members at an angle to the wind (cross-flow rule)', () => {
  for (const planDeg of [30, 60, 135]) {
    it(`horizontal arm at ${planDeg}° in plan, wind toward 90°: force p D̄ L sin²θ normal to the arm`, () => {
      const psi = deg(planDeg);
      const design = makeDesign({ arms: [testArm({ direction_rad: psi, rise_rad: 0 })], attachments: [] });
      const model = buildFrame(design);
      const c = windLoadCase(design, model, { angle_rad: deg(90), label: 'x' });
      const armLoads = c.loads.filter((l) => l.origin.source.includes('arm A1'));
      const F = sumForces(armLoads);
      const theta = Math.abs(deg(90) - psi); // plan angle between the wind and the arm
      const mag = pm * meanD(design.arms[0].section) * design.arms[0].length_m * Math.sin(theta) ** 2;
      // Direction: the wind component normal to the arm, ŵ − (ŵ·x̂) x̂, normalised.
      const w = [0, 1];
      const x = [Math.cos(psi), Math.sin(psi)];
      const d = w[0] * x[0] + w[1] * x[1];
      const n = [w[0] - d * x[0], w[1] - d * x[1]];
      const nn = Math.hypot(n[0], n[1]);
      expect(rel(Math.hypot(F[0], F[1], F[2]), mag)).toBeLessThan(1e-12);
      expect(Math.abs(F[0] - (mag * n[0]) / nn)).toBeLessThan(1e-9 * mag);
      expect(Math.abs(F[1] - (mag * n[1]) / nn)).toBeLessThan(1e-9 * mag);
      expect(Math.abs(F[2])).toBeLessThan(1e-9 * mag);
    });
  }

  it('rising arm, wind along its plan direction: θ = rise angle, force normal to the axis', () => {
    const rise = deg(15);
    const design = makeDesign({ arms: [testArm({ rise_rad: rise })], attachments: [] });
    const model = buildFrame(design);
    const c = windLoadCase(design, model, { angle_rad: 0, label: 'x' });
    const F = sumForces(c.loads.filter((l) => l.origin.source.includes('arm A1')));
    const mag = pm * meanD(design.arms[0].section) * design.arms[0].length_m * Math.sin(rise) ** 2;
    // Normal component of ŵ = (1,0,0) to x̂ = (cos r, 0, sin r) is sin r (sin r, 0, −cos r).
    expect(Math.abs(F[0] - mag * Math.sin(rise))).toBeLessThan(1e-9 * mag);
    expect(Math.abs(F[2] + mag * Math.cos(rise))).toBeLessThan(1e-9 * mag);
    expect(Math.abs(F[1])).toBeLessThan(1e-9 * mag);
  });
});

const moments = (loads: readonly AppliedLoad[], source: string) =>
  loads.filter((l) => l.kind === 'point-moment' && l.origin.source.includes(source)) as ElementPointLoad[];

describe('panels and point attachments', () => {
  it('panel hung below a horizontal arm: torque on the arm = force × vertical offset', () => {
    // Arm along +X, panel centroid 0.6 m below the axis and 0.3 m toward +Y, face normal +Y,
    // wind toward +Y: F = p b h along +Y; r × F about +X = −z F = +0.6 F.
    const design = makeDesign({ arms: [testArm({ rise_rad: 0 })], attachments: [testPanel()] });
    const model = buildFrame(design);
    const c = windLoadCase(design, model, { angle_rad: deg(90), label: 'normal' });
    const F = pp * 3.6 * 2.4;
    const [m] = moments(c.loads, 'panel S1');
    expect(Math.abs(m.value * m.direction[0] - 0.6 * F)).toBeLessThan(1e-9 * F);
    expect(Math.abs(m.direction[1]) + Math.abs(m.direction[2])).toBeLessThan(1e-12);
    const step = c.steps.find((s) => s.symbol === 'T_S1')!;
    expect(rel(step.result.si, 0.6 * F)).toBeLessThan(1e-12);
  });

  for (const a of [0, 30, 45, 80, 120]) {
    it(`panel, wind at ${a}° to its face normal: force p b h cos α normal to the face`, () => {
      const design = makeDesign({ attachments: [testPanel({ faceNormal_rad: deg(90) })] });
      const model = buildFrame(design);
      const c = windLoadCase(design, model, { angle_rad: deg(90 + a), label: 'x' });
      const F = sumForces(c.loads.filter((l) => l.origin.source.includes('panel S1')));
      const expected = pp * 3.6 * 2.4 * Math.cos(deg(a));
      expect(Math.abs(F[1] - expected)).toBeLessThan(1e-9 * pp * 3.6 * 2.4);
      expect(Math.abs(F[0]) + Math.abs(F[2])).toBeLessThan(1e-9 * pp * 3.6 * 2.4);
    });
  }

  it('point attachment: p × area in the wind direction, whatever the direction', () => {
    const design = makeDesign({ attachments: [testHead({ member: 'pole', position_m: 4, offset: { vertical_m: 0, lateral_m: 0.35, direction_rad: 0 } })] });
    const model = buildFrame(design);
    for (const ang of [0, 90, 210]) {
      const c = windLoadCase(design, model, { angle_rad: deg(ang), label: 'x' });
      const F = sumForces(c.loads.filter((l) => l.origin.source.includes('H1')));
      expect(Math.abs(F[0] - pa * 0.8 * Math.cos(deg(ang)))).toBeLessThan(1e-9);
      expect(Math.abs(F[1] - pa * 0.8 * Math.sin(deg(ang)))).toBeLessThan(1e-9);
      // Offset 0.35 m toward +X from the pole axis: torque about the pole (+Z) = x Fy.
      const [m] = moments(c.loads, 'H1');
      const Tz = m ? m.value * m.direction[2] : 0;
      expect(Math.abs(Tz - 0.35 * pa * 0.8 * Math.sin(deg(ang)))).toBeLessThan(1e-9);
    }
  });
});

describe('case ids', () => {
  it('one wind case per direction, ids from the plan angle', () => {
    const design = makeDesign({ ice: null });
    const ids = buildLoadCases(design, buildFrame(design)).map((c) => c.id);
    expect(ids).toEqual(['dead', 'wind-090', 'wind-000', 'wind-045']);
    expect(directionKey(deg(22.5))).toBe('wind-022.5');
    expect(directionKey(deg(-90))).toBe('wind-270');
    expect(directionKey(deg(360))).toBe('wind-000');
  });
  it('rejects two directions that give the same case', () => {
    const design = makeDesign({ wind: { ...makeDesign().wind, directions: [{ angle_rad: 0, label: 'a' }, { angle_rad: 2 * Math.PI, label: 'b' }] } });
    expect(() => buildLoadCases(design, buildFrame(design))).toThrow(/same case/);
  });
});
