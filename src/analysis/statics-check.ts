// Statics check: the sum of applied loads against the sum of reactions, forces and moments about
// the global origin. In the deformed configuration (second order) loads and supports sit at their
// displaced positions, so the check also shows how well the P-delta equilibrium is met.
//
// What to expect, reported as two numbers:
// - Force balance: exact (round-off) in both configurations. The geometric stiffness adds equal and
//   opposite end forces, so it never unbalances the sum of forces; a force residual above round-off
//   is an error.
// - Moment balance in the deformed configuration: NOT exact, by the method. Summing the equilibrium
//   of the nodes (which the solution meets exactly), the global residual is the sum over elements of
//   each element's own moment imbalance in its displaced position. The consistent geometric
//   stiffness built from the axial force only (element-matrices.ts) balances exactly the axial
//   force acting through the element's transverse displacements (its end forces carry the moment
//   N (v_j - v_i)), and nothing else. It leaves out first-order products of other forces with
//   displacements: the shear acting through the axial shortening (a planar cantilever with tip
//   loads P and H leaves exactly H P L / (E A), tests/analysis/statics-deformed.test.ts), the shear
//   in one plane acting through the displacement in the other (a torque about the member: e.g.
//   arm weight through the arm's horizontal deflection), end moments through rotations, rigid
//   offsets through joint rotations, and loads through their own in-element displacements. A fuller
//   3D geometric stiffness with the end-moment terms (McGuire, Gallagher & Ziemian, Matrix
//   Structural Analysis, 2nd ed., ch. 9; from memory) would remove much of this; this package
//   does not use it.
//   So the moment residual is of the order of (forces) x (displacements): momentResidualShare
//   reports it against sum |F| x largest node displacement (the moment the displacements add to
//   the loads). A share well below 1 says the residual is the expected part of the linearised
//   method; a share near 1 would mean the omitted terms are as large as the whole displacement
//   effect, and the second-order results would need a fuller method.
import type { Vec3 } from '../model/frame.ts';
import type { Reaction, StaticsCheck } from './analysis-types.ts';
import { cross } from './element-geometry.ts';
import { intensityAt } from './element-loads.ts';
import type { LoadSet, PreparedModel } from './frame-system.ts';
import type { ElementState } from './member-stations.ts';
import { GAUSS3 } from './shape-functions.ts';
import { endInterpolationInto } from './internal-forces.ts';

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
  // A force (f0, f1, f2) and a moment (m0, m1, m2) at the point (p0, p1, p2); scalars, for speed.
  const apply = (p0: number, p1: number, p2: number, f0: number, f1: number, f2: number, m0: number, m1: number, m2: number): void => {
    const c0 = p1 * f2 - p2 * f1;
    const c1 = p2 * f0 - p0 * f2;
    const c2 = p0 * f1 - p1 * f0;
    F[0] += f0;
    F[1] += f1;
    F[2] += f2;
    M[0] += c0 + m0;
    M[1] += c1 + m1;
    M[2] += c2 + m2;
    sumF += Math.hypot(f0, f1, f2);
    sumM += Math.hypot(c0 + m0, c1 + m1, c2 + m2);
  };
  const nodePos = (n: number): Vec3 => {
    const x = prep.model.nodes[n].xyz_m;
    return deformed ? [x[0] + U[n * 6], x[1] + U[n * 6 + 1], x[2] + U[n * 6 + 2]] : x;
  };
  const nodal = ls.nodal;
  for (let n = 0; n < prep.model.nodes.length; n++) {
    const o = n * 6;
    if (nodal[o] !== 0 || nodal[o + 1] !== 0 || nodal[o + 2] !== 0 || nodal[o + 3] !== 0 || nodal[o + 4] !== 0 || nodal[o + 5] !== 0) {
      const p = nodePos(n);
      apply(p[0], p[1], p[2], nodal[o], nodal[o + 1], nodal[o + 2], nodal[o + 3], nodal[o + 4], nodal[o + 5]);
    }
  }
  const u = new Float64Array(3);
  const pt = new Float64Array(3);
  for (const st of states) {
    const { R, endI, L } = st.pe.geo;
    const pointAt = (x: number): void => {
      pt[0] = endI[0] + x * R[0];
      pt[1] = endI[1] + x * R[1];
      pt[2] = endI[2] + x * R[2];
      if (deformed) {
        endInterpolationInto(st.d, x, L, u);
        pt[0] += R[0] * u[0] + R[3] * u[1] + R[6] * u[2];
        pt[1] += R[1] * u[0] + R[4] * u[1] + R[7] * u[2];
        pt[2] += R[2] * u[0] + R[5] * u[1] + R[8] * u[2];
      }
    };
    // global = R^T local (toGlobal3), inline
    const applyLocal = (x: number, q0: number, q1: number, q2: number, moment: boolean): void => {
      pointAt(x);
      const g0 = R[0] * q0 + R[3] * q1 + R[6] * q2;
      const g1 = R[1] * q0 + R[4] * q1 + R[7] * q2;
      const g2 = R[2] * q0 + R[5] * q1 + R[8] * q2;
      if (moment) apply(pt[0], pt[1], pt[2], 0, 0, 0, g0, g1, g2);
      else apply(pt[0], pt[1], pt[2], g0, g1, g2, 0, 0, 0);
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
          applyLocal(x, q[0] * w, q[1] * w, q[2] * w, false);
        }
      } else if (l.kind === 'force') applyLocal(l.a, l.F[0], l.F[1], l.F[2], false);
      else applyLocal(l.a, l.M[0], l.M[1], l.M[2], true);
    }
  }
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
  let size = 1e-9;
  let moved = 0;
  for (const n of prep.model.nodes) {
    size = Math.max(size, Math.hypot(n.xyz_m[0], n.xyz_m[1], n.xyz_m[2]));
    const o = n.id * 6;
    if (deformed) moved = Math.max(moved, Math.hypot(U[o], U[o + 1], U[o + 2]));
  }
  const scaleM = sumM + sumF * size;
  const relForce = sumF > 0 ? Math.hypot(...resF) / sumF : 0;
  const relMoment = scaleM > 0 ? Math.hypot(...resM) / scaleM : 0;
  const displacementMoment = deformed ? sumF * moved : 0;
  return {
    configuration: deformed ? 'deformed' : 'undeformed',
    appliedForce_N: F,
    appliedMoment_Nm: M,
    reactionForce_N: RF,
    reactionMoment_Nm: RM,
    residualForce_N: resF,
    residualMoment_Nm: resM,
    relativeResidual: Math.max(relForce, relMoment),
    relativeForceResidual: relForce,
    relativeMomentResidual: relMoment,
    displacementMoment_Nm: displacementMoment,
    momentResidualShare: displacementMoment > 0 ? Math.hypot(...resM) / displacementMoment : null,
  };
}
