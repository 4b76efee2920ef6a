// The verdict: per check type, the worst record with the number of records, failures and
// warnings. The summary page, the terminal lines, the JSON and the exit code all read this.
import type { CheckRecord, CheckType } from './check-types.ts';

export interface TypeVerdict {
  readonly type: CheckType;
  /** What the type checks, in words. */
  readonly title: string;
  readonly worst: CheckRecord;
  readonly count: number;
  readonly failures: number;
  readonly warnings: number;
}

export const CHECK_TITLES: Readonly<Record<CheckType, string>> = {
  'member-strength': 'Member strength: axial, flexure, shear and torsion combined',
  'member-wall': 'Wall slenderness within the specification',
  'deflection-dead': 'Arm tip vertical deflection, dead load',
  'deflection-service': 'Horizontal deflection, service',
  'deflection-fatigue': 'Arm tip vertical deflection, fatigue loads',
  'bolt-tension': 'Anchor bolt axial force',
  'bolt-shear': 'Anchor bolt shear',
  'bolt-combined': 'Anchor bolt axial force with shear',
  'bolt-bending': 'Anchor bolt bending over the stand-off',
  'base-plate': 'Base plate bending',
  fatigue: 'Fatigue stress range (infinite life)',
  vortex: 'Vortex shedding susceptibility',
};

/** What each check covers, for the scope of the package. */
export const CHECK_SCOPE: Readonly<Record<CheckType, string>> = {
  'member-strength': 'at every result station of the pole and of each arm, under every factored combination, on the section of the tapered tube at that station',
  'member-wall': 'the wall slenderness of the pole and of each arm against the range of the specification, at the root and the tip',
  'deflection-dead': 'the arm tips, vertical, under the unfactored dead load alone, including the movement of the pole',
  'deflection-service': 'the pole top under every service combination, and each arm tip without the movement it has with the pole',
  'deflection-fatigue': 'the arm tips, vertical, under the galloping and truck-gust fatigue loads',
  'bolt-tension': 'the most loaded anchor bolt on the elastic bolt circle, the larger of its tension and its compression, every factored combination, on the thread stress area',
  'bolt-shear': 'base shear and torque shared by the anchor bolts, every factored combination',
  'bolt-combined': 'the design axial force of the most loaded bolt together with the shear per bolt (AISC 360-16 Eq. J3-3a), every factored combination',
  'bolt-bending': 'anchor-bolt bending with its axial force over the stand-off below the leveling nut (it is more than one bolt diameter), every factored combination',
  'base-plate': 'plate bending at the pole face from the design bolt force, by an effective width per bolt, every factored combination',
  fatigue: 'stress ranges at the pole base, at each arm root and, when anchor bolts are given, in the anchor bolts, under each fatigue load case, against the constant-amplitude thresholds of the details',
  vortex: 'critical vortex-shedding speed of each member in its natural modes against the susceptibility threshold (a warning: vortex-shedding loads are not computed)',
};

/** Types in the order the verdict prints them. */
export const CHECK_ORDER: readonly CheckType[] = Object.keys(CHECK_TITLES) as CheckType[];

export function verdictByType(records: readonly CheckRecord[]): TypeVerdict[] {
  const out: TypeVerdict[] = [];
  for (const type of CHECK_ORDER) {
    const list = records.filter((r) => r.type === type);
    if (list.length === 0) continue;
    const worst = list.reduce((a, b) => (b.ratio > a.ratio ? b : a));
    out.push({ type, title: CHECK_TITLES[type], worst, count: list.length, failures: list.filter((r) => r.status === 'fail').length, warnings: list.filter((r) => r.status === 'warn').length });
  }
  return out;
}
