// 12x12 element matrices in local axes, dof order [u1 v1 w1 rx1 ry1 rz1 u2 v2 w2 rx2 ry2 rz2].
// Bending in x-y uses v and rz (rz = dv/dx); bending in x-z uses w and ry (ry = -dw/dx).
import type { FrameElement } from '../model/frame.ts';

function setSym(k: Float64Array, a: number, b: number, v: number): void {
  k[a * 12 + b] = v;
  k[b * 12 + a] = v;
}

/** Elastic stiffness of a prismatic Euler-Bernoulli 3D beam, shear deformation neglected
 * (the standard matrix of e.g. McGuire, Gallagher & Ziemian, Matrix Structural Analysis, ch. 4; from memory). */
export function elasticStiffnessLocal(el: FrameElement, L: number): Float64Array {
  const k = new Float64Array(144);
  const EA = (el.E_Pa * el.A_m2) / L;
  const GJ = (el.G_Pa * el.J_m4) / L;
  const EIz = el.E_Pa * el.Iz_m4;
  const EIy = el.E_Pa * el.Iy_m4;
  const L2 = L * L;
  const L3 = L2 * L;
  setSym(k, 0, 0, EA); setSym(k, 6, 6, EA); setSym(k, 0, 6, -EA);
  setSym(k, 3, 3, GJ); setSym(k, 9, 9, GJ); setSym(k, 3, 9, -GJ);
  // x-y plane: v (1, 7), rz (5, 11)
  setSym(k, 1, 1, (12 * EIz) / L3); setSym(k, 7, 7, (12 * EIz) / L3); setSym(k, 1, 7, (-12 * EIz) / L3);
  setSym(k, 1, 5, (6 * EIz) / L2); setSym(k, 1, 11, (6 * EIz) / L2);
  setSym(k, 5, 7, (-6 * EIz) / L2); setSym(k, 7, 11, (-6 * EIz) / L2);
  setSym(k, 5, 5, (4 * EIz) / L); setSym(k, 11, 11, (4 * EIz) / L); setSym(k, 5, 11, (2 * EIz) / L);
  // x-z plane: w (2, 8), ry (4, 10)
  setSym(k, 2, 2, (12 * EIy) / L3); setSym(k, 8, 8, (12 * EIy) / L3); setSym(k, 2, 8, (-12 * EIy) / L3);
  setSym(k, 2, 4, (-6 * EIy) / L2); setSym(k, 2, 10, (-6 * EIy) / L2);
  setSym(k, 4, 8, (6 * EIy) / L2); setSym(k, 8, 10, (6 * EIy) / L2);
  setSym(k, 4, 4, (4 * EIy) / L); setSym(k, 10, 10, (4 * EIy) / L); setSym(k, 4, 10, (2 * EIy) / L);
  return k;
}

/** Consistent geometric stiffness for a constant axial force N (tension +) from the same cubic
 * shape functions, with the torsion term N*Ip/(A*L), Ip = Iy + Iz (the N-only form in McGuire,
 * Gallagher & Ziemian, Matrix Structural Analysis, ch. 9, without the end-moment terms; from memory). */
export function geometricStiffnessLocal(el: FrameElement, L: number, N: number): Float64Array {
  const k = new Float64Array(144);
  if (N === 0) return k;
  const a = (6 * N) / (5 * L);
  const b = N / 10;
  const c = (2 * N * L) / 15;
  const d = (-N * L) / 30;
  setSym(k, 1, 1, a); setSym(k, 7, 7, a); setSym(k, 1, 7, -a);
  setSym(k, 1, 5, b); setSym(k, 1, 11, b); setSym(k, 5, 7, -b); setSym(k, 7, 11, -b);
  setSym(k, 5, 5, c); setSym(k, 11, 11, c); setSym(k, 5, 11, d);
  setSym(k, 2, 2, a); setSym(k, 8, 8, a); setSym(k, 2, 8, -a);
  setSym(k, 2, 4, -b); setSym(k, 2, 10, -b); setSym(k, 4, 8, b); setSym(k, 8, 10, b);
  setSym(k, 4, 4, c); setSym(k, 10, 10, c); setSym(k, 4, 10, d);
  const t = (N * (el.Iy_m4 + el.Iz_m4)) / (el.A_m2 * L);
  setSym(k, 3, 3, t); setSym(k, 9, 9, t); setSym(k, 3, 9, -t);
  return k;
}

/** Transformation from the 12 global node dofs to the 12 local end dofs:
 * u_end = u_node + theta x r (rigid offset r), theta_end = theta_node, then rotated by R. */
export function elementTransform(R: Float64Array, rI: readonly number[], rJ: readonly number[]): Float64Array {
  const T = new Float64Array(144);
  const block = (off: number, r: readonly number[]): void => {
    // S = -[r]x so that S * theta = theta x r
    const S = [0, r[2], -r[1], -r[2], 0, r[0], r[1], -r[0], 0];
    for (let a = 0; a < 3; a++) {
      for (let b = 0; b < 3; b++) {
        const Rab = R[a * 3 + b];
        T[(off + a) * 12 + off + b] = Rab; // translations
        T[(off + 3 + a) * 12 + off + 3 + b] = Rab; // rotations
        let rs = 0;
        for (let m = 0; m < 3; m++) rs += R[a * 3 + m] * S[m * 3 + b];
        T[(off + a) * 12 + off + 3 + b] = rs; // rotation -> end translation through the offset
      }
    }
  };
  block(0, rI);
  block(6, rJ);
  return T;
}

/** y = A x for 12x12 A. */
export function mulVec12(A: Float64Array, x: ArrayLike<number>): Float64Array {
  const y = new Float64Array(12);
  for (let a = 0; a < 12; a++) {
    let s = 0;
    for (let b = 0; b < 12; b++) s += A[a * 12 + b] * x[b];
    y[a] = s;
  }
  return y;
}

/** y = A^T x for 12x12 A. */
export function mulTVec12(A: Float64Array, x: ArrayLike<number>): Float64Array {
  const y = new Float64Array(12);
  for (let a = 0; a < 12; a++) {
    const xa = x[a];
    if (xa === 0) continue;
    for (let b = 0; b < 12; b++) y[b] += A[a * 12 + b] * xa;
  }
  return y;
}

/** T^T k T for 12x12 matrices. */
export function congruent12(T: Float64Array, k: Float64Array): Float64Array {
  const kT = new Float64Array(144);
  for (let a = 0; a < 12; a++) {
    for (let m = 0; m < 12; m++) {
      const kam = k[a * 12 + m];
      if (kam === 0) continue;
      for (let b = 0; b < 12; b++) kT[a * 12 + b] += kam * T[m * 12 + b];
    }
  }
  const out = new Float64Array(144);
  for (let m = 0; m < 12; m++) {
    for (let a = 0; a < 12; a++) {
      const Tma = T[m * 12 + a];
      if (Tma === 0) continue;
      for (let b = 0; b < 12; b++) out[a * 12 + b] += Tma * kT[m * 12 + b];
    }
  }
  return out;
}
