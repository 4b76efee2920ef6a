// Fatigue loads against hand formulas. The rules (force = pressure × area; galloping on the
// elevation area of panels and signal heads; natural gust on every exposed area scaled by
// (V/11.2 mph)²; truck gust on the horizontal projection, reduced linearly with height) are those
// of the AASHTO LRFD-LTS fatigue provisions as recalled (from memory); the tests check that the
// code applies them exactly as stated, with totals worked by hand from the closed forms.
import { describe, expect, it } from 'vitest';
import type { FatigueInput } from '../../src/design/design.ts';
import { gallopingCase, naturalGustCase, truckGustCase, truckGustHeightFactor, NATURAL_GUST_REFERENCE_SPEED_mps } from '../../src/loads/fatigue-load.ts';
import { expandCombinations } from '../../src/loads/combinations.ts';
import { buildLoadCases } from '../../src/loads/build-load-cases.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { deg, makeDesign, testArm, testHead, testPanel } from '../model/design-factory.ts';
import { sumForces } from './sum-forces.ts';

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const PSF = 47.88025898033584;

const fatigue = (over: Partial<FatigueInput> = {}): FatigueInput => ({
  category: 'I',
  meanWindSpeed_mps: NATURAL_GUST_REFERENCE_SPEED_mps,
  galloping: { pressure_Pa: 21 * PSF, importance: 0.7 },
  naturalGust: { pressure_Pa: 5.2 * PSF, importance: 0.85 },
  truckGust: { pressure_Pa: 18.8 * PSF, importance: 0.9, lanes: [{ arm: 'A1', from_m: 2, to_m: 8 }], roadLevel_m: 0, fullPressureHeight_m: 6.0, zeroPressureHeight_m: 10.0, horizontalAreas_m2: {} },
  drag: { panels: 1.12, roundMembers: 1.1, multisidedMembers: 1.2, points: 1.2 },
  poleBase: { category: "E'", threshold_Pa: 2.6 * 6.894757e6 },
  armRoot: { category: "E'", threshold_Pa: 2.6 * 6.894757e6 },
  anchorBolts: { category: 'D', threshold_Pa: 7 * 6.894757e6 },
  ...over,
});

describe('galloping', () => {
  it('vertical total = P_G I_F × (panel area + signal head area) on the arm', () => {
    const design = makeDesign({ fatigue: fatigue() });
    const model = buildFrame(design);
    const c = gallopingCase(design, model, design.fatigue!)!;
    // testPanel 3.6 m × 2.4 m and testHead with a wind area of 0.8 m² (design factory).
    const expected = 21 * PSF * 0.7 * (3.6 * 2.4 + 0.8);
    const F = sumForces(c.loads);
    expect(rel(F[2], expected)).toBeLessThan(1e-12);
    expect(Math.abs(F[0]) + Math.abs(F[1])).toBeLessThan(1e-9 * expected);
  });
  it('leaves out attachments on the pole and luminaires', () => {
    const design = makeDesign({ attachments: [testPanel({ member: 'pole', position_m: 3, faceNormal_rad: 0 }), testHead({ kind: 'luminaire' })], fatigue: fatigue() });
    expect(gallopingCase(design, buildFrame(design), design.fatigue!)).toBeNull();
  });
});

describe('natural wind gust', () => {
  it('wind normal to the sign: total = P Cd I_F (V/11.2)² × projected areas', () => {
    const V = 2 * NATURAL_GUST_REFERENCE_SPEED_mps; // a site with twice the reference mean speed: 4 × the pressure
    const design = makeDesign({ fatigue: fatigue({ meanWindSpeed_mps: V }) });
    const model = buildFrame(design);
    const c = naturalGustCase(design, model, design.fatigue!, { angle_rad: deg(90), label: 'normal' })!;
    const p = 5.2 * PSF * 0.85 * 4;
    const pole = design.pole;
    const arm = design.arms[0];
    const meanD = (s: { rootDiameter_m: number; tipDiameter_m: number }) => (s.rootDiameter_m + s.tipDiameter_m) / 2;
    // Both members are normal to a wind toward +Y (sin θ = 1): area D̄ L with Cd 1.1.
    const expected = p * 1.1 * (meanD(pole.section) * pole.height_m + meanD(arm.section) * arm.length_m) + p * 1.12 * 3.6 * 2.4 + p * 1.2 * 0.8;
    expect(rel(sumForces(c.loads)[1], expected)).toBeLessThan(1e-12);
  });
  it('a member at 30° to the wind carries sin 30° of its normal load, in the wind direction (projected area)', () => {
    const design = makeDesign({ arms: [testArm({ rise_rad: 0, direction_rad: deg(60) })], attachments: [], fatigue: fatigue() });
    const model = buildFrame(design);
    const c = naturalGustCase(design, model, design.fatigue!, { angle_rad: deg(90), label: 'x' })!;
    const armLoads = c.loads.filter((l) => l.origin.source.includes('arm A1'));
    const arm = design.arms[0];
    const expected = 5.2 * PSF * 0.85 * 1.1 * ((arm.section.rootDiameter_m + arm.section.tipDiameter_m) / 2) * arm.length_m * Math.sin(deg(30));
    const F = sumForces(armLoads);
    expect(rel(F[1], expected)).toBeLessThan(1e-12);
    expect(Math.abs(F[0])).toBeLessThan(1e-12 * expected);
  });
});

