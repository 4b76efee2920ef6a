// Runs ccx on a FrameModel in a fresh temporary folder and reads back the translations of
// every frame node. Rotations of beam nodes are not printed by ccx for expanded beams, so
// only translations are returned. Reactions come from statics (see statics.ts).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { FrameModel, Vec3, Vec6 } from '../../../src/model/frame.ts';
import type { NodalLoad } from '../../../src/loads/load-types.ts';
import { ccxNodeId, writeCalculixInput, type CalculixDeckOptions } from './write-input.ts';
import { parseDatDisplacements } from './parse-dat.ts';
import { reactionsByStatics } from './statics.ts';

export interface CalculixResult {
  /** Translations [ux, uy, uz] of each frame node, indexed by frame node id. */
  readonly translations_m: readonly Vec3[];
  /** Support reactions by statics of the same loads (single fixed support only). */
  readonly reactions: readonly { node: number; force: Vec6 }[];
  readonly deck: string;
}

export interface RunOptions extends CalculixDeckOptions {
  readonly timeout_ms?: number;
  /** Keep the temporary folder (its path is put in the error message on failure). */
  readonly keepFiles?: boolean;
}

export async function runCalculix(
  model: FrameModel,
  loads: readonly NodalLoad[],
  options: RunOptions = {},
): Promise<CalculixResult> {
  const deck = writeCalculixInput(model, loads, options);
  const dir = mkdtempSync(join(tmpdir(), 'polebook-ccx-'));
  try {
    writeFileSync(join(dir, 'frame.inp'), deck);
    const run = spawnSync('ccx', ['-i', 'frame'], {
      cwd: dir,
      encoding: 'utf8',
      timeout: options.timeout_ms ?? 60_000,
      env: { ...process.env, OMP_NUM_THREADS: '1', CCX_NPROC_EQUATION_SOLVER: '1' },
    });
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
    return { translations_m, reactions: reactionsByStatics(model, loads), deck };
  } finally {
    if (options.keepFiles !== true) rmSync(dir, { recursive: true, force: true });
  }
}
