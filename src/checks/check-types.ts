// Records of the checks stage. A check is a plain record, like a calculation step: what is
// checked, where, under which combination, the demand, the capacity, the ratio, the equation
// with its source, and whether it passes. The report, the JSON and the exit code all read
// these records, so the summary page, the terminal line and the exit code cannot disagree.
// All values SI.
import type { CalcStep, Qty } from '../calc/step.ts';

/** The kinds of check polebook makes; each has its own row in the verdict. */
export type CheckType =
  | 'member-strength' // combined axial, flexure, shear, torsion at a station (H3-6)
  | 'member-wall' // wall slenderness D/t or b/t within the specification's range
  | 'deflection-dead' // arm tip vertical under the unfactored dead load
  | 'deflection-service' // arm tip and pole top horizontal under the service combinations
  | 'deflection-fatigue' // arm tip vertical under galloping and truck gust
  | 'bolt-tension'
  | 'bolt-shear'
  | 'bolt-combined' // tension with shear (AISC 360 J3.7)
  | 'bolt-bending' // bolt bending over a stand-off larger than one bolt diameter
  | 'base-plate'
  | 'fatigue' // stress range against the constant-amplitude fatigue threshold
  | 'vortex'; // critical vortex-shedding speed against the susceptibility threshold

/**
 * 'ok': the demand is within the capacity. 'fail': it is not, or the check cannot be made
 * (a slenderness beyond the specification's range, a missing input), with its reason.
 * 'warn': outside polebook's checks but needing the engineer's attention (e.g. a member
 * susceptible to vortex shedding); it does not fail the build.
 */
export type CheckStatus = 'ok' | 'fail' | 'warn';

export interface CheckRecord {
  readonly type: CheckType;
  /** What is checked, e.g. 'Combined forces, round HSS' or 'Arm tip vertical, dead load'. */
  readonly label: string;
  /** 'pole', an arm id, 'anchor-bolts' or 'base-plate'. */
  readonly member: string;
  /** Distance along the member from its root; null when the check has no station. */
  readonly s_m: number | null;
  /** Combination (or load case for fatigue and dead-load deflection) id; null for none. */
  readonly combination: string | null;
  readonly demand: Qty;
  readonly capacity: Qty;
  /** demand / capacity; Infinity when the check cannot be made. */
  readonly ratio: number;
  /** Equation number and publication, e.g. 'AISC 360-16 Eq. H3-6'. */
  readonly equation: string;
  readonly status: CheckStatus;
  /** Why a check failed or could not be made, in plain words; '' when it passes. */
  readonly reason: string;
}

/** The governing record of a check type on one member, with its full calculation. */
export interface GoverningCheck {
  readonly record: CheckRecord;
  /** Every step from the section properties to the ratio, for the reviewer to rework by hand. */
  readonly steps: readonly CalcStep[];
}

export interface CheckResults {
  /** Every record, in a stable order (type, member, station, combination). */
  readonly records: readonly CheckRecord[];
  /** One per (type, member): the largest ratio with its steps. */
  readonly governing: readonly GoverningCheck[];
  /** True when any record has status 'fail'. */
  readonly fails: boolean;
}
