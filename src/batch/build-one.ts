// One input of a batch: the same steps as `polebook build` (outputs checked, package built, both
// files written atomically), with every failure turned into the outcome of its row so the other
// inputs go on.
import { readFileSync, mkdirSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import { EXIT, FileLevelError, InputError, PolebookError, UnstableStructureError, formatDiagnostic, type ExitCode } from '../errors.ts';
import { inputHash } from '../input/index.ts';
import { buildPackage } from '../pipeline.ts';
import { checkOutputsWritable } from '../output/check-outputs.ts';
import { writeFilesAtomic } from '../output/write-atomic.ts';
import { alternativeMetrics } from '../compare/metrics.ts';

export interface BuildTask {
  /** Absolute path of the input. */
  readonly file: string;
  /** As the user named it (printed in the index). */
  readonly display: string;
  readonly outDir: string;
  readonly json: boolean;
  readonly firstOrder: boolean;
  readonly env: Readonly<Record<string, string | undefined>>;
}

export type BuildStatus = 'passes' | 'fails' | 'bad input' | 'unstable' | 'internal error';

export interface BuildOutcome {
  readonly display: string;
  readonly status: BuildStatus;
  readonly exitCode: ExitCode;
  readonly structureId: string | null;
  readonly governingRatio: number | null;
  readonly governingCheck: string | null;
  /** First 12 hex digits of the SHA-256 of the input file; null when it cannot be read. */
  readonly inputHash: string | null;
  /** File names written, relative to the output folder. */
  readonly written: readonly string[];
  /** Why it failed to build; null when the package was written. */
  readonly message: string | null;
  /** The date printed on its package; null when none was built. */
  readonly packageDate: string | null;
  /** Warnings of the input and of the results, for the terminal. */
  readonly warnings: readonly string[];
}

export function outputNames(file: string, json: boolean): string[] {
  const stem = basename(file, extname(file));
  return [`${stem}.pdf`, ...(json ? [`${stem}.results.json`] : [])];
}

function hashOf(file: string): string | null {
  try {
    return inputHash(readFileSync(file));
  } catch {
    return null;
  }
}

export async function buildOneInput(task: BuildTask): Promise<BuildOutcome> {
  const names = outputNames(task.file, task.json);
  const paths = names.map((n) => join(task.outDir, n));
  const base = { display: task.display, inputHash: hashOf(task.file), structureId: null, governingRatio: null, governingCheck: null, written: [], warnings: [], packageDate: null };
  try {
    checkOutputsWritable(task.outDir, paths);
    const result = await buildPackage(task.file, { env: task.env, firstOrder: task.firstOrder, json: task.json });
    checkOutputsWritable(task.outDir, paths);
    try {
      mkdirSync(task.outDir, { recursive: true });
      // The record of an issued revision goes with its package, as in a single build.
      const register = result.issuedRegister?.text != null ? [{ path: result.issuedRegister.path, data: result.issuedRegister.text }] : [];
      writeFilesAtomic([{ path: paths[0]!, data: result.pdf }, ...(result.json !== null ? [{ path: paths[1]!, data: result.json }] : []), ...register]);
    } catch (err) {
      if (typeof (err as NodeJS.ErrnoException).code !== 'string') throw err;
      throw new FileLevelError(task.outDir, `cannot write the outputs to ${task.outDir}: ${(err as Error).message}`);
    }
    const m = alternativeMetrics(result.loaded, result);
    return {
      ...base,
      status: result.checksFail ? 'fails' : 'passes',
      exitCode: result.checksFail ? EXIT.checkFails : EXIT.ok,
      structureId: result.loaded.design.project.structureId,
      governingRatio: m.governing.ratio,
      governingCheck: m.governing.title,
      inputHash: result.loaded.inputHash,
      written: names,
      packageDate: result.loaded.design.project.date,
      message: null,
      warnings: [...result.loaded.warnings.map(formatDiagnostic), ...result.resultWarnings],
    };
  } catch (err) {
    // Messages name the input as the user gave it, so the index is the same on every machine.
    const local = (text: string) => text.split(task.file).join(task.display);
    if (err instanceof InputError) return { ...base, status: 'bad input', exitCode: EXIT.badInput, message: local(err.diagnostics.filter((d) => d.severity === 'error').map(formatDiagnostic).join('\n')) };
    if (err instanceof UnstableStructureError) return { ...base, status: 'unstable', exitCode: EXIT.unstable, message: local(err.message) };
    if (err instanceof PolebookError) return { ...base, status: err.exitCode === EXIT.badInput ? 'bad input' : 'internal error', exitCode: err.exitCode, message: local(err.message) };
    return { ...base, status: 'internal error', exitCode: EXIT.internal, message: err instanceof Error ? (err.stack ?? err.message) : String(err) };
  }
}
