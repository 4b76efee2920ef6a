// The moment-area hand check on an L-frame of uniform (non-tapered) round tubes with one tip
// weight and no self-weight (density 0), against the closed forms of the L-frame by the
// moment-area method (any structural analysis text, e.g. Hibbeler, Structural Analysis,
// deflections by moment-area): uniform pole moment P a, joint rotation θ = P a h/(EI_pole),
// sway Δ = P a h²/(2 EI_pole), tip drop P L³/(3 EI_arm) + P a² h/(EI_pole), with a = r + L the
// horizontal reach from the pole axis (the rigid offset r to the pole face adds lever arm but no
// flexibility; with r = 0 and one EI this is the text's P a³/(3EI) + P a² h/EI).
// A base spring k adds the rigid-body rotation P a/k at the base: θ += P a/k, Δ += (P a/k) h,
// tip drop += (P a/k) a (kinematics of a rigid rotation).
// The integrands are polynomials here, so the Gauss-Legendre result is exact to round-off:
// tolerance 1e-10 relative.
import { describe, expect, it } from 'vitest';
import type { Design } from '../../src/design/design.ts';
import { momentAreaCheck } from '../../src/handcheck/moment-area.ts';
import { makeDesign, roundSection, testArm, testHead, testPole } from '../model/design-factory.ts';

const P = 2500;
const h = 6.5;
const L = 8;
const Dp = 0.35;
const tp = 0.008;
const Da = 0.22;
const ta = 0.006;
const E = 200e9;
// Moment of inertia of an annulus, π/64 (D⁴ − d⁴) (geometry of the annulus).
const annulusI = (D: number, t: number) => (Math.PI / 64) * (D ** 4 - (D - 2 * t) ** 4);
const EIp = E * annulusI(Dp, tp);
const EIa = E * annulusI(Da, ta);
const r = Dp / 2;
const a = r + L;
const TOL = 1e-10;

function lFrame(base: Design['pole']['base']): Design {
  const d = makeDesign({
    pole: testPole({ height_m: 7.5, section: roundSection(Dp, Dp, tp), base }),
    arms: [testArm({ attachHeight_m: h, length_m: L, rise_rad: 0, section: roundSection(Da, Da, ta) })],
    attachments: [testHead({ position_m: L, weight_N: P, offset: { vertical_m: -0.4, lateral_m: 0, direction_rad: 0 } })],
  });
  return { ...d, material: { ...d.material, E_Pa: E, density_kgm3: 0 } };
}

const rel = (x: number, y: number) => Math.abs(x - y) / Math.abs(y);

describe('L-frame with a tip weight, uniform tubes, fixed base', () => {
  const c = momentAreaCheck(lFrame({ kind: 'fixed' }));
  if (!c) throw new Error('no arm');
  it('pole moment is P a everywhere below the joint and nil above', () => {
    for (const z of [0, 1, h / 2, h - 1e-6]) expect(rel(c.statics.poleMoment(z), P * a)).toBeLessThan(TOL);
    expect(c.statics.poleMoment(h + 0.5)).toBe(0);
    expect(rel(c.statics.jointMoment_Nm, P * a)).toBeLessThan(TOL);
  });
  it('joint rotation P a h / EI', () => expect(rel(c.jointRotation_rad, (P * a * h) / EIp)).toBeLessThan(TOL));
  it('joint sway P a h² / (2 EI)', () => expect(rel(c.jointSway_m, (P * a * h * h) / (2 * EIp))).toBeLessThan(TOL));
  it('tip drop P L³/(3 EI_arm) + P a² h / EI_pole', () => expect(rel(c.tipDrop_m, (P * L ** 3) / (3 * EIa) + (P * a * a * h) / EIp)).toBeLessThan(TOL));
  it('pole shortening (printed for reference) P h / (E A), A = π/4 (D² − d²) (axial deformation of a bar, any mechanics of materials text)', () => {
    const A = (Math.PI / 4) * (Dp ** 2 - (Dp - 2 * tp) ** 2);
    expect(rel(c.poleShortening_m, (P * h) / (E * A))).toBeLessThan(TOL);
  });
});

describe('L-frame with a tip weight, rotational base spring', () => {
  const k = 4e7;
  const c = momentAreaCheck(lFrame({ kind: 'spring', stiffness_Nm_per_rad: k }));
  if (!c) throw new Error('no arm');
  const tb = (P * a) / k;
  it('base rotation M_base / k', () => expect(rel(c.baseRotation_rad, tb)).toBeLessThan(TOL));
  it('joint rotation P a/k + P a h / EI', () => expect(rel(c.jointRotation_rad, tb + (P * a * h) / EIp)).toBeLessThan(TOL));
  it('joint sway (P a/k) h + P a h² / (2 EI)', () => expect(rel(c.jointSway_m, tb * h + (P * a * h * h) / (2 * EIp))).toBeLessThan(TOL));
  it('tip drop adds (P a/k) a', () => expect(rel(c.tipDrop_m, tb * a + (P * L ** 3) / (3 * EIa) + (P * a * a * h) / EIp)).toBeLessThan(TOL));
});

describe('L-frame with the arm in another plan direction and a lateral offset', () => {
  // The plane turns with the arm; a lateral offset makes torque only (out of plane), so the
  // closed forms above hold unchanged.
  const base = lFrame({ kind: 'fixed' });
  const d: Design = {
    ...base,
    arms: [{ ...base.arms[0], direction_rad: 2.1 }],
    attachments: [testHead({ position_m: L, weight_N: P, offset: { vertical_m: -0.4, lateral_m: 0.5, direction_rad: 0 } })],
  };
  const c = momentAreaCheck(d);
  if (!c) throw new Error('no arm');
  it('same joint rotation, sway and tip drop', () => {
    expect(rel(c.jointRotation_rad, (P * a * h) / EIp)).toBeLessThan(TOL);
    expect(rel(c.jointSway_m, (P * a * h * h) / (2 * EIp))).toBeLessThan(TOL);
    expect(rel(c.tipDrop_m, (P * L ** 3) / (3 * EIa) + (P * a * a * h) / EIp)).toBeLessThan(TOL);
  });
});
