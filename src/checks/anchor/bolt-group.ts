// Forces in the anchor bolts from the base reaction: n equal bolts equally spaced on a circle
// of diameter D, the base plate rigid, each bolt axially elastic (the elastic bolt-circle method).
// The section modulus of the bolt group is n D / 4 bolts (Σy² = n D²/8 for n ≥ 3 bolts at any
// rotation, divided by the largest distance D/2), so the largest bolt force from the moment is
// 4M/(nD) whatever the direction of the moment; the axial force shares equally.
import type { Vec6 } from '../../model/frame.ts';

/** The base reaction as the bolt group sees it. */
export interface BaseActions {
  /** Resultant overturning moment √(Mx² + My²). */
  readonly M_Nm: number;
  /** Downward force of the pole on the base (the vertical reaction Fz; negative is uplift). */
  readonly P_N: number;
  /** Resultant horizontal shear √(Fx² + Fy²). */
  readonly V_N: number;
  /** Torque about the pole axis |Mz|. */
  readonly T_Nm: number;
}

export const baseActions = (reaction: Vec6): BaseActions => ({
  M_Nm: Math.hypot(reaction[3], reaction[4]),
  P_N: reaction[2],
  V_N: Math.hypot(reaction[0], reaction[1]),
  T_Nm: Math.abs(reaction[5]),
});

export interface BoltForces {
  /** Largest bolt tension 4M/(nD) − P/n (negative when every bolt is in compression). */
  readonly tension_N: number;
  /** Largest bolt compression 4M/(nD) + P/n (negative when every bolt is in tension). */
  readonly compression_N: number;
  /** Shear per bolt from the base shear, V/n. */
  readonly shearFromV_N: number;
  /** Shear per bolt from the torque, T/(n D/2). */
  readonly shearFromT_N: number;
  /** Both added, as if they had the same direction in the most loaded bolt (an upper bound). */
  readonly shear_N: number;
}

export function boltForces(a: BaseActions, n: number, D_m: number): BoltForces {
  const fromM = (4 * a.M_Nm) / (n * D_m);
  const shearFromV_N = a.V_N / n;
  const shearFromT_N = a.T_Nm / ((n * D_m) / 2);
  return { tension_N: fromM - a.P_N / n, compression_N: fromM + a.P_N / n, shearFromV_N, shearFromT_N, shear_N: shearFromV_N + shearFromT_N };
}
