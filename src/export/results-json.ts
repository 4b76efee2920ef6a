// The results as JSON for other tools: the model exactly as analysed (so any frame program
// can solve it again), the loads of every combination as applied, and the results.
// Every key carries its unit as a suffix (_m, _N, _Nm, _Pa, _rad, _kg, _Hz); arrays of six
// values are described by the "columns" header.
import type { FrameModel } from '../model/frame.ts';
import type { AppliedLoad, Combination, LoadCase } from '../loads/load-types.ts';
import type { AnalysisResults, Mode } from '../analysis/analysis-types.ts';
import type { LoadedDesign } from '../design/design.ts';
import { scaleLoad } from '../loads/scale-load.ts';
import { combinedLoads } from '../analysis/analyze.ts';
import type { CheckRecord, CheckResults } from '../checks/check-types.ts';
import { verdictByType } from '../checks/verdict.ts';
import { largeMovements, SMALL_DISPLACEMENT_LIMIT } from '../analysis/displacement-range.ts';
import type { Dim } from '../units/units.ts';

export const RESULTS_FORMAT = 'polebook-results';
export const RESULTS_FORMAT_VERSION = 1;

export interface ResultsJsonInput {
  readonly loaded: LoadedDesign;
  readonly toolVersion: string;
  readonly model: FrameModel;
  readonly cases: readonly LoadCase[];
  readonly combinations: readonly Combination[];
  readonly results: AnalysisResults;
  readonly modes: readonly Mode[];
  readonly secondOrder: boolean;
  readonly checks: CheckResults;
}

/** SI unit of each kind of quantity, for the check records. */
const SI_UNIT: Readonly<Record<Dim, string>> = {
  length: 'm', section: 'm', area: 'm2', force: 'N', weight: 'N', moment: 'N*m', pressure: 'Pa', stress: 'Pa', density: 'kg/m3', unitWeight: 'N/m3',
  lineLoad: 'N/m', rotStiffness: 'N*m/rad', angle: 'rad', taper: 'm/m', speed: 'm/s', frequency: 'Hz', sectionArea: 'm2',
  inertia: 'm4', modulus: 'm3', mass: 'kg', ratio: '1',
};

function checkRecord(r: CheckRecord): Record<string, unknown> {
  return {
    type: r.type, label: r.label, member: r.member, s_m: r.s_m, combination: r.combination,
    demand: { value: r.demand.si, unit: SI_UNIT[r.demand.dim] }, capacity: { value: r.capacity.si, unit: SI_UNIT[r.capacity.dim] },
    ratio: Number.isFinite(r.ratio) ? r.ratio : null, equation: r.equation, status: r.status, pass: r.status !== 'fail', reason: r.reason,
  };
}

function checksRecord(c: CheckResults): Record<string, unknown> {
  return {
    note: 'Every check record; ratio = |demand| / capacity, null when the check cannot be made (then status is fail and reason says why). status warn: outside the checks polebook makes, for the engineer to judge; it does not fail the build.',
    fails: c.fails,
    verdict: verdictByType(c.records).map((v) => ({ type: v.type, title: v.title, count: v.count, failures: v.failures, warnings: v.warnings, worst: checkRecord(v.worst) })),
    records: c.records.map(checkRecord),
  };
}

const COLUMNS = {
  displacement: ['ux_m', 'uy_m', 'uz_m', 'rx_rad', 'ry_rad', 'rz_rad'],
  force: ['Fx_N', 'Fy_N', 'Fz_N', 'Mx_Nm', 'My_Nm', 'Mz_Nm'],
};

function loadRecord(load: AppliedLoad): Record<string, unknown> {
  switch (load.kind) {
    case 'nodal':
      return { type: 'nodal', axes: 'global', node: load.node, F_N: load.F_N, M_Nm: load.M_Nm, origin: load.origin.source };
    case 'distributed':
      return {
        type: 'distributed-linear', element: load.element, axes: load.axes, direction: load.direction,
        wA_N_per_m: load.wA_Npm, wB_N_per_m: load.wB_Npm, a_m: load.a_m, b_m: load.b_m, origin: load.origin.source,
      };
    case 'point-force':
      return { type: 'point-force', element: load.element, axes: load.axes, direction: load.direction, value_N: load.value, a_m: load.a_m, origin: load.origin.source };
    case 'point-moment':
      return { type: 'point-moment', element: load.element, axes: load.axes, direction: load.direction, value_Nm: load.value, a_m: load.a_m, origin: load.origin.source };
  }
}