describe('truck-induced gust', () => {
  it('height factor: 1 up to the full-pressure height, linear to 0 at the zero-pressure height', () => {
    expect(truckGustHeightFactor(5, 6, 10)).toBe(1);
    expect(truckGustHeightFactor(6, 6, 10)).toBe(1);
    expect(truckGustHeightFactor(8, 6, 10)).toBeCloseTo(0.5, 14);
    expect(truckGustHeightFactor(10, 6, 10)).toBe(0);
    expect(truckGustHeightFactor(12, 6, 10)).toBe(0);
  });
  it('horizontal arm below the full-pressure height: total = P Cd I_F × ∫ D ds over the lanes', () => {
    const design = makeDesign({ arms: [testArm({ rise_rad: 0, attachHeight_m: 5.5 })], attachments: [], pole: { height_m: 6, section: { shape: 'round', sides: null, rootDiameter_m: 0.4, tipDiameter_m: 0.3, wall_m: 0.00635 }, base: { kind: 'fixed' } }, fatigue: fatigue() });
    const model = buildFrame(design);
    const c = truckGustCase(design, model, design.fatigue!)!;
    const s = design.arms[0].section;
    const D = (x: number) => s.rootDiameter_m + ((s.tipDiameter_m - s.rootDiameter_m) * x) / 9.0;
    const expected = 18.8 * PSF * 0.9 * 1.1 * ((D(2) + D(8)) / 2) * 6;
    const F = sumForces(c.loads);
    expect(rel(F[2], expected)).toBeLessThan(1e-12);
  });
  it('a rising arm crossing the full-pressure height: the load follows the height factor (against Simpson integration split at the kink)', () => {
    // Arm from z = 5.5 m rising at 20°: crosses 6 m at s = 0.5/sin20° = 1.462 m and 10 m at 13.16 m (beyond the 9 m arm).
    const rise = deg(20);
    const design = makeDesign({ arms: [testArm({ rise_rad: rise, attachHeight_m: 5.5 })], attachments: [], pole: { height_m: 6, section: { shape: 'round', sides: null, rootDiameter_m: 0.4, tipDiameter_m: 0.3, wall_m: 0.00635 }, base: { kind: 'fixed' } }, fatigue: fatigue({ truckGust: { ...fatigue().truckGust!, lanes: [{ arm: 'A1', from_m: 0, to_m: 9 }] } }) });
    const model = buildFrame(design);
    const c = truckGustCase(design, model, design.fatigue!)!;
    const s = design.arms[0].section;
    const z0 = 5.5; // the arm root is at the attach height
    const w = (x: number) => {
      const z = z0 + x * Math.sin(rise);
      const k = truckGustHeightFactor(z, 6, 10);
      return 18.8 * PSF * 0.9 * 1.1 * k * (s.rootDiameter_m + ((s.tipDiameter_m - s.rootDiameter_m) * x) / 9) * Math.cos(rise);
    };
    // Independent integral: composite Simpson on the two smooth pieces split at the kink.
    const simpson = (a: number, b: number, n = 200) => { const h = (b - a) / n; let t = w(a) + w(b); for (let i = 1; i < n; i++) t += w(a + i * h) * (i % 2 ? 4 : 2); return (t * h) / 3; };
    const kink = 0.5 / Math.sin(rise);
    const expected = simpson(0, kink) + simpson(kink, 9);
    // Tolerance: the code applies D k_h linearly between element ends and kinks, and D k_h is
    // quadratic past the kink (both factors linear), so the trapezoid error bound applies:
    // |error| <= h² L max|f''| / 12 with h the element length (0.9 m, 10 segments) and
    // f'' = 2 (dD/ds)(dk/ds) × the constant factors.
    const c0 = 18.8 * PSF * 0.9 * 1.1 * Math.cos(rise);
    const fpp = Math.abs(2 * ((s.tipDiameter_m - s.rootDiameter_m) / 9) * (-Math.sin(rise) / 4) * c0);
    const bound = (0.9 ** 2 * 9 * fpp) / 12 / expected;
    expect(bound).toBeLessThan(1e-3);
    expect(rel(sumForces(c.loads)[2], expected)).toBeLessThan(bound);
  });
});

describe('fatigue combinations', () => {
  it('each fatigue case is one combination of category fatigue at factor 1, natural gust once per wind direction', () => {
    const design = makeDesign({ fatigue: fatigue() });
    const model = buildFrame(design);
    const cases = buildLoadCases(design, model);
    const fat = expandCombinations(design, cases).filter((c) => c.category === 'fatigue');
    expect(fat.map((c) => c.id).sort()).toEqual(['fatigue-galloping', 'fatigue-truck-gust', ...design.wind.directions.map((d) => `fatigue-natural-gust@wind-${String(Math.round((d.angle_rad * 180) / Math.PI)).padStart(3, '0')}`)].sort());
    for (const c of fat) expect(c.factors).toEqual([{ caseId: c.id, factor: 1 }]);
  });
});
