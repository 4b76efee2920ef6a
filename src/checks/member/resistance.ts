// What a member-resistance function returns, and the steel it is given.
export interface Steel {
  readonly E_Pa: number;
  readonly Fy_Pa: number;
}

export type WallClass = 'compact' | 'noncompact' | 'slender' | 'beyond-limit';

export interface Resistance {
  /** Nominal resistance (N or N*m), before the resistance factor; NaN when !valid. */
  readonly nominal: number;
  readonly wallClass?: WallClass;
  /** Equation that gives the nominal value, e.g. 'AISC 360-16 Eq. F8-2'. */
  readonly equation: string;
  /** False when the specification gives no resistance (a wall beyond its range). */
  readonly valid: boolean;
  /** Plain words when !valid, else ''. */
  readonly reason: string;
}

export const AISC = 'AISC 360-16 Specification for Structural Steel Buildings';

export const invalid = (equation: string, reason: string, wallClass: WallClass = 'beyond-limit'): Resistance => ({ nominal: NaN, wallClass, equation, valid: false, reason });
