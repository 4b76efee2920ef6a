// Statics check: the sum of applied loads against the sum of reactions, forces and moments about
// the global origin. In the deformed configuration (second order) loads and supports sit at their
// displaced positions, so the check also shows how well the P-delta equilibrium is met.
import type { Vec3 } from '../model/frame.ts';
import type { Reaction, StaticsCheck } from './analysis-types.ts';
import { cross, toGlobal3 } from './element-geometry.ts';
import { intensityAt } from './element-loads.ts';
import type { LoadSet, PreparedModel } from './frame-system.ts';
import type { ElementState } from './member-stations.ts';
import { GAUSS3, localDisplacementAt } from './shape-functions.ts';

type V3 = [number, number, number];

export function staticsCheck(
  prep: PreparedModel,
  ls: LoadSet,
  U: ArrayLike<number>,
  states: readonly ElementState[],
  reactions: readonly Reaction[],
  deformed: boolean,
): StaticsCheck {
  const F: V3 = [0, 0, 0];
  const M: V3 = [0, 0, 0];
  let sumF = 0;
  let sumM = 0;
  const apply = (p: Vec3, force: Vec3, moment: Vec3): void => {
    const m = cross(p, force);
    for (let c = 0; c < 3; c++) {
      F[c] += force[c];
      M[c] += m[c] + moment[c];
    }
    sumF += Math.hypot(...force);
    sumM += Math.hypot(m[0] + moment[0], m[1] + moment[1], m[2] + moment[2]);
  };
  const nodePos = (n: number): Vec3 => {
    const x = prep.model.nodes[n].xyz_m;
    return deformed ? [x[0] + U[n * 6], x[1] + U[n * 6 + 1], x[2] + U[n * 6 + 2]] : x;
  };
  prep.model.nodes.forEach((_, n) => {
    const f: Vec3 = [ls.nodal[n * 6], ls.nodal[n * 6 + 1], ls.nodal[n * 6 + 2]];
    const m: Vec3 = [ls.nodal[n * 6 + 3], ls.nodal[n * 6 + 4], ls.nodal[n * 6 + 5]];
    if (f.some((v) => v !== 0) || m.some((v) => v !== 0)) apply(nodePos(n), f, m);
  });
  states.forEach((st) => {
    const { R, endI, L } = st.pe.geo;
    const pointAt = (x: number): Vec3 => {
      const ex = [R[0], R[1], R[2]];
      const p: V3 = [endI[0] + x * ex[0], endI[1] + x * ex[1], endI[2] + x * ex[2]];
      if (deformed) {
        const u = toGlobal3(R, localDisplacementAt(st.d, x, L));
        for (let c = 0; c < 3; c++) p[c] += u[c];
      }
      return p;
    };
    for (const l of st.loads) {
      if (l.kind === 'distributed') {
        const h = (l.b - l.a) / 2;
        if (h <= 0) continue;
        // deformed positions are cubic: 3-point Gauss keeps the moment exact
        for (let g = 0; g < 3; g++) {
          const x = l.a + h * (1 + GAUSS3.t[g]);
          const q = intensityAt(l, x);
          const w = h * GAUSS3.w[g];
          apply(pointAt(x), toGlobal3(R, [q[0] * w, q[1] * w, q[2] * w]), [0, 0, 0]);
        }
      } else if (l.kind === 'force') apply(pointAt(l.a), toGlobal3(R, l.F), [0, 0, 0]);
      else apply(pointAt(l.a), [0, 0, 0], toGlobal3(R, l.M));
    }
  });
  const RF: V3 = [0, 0, 0];
  const RM: V3 = [0, 0, 0];
  for (const r of reactions) {
    const f: Vec3 = [r.force[0], r.force[1], r.force[2]];
    const m = cross(nodePos(r.node), f);
    for (let c = 0; c < 3; c++) {
      RF[c] += f[c];
      RM[c] += m[c] + r.force[3 + c];
    }
  }
  const resF: V3 = [F[0] + RF[0], F[1] + RF[1], F[2] + RF[2]];
  const resM: V3 = [M[0] + RM[0], M[1] + RM[1], M[2] + RM[2]];
  // Moments are judged against the loads' own moments plus their forces times the frame's size,
  // so a frame whose loads pass through the origin still has a meaningful scale.
  const size = Math.max(...prep.model.nodes.map((n) => Math.hypot(...n.xyz_m)), 1e-9);
  const scaleM = sumM + sumF * size;
  const rel = Math.max(sumF > 0 ? Math.hypot(...resF) / sumF : 0, scaleM > 0 ? Math.hypot(...resM) / scaleM : 0);
  return {
    configuration: deformed ? 'deformed' : 'undeformed',
    appliedForce_N: F,
    appliedMoment_Nm: M,
    reactionForce_N: RF,
    reactionMoment_Nm: RM,
    residualForce_N: resF,
    residualMoment_Nm: resM,
    relativeResidual: rel,
  };
}
