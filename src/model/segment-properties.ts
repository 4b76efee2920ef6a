// Properties of the prismatic element that stands for a piece [s0, s1] of a tapered member.
//
// 'mid-length' (the default): properties of the section at the middle of the piece.
// 'flexibility': A, I and J are the harmonic means over the piece, L / ∫ ds / X(s), so the
// element has the same axial, bending (under uniform moment) and torsional flexibility as
// the tapered piece. The convergence study (tests/model/segment-convergence.test.ts) found
// the mid-length rule closer to the continuous taper for cantilever tip deflections under
// tip load, end moment and uniform load (about 0.4 to 0.7 times the error of the
// flexibility rule, both over-estimating the deflection), so it is the default.
import type { TubeSection } from '../design/design.ts';
import { sectionAt } from './taper.ts';

export type SegmentRule = 'flexibility' | 'mid-length';

export interface SegmentProperties {
  readonly A_m2: number;
  readonly I_m4: number;
  readonly J_m4: number;
  /** Mean steel area over the piece (exact: A is linear in D for a constant wall). */
  readonly meanA_m2: number;
}

// Gauss-Legendre 4-point rule on [-1, 1] (Abramowitz & Stegun, Table 25.4).
const GAUSS4 = [
  { x: -0.8611363115940526, w: 0.3478548451374538 },
  { x: -0.3399810435848563, w: 0.6521451548625461 },
  { x: 0.3399810435848563, w: 0.6521451548625461 },
  { x: 0.8611363115940526, w: 0.3478548451374538 },
];

export function segmentProperties(section: TubeSection, length_m: number, s0_m: number, s1_m: number, rule: SegmentRule = 'mid-length'): SegmentProperties {
  const a = sectionAt(section, length_m, s0_m).A_m2;
  const b = sectionAt(section, length_m, s1_m).A_m2;
  const meanA_m2 = (a + b) / 2;
  const mid = (s0_m + s1_m) / 2;
  if (rule === 'mid-length') {
    const p = sectionAt(section, length_m, mid);
    return { A_m2: p.A_m2, I_m4: p.I_m4, J_m4: p.J_m4, meanA_m2 };
  }
  const half = (s1_m - s0_m) / 2;
  let fA = 0;
  let fI = 0;
  let fJ = 0;
  for (const g of GAUSS4) {
    const p = sectionAt(section, length_m, mid + g.x * half);
    fA += g.w / p.A_m2;
    fI += g.w / p.I_m4;
    fJ += g.w / p.J_m4;
  }
  // Mean of 1/X over [-1, 1] is (Σ w/X) / 2.
  return { A_m2: 2 / fA, I_m4: 2 / fI, J_m4: 2 / fJ, meanA_m2 };
}
