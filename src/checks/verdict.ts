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
  'bolt-tension': 'Anchor bolt tension',
  'bolt-shear': 'Anchor bolt shear',
  'bolt-combined': 'Anchor bolt tension with shear',
  'bolt-bending': 'Anchor bolt bending over the stand-off',
  'base-plate': 'Base plate bending',
  fatigue: 'Fatigue stress range (infinite life)',
  vortex: 'Vortex shedding susceptibility',
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
