// Analysis of load combinations. Each combination is its own analysis: its loads are the sum of
// factor x case loads, combined BEFORE solving (never superposed, which second order forbids).
import { UnstableStructureError } from '../errors.ts';
import type { AppliedLoad, Combination, LoadCase } from '../loads/load-types.ts';
import type { FrameModel, Vec6 } from '../model/frame.ts';
import type {
  AnalysisOptions,
  AnalysisResults,
  BaseMoment,
  CombinationResult,
  ElementEndForces,
  LinearSolution,
  MemberStations,
  Reaction,
} from './analysis-types.ts';
import type { BandedMatrix } from './banded-ldlt.ts';
import { deepFreeze } from './deep-freeze.ts';
import {
  assemble,
  axialForces,
  buildLoadSet,
  endForcesFromLocal,
  expand,
  factorOrThrow,
  loadVector,
  localEndDisplacements,
  prepareModel,
  reactions,
  type FactoredLoad,
  type LoadSet,
  type PreparedElement,
  type PreparedModel,
} from './frame-system.ts';
import { memberStations, type ElementState } from './member-stations.ts';
import { staticsCheck } from './statics-check.ts';
import { bucklingPlace, placeText } from './buckling-place.ts';

/** A prepared model with its factorised linear stiffness, shared by all combinations. */
interface Solver {
  readonly prep: PreparedModel;
  linear: BandedMatrix | null;
  /** Storage reused by every K + Kg assembly of the P-delta iterations. */
  work: BandedMatrix | null;
}

function workMatrix(solver: Solver, N: Float64Array): BandedMatrix {
  solver.work = assemble(solver.prep, N, solver.work ?? undefined);
  return solver.work;
}

function linearFactor(solver: Solver, combination: string | undefined): BandedMatrix {
  if (!solver.linear) {
    const K = assemble(solver.prep, null);
    factorOrThrow(solver.prep, K, combination, false);
    solver.linear = K;
  }
  return solver.linear;
}

function checkOptions(opts: AnalysisOptions): void {
  if (!(opts.tolerance > 0)) throw new Error(`analysis tolerance must be > 0 (got ${opts.tolerance})`);
  if (!(opts.stationSpacing_m > 0)) throw new Error(`station spacing must be > 0 m (got ${opts.stationSpacing_m})`);
  if (opts.secondOrder && !(Number.isInteger(opts.maxIterations) && opts.maxIterations >= 2)) {
    throw new Error(`second-order analysis needs maxIterations >= 2 (got ${opts.maxIterations})`);
  }
}

const maxAbs = (v: ArrayLike<number>): number => {
  let m = 0;
  for (let k = 0; k < v.length; k++) m = Math.max(m, Math.abs(v[k]));
  return m;
};

/** Six values as a frozen Vec6 (frozen where made, so the final deepFreeze skips them). */
const vec6 = (f: ArrayLike<number>, off: number): Vec6 => Object.freeze([f[off], f[off + 1], f[off + 2], f[off + 3], f[off + 4], f[off + 5]] as const);

interface State {
  readonly U: Float64Array;
  /** Axial force used in the geometric stiffness per element (zeros for first order). */
  readonly Nkg: Float64Array;
  /** Local end displacements and end forces per element (only the elements asked for). */
  readonly d: Float64Array[];
  readonly endForces: Float64Array[];
}

function stateFrom(prep: PreparedModel, ls: LoadSet, U: Float64Array, Nkg: Float64Array, only?: readonly PreparedElement[]): State {
  const d: Float64Array[] = new Array<Float64Array>(prep.elements.length);
  const endForces: Float64Array[] = new Array<Float64Array>(prep.elements.length);
  for (const pe of only ?? prep.elements) {
    const e = pe.el.id;
    d[e] = localEndDisplacements(pe, U);
    endForces[e] = endForcesFromLocal(pe, d[e], ls.fixedEnd[e], Nkg[e]);
  }
  return { U, Nkg, d, endForces };
}

