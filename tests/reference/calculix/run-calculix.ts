// Runs ccx on a FrameModel in a fresh temporary folder and reads back the translations of
// every frame node. ccx prints no rotations for expanded beams: rotations are recovered only
// at the nodes asked for, from two rigid probe stubs each (see write-input.ts).
// Reactions come from statics of the loads in the deck (see statics.ts).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import type { FrameModel, Vec3, Vec6 } from '../../../src/model/frame.ts';
import type { AppliedLoad } from '../../../src/loads/load-types.ts';
import { buildCalculixDeck, ccxNodeId, type CalculixDeckOptions, type RotationProbe } from './write-input.ts';
import { cross, dot, scale, sub, unit, add } from './vec3.ts';
import { parseDatDisplacements } from './parse-dat.ts';
import { reactionsFromPointForces, type PointForce } from './statics.ts';

export interface CalculixResult {
  /** Translations [ux, uy, uz] of each frame node, indexed by frame node id. */
  readonly translations_m: readonly Vec3[];
  /** Support reactions by statics of the concentrated loads written in the deck (single fixed support only). */
  readonly reactions: readonly { node: number; force: Vec6 }[];
  /** Rotations [rx, ry, rz] of the nodes given in options.rotationProbes. */
  readonly rotations_rad: ReadonlyMap<number, Vec3>;
  readonly deck: string;
  /** Every concentrated force in the deck at its undeformed point, and every printed ccx node's
   * translation (all nodes with printAllNodes), for statics in the deformed configuration. */
  readonly pointForces: readonly PointForce[];
  readonly ccxTranslations_m: ReadonlyMap<number, Vec3>;
  /** Wall time of the ccx process (spawn to exit, including its file input and output), ms. */
  readonly ccxWall_ms: number;
}

export interface RunOptions extends CalculixDeckOptions {
  readonly timeout_ms?: number;
  /** Keep the temporary folder (its path is put in the error message on failure). */
  readonly keepFiles?: boolean;
}

export async function runCalculix(
  model: FrameModel,
  loads: readonly AppliedLoad[],
  options: RunOptions = {},
): Promise<CalculixResult> {
  const { deck, probes, pointForces } = buildCalculixDeck(model, loads, options);
  const dir = mkdtempSync(join(tmpdir(), 'polebook-ccx-'));
  try {
    writeFileSync(join(dir, 'frame.inp'), deck);
    const t0 = performance.now();
    const run = spawnSync('ccx', ['-i', 'frame'], {
      cwd: dir,
      encoding: 'utf8',
      timeout: options.timeout_ms ?? 60_000,
      env: { ...process.env, OMP_NUM_THREADS: '1', CCX_NPROC_EQUATION_SOLVER: '1' },
    });
    const ccxWall_ms = performance.now() - t0;
    const log = `${run.stdout ?? ''}${run.stderr ?? ''}`;
    if (run.error !== undefined || run.status !== 0 || !log.includes('Job finished') || /\*ERROR/.test(log)) {
      const err = log.split('\n').filter((l) => /ERROR|error/.test(l)).slice(0, 5).join('\n');
      throw new Error(`CalculiX run failed in ${dir}: ${run.error?.message ?? `exit ${run.status}`}\n${err}`);
    }
    const disp = parseDatDisplacements(readFileSync(join(dir, 'frame.dat'), 'utf8'));
    const translations_m = model.nodes.map((n): Vec3 => {
      const u = disp.get(ccxNodeId(n.id));
      if (u === undefined) throw new Error(`CalculiX harness: no displacement printed for frame node ${n.id}`);
      return u;
    });
    const rotations_rad = new Map<number, Vec3>();
    for (let k = 0; k + 1 < probes.length; k += 2) {
      const at = (p: RotationProbe): Vec3 => {
        const u = disp.get(p.ccxNode);
        if (u === undefined) throw new Error(`CalculiX harness: no displacement printed for probe ${p.ccxNode}`);
        return scale(sub(u, translations_m[p.frameNode]!), 1 / p.length_m);
      };
      rotations_rad.set(probes[k]!.frameNode, rotationFromProbes(probes[k]!.direction, at(probes[k]!), probes[k + 1]!.direction, at(probes[k + 1]!)));
    }
    return { translations_m, reactions: reactionsFromPointForces(model, pointForces), rotations_rad, deck, ccxWall_ms, pointForces, ccxTranslations_m: disp };
  } finally {
    if (options.keepFiles !== true) rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Small rotation theta from w_a = theta x a and w_b = theta x b (a, b orthonormal, c = a x b):
 * theta.a = w_b.c, theta.b = -w_a.c, theta.c = w_a.b = -w_b.a (both used, averaged).
 */
export function rotationFromProbes(a: Vec3, wa: Vec3, b: Vec3, wb: Vec3): Vec3 {
  const ua = unit(a);
  const ub = unit(b);
  const c = cross(ua, ub);
  const ta = dot(wb, c);
  const tb = -dot(wa, c);
  const tc = (dot(wa, ub) - dot(wb, ua)) / 2;
  return add(add(scale(ua, ta), scale(ub, tb)), scale(c, tc));
}
