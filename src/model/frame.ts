// The frame model: what the analysis solves. Plain data in SI units, built from the
// design by src/model/build-frame.ts, and written out whole in the JSON results so
// another frame program can solve the same model.

export type Vec3 = readonly [number, number, number];
/** Six values per node or element end: [ux, uy, uz, rx, ry, rz] or [Fx, Fy, Fz, Mx, My, Mz]. */
export type Vec6 = readonly [number, number, number, number, number, number];

export interface FrameNode {
  readonly id: number; // equals its index in FrameModel.nodes
  readonly xyz_m: Vec3;
  /** Why this node exists: 'base', 'pole-top', 'arm-root:A1', 'attachment:P1', 'segment', ... */
  readonly tag: string;
}

/**
 * A prismatic 3D Euler-Bernoulli beam element between nodes i and j.
 * Local axes: x from end i to end j (after rigid offsets); y lies in the plane of x and
 * refVector_global, perpendicular to x; z = x cross y. Iy_m4 is about local y, Iz_m4 about local z.
 */
export interface FrameElement {
  readonly id: number; // equals its index in FrameModel.elements
  /** The member this element belongs to: 'pole' or an arm id. */
  readonly member: string;
  readonly i: number;
  readonly j: number;
  readonly E_Pa: number;
  readonly G_Pa: number;
  readonly A_m2: number;
  readonly Iy_m4: number;
  readonly Iz_m4: number;
  readonly J_m4: number;
  /** Any vector not parallel to the element, in global axes, fixing local y. */
  readonly refVector: Vec3;
  /** Rigid offsets in global axes from node i (j) to the element's end i (j). */
  readonly offsetI_m: Vec3;
  readonly offsetJ_m: Vec3;
  /** Steel mass per metre, for self-weight and lumped masses. */
  readonly massPerLength_kgm: number;
  /** Distance along the member of the element's end i and end j (for stations). */
  readonly sI_m: number;
  readonly sJ_m: number;
  /** Outside diameter at the ends (across flats if multisided), for wind and checks. */
  readonly diameterI_m: number;
  readonly diameterJ_m: number;
}

export interface Support {
  readonly node: number;
  /** Restrained degrees of freedom [ux, uy, uz, rx, ry, rz]. */
  readonly fixed: readonly [boolean, boolean, boolean, boolean, boolean, boolean];
  /** Spring stiffness on a free dof (N/m or N*m/rad); 0 for none. */
  readonly springs: Vec6;
}

export interface MemberInfo {
  readonly id: string;
  readonly kind: 'pole' | 'arm';
  /** Element ids from root to tip. */
  readonly elements: readonly number[];
  readonly length_m: number;
  /** Positions along the member (from its root) where results must have a station. */
  readonly discontinuities_m: readonly number[];
}

export interface LumpedMass {
  readonly node: number;
  readonly mass_kg: number;
  readonly origin: string;
}

export interface FrameModel {
  readonly nodes: readonly FrameNode[];
  readonly elements: readonly FrameElement[];
  readonly supports: readonly Support[];
  readonly members: readonly MemberInfo[];
  /** Attachment masses (steel mass comes from the elements). */
  readonly masses: readonly LumpedMass[];
}
