import { describe, expect, it } from 'vitest';
import { buildLoadCases } from '../../src/loads/build-load-cases.ts';
import { deadLoadCase } from '../../src/loads/dead-load.ts';
import { loadResultant } from '../../src/loads/load-resultant.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { elementEnds } from '../../src/model/locate.ts';
import { deg, makeDesign, polySection, testArm, testHead, testPanel, testPole } from '../model/design-factory.ts';
import { sumForces } from './sum-forces.ts';

const g = 9.80665; // standard gravity, NIST SP 330
const rel = (a: number, b: number) => Math.abs(a / b - 1);

// Frustum of a tube with constant wall t and outside diameter linear from D1 to D2:
// round A(D) = π t (D − t); regular n-gon across flats A(D) = n tan(π/n) t (D − t) (both exact
// for a constant wall: annulus / trapezoids), so the volume is that area at the mean diameter
// times L (the volume of a frustum shell of linear taper).
const frustumVolume = (shape: 'round' | 'multisided', n: number | null, D1: number, D2: number, t: number, L: number) =>
  (shape === 'round' ? Math.PI : n! * Math.tan(Math.PI / n!)) * t * ((D1 + D2) / 2 - t) * L;

describe('dead load', () => {
  for (const [label, pole] of [
    ['round pole', testPole()],
    ['16-sided pole', testPole({ section: polySection(16, 0.42, 0.28, 0.0061) })],
  ] as const) {
    it(`${label}: total equals Σ ρ g V (frustum of tube) + attachment weights`, () => {
      const design = makeDesign({ pole });
      const model = buildFrame(design);
      const dead = deadLoadCase(design, model);
      const rho = design.material.density_kgm3;
      const p = design.pole.section;
      const a = design.arms[0].section;
      const expected =
        rho * g * frustumVolume(p.shape, p.sides, p.rootDiameter_m, p.tipDiameter_m, p.wall_m, design.pole.height_m) +
        rho * g * frustumVolume(a.shape, a.sides, a.rootDiameter_m, a.tipDiameter_m, a.wall_m, design.arms[0].length_m) +
        170 * 3.6 * 2.4 + // panel S1: weight per area × width × height (factory input)
        250; // head H1 weight (factory input)
      const F = sumForces(dead.loads);
      expect(rel(-F[2], expected)).toBeLessThan(1e-12);
      expect(Math.abs(F[0]) + Math.abs(F[1])).toBeLessThan(1e-9);
      const totalStep = dead.steps.find((s) => s.symbol === 'ΣD')!;
      expect(rel(totalStep.result.si, expected)).toBeLessThan(1e-12);
    });
  }

  it('pole self-weight alone matches the frustum-of-tube integral', () => {
    const design = makeDesign({ arms: [], attachments: [] });
    const model = buildFrame(design, { segmentsPerMember: 3 });
    const s = design.pole.section;
    const W = 7850 * g * frustumVolume('round', null, s.rootDiameter_m, s.tipDiameter_m, s.wall_m, design.pole.height_m);
    expect(rel(-sumForces(deadLoadCase(design, model).loads)[2], W)).toBeLessThan(1e-12);
  });

  it('overturning moment of the dead load about the base equals Σ W x by hand', () => {
    // Horizontal arm along +X at height h; pole radius r at h. Arm self-weight moment
    // ∫ ρ g A(s) (r + s) ds by a fine midpoint sum with the annulus area; panel and head at
    // x = r + position. Their vertical offsets add nothing for a vertical force; the panel's
    // lateral offset (toward +Y) adds a moment about X.
    const design = makeDesign({ arms: [testArm({ rise_rad: 0 })] });
    const model = buildFrame(design);
    const R = loadResultant(model, deadLoadCase(design, model).loads);
    const arm = design.arms[0];
    const ps = design.pole.section;
    const r = (ps.rootDiameter_m + ((ps.tipDiameter_m - ps.rootDiameter_m) * arm.attachHeight_m) / design.pole.height_m) / 2;
    const sec = arm.section;
    let armMoment = 0;
    const N = 20000;
    for (let k = 0; k < N; k++) {
      const s = ((k + 0.5) * arm.length_m) / N;
      const D = sec.rootDiameter_m + ((sec.tipDiameter_m - sec.rootDiameter_m) * s) / arm.length_m;
      const A = (Math.PI / 4) * (D * D - (D - 2 * sec.wall_m) ** 2);
      armMoment += 7850 * g * A * (r + s) * (arm.length_m / N);
    }
    const Wp = 170 * 3.6 * 2.4;
    const My = armMoment + Wp * (r + 6.0) + 250 * (r + 8.5); // about +Y: a downward load at +x gives +My (r × F)
    expect(rel(R.moment_Nm[1], My)).toBeLessThan(1e-6); // midpoint sum error ~ (L/N)² relative
    // Panel lateral offset 0.3 m toward +Y, weight down: Mx = y Fz = 0.3 × (−Wp); the head has no lateral offset.
    expect(rel(R.moment_Nm[0], -0.3 * Wp)).toBeLessThan(1e-9);
  });

  it('an attachment weight off the arm axis twists the arm: T = −W × lateral offset', () => {
    // Arm along plan direction 30°, horizontal; weight W hung 0.4 m to the left of the arm
    // (looking root to tip). Right-hand rule about the arm axis x (y to the left, z up): the
    // left side pushed down is a negative rotation, so T = −W × 0.4 m.
    const design = makeDesign({
      arms: [testArm({ direction_rad: deg(30), rise_rad: 0 })],
      attachments: [testHead({ weight_N: 300, offset: { vertical_m: -0.5, lateral_m: 0.4, direction_rad: 0 } })],
    });
    const model = buildFrame(design);
    const dead = deadLoadCase(design, model);
    const m = dead.loads.find((l) => l.kind === 'point-moment')!;
    if (m.kind !== 'point-moment') throw new Error('no moment');
    const x = [Math.cos(deg(30)), Math.sin(deg(30)), 0];
    const T = m.value * (m.direction[0] * x[0] + m.direction[1] * x[1] + m.direction[2] * x[2]);
    expect(Math.abs(T - -300 * 0.4)).toBeLessThan(1e-9);
    expect(Math.abs(m.value - 300 * 0.4)).toBeLessThan(1e-9); // no other component for a horizontal arm
    const step = dead.steps.find((s) => s.symbol === 'T_H1')!;
    expect(Math.abs(step.result.si - -120)).toBeLessThan(1e-9);
  });

  it('every load lies on an element and has an origin; attachment loads sit at the attachment position', () => {
    const design = makeDesign({ attachments: [testPanel(), testHead(), testHead({ id: 'P2', member: 'pole', position_m: 3.2, offset: { vertical_m: 0, lateral_m: 0.3, direction_rad: deg(200) } })] });
    const model = buildFrame(design);
    for (const c of buildLoadCases(design, model)) {
      expect(c.steps.length).toBeGreaterThan(0);
      for (const s of c.steps) expect(s.source.length).toBeGreaterThan(0);
      for (const l of c.loads) {
        expect(l.origin.source.length).toBeGreaterThan(0);
        if (l.kind === 'nodal') continue;
        const el = model.elements[l.element];
        expect(el).toBeDefined();
        const L = elementEnds(model, el).length_m;
        if (l.kind === 'distributed') {
          expect(l.a_m).toBeGreaterThanOrEqual(0);
          expect(l.b_m).toBeLessThanOrEqual(L + 1e-12);
          expect(l.b_m).toBeGreaterThan(l.a_m);
        } else {
          expect(l.a_m).toBeGreaterThanOrEqual(0);
          expect(l.a_m).toBeLessThanOrEqual(L + 1e-12);
          const att = design.attachments.find((a) => l.origin.source.includes(` ${a.id}`))!;
          expect(att.member).toBe(el.member);
          expect(Math.abs(el.sI_m + l.a_m - att.position_m)).toBeLessThan(1e-9);
        }
      }
    }
  });
});
