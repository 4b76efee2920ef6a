// Independent hand check of the in-plane dead-load case by the moment-area method (Mohr's
// theorems), integrating M/EI along the real continuous taper (I from the exact tube formulas
// at each point), not along the analysis's prismatic segment chain.
//
// With the pole base at z = 0, the joint (the main arm's attach height) at h, the arm's
// horizontal reach R from the pole axis to the tip, the arm length L and rise α:
//   first theorem:  θ_joint = θ_base + ∫[0,h] M/EI dz              (θ_base = M_base / k for a base spring)
//   second theorem: Δ_joint = θ_base h + ∫[0,h] M (h − z)/EI dz
//   arm tip:        δ_tip  = θ_joint R + cos α ∫[0,L] M (L − s)/EI ds
// (the tip moves square to the arm by (L − s) dθ for a curvature at s; its vertical part is
// (L − s) cos α dθ). Signs: M > 0 as the main arm's weights act; θ > 0 drops the tip; Δ > 0
// toward the arm; δ_tip > 0 downward. Axial shortening and shear deformation are neglected.
import { qty, StepCollector, type CalcStep, type Expr } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import { sectionAt } from '../model/taper.ts';
import { formatNumber } from '../units/units.ts';
import { integratePiecewise, type QuadratureSettings } from './gauss-legendre.ts';
import { inPlaneStatics, type InPlaneStatics } from './in-plane-statics.ts';
import { poleShortening_m } from './pole-shortening.ts';

export const MOMENT_AREA_SOURCE = "moment-area method (Mohr's theorems), e.g. Hibbeler, Structural Analysis";

/** 5 Gauss points in each of 8 panels per piece; the error estimate doubles the panels. */
export const DEFAULT_QUADRATURE: QuadratureSettings = { points: 5, panels: 8 };

/** Intervals of the printed integration tables. */
export const TABLE_INTERVALS = 10;

export interface IntegrationRow {
  /** z on the pole, s on the arm. */
  readonly position_m: number;
  readonly M_Nm: number;
  readonly I_m4: number;
  /** M / EI. */
  readonly curvature_per_m: number;
  /** M × lever / EI: lever h − z on the pole, (L − s) cos α on the arm. */
  readonly leveredCurvature: number;
}

export interface IntegrationTable {
  readonly member: 'pole' | 'arm';
  readonly length_m: number;
  readonly rows: readonly IntegrationRow[];
  /** Simpson's rule on the table's points, for a checker to compare with the quadrature. */
  readonly simpsonCurvature: number;
  readonly simpsonLevered: number;
}

export interface MomentAreaCheck {
  readonly statics: InPlaneStatics;
  readonly E_Pa: number;
  readonly jointHeight_m: number;
  readonly baseRotation_rad: number;
  readonly poleRotationIntegral_rad: number;
  readonly poleSwayIntegral_m: number;
  /** cos α ∫ M (L − s)/EI ds: the tip drop from the arm's own bending. */
  readonly armDrop_m: number;
  readonly jointRotation_rad: number;
  readonly jointSway_m: number;
  readonly tipDrop_m: number;
  /** Axial shortening of the pole to the joint, ∫ N/EA dz: left out of the moment-area result,
   * printed for reading the comparison. */
  readonly poleShortening_m: number;
  readonly quadrature: QuadratureSettings;
  /** Largest |I(panels) − I(2 panels)| / |I(2 panels)| of the three integrals (the values are the finer ones). */
  readonly integrationError: number;
  readonly poleTable: IntegrationTable;
  readonly armTable: IntegrationTable;
  readonly steps: readonly CalcStep[];
}

function table(member: 'pole' | 'arm', length_m: number, M: (x: number) => number, I: (x: number) => number, E: number, lever: (x: number) => number): IntegrationTable {
  const h = length_m / TABLE_INTERVALS;
  const rows: IntegrationRow[] = [];
  for (let k = 0; k <= TABLE_INTERVALS; k++) {
    const x = k === TABLE_INTERVALS ? length_m : k * h;
    const Mx = M(x);
    const Ix = I(x);
    rows.push({ position_m: x, M_Nm: Mx, I_m4: Ix, curvature_per_m: Mx / (E * Ix), leveredCurvature: (Mx * lever(x)) / (E * Ix) });
  }
  const simpson = (f: (r: IntegrationRow) => number) =>
    (h / 3) * rows.reduce((t, r, k) => t + f(r) * (k === 0 || k === TABLE_INTERVALS ? 1 : k % 2 === 1 ? 4 : 2), 0);
  return { member, length_m, rows, simpsonCurvature: simpson((r) => r.curvature_per_m), simpsonLevered: simpson((r) => r.leveredCurvature) };
}

