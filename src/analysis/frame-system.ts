// The frame as a linear system: prepared elements, assembly of K (+ Kg), load vector,
// factorisation with the mechanism check, and recovery of element end forces and reactions.
import { UnstableStructureError } from '../errors.ts';
import type { AppliedLoad, NodalLoad } from '../loads/load-types.ts';
import type { FrameElement, FrameModel, Vec6 } from '../model/frame.ts';
import type { Reaction } from './analysis-types.ts';
import { assemblyPlan, type AssemblyPlan } from './assembly-plan.ts';
import { BandedMatrix, PivotFailure } from './banded-ldlt.ts';
import { DOF_NAMES, dofLabel, numberDofs, type DofMap } from './dof-numbering.ts';
import { elementGeometry, type ElementGeometry } from './element-geometry.ts';
import { fixedEndForces, isElementLoad, resolveDirection, scaleResolved, type LocalLoad, type ResolvedLoad } from './element-loads.ts';
import {
  congruent12,
  elasticStiffnessLocal,
  elementTransform,
  geometricStiffnessLocal,
  mulTVec12,
  mulVec12,
} from './element-matrices.ts';

export interface PreparedElement {
  readonly el: FrameElement;
  readonly geo: ElementGeometry;
  /** Global node dofs -> local end dofs (rotation and rigid offsets). */
  readonly T: Float64Array;
  readonly kLocal: Float64Array;
  readonly kGlobal: Float64Array;
  /** Geometric stiffness for N = 1 N (it is linear in N), local and global. */
  readonly kgUnitLocal: Float64Array;
  readonly kgUnitGlobal: Float64Array;
  /** Global dof indices (node*6 + c) of the element's 12 node dofs. */
  readonly dofs: Int32Array;
  /** Equation numbers of the 12 node dofs (-1 where fixed). */
  readonly eqs: Int32Array;
}

export interface PreparedModel {
  readonly model: FrameModel;
  readonly elements: readonly PreparedElement[];
  readonly dofs: DofMap;
  /** Number of elements attached to each node. */
  readonly degree: Int32Array;
  /** 1 for a node with a support. */
  readonly supported: Uint8Array;
  /** Elements with an end at a support (in element order): the only ones reactions need. */
  readonly atSupports: readonly PreparedElement[];
  readonly plan: AssemblyPlan;
  /** Element loads already checked and resolved into local axes (filled by buildLoadSet). */
  readonly resolved: WeakMap<AppliedLoad, ResolvedLoad>;
}

/** Rejects numbers that would otherwise flow silently into wrong results (NaN, zero stiffness). */
function validateModel(model: FrameModel): void {
  model.nodes.forEach((n, idx) => {
    if (n.id !== idx) throw new Error(`node id ${n.id} differs from its index ${idx}`);
    if (!n.xyz_m.every(Number.isFinite)) throw new Error(`node ${idx} (${n.tag}) has a coordinate that is not a number`);
  });
  model.elements.forEach((el, idx) => {
    if (el.id !== idx) throw new Error(`element id ${el.id} differs from its index ${idx}`);
    if (!model.nodes[el.i] || !model.nodes[el.j]) throw new Error(`element ${idx} (${el.member}) names a node that does not exist`);
    for (const key of ['E_Pa', 'G_Pa', 'A_m2', 'Iy_m4', 'Iz_m4', 'J_m4'] as const) {
      if (!(el[key] > 0 && Number.isFinite(el[key]))) throw new Error(`element ${idx} (${el.member}): ${key} = ${el[key]} must be a positive number`);
    }
    if (!(el.massPerLength_kgm >= 0)) throw new Error(`element ${idx} (${el.member}): massPerLength_kgm must be >= 0`);
    if (![...el.offsetI_m, ...el.offsetJ_m, ...el.refVector].every(Number.isFinite)) {
      throw new Error(`element ${idx} (${el.member}): offset or refVector is not a number`);
    }
  });
  for (const s of model.supports) {
    if (!model.nodes[s.node]) throw new Error(`support at node ${s.node}, which does not exist`);
    if (!s.springs.every((k) => k >= 0 && Number.isFinite(k))) throw new Error(`support at node ${s.node}: springs must be >= 0`);
  }
}

