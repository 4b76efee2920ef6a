// Base moment of a one-support frame in the deformed configuration, from a ccx run: every
// concentrated force of the deck at its displaced point (ccx printed every node's translation,
// RunOptions.printAllNodes). For a statically determinate frame this is the exact reaction moment
// of the deformed structure under loads that keep their direction (what *CLOAD does under NLGEOM).
import type { FrameModel, Vec3 } from '../../../src/model/frame.ts';
import type { CalculixResult } from './run-calculix.ts';
import { add, cross, sub } from './vec3.ts';

export function deformedBaseMoment(model: FrameModel, r: CalculixResult): Vec3 {
  const p = model.nodes[model.supports[0]!.node]!.xyz_m;
  let M: Vec3 = [0, 0, 0];
  for (const f of r.pointForces) {
    const u = f.ccxNode === undefined ? undefined : r.ccxTranslations_m.get(f.ccxNode);
    if (u === undefined) throw new Error('CalculiX harness: deformed statics needs every loaded node printed (printAllNodes)');
    M = add(M, cross(sub(add(f.xyz_m, u), p), f.F_N));
  }
  // The moment of the loads about the support; the reaction is its negative.
  return M;
}
