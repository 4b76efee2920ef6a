// Where each member's axis lies in global axes (X, Y horizontal, Z up, origin at the pole
// base centre), and where an attachment's centroid sits relative to that axis.
import type { Arm, Design, Offset, TubeSection } from '../design/design.ts';
import type { Vec3 } from './frame.ts';
import { diameterAt } from './taper.ts';
import { add, scale } from './vec3.ts';

export interface MemberAxis {
  readonly id: string;
  readonly kind: 'pole' | 'arm';
  /** Axis point at s = 0: the pole base, or the arm root at the pole face. */
  readonly origin_m: Vec3;
  /** Unit vector along the axis from root to tip. */
  readonly direction: Vec3;
  readonly length_m: number;
  readonly section: TubeSection;
  /** Plan direction of the arm (0 for the pole). */
  readonly plan_rad: number;
}

export function poleAxis(design: Design): MemberAxis {
  const p = design.pole;
  return { id: 'pole', kind: 'pole', origin_m: [0, 0, 0], direction: [0, 0, 1], length_m: p.height_m, section: p.section, plan_rad: 0 };
}

/** Radius from the pole axis to the pole face at height z (for multisided: half the
 * across-flats width, i.e. the arm is taken to meet a flat). */
export function poleFaceRadius(design: Design, z_m: number): number {
  return diameterAt(design.pole.section, design.pole.height_m, z_m) / 2;
}

/** What turns an arm's face-measured length and positions back into those entered: the pole face
 * radius at the arm for an arm dimensioned from the pole axis, 0 for one dimensioned from the face. */
export function armLengthShift(design: Design, arm: Arm): number {
  return arm.lengthFrom === 'axis' ? poleFaceRadius(design, arm.attachHeight_m) : 0;
}

export function armAxis(design: Design, arm: Arm): MemberAxis {
  const r = poleFaceRadius(design, arm.attachHeight_m);
  const c = Math.cos(arm.direction_rad);
  const s = Math.sin(arm.direction_rad);
  const cr = Math.cos(arm.rise_rad);
  return {
    id: arm.id,
    kind: 'arm',
    origin_m: [r * c, r * s, arm.attachHeight_m],
    direction: [cr * c, cr * s, Math.sin(arm.rise_rad)],
    length_m: arm.length_m,
    section: arm.section,
    plan_rad: arm.direction_rad,
  };
}

/** The pole first, then the arms in input order. */
export function memberAxes(design: Design): MemberAxis[] {
  return [poleAxis(design), ...design.arms.map((a) => armAxis(design, a))];
}

export function findAxis(design: Design, member: string): MemberAxis {
  const ax = memberAxes(design).find((m) => m.id === member);
  if (!ax) throw new RangeError(`no member '${member}' (members: ${memberAxes(design).map((m) => m.id).join(', ')})`);
  return ax;
}

export const pointOnAxis = (ax: MemberAxis, s_m: number): Vec3 => add(ax.origin_m, scale(ax.direction, s_m));

/**
 * Global vector from the member axis to an attachment centroid (see design.ts Offset):
 * on an arm, vertical_m along global Z and lateral_m horizontal, +90 degrees in plan from the
 * arm direction; on the pole, lateral_m horizontal in plan direction offset.direction_rad and
 * vertical_m along Z from the position (a bracket that holds the centroid above or below it).
 */
export function offsetVector(ax: MemberAxis, off: Offset): Vec3 {
  if (ax.kind === 'pole') {
    return [off.lateral_m * Math.cos(off.direction_rad), off.lateral_m * Math.sin(off.direction_rad), off.vertical_m];
  }
  return [-off.lateral_m * Math.sin(ax.plan_rad), off.lateral_m * Math.cos(ax.plan_rad), off.vertical_m];
}