/** Largest resultant moment at a supported element end; `first` needs only the elements at supports. */
function baseMoment(prep: PreparedModel, first: State, final: State): BaseMoment | null {
  let best: BaseMoment | null = null;
  for (const pe of prep.atSupports) {
    for (const end of [0, 6]) {
      const node = end === 0 ? pe.el.i : pe.el.j;
      if (!prep.supported[node]) continue;
      const m = (s: State): number => Math.hypot(s.endForces[pe.el.id][end + 4], s.endForces[pe.el.id][end + 5]);
      const f = m(first);
      const g = m(final);
      if (!best || g > best.final_Nm) {
        best = { node, element: pe.el.id, firstOrder_Nm: f, final_Nm: g, amplification: f > 0 ? g / f : null };
      }
    }
  }
  return best;
}

function solution(prep: PreparedModel, ls: LoadSet, st: State, spacing_m: number | null, deformed: boolean): LinearSolution {
  const { model } = prep;
  const states: ElementState[] = prep.elements.map((pe, e) => ({
    pe,
    d: st.d[e],
    f: st.endForces[e],
    N: st.Nkg[e],
    loads: ls.local[e],
    fixedEnd: ls.fixedEnd[e],
  }));
  const reacts: Reaction[] = reactions(prep, st.U, ls, st.endForces);
  const members: Record<string, MemberStations> = {};
  for (const m of model.members) members[m.id] = memberStations(prep, states, ls, m, spacing_m);
  const elementEnd: ElementEndForces[] = st.endForces.map((f, e) => Object.freeze({
    element: e,
    i: vec6(f, 0),
    j: vec6(f, 6),
    Ngeometric_N: st.Nkg[e],
  }));
  return {
    displacements: model.nodes.map((_, n) => vec6(st.U, n * 6)),
    reactions: reacts,
    elementEndForces: elementEnd,
    members,
    statics: staticsCheck(prep, ls, st.U, states, reacts, deformed),
  };
}

/** Loss of stability: the message and detail with the member and place where the first buckling mode
 * of the axial forces N moves most (in metres; analyse-design.ts prints it in the user's units). */
function withBucklingPlace(
  solver: Solver,
  message: string,
  detail: UnstableStructureError['detail'],
  N: Float64Array,
  u: ArrayLike<number>,
): UnstableStructureError {
  const place = bucklingPlace(solver.prep, linearFactor(solver, detail.combination), N, u);
  if (!place) return new UnstableStructureError(message, detail);
  return new UnstableStructureError(`${message}; ${placeText(place, 'si')}`, { ...detail, place });
}

