// The same three quantities from polebook's matrix analysis of the 'dead' case alone, first
// order, on the same frame model (a chain of prismatic segments), and their differences from
// the moment-area values. The difference holds the segment discretisation plus what the hand
// method leaves out (axial shortening of the pole and arm, coupling through torsion from
// lateral offsets); shear deformation is absent from both.
import type { LoadCase } from '../loads/load-types.ts';
import { DEAD_CASE_ID } from '../loads/case-ids.ts';
import type { FrameModel } from '../model/frame.ts';
import { solveLoads } from '../analysis/analyze.ts';
import { dot } from '../model/vec3.ts';
import type { MomentAreaCheck } from './moment-area.ts';

/** Agreement expected at the default 20 segments per member (the chain's prismatic segments
 * are the main source; the segment study found ≤ 0.5 % on tip deflection, see build-frame.ts). */
export const EXPECTED_AGREEMENT = 0.01;

/** A quantity smaller than this share of its scale is nil on both sides; its difference is
 * shown against the scale instead of as a percentage of itself. */
export const NIL_SHARE = 1e-6;

export type QuantityKey = 'jointRotation' | 'jointSway' | 'tipDrop' | 'tipDropWithShortening';

export interface ComparisonRow {
  readonly key: QuantityKey;
  readonly label: string;
  readonly dim: 'angle' | 'section';
  readonly momentArea: number;
  readonly matrix: number;
  /** (matrix − moment-area) / |moment-area|; null when the moment-area value is nil. */
  readonly relativeDifference: number | null;
  /** (matrix − moment-area) / scale: the scale is the quantity itself, or for a nil one the arm-tip
   * drop (divided by the reach for the rotation). */
  readonly differenceOfScale: number;
}

export interface MatrixComparison {
  readonly jointNode: number;
  readonly tipNode: number;
  readonly rows: readonly ComparisonRow[];
}

function deadCase(cases: readonly LoadCase[]): LoadCase {
  const c = cases.find((x) => x.id === DEAD_CASE_ID);
  if (!c) throw new Error(`load case '${DEAD_CASE_ID}' was not built`);
  return c;
}

export function compareWithMatrix(check: MomentAreaCheck, model: FrameModel, cases: readonly LoadCase[]): MatrixComparison {
  const armId = check.statics.arm.id;
  const info = model.members.find((m) => m.id === armId);
  if (!info || info.elements.length === 0) throw new Error(`arm ${armId} is missing from the frame model`);
  const jointNode = model.elements[info.elements[0]].i;
  const tipNode = model.elements[info.elements[info.elements.length - 1]].j;
  const u = solveLoads(model, deadCase(cases).loads).displacements;
  const { e, n } = check.statics;
  const uj = u[jointNode];
  const matrix: Record<QuantityKey, number> = {
    jointRotation: dot([uj[3], uj[4], uj[5]], n),
    jointSway: dot([uj[0], uj[1], uj[2]], e),
    tipDrop: -u[tipNode][2],
    tipDropWithShortening: -u[tipNode][2],
  };
  const tipScale = Math.abs(check.tipDrop_m);
  const rows = (
    [
      ['jointRotation', 'Joint rotation θ_joint', 'angle', check.jointRotation_rad, tipScale / check.statics.reach_m],
      ['jointSway', 'Joint sway Δ_joint', 'section', check.jointSway_m, tipScale],
      ['tipDrop', `Arm ${armId} tip drop δ_tip`, 'section', check.tipDrop_m, tipScale],
      ['tipDropWithShortening', `For reference: δ_tip + δ_axial (pole shortening)`, 'section', check.tipDrop_m + check.poleShortening_m, tipScale],
    ] as const
  ).map(([key, label, dim, ma, fallbackScale]): ComparisonRow => {
    const nil = Math.abs(ma) <= NIL_SHARE * fallbackScale;
    const scale = nil ? fallbackScale : Math.abs(ma);
    const diff = matrix[key] - ma;
    return { key, label, dim, momentArea: ma, matrix: matrix[key], relativeDifference: nil ? null : diff / Math.abs(ma), differenceOfScale: scale > 0 ? diff / scale : 0 };
  });
  return { jointNode, tipNode, rows };
}