function modelRecord(model: FrameModel): Record<string, unknown> {
  return {
    axes: 'global X, Y horizontal, Z up; origin at the pole base centre; element local x from end i to end j, local y in the plane of x and refVector, z = x cross y',
    nodes: model.nodes.map((n) => ({ id: n.id, x_m: n.xyz_m[0], y_m: n.xyz_m[1], z_m: n.xyz_m[2], tag: n.tag })),
    elements: model.elements.map((e) => ({
      id: e.id, member: e.member, i: e.i, j: e.j,
      length_m: elementClearLength(model, e.id),
      A_m2: e.A_m2, Iy_m4: e.Iy_m4, Iz_m4: e.Iz_m4, J_m4: e.J_m4, E_Pa: e.E_Pa, G_Pa: e.G_Pa,
      refVector: e.refVector, offsetI_m: e.offsetI_m, offsetJ_m: e.offsetJ_m,
      massPerLength_kg_per_m: e.massPerLength_kgm, sI_m: e.sI_m, sJ_m: e.sJ_m,
      diameterI_m: e.diameterI_m, diameterJ_m: e.diameterJ_m,
    })),
    supports: model.supports.map((s) => ({
      node: s.node, fixed: { ux: s.fixed[0], uy: s.fixed[1], uz: s.fixed[2], rx: s.fixed[3], ry: s.fixed[4], rz: s.fixed[5] },
      springs: { kx_N_per_m: s.springs[0], ky_N_per_m: s.springs[1], kz_N_per_m: s.springs[2], krx_Nm_per_rad: s.springs[3], kry_Nm_per_rad: s.springs[4], krz_Nm_per_rad: s.springs[5] },
    })),
    members: model.members.map((m) => ({ id: m.id, kind: m.kind, elements: m.elements, length_m: m.length_m, discontinuities_m: m.discontinuities_m })),
    lumpedMasses: model.masses.map((m) => ({ node: m.node, mass_kg: m.mass_kg, origin: m.origin })),
  };
}

/** Length between the element's ends after the rigid offsets. */
function elementClearLength(model: FrameModel, id: number): number {
  const e = model.elements[id]!;
  const a = model.nodes[e.i]!.xyz_m;
  const b = model.nodes[e.j]!.xyz_m;
  const d = [0, 1, 2].map((k) => b[k]! + e.offsetJ_m[k]! - (a[k]! + e.offsetI_m[k]!));
  return Math.hypot(d[0]!, d[1]!, d[2]!);
}

export function resultsJson(input: ResultsJsonInput): string {
  const { loaded, model, cases, combinations, results } = input;
  const doc = {
    format: RESULTS_FORMAT,
    formatVersion: RESULTS_FORMAT_VERSION,
    tool: { name: 'polebook', version: input.toolVersion },
    input: { file: loaded.file.split(/[\\/]/).pop(), hash: loaded.inputHash, structureId: loaded.design.project.structureId },
    units: { length: 'm', force: 'N', moment: 'N*m', stress: 'Pa', angle: 'rad', mass: 'kg', frequency: 'Hz', note: 'SI base units throughout; each key names its unit' },
    columns: COLUMNS,
    caution: 'Draft results for review by a licensed engineer; they defer to the governing codes.',
    analysis: {
      secondOrder: input.secondOrder,
      method: 'direct stiffness, 3D Euler-Bernoulli frame elements, rigid end offsets; second order by geometric stiffness iterated on the combined loads',
      outsideMethod: {
        limitRatio: SMALL_DISPLACEMENT_LIMIT,
        note: 'Pole top and arm tips whose total translation exceeds limitRatio x their member length, per combination: beyond it the small-displacement, small-rotation assumption no longer holds (a limit of ours, common practice) and the results of that combination are outside the method.',
        movements: largeMovements(model, results).map((x) => ({ member: x.member, combination: x.combination, movement_m: x.movement_m, length_m: x.length_m, ratio: x.ratio })),
      },
    },
    model: modelRecord(model),
    loadCases: cases.map((c) => ({ id: c.id, kind: c.kind, description: c.description, windAngle_rad: c.windAngle_rad, loads: c.loads.map(loadRecord) })),
    combinations: combinations.map((c) => ({
      id: c.id, category: c.category, description: c.description, source: c.source, factors: c.factors,
      loads: combinedLoads(cases, c).map(({ load, factor }) => loadRecord(scaleLoad(load, factor))),
    })),
    results: Object.values(results).map((r) => ({
      combination: r.combination,
      secondOrder: r.secondOrder,
      iterations: r.iterations,
      convergence: r.convergence,
      baseMoment: r.baseMoment && { node: r.baseMoment.node, element: r.baseMoment.element, firstOrder_Nm: r.baseMoment.firstOrder_Nm, final_Nm: r.baseMoment.final_Nm, amplification: r.baseMoment.amplification },
      statics: r.statics,
      displacements: r.displacements,
      reactions: r.reactions,
      elementEndForces: r.elementEndForces.map((f) => ({ element: f.element, i: f.i, j: f.j, axialForGeometricStiffness_N: f.Ngeometric_N })),
      members: Object.values(r.members).map((m) => ({ member: m.member, extremes: m.extremes, stations: m.stations })),
    })),
    modes: input.modes.map((m) => ({ mode: m.mode, frequency_Hz: m.frequency_Hz, period_s: m.period_s, effectiveMassRatio: m.effectiveMassRatio, shape: m.shape })),
    checks: checksRecord(input.checks),
  };
  return `${JSON.stringify(doc, null, 1)}\n`;
}
