// Results outside the method: a pole top or arm tip that moves more than a fraction of its member's
// length. The analysis (first order, or P-delta with the geometric stiffness of the undeformed
// geometry) assumes small displacements and rotations; such results are not to be trusted.
import type { FrameModel } from '../model/frame.ts';
import type { AnalysisResults } from './analysis-types.ts';

/** A limit of ours: beyond about a tenth of the length the small-displacement, small-rotation
 * assumption of the P-delta method no longer holds; common practice. */
export const SMALL_DISPLACEMENT_LIMIT = 0.1;

export interface LargeMovement {
  /** 'pole' or an arm id. */
  readonly member: string;
  readonly combination: string;
  /** Total translation of the member's tip (pole top, arm tip), including what it has with the pole. */
  readonly movement_m: number;
  readonly length_m: number;
  /** movement / length. */
  readonly ratio: number;
}

/** Every member and combination whose tip moves more than SMALL_DISPLACEMENT_LIMIT x its length. */
export function largeMovements(model: FrameModel, results: AnalysisResults): LargeMovement[] {
  const out: LargeMovement[] = [];
  for (const r of Object.values(results)) {
    for (const m of model.members) {
      const stations = r.members[m.id]?.stations;
      if (!stations || stations.length === 0 || !(m.length_m > 0)) continue;
      const tip = stations.reduce((a, b) => (b.s_m > a.s_m ? b : a));
      const movement_m = Math.hypot(tip.ux_m, tip.uy_m, tip.uz_m);
      const ratio = movement_m / m.length_m;
      if (ratio > SMALL_DISPLACEMENT_LIMIT) out.push({ member: m.id, combination: r.combination, movement_m, length_m: m.length_m, ratio });
    }
  }
  return out;
}

/** The largest ratio of each member, in member order (the first combination on ties). */
export function worstPerMember(model: FrameModel, list: readonly LargeMovement[]): LargeMovement[] {
  const out: LargeMovement[] = [];
  for (const m of model.members) {
    const mine = list.filter((x) => x.member === m.id);
    if (mine.length > 0) out.push(mine.reduce((a, b) => (b.ratio > a.ratio ? b : a)));
  }
  return out;
}
