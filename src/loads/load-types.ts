// Loads as applied to the frame model. Every load keeps its origin so the package
// can print it as a calculation step.
import type { CalcStep } from '../calc/step.ts';
import type { CombinationCategory } from '../design/design.ts';
import type { Vec3 } from '../model/frame.ts';

export interface LoadOrigin {
  /** What made the load: 'pole self-weight', 'panel S1', 'wind on arm A1', ... */
  readonly source: string;
}

export interface NodalLoad {
  readonly kind: 'nodal';
  readonly node: number;
  readonly F_N: Vec3; // global
  readonly M_Nm: Vec3; // global
  readonly origin: LoadOrigin;
}

/** A linearly varying distributed force per unit length over [a_m, b_m] along the element
 * (distances from end i, measured along the element's clear length). */
export interface DistributedLoad {
  readonly kind: 'distributed';
  readonly element: number;
  readonly axes: 'global' | 'local';
  /** Unit direction in the chosen axes (need not be aligned with an axis). */
  readonly direction: Vec3;
  readonly wA_Npm: number;
  readonly wB_Npm: number;
  readonly a_m: number;
  readonly b_m: number;
  readonly origin: LoadOrigin;
}

/** A concentrated force or moment at distance a_m from end i along the element. */
export interface ElementPointLoad {
  readonly kind: 'point-force' | 'point-moment';
  readonly element: number;
  readonly axes: 'global' | 'local';
  readonly direction: Vec3;
  /** N for a force, N*m for a moment (a torque when along local x). */
  readonly value: number;
  readonly a_m: number;
  readonly origin: LoadOrigin;
}

export type AppliedLoad = NodalLoad | DistributedLoad | ElementPointLoad;

export interface LoadCase {
  readonly id: string; // 'dead', 'wind-090', 'ice', ...
  readonly kind: 'dead' | 'wind' | 'ice' | 'ice-wind' | 'fatigue';
  readonly description: string;
  /** Plan direction the wind blows toward, for wind cases. */
  readonly windAngle_rad: number | null;
  readonly loads: readonly AppliedLoad[];
  /** How each load was found, for the package. */
  readonly steps: readonly CalcStep[];
}

/** A combination to analyse: factors on load cases (already expanded per wind direction). */
export interface Combination {
  readonly id: string; // 'extreme-wind-max@wind-090'
  readonly specId: string;
  readonly category: CombinationCategory;
  readonly description: string;
  readonly factors: readonly { readonly caseId: string; readonly factor: number }[];
  readonly source: string;
}
