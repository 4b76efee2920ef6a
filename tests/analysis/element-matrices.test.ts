// Element matrices against their definitions as integrals of the shape functions (e.g. Cook,
// Malkus, Plesha & Witt, Concepts and Applications of Finite Element Analysis, 4th ed., ch. 2 and
// ch. 18, from memory): elastic bending k = integral EI N''^T N'' dx, geometric stiffness
// kg = integral N N'^T N' dx (plus the torsion term integral N (Ip/A) theta'^2 dx), with cubic
// Hermite N written out here independently. 4-point Gauss integrates these polynomials exactly.
import { describe, expect, it } from 'vitest';
import { elasticStiffnessLocal, geometricStiffnessLocal } from '../../src/analysis/element-matrices.ts';
import type { FrameElement } from '../../src/model/frame.ts';

const el: FrameElement = {
  id: 0, member: 'm', i: 0, j: 1, E_Pa: 2e11, G_Pa: 8e10, A_m2: 0.004, Iy_m4: 3e-5, Iz_m4: 5e-5, J_m4: 7e-5,
  refVector: [0, 0, 1], offsetI_m: [0, 0, 0], offsetJ_m: [0, 0, 0], massPerLength_kgm: 30, sI_m: 0, sJ_m: 1.7,
  diameterI_m: 0.2, diameterJ_m: 0.2,
};
const L = 1.7;
const gp = [-0.861136311594053, -0.339981043584856, 0.339981043584856, 0.861136311594053];
const gw = [0.347854845137454, 0.652145154862546, 0.652145154862546, 0.347854845137454];

/** Derivatives of v(x) = sum phi_k q_k for dofs (v1, rz1, v2, rz2): first and second. */
function hermiteD(x: number): { d1: number[]; d2: number[] } {
  const s = x / L;
  return {
    d1: [(-6 * s + 6 * s * s) / L, 1 - 4 * s + 3 * s * s, (6 * s - 6 * s * s) / L, -2 * s + 3 * s * s],
    d2: [(-6 + 12 * s) / L ** 2, (-4 + 6 * s) / L, (6 - 12 * s) / L ** 2, (-2 + 6 * s) / L],
  };
}

function integrate(f: (x: number) => number): number {
  return gp.reduce((acc, t, k) => acc + gw[k] * (L / 2) * f((L / 2) * (1 + t)), 0);
}

// x-y plane dofs: v = 1, 7; rz = 5, 11 (rz = v'). x-z plane: w = 2, 8; ry = 4, 10 with ry = -w',
// so the rotation shape functions change sign there.
const planes = [
  { dofs: [1, 5, 7, 11], sign: [1, 1, 1, 1], I: el.Iz_m4 },
  { dofs: [2, 4, 8, 10], sign: [1, -1, 1, -1], I: el.Iy_m4 },
];

describe('element matrices equal their shape-function integrals', () => {
  it('elastic bending stiffness in both planes', () => {
    const k = elasticStiffnessLocal(el, L);
    for (const p of planes) {
      for (let a = 0; a < 4; a++) {
        for (let b = 0; b < 4; b++) {
          const ref = integrate((x) => el.E_Pa * p.I * hermiteD(x).d2[a] * p.sign[a] * hermiteD(x).d2[b] * p.sign[b]);
          const got = k[p.dofs[a] * 12 + p.dofs[b]];
          expect(Math.abs(got - ref)).toBeLessThan(1e-9 * Math.abs(k[p.dofs[0] * 12 + p.dofs[0]]));
        }
      }
    }
  });
  it('geometric stiffness (N = -3 kN) in both planes and the torsion term', () => {
    const N = -3e3;
    const kg = geometricStiffnessLocal(el, L, N);
    for (const p of planes) {
      for (let a = 0; a < 4; a++) {
        for (let b = 0; b < 4; b++) {
          const ref = integrate((x) => N * hermiteD(x).d1[a] * p.sign[a] * hermiteD(x).d1[b] * p.sign[b]);
          expect(Math.abs(kg[p.dofs[a] * 12 + p.dofs[b]] - ref)).toBeLessThan(1e-9 * Math.abs(N));
        }
      }
    }
    const ip = (el.Iy_m4 + el.Iz_m4) / el.A_m2;
    expect(kg[3 * 12 + 3]).toBeCloseTo((N * ip) / L, 9);
    expect(kg[3 * 12 + 9]).toBeCloseTo((-N * ip) / L, 9);
    // no axial terms; symmetric
    expect(kg[0]).toBe(0);
    for (let a = 0; a < 12; a++) for (let b = 0; b < 12; b++) expect(kg[a * 12 + b]).toBe(kg[b * 12 + a]);
  });
});