function runCombination(solver: Solver, loads: readonly FactoredLoad[], opts: AnalysisOptions, id: string): CombinationResult {
  const { prep } = solver;
  const ls = buildLoadSet(prep, loads);
  const F = loadVector(prep, ls);
  const zeros = new Float64Array(prep.elements.length);
  const u1 = linearFactor(solver, id).solve(F);
  // In second order the first-order state serves only the base-moment amplification.
  const first = stateFrom(prep, ls, expand(prep, u1), zeros, opts.secondOrder ? prep.atSupports : undefined);
  let final = first;
  let iterations = 1;
  let change = 0;
  let residual = 0;
  if (opts.secondOrder) {
    let uPrev = u1;
    let N = axialForces(prep, first.U);
    let Nused = N;
    let converged = false;
    while (iterations < opts.maxIterations) {
      const K = workMatrix(solver, N);
      try {
        factorOrThrow(prep, K, id, true);
      } catch (err) {
        if (!(err instanceof UnstableStructureError)) throw err;
        throw withBucklingPlace(solver, err.message, err.detail, N, uPrev);
      }
      const u = K.solve(F);
      iterations++;
      let diff = 0;
      for (let k = 0; k < u.length; k++) diff = Math.max(diff, Math.abs(u[k] - uPrev[k]));
      const scale = maxAbs(u);
      change = scale > 0 ? diff / scale : 0;
      Nused = N;
      N = axialForces(prep, expand(prep, u));
      uPrev = u;
      if (change < opts.tolerance) {
        converged = true;
        break;
      }
    }
    if (!converged) {
      throw withBucklingPlace(
        solver,
        `combination ${id}: the second-order analysis did not converge in ${opts.maxIterations} iterations ` +
          `(last relative change of displacements ${change.toExponential(3)}, tolerance ${opts.tolerance}); ` +
          'the axial loads are at or near a buckling load',
        { combination: id },
        N,
        uPrev,
      );
    }
    // Member forces use the axial forces that built the matrix the displacements solve.
    final = stateFrom(prep, ls, expand(prep, uPrev), Nused);
    // Out-of-balance force with the geometric stiffness rebuilt from the final axial forces.
    const r = workMatrix(solver, N).multiply(uPrev);
    for (let k = 0; k < r.length; k++) r[k] -= F[k];
    const fScale = maxAbs(F);
    residual = fScale > 0 ? maxAbs(r) / fScale : 0;
  }
  const sol = solution(prep, ls, final, opts.stationSpacing_m, opts.secondOrder);
  return {
    combination: id,
    secondOrder: opts.secondOrder,
    iterations,
    convergence: { change, residual },
    baseMoment: baseMoment(prep, first, final),
    ...sol,
  };
}

/** The loads of a combination: every case load with its factor (combined before solving). */
export function combinedLoads(cases: readonly LoadCase[], combo: Combination): FactoredLoad[] {
  const out: FactoredLoad[] = [];
  for (const { caseId, factor } of combo.factors) {
    const lc = cases.find((c) => c.id === caseId);
    if (!lc) throw new Error(`combination ${combo.id} names load case '${caseId}', which was not built`);
    if (!Number.isFinite(factor)) throw new Error(`combination ${combo.id}: factor on '${caseId}' is not a number`);
    for (const load of lc.loads) out.push({ load, factor });
  }
  return out;
}

export function analyzeCombination(
  model: FrameModel,
  cases: readonly LoadCase[],
  combo: Combination,
  opts: AnalysisOptions,
): CombinationResult {
  checkOptions(opts);
  const solver: Solver = { prep: prepareModel(model), linear: null, work: null };
  return deepFreeze(runCombination(solver, combinedLoads(cases, combo), opts, combo.id));
}

/** Every combination, each its own analysis; one model preparation and one linear factorisation. */
export function analyzeAll(
  model: FrameModel,
  cases: readonly LoadCase[],
  combos: readonly Combination[],
  opts: AnalysisOptions,
): AnalysisResults {
  checkOptions(opts);
  const solver: Solver = { prep: prepareModel(model), linear: null, work: null };
  const out: Record<string, CombinationResult> = {};
  for (const combo of combos) {
    if (combo.id in out) throw new Error(`combination id '${combo.id}' appears twice`);
    out[combo.id] = runCombination(solver, combinedLoads(cases, combo), opts, combo.id);
  }
  return deepFreeze(out);
}

/** First-order solution of a plain list of loads (factor 1). Stations at ends, discontinuities and
 * loads, plus a regular spacing only when stationSpacing_m is given. */
export function solveLoads(
  model: FrameModel,
  loads: readonly AppliedLoad[],
  opts: { readonly stationSpacing_m?: number } = {},
): LinearSolution {
  const solver: Solver = { prep: prepareModel(model), linear: null, work: null };
  const ls = buildLoadSet(solver.prep, loads.map((load) => ({ load, factor: 1 })));
  const u = linearFactor(solver, undefined).solve(loadVector(solver.prep, ls));
  const st = stateFrom(solver.prep, ls, expand(solver.prep, u), new Float64Array(model.elements.length));
  return deepFreeze(solution(solver.prep, ls, st, opts.stationSpacing_m ?? null, false));
}
