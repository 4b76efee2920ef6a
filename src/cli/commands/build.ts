// polebook build <input> [--out DIR] [--json] [--first-order]
import { basename, extname, join, resolve } from 'node:path';
import { mkdirSync } from 'node:fs';
import { EXIT, FileLevelError } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { painter } from '../io.ts';
import { buildPackage } from '../../pipeline.ts';
import { writeFilesAtomic } from '../../output/write-atomic.ts';
import { checkOutputsWritable } from '../../output/check-outputs.ts';
import { printWarnings } from './print-warnings.ts';

const HELP = `Usage: polebook build <input.yaml> [--out DIR] [--json] [--first-order]

Reads the input file, analyses the structure and writes the calculation package
<out>/<input name>.pdf (and <out>/<input name>.results.json with --json).

Options:
  --out DIR       folder for the outputs (default: output)
  --json          also write the analysis results and the model as JSON
  --first-order   analyse without second-order (P-delta) effects
  --help          show this help

Nothing is written unless the whole run succeeds; an earlier package is left untouched.
The output folder is checked before the analysis: a file in its way, a folder that cannot
be written, or an earlier package made read-only (chmod a-w) stops the run with exit code 2.
`;

export const buildCommand: Command = {
  name: 'build',
  summary: 'analyse an input file and write its calculation package (PDF, optional JSON)',
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: ['json', 'first-order'], values: ['out'] });
    if (args.positionals.length !== 1) throw new UsageError('build takes exactly one input file');
    const input = resolve(io.cwd, args.positionals[0]!);
    const outDir = resolve(io.cwd, args.values.get('out') ?? 'output');
    const stem = basename(input, extname(input));
    const pdfPath = join(outDir, `${stem}.pdf`);
    const jsonPath = join(outDir, `${stem}.results.json`);
    const written = [pdfPath, ...(args.flags.has('json') ? [jsonPath] : [])];
    // Before the analysis: a folder in the way or a protected package is said at once.
    checkOutputsWritable(outDir, written);
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
    for (const path of written) io.stdout(`${paint.good('wrote')} ${path}\n`);
    return result.checksFail ? EXIT.checkFails : EXIT.ok;
  },
};
