// Solve time against segment count: a tapered pole with two arms, built by hand, n prismatic
// segments per member. `solve` is assembly + banded LDL^T factorisation + one solve (median and
// quartiles of samples of equal length after a warm-up); it should grow about linearly with n (narrow band).
import { performance } from 'node:perf_hooks';
import { assemble, buildLoadSet, factorOrThrow, loadVector, prepareModel } from '../src/analysis/frame-system.ts';
import type { AppliedLoad } from '../src/loads/load-types.ts';
import type { FrameElement, FrameModel, FrameNode, MemberInfo, Vec3 } from '../src/model/frame.ts';
import { summarise, timeBatched, type Timing } from './timing.ts';

export interface ScalingRow {
  readonly segments: number;
  readonly dof: number;
  /** Half bandwidth of the assembled stiffness. */
  readonly bandwidth: number;
  /** Runs per timed sample. */
  readonly batch: number;
  /** Per run. */
  readonly solve: Timing;
}

function tube(D: number, t: number) {
  const d = D - 2 * t;
  const A = (Math.PI / 4) * (D ** 2 - d ** 2);
  const I = (Math.PI / 64) * (D ** 4 - d ** 4);
  return { A, I };
}

/** Pole 10 m (0.45 -> 0.25 m), arms 9 m and 4 m at 7.5 m and 10 m, n segments each. */
export function benchFrame(n: number): { model: FrameModel; loads: AppliedLoad[] } {
  const nodes: FrameNode[] = [];
  const elements: FrameElement[] = [];
  const members: MemberInfo[] = [];
  const node = (xyz: Vec3, tag: string): number => (nodes.push({ id: nodes.length, xyz_m: xyz, tag }), nodes.length - 1);
  const chain = (id: string, kind: 'pole' | 'arm', from: number, off: Vec3, to: Vec3, D0: number, D1: number, ref: Vec3): number[] => {
    const p = nodes[from].xyz_m;
    const s0: Vec3 = [p[0] + off[0], p[1] + off[1], p[2] + off[2]];
    const L = Math.hypot(to[0] - s0[0], to[1] - s0[1], to[2] - s0[2]);
    const ids = [from];
    const els: number[] = [];
    for (let k = 0; k < n; k++) {
      const t = (k + 1) / n;
      const j = node([s0[0] + (to[0] - s0[0]) * t, s0[1] + (to[1] - s0[1]) * t, s0[2] + (to[2] - s0[2]) * t], k === n - 1 ? `${id}-tip` : 'segment');
      const D = D0 + ((D1 - D0) * (k + 0.5)) / n;
      const { A, I } = tube(D, 0.006);
      elements.push({
        id: elements.length, member: id, i: ids[ids.length - 1], j, E_Pa: 200e9, G_Pa: 77e9, A_m2: A, Iy_m4: I, Iz_m4: I, J_m4: 2 * I,
        refVector: ref, offsetI_m: k === 0 ? off : [0, 0, 0], offsetJ_m: [0, 0, 0], massPerLength_kgm: 7850 * A,
        sI_m: (k * L) / n, sJ_m: ((k + 1) * L) / n, diameterI_m: D, diameterJ_m: D,
      });
      els.push(elements.length - 1);
      ids.push(j);
    }
    members.push({ id, kind, elements: els, length_m: L, discontinuities_m: [] });
    return ids;
  };
  const base = node([0, 0, 0], 'base');
  const lower = chain('pole-lower', 'pole', base, [0, 0, 0], [0, 0, 7.5], 0.45, 0.3, [1, 0, 0]);
  const upper = chain('pole-upper', 'pole', lower[lower.length - 1], [0, 0, 0], [0, 0, 10], 0.3, 0.25, [1, 0, 0]);
  const a1 = chain('A1', 'arm', lower[lower.length - 1], [0.15, 0, 0], [9.15, 0, 7.8], 0.25, 0.15, [0, 0, 1]);
  const a2 = chain('A2', 'arm', upper[upper.length - 1], [0, 0.125, 0], [0, 4.125, 10.3], 0.15, 0.1, [0, 0, 1]);
  const loads: AppliedLoad[] = [
    { kind: 'nodal', node: a1[a1.length - 1], F_N: [0, 800, -2000], M_Nm: [0, 0, 0], origin: { source: 'bench' } },
    { kind: 'nodal', node: a2[a2.length - 1], F_N: [500, 0, -600], M_Nm: [0, 0, 0], origin: { source: 'bench' } },
    ...elements.map((el): AppliedLoad => ({
      kind: 'distributed', element: el.id, axes: 'global', direction: [0, 1, 0], wA_Npm: 300, wB_Npm: 300,
      a_m: 0, b_m: el.sJ_m - el.sI_m, origin: { source: 'bench' },
    })),
  ];
  return {
    model: { nodes, elements, supports: [{ node: base, fixed: [true, true, true, true, true, true], springs: [0, 0, 0, 0, 0, 0] }], members, masses: [] },
    loads,
  };
}

/** Timed samples per row, each lasting about SAMPLE_MS (fast models run in batches). */
const SAMPLES = 61;
const SAMPLE_MS = 4;

export interface ScalingTable {
  readonly rows: readonly ScalingRow[];
  /** Per sample round, time per run of each row over the reference row's (rows[k] / rows[ref]). */
  readonly ratios: readonly (readonly number[])[];
}

/**
 * Rows are sampled in turn, one sample of each per round, so every row meets the same conditions
 * on a shared machine (a burst of other work, a garbage collection); the ratio of each round then
 * compares like with like, and its median is the robust figure.
 */
export function scalingTable(segments: number[], reference: number): ScalingTable {
  const cases = segments.map((n) => {
    const { model, loads } = benchFrame(n);
    const prep = prepareModel(model);
    const ls = buildLoadSet(prep, loads.map((load) => ({ load, factor: 1 })));
    const F = loadVector(prep, ls);
    // One storage for K, reused by every assembly (as the P-delta iteration does).
    const K = assemble(prep, null);
    const once = (): void => {
      assemble(prep, null, K);
      factorOrThrow(prep, K, undefined, false);
      K.solve(F);
    };
    // warm-up (JIT) for about 50 ms, then five runs size the batch
    for (let k = 0, w0 = performance.now(); k < 5 || performance.now() - w0 < 50; k++) once();
    const t0 = performance.now();
    for (let k = 0; k < 5; k++) once();
    const single = (performance.now() - t0) / 5;
    const batch = Math.max(1, Math.round(SAMPLE_MS / Math.max(single, 1e-3)));
    return { n, prep, once, batch, times: [] as number[] };
  });
  for (let r = 0; r < SAMPLES; r++) {
    for (const c of cases) c.times.push(timeBatched(c.once, 1, c.batch, 0).median_ms);
  }
  const ref = cases.findIndex((c) => c.n === reference);
  if (ref < 0) throw new Error(`scaling: reference ${reference} segments is not among the rows`);
  return {
    rows: cases.map((c) => ({ segments: c.n, dof: c.prep.dofs.nEq, bandwidth: c.prep.dofs.bw, batch: c.batch, solve: summarise(c.times) })),
    ratios: cases.map((c) => c.times.map((t, r) => t / cases[ref].times[r])),
  };
}