export function prepareModel(model: FrameModel): PreparedModel {
  validateModel(model);
  const dofMap = numberDofs(model);
  const elements = model.elements.map((el, idx): PreparedElement => {
    const geo = elementGeometry(model, el);
    const T = elementTransform(geo.R, el.offsetI_m, el.offsetJ_m);
    const kLocal = elasticStiffnessLocal(el, geo.L);
    const dofs = new Int32Array(12);
    for (let c = 0; c < 6; c++) {
      dofs[c] = el.i * 6 + c;
      dofs[6 + c] = el.j * 6 + c;
    }
    const kgUnitLocal = geometricStiffnessLocal(el, geo.L, 1);
    return {
      el, geo, T, kLocal, kGlobal: congruent12(T, kLocal), kgUnitLocal, kgUnitGlobal: congruent12(T, kgUnitLocal),
      dofs, eqs: dofs.map((d) => dofMap.eq[d]),
    };
  });
  const degree = new Int32Array(model.nodes.length);
  for (const el of model.elements) {
    degree[el.i]++;
    degree[el.j]++;
  }
  const supported = new Uint8Array(model.nodes.length);
  for (const s of model.supports) supported[s.node] = 1;
  const atSupports = elements.filter((pe) => supported[pe.el.i] || supported[pe.el.j]);
  return { model, elements, dofs: dofMap, degree, supported, atSupports, plan: assemblyPlan(elements, dofMap), resolved: new WeakMap() };
}

/** Loads of one analysis, already multiplied by their combination factors. */
export interface LoadSet {
  /** Nodal loads, global, node*6 + c. */
  readonly nodal: Float64Array;
  readonly nodesLoaded: ReadonlySet<number>;
  /** Element loads in local axes, per element. */
  readonly local: readonly (readonly LocalLoad[])[];
  /** Fixed-end forces per element (local), or null when unloaded. */
  readonly fixedEnd: readonly (Float64Array | null)[];
}

export interface FactoredLoad {
  readonly load: AppliedLoad;
  readonly factor: number;
}

export function buildLoadSet(prep: PreparedModel, loads: readonly FactoredLoad[]): LoadSet {
  const { model } = prep;
  const nodal = new Float64Array(model.nodes.length * 6);
  const nodesLoaded = new Set<number>();
  const local: LocalLoad[][] = model.elements.map(() => []);
  for (const { load, factor } of loads) {
    if (factor === 0) continue;
    if (isElementLoad(load)) {
      const pe = prep.elements[load.element];
      if (!pe) throw new Error(`load '${load.origin.source}' names element ${load.element}, which does not exist`);
      // checked and turned into local axes once per load, scaled per combination
      let r = prep.resolved.get(load);
      if (!r) {
        r = resolveDirection(load, pe.geo.R, pe.geo.L);
        prep.resolved.set(load, r);
      }
      local[load.element].push(scaleResolved(r, factor));
    } else {
      addNodal(nodal, load, factor, model);
      nodesLoaded.add(load.node);
    }
  }
  const fixedEnd = prep.elements.map((pe, e) => (local[e].length ? fixedEndForces(local[e], pe.geo.L) : null));
  return { nodal, nodesLoaded, local, fixedEnd };
}

function addNodal(nodal: Float64Array, l: NodalLoad, factor: number, model: FrameModel): void {
  if (!model.nodes[l.node]) throw new Error(`load '${l.origin.source}' names node ${l.node}, which does not exist`);
  for (let c = 0; c < 3; c++) {
    if (!Number.isFinite(l.F_N[c]) || !Number.isFinite(l.M_Nm[c])) throw new Error(`load '${l.origin.source}' at node ${l.node} is not a number`);
  }
  for (let c = 0; c < 3; c++) {
    nodal[l.node * 6 + c] += factor * l.F_N[c];
    nodal[l.node * 6 + 3 + c] += factor * l.M_Nm[c];
  }
}

/** Right-hand side: nodal loads plus the equivalent nodal loads -T^T f_fixed of element loads. */
export function loadVector(prep: PreparedModel, ls: LoadSet): Float64Array {
  const full = new Float64Array(ls.nodal);
  prep.elements.forEach((pe, e) => {
    const fef = ls.fixedEnd[e];
    if (!fef) return;
    const g = mulTVec12(pe.T, fef);
    for (let k = 0; k < 12; k++) full[pe.dofs[k]] -= g[k];
  });
  return restrict(prep, full);
}

