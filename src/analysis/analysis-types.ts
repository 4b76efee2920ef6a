// Public records of the analysis. All values SI (m, N, N*m, rad, kg, s).
//
// Sign conventions (the report's sketch must show the same):
// - Element local axes: x from end i to end j (ends after rigid offsets); y in the plane of x
//   and the element's refVector, perpendicular to x; z = x cross y.
// - Element end forces: forces and moments exerted ON the element BY the nodes at end i and
//   end j, in element local axes [Fx, Fy, Fz, Mx, My, Mz].
// - Internal forces at a station (N, Vy, Vz, T, My, Mz): the resultant that the part of the
//   member beyond the cut (larger s) exerts on the part before it, in local axes at the cut.
//   So N > 0 is tension, T is the torque about local x, and Mz = EIz v'' , My = -EIy w''
//   (v, w: displacements along local y, z).
// - Reactions: force and moment exerted BY the support ON the structure, global axes.
import type { Vec3, Vec6 } from '../model/frame.ts';

export interface AnalysisOptions {
  /** P-delta by geometric stiffness, iterated to convergence. */
  readonly secondOrder: boolean;
  /** Relative change of the displacement vector (infinity norm) that ends the iteration. */
  readonly tolerance: number;
  /** Cap on the number of linear solves in a second-order analysis. */
  readonly maxIterations: number;
  /** Regular spacing of result stations along every member (in addition to ends and discontinuities). */
  readonly stationSpacing_m: number;
}

/** The six internal-force components at a station. */
export type ForceComponent = 'N' | 'Vy' | 'Vz' | 'T' | 'My' | 'Mz';
/** Components that have an envelope: the six, plus resultant moment sqrt(My²+Mz²) and shear sqrt(Vy²+Vz²). */
export type EnvelopeComponent = ForceComponent | 'Mres' | 'Vres';

/** Which limit a station holds: from smaller s ('left'), from larger s ('right'), or continuous ('both'). */
export type StationSide = 'left' | 'right' | 'both';

export interface Station {
  /** Distance along the member from its root. */
  readonly s_m: number;
  readonly element: number;
  /** Distance from the element's end i along its clear length. */
  readonly x_m: number;
  readonly side: StationSide;
  readonly N_N: number;
  readonly Vy_N: number;
  readonly Vz_N: number;
  readonly T_Nm: number;
  readonly My_Nm: number;
  readonly Mz_Nm: number;
  /** Global displacement of the member axis at the station. */
  readonly ux_m: number;
  readonly uy_m: number;
  readonly uz_m: number;
}

export interface Extreme {
  readonly value: number;
  readonly s_m: number;
}

export interface MemberStations {
  readonly member: string;
  readonly stations: readonly Station[];
  /** Exact extremes along the member (found analytically on each polynomial piece, not sampled). */
  readonly extremes: Readonly<Record<EnvelopeComponent, { readonly max: Extreme; readonly min: Extreme }>>;
}

export interface ElementEndForces {
  readonly element: number;
  /** Local axes, on the element by the node: [Fx, Fy, Fz, Mx, My, Mz]. */
  readonly i: Vec6;
  readonly j: Vec6;
  /** Axial force used in the geometric stiffness (tension +); 0 in a first-order analysis. */
  readonly Ngeometric_N: number;
}

export interface Reaction {
  readonly node: number;
  /** [Fx, Fy, Fz, Mx, My, Mz] global, by the support on the structure. */
  readonly force: Vec6;
}

/** Sum of applied loads against sum of reactions; both about the global origin. */
export interface StaticsCheck {
  /** 'undeformed' for first order; 'deformed' (loads and supports at displaced positions) for second order. */
  readonly configuration: 'undeformed' | 'deformed';
  readonly appliedForce_N: Vec3;
  readonly appliedMoment_Nm: Vec3;
  readonly reactionForce_N: Vec3;
  readonly reactionMoment_Nm: Vec3;
  /** applied + reactions (zero for exact equilibrium). */
  readonly residualForce_N: Vec3;
  readonly residualMoment_Nm: Vec3;
  /** max(relativeForceResidual, relativeMomentResidual). */
  readonly relativeResidual: number;
  /** |residual force| / sum of |applied forces|: round-off in both configurations (the geometric
   * stiffness adds only self-balanced forces), so anything larger is an error. */
  readonly relativeForceResidual: number;
  /** |residual moment| / (sum of |applied moments about the origin| + sum of |applied forces| x largest
   * node distance from the origin). Round-off when undeformed; in the deformed configuration it holds
   * the first-order terms that the axial-force-only geometric stiffness leaves out (statics-check.ts). */
  readonly relativeMomentResidual: number;
  /** Deformed configuration: sum of |applied forces| x largest node displacement, the size of the moments
   * the displacements add to the loads; 0 when undeformed. */
  readonly displacementMoment_Nm: number;
  /** |residual moment| / displacementMoment_Nm: the share of the displacement effect on the moments that
   * the linearised P-delta method leaves unbalanced (expected well below 1); null when undeformed or
   * nothing moved. */
  readonly momentResidualShare: number | null;
}

/** Resultant bending moment sqrt(My²+Mz²) at the supported end of the elements attached to supports. */
export interface BaseMoment {
  readonly node: number;
  readonly element: number;
  readonly firstOrder_Nm: number;
  /** Final value (second-order if the analysis is second-order). */
  readonly final_Nm: number;
  /** final / firstOrder; null when the first-order base moment is zero. */
  readonly amplification: number | null;
}

export interface LinearSolution {
  readonly displacements: readonly Vec6[];
  readonly reactions: readonly Reaction[];
  readonly elementEndForces: readonly ElementEndForces[];
  readonly members: Readonly<Record<string, MemberStations>>;
  readonly statics: StaticsCheck;
}

export interface CombinationResult extends LinearSolution {
  readonly combination: string;
  readonly secondOrder: boolean;
  /** Linear solves made (1 for first order). */
  readonly iterations: number;
  readonly convergence: {
    /** Relative change of displacements in the last iteration (0 for first order). */
    readonly change: number;
    /** |(K + Kg(N)) u - F|inf / |F|inf with N from the final displacements. */
    readonly residual: number;
  };
  readonly baseMoment: BaseMoment | null;
}

/** Results of every combination, keyed by combination id (frozen, in the order analysed). */
export type AnalysisResults = Readonly<Record<string, CombinationResult>>;

export interface EnvelopeEntry {
  readonly value: number;
  readonly combination: string;
  readonly s_m: number;
}

export interface Envelope {
  readonly member: string;
  readonly component: EnvelopeComponent;
  readonly max: EnvelopeEntry;
  readonly min: EnvelopeEntry;
}

export interface Mode {
  /** 1 for the fundamental mode. */
  readonly mode: number;
  readonly omega_rad_s: number;
  readonly frequency_Hz: number;
  readonly period_s: number;
  /** Per node [ux, uy, uz, rx, ry, rz], scaled so the largest translation is +1. */
  readonly shape: readonly Vec6[];
  /** Effective modal mass in global X, Y, Z as a fraction of the total moving mass. */
  readonly effectiveMassRatio: Vec3;
}
