// The numbers of one alternative's row, read from the analysis and the checks exactly as a
// build makes them (the records the package prints): no engineering is redone here. SI units.
import type { LoadedDesign } from '../design/design.ts';
import type { CheckedDesign } from '../pipeline.ts';
import type { CheckRecord } from '../checks/check-types.ts';
import { CHECK_TITLES } from '../checks/verdict.ts';
import { isFactored } from '../design/combination-use.ts';
import { STANDARD_GRAVITY_mps2 } from '../model/gravity.ts';

/** A value with the combination (or case) and place it comes from. */
export interface Located {
  readonly value: number;
  readonly combination: string | null;
  readonly member: string | null;
}

/** A demand with the limit it is checked against. */
export interface Limited extends Located {
  readonly limit: number;
}

export interface AlternativeMetrics {
  /** The record with the largest ratio among the pass/fail checks (warnings excluded). */
  readonly governing: {
    readonly ratio: number;
    readonly title: string;
    readonly label: string;
    readonly member: string;
    readonly s_m: number | null;
    readonly combination: string | null;
  };
  /** Check types with at least one failing record, by title. */
  readonly failing: readonly string[];
  /** Check types with a warning (e.g. vortex shedding), by title. */
  readonly warnings: readonly string[];
  /** Largest resultant moment at the pole base over the factored combinations (second order when analysed so). */
  readonly baseMoment: Located | null;
  /** Largest horizontal base reaction, factored. */
  readonly baseShear: Located | null;
  /** Largest base torque (reaction about the vertical), factored. */
  readonly baseTorque: Located | null;
  /** Pole top horizontal deflection under the service combinations, with its limit. */
  readonly poleTopSway: Limited | null;
  /** Arm tip vertical deflection under the unfactored dead load, the largest ratio of the arms, with its limit. */
  readonly armTipDeflection: Limited | null;
  /** Largest anchor bolt axial force, with its design strength. */
  readonly boltForce: Limited | null;
  /** Weight of the steel tubes (pole and arms), from the model's elements. */
  readonly steelWeight_N: number;
  /** Length of each arm from the pole face, by id. */
  readonly armLengths_m: Readonly<Record<string, number>>;
}

const worstBy = (records: readonly CheckRecord[], key: (r: CheckRecord) => number): CheckRecord | null =>
  records.reduce<CheckRecord | null>((a, r) => (a === null || key(r) > key(a) ? r : a), null);

function limited(records: readonly CheckRecord[], byRatio: boolean): Limited | null {
  const w = worstBy(records, (r) => (byRatio ? r.ratio : r.demand.si));
  return w === null ? null : { value: w.demand.si, limit: w.capacity.si, combination: w.combination, member: w.member };
}

export function alternativeMetrics(loaded: LoadedDesign, checked: CheckedDesign): AlternativeMetrics {
  const { analysis, checks } = checked;
  // Vortex shedding only ever warns (it never fails a build), so it is not a pass/fail ratio.
  const judged = checks.records.filter((r) => r.status !== 'warn' && r.type !== 'vortex');
  const top = worstBy(judged, (r) => r.ratio) ?? worstBy(checks.records, (r) => r.ratio);
  if (top === null) throw new Error('no check records: a comparison needs checks');
  const titles = (pred: (r: CheckRecord) => boolean) => [...new Set(checks.records.filter(pred).map((r) => CHECK_TITLES[r.type]))];

  const factored = analysis.combinations.filter((c) => isFactored(c.category)).map((c) => c.id);
  const baseNode = analysis.model.supports[0]!.node;
  const maxOver = (f: (id: string) => number | null): Located | null => {
    let best: Located | null = null;
    for (const id of factored) {
      const v = f(id);
      if (v !== null && (best === null || v > best.value)) best = { value: v, combination: id, member: 'pole' };
    }
    return best;
  };
  const reaction = (id: string) => analysis.results[id]!.reactions.find((r) => r.node === baseNode)?.force ?? null;

  const steelMass = analysis.model.elements.reduce((sum, e) => sum + e.massPerLength_kgm * (e.sJ_m - e.sI_m), 0);
  return {
    governing: { ratio: top.ratio, title: CHECK_TITLES[top.type], label: top.label, member: top.member, s_m: top.s_m, combination: top.combination },
    failing: titles((r) => r.status === 'fail'),
    warnings: titles((r) => r.status === 'warn'),
    baseMoment: maxOver((id) => analysis.results[id]!.baseMoment?.final_Nm ?? null),
    baseShear: maxOver((id) => {
      const f = reaction(id);
      return f === null ? null : Math.hypot(f[0], f[1]);
    }),
    baseTorque: maxOver((id) => {
      const f = reaction(id);
      return f === null ? null : Math.abs(f[5]);
    }),
    poleTopSway: limited(checks.records.filter((r) => r.type === 'deflection-service' && r.member === 'pole'), false),
    armTipDeflection: limited(checks.records.filter((r) => r.type === 'deflection-dead'), true),
    boltForce: limited(checks.records.filter((r) => r.type === 'bolt-tension'), false),
    steelWeight_N: steelMass * STANDARD_GRAVITY_mps2,
    armLengths_m: Object.fromEntries(loaded.design.arms.map((a) => [a.id, a.length_m])),
  };
}
