// Statics of the in-plane dead load for the moment-area hand check: the vertical plane of
// the main (longest) arm, the arm's bending moment diagram M(s) as a cantilever from the pole
// face, and the pole's moment diagram M(z) about the horizontal axis normal to that plane.
//
// What is in plane: weights (all vertical) and their horizontal lever arms projected on the
// arm's plan direction e. A vertical offset of an attachment does nothing to a weight's
// moment; a lateral offset (square to the arm in plan) makes a torque about the arm axis,
// which is out of plane and left out. The pole's own self-weight is axial. Other arms and
// offset pole attachments enter by weight × (horizontal lever arm projected on e).
//
// Sign convention: M > 0 in the sense of the main arm's weights (arm: tension on top;
// pole: tension on the face toward the arm).
import type { Arm, Attachment, Design } from '../design/design.ts';
import { attachmentWeight_N } from '../model/build-frame.ts';
import type { Vec3 } from '../model/frame.ts';
import { STANDARD_GRAVITY_mps2 } from '../model/gravity.ts';
import { armAxis, offsetVector, pointOnAxis, poleAxis, type MemberAxis } from '../model/member-axes.ts';
import { sectionAt } from '../model/taper.ts';
import { add, dot } from '../model/vec3.ts';
import { integratePiecewise } from './gauss-legendre.ts';

/** The arm the hand check follows: the longest, the first in input order on a tie. */
export function mainArm(design: Design): Arm | null {
  let best: Arm | null = null;
  for (const a of design.arms) if (best === null || a.length_m > best.length_m) best = a;
  return best;
}

/** A concentrated in-plane moment entering the pole at height z_m. */
export interface PoleMomentSource {
  readonly what: string;
  readonly z_m: number;
  readonly M_Nm: number;
}

export interface InPlaneStatics {
  readonly arm: Arm;
  readonly armAxis: MemberAxis;
  /** Unit plan direction of the main arm (horizontal). */
  readonly e: Vec3;
  /** Horizontal axis normal to the arm's plane, z × e: rotation about it drops the arm tip. */
  readonly n: Vec3;
  /** Horizontal distance from the pole axis to the pole face at the joint (the rigid offset). */
  readonly faceOffset_m: number;
  /** Horizontal distance from the pole axis to the arm tip. */
  readonly reach_m: number;
  /** Weights on the main arm, with their distance s along the arm. */
  readonly armWeights: readonly { readonly what: string; readonly s_m: number; readonly W_N: number }[];
  readonly armSelfWeight_N: number;
  /** Moment in the arm at its root (pole face). */
  readonly armRootMoment_Nm: number;
  /** Moment the main arm puts into the pole at the joint (about the pole axis). */
  readonly jointMoment_Nm: number;
  /** Everything that makes the pole moment, the main arm first. */
  readonly poleSources: readonly PoleMomentSource[];
  readonly baseMoment_Nm: number;
  /** Arm bending moment at s from the pole face. */
  armMoment(s_m: number): number;
  /** Pole bending moment at height z above the base (just below z where a moment enters). */
  poleMoment(z_m: number): number;
}

/** Levers below a nanometre are round-off of a projection. */
const ROUND_OFF_LEVER_m = 1e-9;

const selfWeightPerLength = (design: Design, ax: MemberAxis, s_m: number): number =>
  design.material.density_kgm3 * STANDARD_GRAVITY_mps2 * sectionAt(ax.section, ax.length_m, s_m).A_m2;

/** Horizontal lever, projected on e, of an attachment's centroid from the pole axis. */
function attachmentLever(ax: MemberAxis, a: Attachment, e: Vec3): number {
  return dot(add(pointOnAxis(ax, a.position_m), offsetVector(ax, a.offset)), e);
}

