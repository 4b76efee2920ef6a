// polebook build <input> [--out DIR] [--json] [--first-order]
import { basename, extname, join, resolve } from 'node:path';
import { mkdirSync } from 'node:fs';
import { EXIT, FileLevelError } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { painter } from '../io.ts';
import { buildPackage } from '../../pipeline.ts';
import { growHeapInSmallSteps } from '../../heap-growth.ts';
import { writeFilesAtomic } from '../../output/write-atomic.ts';
import { checkOutputsWritable } from '../../output/check-outputs.ts';
import { printWarnings } from './print-warnings.ts';
import { expandInputs, INPUT_EXTENSIONS, parseShard } from '../../batch/inputs.ts';
import { runBatch } from '../../batch/run-batch.ts';
import { worstExit } from '../../batch/index-files.ts';
import type { ParsedArgs } from '../args.ts';
import type { CliIO } from '../io.ts';
import { progressFor } from '../progress.ts';
import { workersOption } from './workers-option.ts';
import { printIndex, writeIndex } from './batch-output.ts';
import { statSync } from 'node:fs';

/** Several inputs, or one folder. A folder named like an input file (pole.yaml/) was meant as a
 * file: it gets the single build's "it is a folder" message. */
function isBatch(positionals: readonly string[], cwd: string): boolean {
  if (positionals.length > 1) return true;
  if (INPUT_EXTENSIONS.includes(extname(positionals[0]!).toLowerCase())) return false;
  try {
    return statSync(resolve(cwd, positionals[0]!)).isDirectory();
  } catch {
    return false;
  }
}

async function buildBatch(args: ParsedArgs, io: CliIO): Promise<number> {
  const outDir = resolve(io.cwd, args.values.get('out') ?? 'output');
  const shardText = args.values.get('shard');
  const shard = shardText === undefined ? null : parseShard(shardText);
  const quiet = args.flags.has('quiet');
  const inputs = expandInputs(args.positionals, io.cwd);
  const progress = progressFor(io, quiet, 'inputs');
  const paint = painter(io);
  const { index } = await runBatch({
    inputs,
    shard,
    outDir,
    json: args.flags.has('json'),
    firstOrder: args.flags.has('first-order'),
    env: io.env,
    workers: workersOption(args.values.get('workers')),
    onDone: (o, done, total) => {
      progress.step(done, total, `${o.display} ${o.status}`);
      if (!quiet && !io.isTTY) for (const w of o.warnings) io.stderr(`${paint.warn(w)}\n`);
    },
  });
  progress.end();
  await writeIndex(index, outDir, io, quiet);
  printIndex(index, io);
  return worstExit(index);
}

const HELP = `Usage: polebook build <input.yaml> [--out DIR] [--json] [--first-order]
       polebook build <inputs or folders...> [--shard K/N] [--workers N] [--quiet] [...]

Reads the input file, analyses the structure and writes the calculation package
<out>/<input name>.pdf (and <out>/<input name>.results.json with --json).

With several inputs or a folder (its .yaml, .yml and .json files, not its subfolders), each
input gets its own package and the batch an index: <out>/index.pdf, index.csv and index.json
(structure, verdict, governing ratio, file, input hash). A bad or unstable input is reported
in the index and the others go on; the exit code is the worst of the runs.

Options:
  --out DIR       folder for the outputs (default: output)
  --json          also write the analysis results and the model as JSON
  --first-order   analyse without second-order (P-delta) effects
  --shard K/N     batch: build only the K-th of N parts of the sorted input list (every N-th
                  input from the K-th on); merge the parts' indexes with polebook index
  --workers N     batch: threads to use (default: as many as pay on this machine)
  --quiet         batch: no progress and no status lines on stderr
  --help          show this help

Nothing is written unless the whole run succeeds; an earlier package is left untouched.
The output folder is checked before the analysis: a file in its way, a folder that cannot
be written, or an earlier package made read-only (chmod a-w) stops the run with exit code 2.
`;

export const buildCommand: Command = {
  name: 'build',
  summary: 'analyse an input file and write its calculation package (PDF, optional JSON); several or a folder: a batch with an index',
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: ['json', 'first-order', 'quiet'], values: ['out', 'shard', 'workers'] });
    if (args.positionals.length === 0) throw new UsageError('build takes an input file (or several, or a folder of them)');
    if (isBatch(args.positionals, io.cwd) || args.values.has('shard')) return buildBatch(args, io);
    for (const batchOnly of ['workers', 'quiet']) if (args.values.has(batchOnly) || args.flags.has(batchOnly)) throw new UsageError(`--${batchOnly} applies to a batch (several inputs or a folder)`);
    const input = resolve(io.cwd, args.positionals[0]!);
    const outDir = resolve(io.cwd, args.values.get('out') ?? 'output');
    const stem = basename(input, extname(input));
    const pdfPath = join(outDir, `${stem}.pdf`);
    const jsonPath = join(outDir, `${stem}.results.json`);
    const written = [pdfPath, ...(args.flags.has('json') ? [jsonPath] : [])];
    // Before the analysis: a folder in the way or a protected package is said at once.
    checkOutputsWritable(outDir, written);
    growHeapInSmallSteps();
    const result = await buildPackage(input, { env: io.env, firstOrder: args.flags.has('first-order'), json: args.flags.has('json') });
    printWarnings(result.loaded.warnings, io);
    // Everything is computed before anything is written; asked again in case it changed meanwhile.
    checkOutputsWritable(outDir, written);
    try {
      mkdirSync(outDir, { recursive: true });
      // Both complete before either replaces an earlier file.
      // The record of an issued revision goes with its package, all or nothing.
      const register = result.issuedRegister?.text != null ? [{ path: result.issuedRegister.path, data: result.issuedRegister.text }] : [];
      writeFilesAtomic([{ path: pdfPath, data: result.pdf }, ...(result.json !== null ? [{ path: jsonPath, data: result.json }] : []), ...register]);
      if (register.length > 0) written.push(result.issuedRegister!.path);
    } catch (err) {
      const code = (err as NodeJS.ErrnoException).code;
      if (typeof code !== 'string') throw err;
      throw new FileLevelError(outDir, `cannot write the outputs to ${outDir}: ${(err as Error).message}; give --out a folder you can write to`);
    }
    const paint = painter(io);
    for (const line of result.summary) io.stdout(`${line}\n`);
    for (const line of result.resultWarnings) io.stderr(`${paint.warn(line)}\n`);
    // Status lines go to stderr: stdout carries the results only.
    for (const path of written) io.stderr(`${paint.good('wrote')} ${path}\n`);
    return result.checksFail ? EXIT.checkFails : EXIT.ok;
  },
};
