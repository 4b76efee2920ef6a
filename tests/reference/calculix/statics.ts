// Reactions of a frame with exactly one support, by statics (sum of forces and of moments
// about the support node, first order, undeformed geometry). ccx's own reaction printout
// (*NODE PRINT RF) at beam supports was measured wrong on this machine (CalculiX from Debian;
// a tip-loaded cantilever printed a 2141 N axial reaction for a purely transverse 1000 N load),
// so reactions for the comparison come from this equilibrium of the loads ccx solved: the
// concentrated forces written in its deck (element loads lumped onto ccx nodes, moments as
// force couples), each at its own point.
import type { FrameModel, Vec3, Vec6 } from '../../../src/model/frame.ts';
import type { NodalLoad } from '../../../src/loads/load-types.ts';
import { add, cross, sub } from './vec3.ts';

/** A concentrated force at a point, as written into the ccx deck. */
export interface PointForce {
  readonly xyz_m: Vec3;
  readonly F_N: Vec3;
  /** The ccx node it acts on, when it comes from a deck. */
  readonly ccxNode?: number;
}

export function reactionsFromPointForces(model: FrameModel, forces: readonly PointForce[]): { node: number; force: Vec6 }[] {
  if (model.supports.length !== 1) {
    throw new Error('CalculiX harness: reactions by statics need exactly one support (statically determinate)');
  }
  const support = model.supports[0]!;
  if (!support.fixed.every((f) => f)) throw new Error('CalculiX harness: the single support must be fully fixed');
  const p = model.nodes[support.node]!.xyz_m;
  let F: Vec3 = [0, 0, 0];
  let M: Vec3 = [0, 0, 0];
  for (const f of forces) {
    F = add(F, f.F_N);
    M = add(M, cross(sub(f.xyz_m, p), f.F_N));
  }
  return [{ node: support.node, force: [-F[0], -F[1], -F[2], -M[0], -M[1], -M[2]] }];
}

/** Nodal loads only: forces at their nodes, moments added directly. */
export function reactionsByStatics(model: FrameModel, loads: readonly NodalLoad[]): { node: number; force: Vec6 }[] {
  const r = reactionsFromPointForces(model, loads.map((l) => ({ xyz_m: model.nodes[l.node]!.xyz_m, F_N: l.F_N })));
  const M = loads.reduce<Vec3>((m, l) => add(m, l.M_Nm), [0, 0, 0]);
  const f = r[0]!.force;
  return [{ node: r[0]!.node, force: [f[0], f[1], f[2], f[3] - M[0], f[4] - M[1], f[5] - M[2]] }];
}
