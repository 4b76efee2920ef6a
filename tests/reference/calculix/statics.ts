// Reactions of a frame with exactly one support, by statics (sum of forces and of moments
// about the support node, first order, undeformed geometry). ccx's own reaction printout
// (*NODE PRINT RF) at beam supports was measured wrong on this machine (../shared/STACK-NOTES.md;
// a tip-loaded cantilever printed a 2141 N axial reaction for a purely transverse 1000 N load),
// so reactions for the comparison come from this equilibrium of the same loads ccx solved.
import type { FrameModel, Vec6 } from '../../../src/model/frame.ts';
import type { NodalLoad } from '../../../src/loads/load-types.ts';
import { add, cross, sub } from './vec3.ts';
import type { Vec3 } from '../../../src/model/frame.ts';

export function reactionsByStatics(model: FrameModel, loads: readonly NodalLoad[]): { node: number; force: Vec6 }[] {
  if (model.supports.length !== 1) {
    throw new Error('CalculiX harness: reactions by statics need exactly one support (statically determinate)');
  }
  const support = model.supports[0]!;
  if (!support.fixed.every((f) => f)) throw new Error('CalculiX harness: the single support must be fully fixed');
  const p = model.nodes[support.node]!.xyz_m;
  let F: Vec3 = [0, 0, 0];
  let M: Vec3 = [0, 0, 0];
  for (const load of loads) {
    const r = sub(model.nodes[load.node]!.xyz_m, p);
    F = add(F, load.F_N);
    M = add(M, add(cross(r, load.F_N), load.M_Nm));
  }
  return [{ node: support.node, force: [-F[0], -F[1], -F[2], -M[0], -M[1], -M[2]] }];
}