/** In-plane moment about the pole axis of one arm's weights (steel and attachments). */
function armMomentAtPole(design: Design, ax: MemberAxis, e: Vec3): number {
  // Weight per length and lever are both linear in s: a 2-point rule is exact.
  let M = integratePiecewise((s) => selfWeightPerLength(design, ax, s) * dot(pointOnAxis(ax, s), e), 0, ax.length_m, [], { points: 2, panels: 1 });
  for (const a of design.attachments) if (a.member === ax.id) M += attachmentWeight_N(a) * attachmentLever(ax, a, e);
  return M;
}

export function inPlaneStatics(design: Design): InPlaneStatics | null {
  const arm = mainArm(design);
  if (!arm) return null;
  const ax = armAxis(design, arm);
  const e: Vec3 = [Math.cos(arm.direction_rad), Math.sin(arm.direction_rad), 0];
  const n: Vec3 = [-e[1], e[0], 0];
  const cosRise = Math.cos(arm.rise_rad);
  const faceOffset_m = dot(ax.origin_m, e);
  const L = arm.length_m;
  const x = (s: number) => dot(pointOnAxis(ax, s), e);

  const armWeights = design.attachments
    .filter((a) => a.member === arm.id)
    .map((a) => ({ what: `${a.kind} ${a.id}`, s_m: a.position_m, W_N: attachmentWeight_N(a), lever_m: attachmentLever(ax, a, e) }));
  const armMoment = (s: number): number => {
    // Steel beyond s: a linear load from w(s) to w(L) over ℓ = L − s, moment about s = ℓ² (w_s + 2 w_L) / 6
    // along the arm, times cos(rise) for the horizontal lever.
    const l = L - s;
    let M = ((l * l * (selfWeightPerLength(design, ax, s) + 2 * selfWeightPerLength(design, ax, L))) / 6) * cosRise;
    for (const w of armWeights) if (w.s_m > s) M += w.W_N * (w.lever_m - x(s));
    return M;
  };
  const armSelfWeight_N = (L * (selfWeightPerLength(design, ax, 0) + selfWeightPerLength(design, ax, L))) / 2;
  const armRootMoment_Nm = armMoment(0);
  const jointMoment_Nm = armRootMoment_Nm + (armSelfWeight_N + armWeights.reduce((t, w) => t + w.W_N, 0)) * faceOffset_m;

  const poleSources: PoleMomentSource[] = [{ what: `arm ${arm.id} (the arm checked)`, z_m: arm.attachHeight_m, M_Nm: jointMoment_Nm }];
  for (const other of design.arms) {
    if (other === arm) continue;
    poleSources.push({ what: `arm ${other.id}`, z_m: other.attachHeight_m, M_Nm: armMomentAtPole(design, armAxis(design, other), e) });
  }
  const poleAx = poleAxis(design);
  for (const a of design.attachments) {
    if (a.member !== 'pole') continue;
    const lever = attachmentLever(poleAx, a, e);
    // An offset square to the plane gives a lever of round-off (cos 90°), not a moment.
    if (Math.abs(lever) > ROUND_OFF_LEVER_m) poleSources.push({ what: `${a.kind} ${a.id} on the pole (offset)`, z_m: a.position_m, M_Nm: attachmentWeight_N(a) * lever });
  }
  // At a height where a moment enters, the value just below it (so the joint itself has M_joint).
  // Moments that cancel (twin arms) leave round-off, not a moment: below 1e-12 of the sum of
  // their sizes the pole moment is zero.
  const poleMoment = (z: number): number => {
    let sum = 0;
    let size = 0;
    for (const p of poleSources) {
      if (p.z_m < z) continue;
      sum += p.M_Nm;
      size += Math.abs(p.M_Nm);
    }
    return Math.abs(sum) <= 1e-12 * size ? 0 : sum;
  };

  return {
    arm,
    armAxis: ax,
    e,
    n,
    faceOffset_m,
    reach_m: x(L),
    armWeights: armWeights.map(({ what, s_m, W_N }) => ({ what, s_m, W_N })),
    armSelfWeight_N,
    armRootMoment_Nm,
    jointMoment_Nm,
    poleSources,
    baseMoment_Nm: poleMoment(0),
    armMoment,
    poleMoment,
  };
}
