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
//   N (v_j - v_i)), and nothing else. N is the axial force the element carries (its length-weighted
//   mean, frame-system.ts axialForces): were it short of that (the mean of the end forces counts a
//   load at an element end as half carried), the missing P-delta moment would show here too, and
//   it would be an error, not a term of the method (a head load at the top of a column:
//   tests/analysis/p-delta-element-loads.test.ts). It leaves out first-order products of other forces with
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
import type { LoadSet, PreparedModel } from './frame-system.ts';
import type { ElementState } from './member-stations.ts';
import { GAUSS3, localDisplacementInto } from './shape-functions.ts';
import { intensityInto } from './element-loads.ts';

type V3 = [number, number, number];

/** Running sums: F (0-2), M about the origin (3-5), sum |F| (6), sum |M| (7). */
type Sums = Float64Array;

const pt = new Float64Array(3);
const u = new Float64Array(3);
/** The load being added: force (0-2) and moment (3-5), global. */
const fm = new Float64Array(6);

/** Adds the force and moment in fm acting at the point pt (scratch arrays: no allocation, no boxed
 * numbers in the hot loop). */
function apply(acc: Sums): void {
  const p0 = pt[0];
  const p1 = pt[1];
  const p2 = pt[2];
  const f0 = fm[0];
  const f1 = fm[1];
  const f2 = fm[2];
  const c0 = p1 * f2 - p2 * f1;
  const c1 = p2 * f0 - p0 * f2;
  const c2 = p0 * f1 - p1 * f0;
  acc[0] += f0;
  acc[1] += f1;
  acc[2] += f2;
  acc[3] += c0 + fm[3];
  acc[4] += c1 + fm[4];
  acc[5] += c2 + fm[5];
  // magnitudes only scale the relative residuals
  acc[6] += Math.sqrt(f0 * f0 + f1 * f1 + f2 * f2);
  const t0 = c0 + fm[3];
  const t1 = c1 + fm[4];
  const t2 = c2 + fm[5];
  acc[7] += Math.sqrt(t0 * t0 + t1 * t1 + t2 * t2);
}

/** Position of the point x along the element (displaced when deformed) into pt. */
function pointAt(st: ElementState, x: number, deformed: boolean): void {
  const { R, endI, L } = st.pe.geo;
  pt[0] = endI[0] + x * R[0];
  pt[1] = endI[1] + x * R[1];
  pt[2] = endI[2] + x * R[2];
  if (deformed) {
    localDisplacementInto(st.d, x, L, u);
    pt[0] += R[0] * u[0] + R[3] * u[1] + R[6] * u[2];
    pt[1] += R[1] * u[0] + R[4] * u[1] + R[7] * u[2];
    pt[2] += R[2] * u[0] + R[5] * u[1] + R[8] * u[2];
  }
}

/** The vector q (element axes) as a force, or as a moment, acting at x along the element. */
function applyLocal(acc: Sums, st: ElementState, deformed: boolean, x: number, q: Float64Array, moment: boolean): void {
  pointAt(st, x, deformed);
  const R = st.pe.geo.R;
  // global = R^T local (toGlobal3), inline
  const g0 = R[0] * q[0] + R[3] * q[1] + R[6] * q[2];
  const g1 = R[1] * q[0] + R[4] * q[1] + R[7] * q[2];
  const g2 = R[2] * q[0] + R[5] * q[1] + R[8] * q[2];
  const o = moment ? 3 : 0;
  fm.fill(0);
  fm[o] = g0;
  fm[o + 1] = g1;
  fm[o + 2] = g2;
  apply(acc);
}

const q = new Float64Array(3);

export function staticsCheck(
  prep: PreparedModel,
  ls: LoadSet,
  U: ArrayLike<number>,
  states: readonly ElementState[],
  reactions: readonly Reaction[],
  deformed: boolean,
): StaticsCheck {
  const acc: Sums = new Float64Array(8);
  const nodePos = (n: number): Vec3 => {
    const x = prep.model.nodes[n].xyz_m;
    return deformed ? [x[0] + U[n * 6], x[1] + U[n * 6 + 1], x[2] + U[n * 6 + 2]] : x;
  };
  const nodal = ls.nodal;
  for (let n = 0; n < prep.model.nodes.length; n++) {
    const o = n * 6;
    if (nodal[o] !== 0 || nodal[o + 1] !== 0 || nodal[o + 2] !== 0 || nodal[o + 3] !== 0 || nodal[o + 4] !== 0 || nodal[o + 5] !== 0) {
      const p = nodePos(n);
      pt[0] = p[0];
      pt[1] = p[1];
      pt[2] = p[2];
      for (let c = 0; c < 6; c++) fm[c] = nodal[o + c];
      apply(acc);
    }
  }
  for (const st of states) {
    const loads = st.loads;
    for (let k = 0; k < loads.length; k++) {
      const l = loads[k];
      if (l.kind === 'distributed') {
        const h = (l.b - l.a) / 2;
        if (h <= 0) continue;
        // deformed positions are cubic: 3-point Gauss keeps the moment exact
        for (let g = 0; g < 3; g++) {
          const x = l.a + h * (1 + GAUSS3.t[g]);
          const w = h * GAUSS3.w[g];
          intensityInto(l, x, q);
          q[0] *= w;
          q[1] *= w;
          q[2] *= w;
          applyLocal(acc, st, deformed, x, q, false);
        }
      } else {
        q[0] = l.vA[0];
        q[1] = l.vA[1];
        q[2] = l.vA[2];
        applyLocal(acc, st, deformed, l.a, q, l.kind === 'moment');
      }
    }
  }
  const F: V3 = [acc[0], acc[1], acc[2]];
  const M: V3 = [acc[3], acc[4], acc[5]];
  const sumF = acc[6];
  const sumM = acc[7];
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