export function momentAreaCheck(design: Design, quadrature: QuadratureSettings = DEFAULT_QUADRATURE): MomentAreaCheck | null {
  const st = inPlaneStatics(design);
  if (!st) return null;
  const E = design.material.E_Pa;
  const pole = design.pole;
  const arm = st.arm;
  const h = arm.attachHeight_m;
  const L = arm.length_m;
  const cosRise = Math.cos(arm.rise_rad);
  const Ipole = (z: number) => sectionAt(pole.section, pole.height_m, z).I_m4;
  const Iarm = (s: number) => sectionAt(arm.section, L, s).I_m4;
  const poleBreaks = st.poleSources.map((p) => p.z_m);
  const armBreaks = st.armWeights.map((w) => w.s_m);

  let worst = 0;
  const integral = (f: (x: number) => number, b: number, breaks: readonly number[]): number => {
    const coarse = integratePiecewise(f, 0, b, breaks, quadrature);
    const fine = integratePiecewise(f, 0, b, breaks, { points: quadrature.points, panels: 2 * quadrature.panels });
    const diff = Math.abs(fine - coarse);
    if (diff > 0) worst = Math.max(worst, fine === 0 ? Infinity : diff / Math.abs(fine));
    return fine;
  };
  const poleRot = integral((z) => st.poleMoment(z) / (E * Ipole(z)), h, poleBreaks);
  const poleSway = integral((z) => (st.poleMoment(z) * (h - z)) / (E * Ipole(z)), h, poleBreaks);
  const armDrop = cosRise * integral((s) => (st.armMoment(s) * (L - s)) / (E * Iarm(s)), L, armBreaks);

  // The base spring about the horizontal axis square to the arm's plane, n = (−sin φ, cos φ, 0):
  // the in-plane rotation is M n·K⁻¹·n, so k = 1 / (sin²φ / kx + cos²φ / ky).
  const phi = arm.direction_rad;
  const k = pole.base.kind === 'spring' ? 1 / (Math.sin(phi) ** 2 / pole.base.stiffness_Nm_per_rad + Math.cos(phi) ** 2 / (pole.base.stiffnessY_Nm_per_rad ?? pole.base.stiffness_Nm_per_rad)) : Infinity;
  const baseRot = Number.isFinite(k) ? st.baseMoment_Nm / k : 0;
  const jointRotation = baseRot + poleRot;
  const jointSway = baseRot * h + poleSway;
  const tipDrop = jointRotation * st.reach_m + armDrop;

  const c = new StepCollector();
  const src = MOMENT_AREA_SOURCE;
  const selfPart = st.armRootMoment_Nm - st.armWeights.reduce((t, w) => t + w.W_N * (w.s_m * cosRise), 0);
  const weightTerms: Expr = st.armWeights.flatMap((w, i) => [i === 0 ? '' : ' + ', qty(w.W_N, 'weight'), ' × ', qty(w.s_m, 'length'), ' × cos α']);
  c.add({
    description: `In-plane moment in arm ${arm.id} at its root (pole face): attachment weights × horizontal lever arms, plus the tapered self-weight`,
    symbol: 'M_root',
    formula: 'M_root = Σ W_i s_i cos α + cos α ∫[0,L] w(s) s ds',
    substituted: [...weightTerms, st.armWeights.length > 0 ? ' + ' : '', qty(selfPart, 'moment'), ` (cos α = ${cosRise.toFixed(4)})`],
    result: qty(st.armRootMoment_Nm, 'moment'),
    source: 'statics of the cantilevered arm; w(s) = ρ g A(s), A linear in s for a constant wall',
  });
  const armTotal = st.armSelfWeight_N + st.armWeights.reduce((t, w) => t + w.W_N, 0);
  c.add({
    description: `Moment arm ${arm.id} puts into the pole at the joint (its weights also act at the rigid offset from the pole axis to the pole face)`,
    symbol: 'M_joint',
    formula: 'M_joint = M_root + W_arm r_face',
    substituted: [qty(st.armRootMoment_Nm, 'moment'), ' + ', qty(armTotal, 'weight'), ' × ', qty(st.faceOffset_m, 'section')],
    result: qty(st.jointMoment_Nm, 'moment'),
    source: 'statics',
  });
  const others = st.poleSources.slice(1);
  c.add({
    description: others.length > 0 ? 'Pole moment at the base: the joint moment plus the in-plane moments of the other arms and offset pole attachments (weight × horizontal lever arm projected on the plane); the pole self-weight is axial' : 'Pole moment at the base: the joint moment (the pole self-weight is axial)',
    symbol: 'M_base',
    formula: others.length > 0 ? 'M_base = M_joint + Σ W e·r' : 'M_base = M_joint',
    substituted: [qty(st.jointMoment_Nm, 'moment'), ...others.flatMap((o) => [' + (', qty(o.M_Nm, 'moment'), ')'])],
    result: qty(st.baseMoment_Nm, 'moment'),
    source: 'statics',
  });
  if (Number.isFinite(k)) {
    c.add({ description: 'Rotation of the base spring', symbol: 'θ_base', formula: 'θ_base = M_base / k', substituted: [qty(st.baseMoment_Nm, 'moment'), ' / ', qty(k, 'rotStiffness')], result: qty(baseRot, 'angle'), source: 'rotational spring' });
  }
  const base = Number.isFinite(k) ? [qty(baseRot, 'angle'), ' + '] : [];
  c.add({
    description: `Joint rotation at the arm ${arm.id} connection (first moment-area theorem; positive drops the arm tip)`,
    symbol: 'θ_joint',
    formula: Number.isFinite(k) ? 'θ_joint = θ_base + ∫[0,h] M/EI dz' : 'θ_joint = ∫[0,h] M/EI dz',
    substituted: [...base, '∫[0,h] M/EI dz = ', qty(poleRot, 'angle'), ' (h = ', qty(h, 'length'), ')'],
    result: qty(jointRotation, 'angle'),
    source: src,
  });
  c.add({
    description: 'Joint sway, horizontal in the plane of the arm (second moment-area theorem; positive toward the arm)',
    symbol: 'Δ_joint',
    formula: Number.isFinite(k) ? 'Δ_joint = θ_base h + ∫[0,h] M (h − z)/EI dz' : 'Δ_joint = ∫[0,h] M (h − z)/EI dz',
    substituted: [...(Number.isFinite(k) ? [qty(baseRot, 'angle'), ' × ', qty(h, 'length'), ' + '] : []), '∫[0,h] M (h − z)/EI dz = ', qty(poleSway, 'section')],
    result: qty(jointSway, 'section'),
    source: src,
  });
  c.add({
    description: `Tip drop of arm ${arm.id} from its own bending (second theorem along the arm; vertical part of the deflection square to the arm)`,
    symbol: 'δ_arm',
    formula: 'δ_arm = cos α ∫[0,L] M (L − s)/EI ds',
    substituted: [`${cosRise.toFixed(4)} × ∫[0,L] M (L − s)/EI ds = ${cosRise.toFixed(4)} × `, qty(armDrop / cosRise, 'section'), ' (L = ', qty(L, 'length'), ')'],
    result: qty(armDrop, 'section'),
    source: src,
  });
  c.add({
    description: `Vertical deflection of the tip of arm ${arm.id} (positive down): the joint rotation over the horizontal reach from the pole axis, plus the arm's own bending`,
    symbol: 'δ_tip',
    formula: 'δ_tip = θ_joint R + δ_arm',
    // The rotation in radians, as it enters the product (the angle dimension prints degrees).
    substituted: [`${formatNumber(jointRotation)} rad × `, qty(st.reach_m, 'length'), ' + ', qty(armDrop, 'section')],
    result: qty(tipDrop, 'section'),
    source: src,
  });

  const shortening = poleShortening_m(design, h, { points: quadrature.points, panels: 2 * quadrature.panels });
  c.add({
    description: 'For reading the comparison only, not part of the moment-area result: axial shortening of the pole from the base to the joint under the whole dead load (it lowers the joint and the arm tip with it)',
    symbol: 'δ_axial',
    formula: 'δ_axial = ∫[0,h] N/EA dz',
    substituted: ['∫[0,h] N/EA dz, N = weight above z, = ', qty(shortening, 'section')],
    result: qty(shortening, 'section'),
    source: 'axial deformation of a bar, δ = ∫ N/EA dz',
  });

  return {
    statics: st,
    E_Pa: E,
    jointHeight_m: h,
    baseRotation_rad: baseRot,
    poleRotationIntegral_rad: poleRot,
    poleSwayIntegral_m: poleSway,
    armDrop_m: armDrop,
    jointRotation_rad: jointRotation,
    jointSway_m: jointSway,
    tipDrop_m: tipDrop,
    poleShortening_m: shortening,
    quadrature,
    integrationError: worst,
    poleTable: table('pole', h, st.poleMoment, Ipole, E, (z) => h - z),
    armTable: table('arm', L, st.armMoment, Iarm, E, (s) => (L - s) * cosRise),
    steps: c.steps,
  };
}