export function restrict(prep: PreparedModel, full: ArrayLike<number>): Float64Array {
  const { eq, nEq } = prep.dofs;
  const out = new Float64Array(nEq);
  for (let d = 0; d < eq.length; d++) if (eq[d] >= 0) out[eq[d]] = full[d];
  return out;
}

export function expand(prep: PreparedModel, x: ArrayLike<number>): Float64Array {
  const { eq } = prep.dofs;
  const full = new Float64Array(eq.length);
  for (let d = 0; d < eq.length; d++) if (eq[d] >= 0) full[d] = x[eq[d]];
  return full;
}

/** Assembles K, plus the geometric stiffness when axial forces (tension +) are given; into `target`
 * (cleared first) when one of the right size is given, so repeated assemblies reuse one storage. */
export function assemble(prep: PreparedModel, axialN: Float64Array | null, target?: BandedMatrix): BandedMatrix {
  const { eq, nEq, bw } = prep.dofs;
  let K: BandedMatrix;
  if (target) {
    if (target.n !== nEq || target.bw !== bw) throw new Error('assemble: target matrix has the wrong size');
    target.reset();
    K = target;
  } else K = new BandedMatrix(nEq, bw);
  const data = K.data;
  const { start, pos, k, kgUnit } = prep.plan;
  for (let e = 0; e < prep.elements.length; e++) {
    const N = axialN ? axialN[e] : 0;
    const end = start[e + 1];
    if (N === 0) {
      for (let m = start[e]; m < end; m++) if (k[m] !== 0) data[pos[m]] += k[m];
    } else {
      for (let m = start[e]; m < end; m++) {
        const v = k[m] + N * kgUnit[m];
        if (v !== 0) data[pos[m]] += v;
      }
    }
  }
  for (const s of prep.model.supports) {
    for (let c = 0; c < 6; c++) {
      const e = eq[s.node * 6 + c];
      if (e >= 0 && s.springs[c] > 0) K.add(e, e, s.springs[c]);
    }
  }
  return K;
}

/** Factorises K; a vanishing or negative pivot becomes an UnstableStructureError naming the dof of a
 * mechanism (first order); for loss of stability the dof is arbitrary and analyze.ts adds the place. */
export function factorOrThrow(prep: PreparedModel, K: BandedMatrix, combination: string | undefined, secondOrder: boolean): void {
  try {
    K.factor();
  } catch (err) {
    if (!(err instanceof PivotFailure)) throw err;
    const dof = prep.dofs.dofOfEq[err.eq];
    const label = dofLabel(prep.model, dof);
    const where = combination ? `combination ${combination}: ` : '';
    const why = secondOrder
      ? 'loss of stability in the second-order analysis: the stiffness with geometric stiffness (K + Kg) is not positive definite; the axial loads reach a buckling load'
      : `the structure is a mechanism or is not supported: no stiffness against ${label} (pivot ${err.pivot.toExponential(3)}, diagonal ${err.diagonal.toExponential(3)})`;
    throw new UnstableStructureError(`${where}${why}`, {
      combination,
      node: Math.floor(dof / 6),
      dof: DOF_NAMES[dof % 6],
    });
  }
}

/** Displacements of the element's clear ends in local axes: per end, R (u + theta x r) and R theta. */
export function localEndDisplacements(pe: PreparedElement, U: ArrayLike<number>): Float64Array {
  const d = new Float64Array(12);
  endToLocal(pe.geo.R, U, pe.el.i * 6, pe.el.offsetI_m, d, 0);
  endToLocal(pe.geo.R, U, pe.el.j * 6, pe.el.offsetJ_m, d, 6);
  return d;
}

function endToLocal(R: Float64Array, U: ArrayLike<number>, n: number, r: readonly number[], d: Float64Array, off: number): void {
  const tx = U[n + 3];
  const ty = U[n + 4];
  const tz = U[n + 5];
  const ux = U[n] + ty * r[2] - tz * r[1];
  const uy = U[n + 1] + tz * r[0] - tx * r[2];
  const uz = U[n + 2] + tx * r[1] - ty * r[0];
  for (let a = 0; a < 3; a++) {
    d[off + a] = R[a * 3] * ux + R[a * 3 + 1] * uy + R[a * 3 + 2] * uz;
    d[off + 3 + a] = R[a * 3] * tx + R[a * 3 + 1] * ty + R[a * 3 + 2] * tz;
  }
}

/** End forces on the element by the nodes, local: (k + kg(N)) d + f_fixed. */
export function elementEndForces(pe: PreparedElement, U: ArrayLike<number>, fef: Float64Array | null, N: number): Float64Array {
  return endForcesFromLocal(pe, localEndDisplacements(pe, U), fef, N);
}

/** elementEndForces from the local end displacements d. */
export function endForcesFromLocal(pe: PreparedElement, d: Float64Array, fef: Float64Array | null, N: number): Float64Array {
  const f = mulVec12(pe.kLocal, d);
  if (N !== 0) {
    const g = mulVec12(pe.kgUnitLocal, d);
    for (let k = 0; k < 12; k++) f[k] += N * g[k];
  }
  if (fef) for (let k = 0; k < 12; k++) f[k] += fef[k];
  return f;
}

/**
 * The axial force (tension +) each element carries, for its geometric stiffness: the length-weighted
 * mean of N(x) along the element, which is EA times its elongation over L, EA (d_j - d_i) / L. The
 * element's loads need no term of their own: a bar's nodal displacements are exact, and the
 * elongation is the integral of N / EA whatever the axial loads. (The mean of the two end forces,
 * (f_j - f_i) / 2, counts a point load at an element end as half carried: a head load at the pole
 * top would stiffen the top segment's P-delta with 0.5 P.)
 */
export function axialForces(prep: PreparedModel, U: ArrayLike<number>): Float64Array {
  const out = new Float64Array(prep.elements.length);
  for (let e = 0; e < out.length; e++) {
    const pe = prep.elements[e];
    const R = pe.geo.R;
    const di = axialEndDisplacement(R, U, pe.el.i * 6, pe.el.offsetI_m);
    const dj = axialEndDisplacement(R, U, pe.el.j * 6, pe.el.offsetJ_m);
    out[e] = ((pe.el.E_Pa * pe.el.A_m2) / pe.geo.L) * (dj - di);
  }
  return out;
}

/** The local-x component of endToLocal (the same arithmetic). */
function axialEndDisplacement(R: Float64Array, U: ArrayLike<number>, n: number, r: readonly number[]): number {
  const tx = U[n + 3];
  const ty = U[n + 4];
  const tz = U[n + 5];
  const ux = U[n] + ty * r[2] - tz * r[1];
  const uy = U[n + 1] + tz * r[0] - tx * r[2];
  const uz = U[n + 2] + tx * r[1] - ty * r[0];
  return R[0] * ux + R[1] * uy + R[2] * uz;
}

/** Reactions by the supports on the structure, global: node equilibrium at fixed dofs, -k u at springs.
 * Only elements with an end at a support contribute to a support node, so only their end forces are read. */
export function reactions(prep: PreparedModel, U: ArrayLike<number>, ls: LoadSet, endForces: readonly (Float64Array | undefined)[]): Reaction[] {
  const nodeForce = new Float64Array(prep.model.nodes.length * 6);
  for (const pe of prep.atSupports) {
    const f = endForces[pe.el.id];
    if (!f) throw new Error(`end forces of element ${pe.el.id} (at a support) were not computed`);
    const g = mulTVec12(pe.T, f);
    for (let k = 0; k < 12; k++) nodeForce[pe.dofs[k]] += g[k];
  }
  return prep.model.supports.map((s): Reaction => {
    const force = [0, 0, 0, 0, 0, 0];
    for (let c = 0; c < 6; c++) {
      const d = s.node * 6 + c;
      if (s.fixed[c]) force[c] = nodeForce[d] - ls.nodal[d];
      else if (s.springs[c] > 0) force[c] = -s.springs[c] * U[d];
    }
    return { node: s.node, force: force as unknown as Vec6 };
  });
}
