// polebook compare <input> --vary path=values [...] [--out DIR] [--packages] [--workers N] [--quiet]
import { join, resolve } from 'node:path';
import { mkdirSync } from 'node:fs';
import { EXIT, FileLevelError } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { painter } from '../io.ts';
import { progressFor } from '../progress.ts';
import { writeFilesAtomic } from '../../output/write-atomic.ts';
import { checkOutputsWritable } from '../../output/check-outputs.ts';
import { alternativeFileName, runComparison } from '../../compare/run-compare.ts';
import { comparisonStem } from '../../compare/compare-files.ts';
import { statusText } from '../../compare/status-text.ts';
import { formatNumber } from '../../units/units.ts';
import { printWarnings } from './print-warnings.ts';
import { workersOption } from './workers-option.ts';

const HELP = `Usage: polebook compare <input.yaml> --vary <path>=<values> [--vary ...] [options]

Analyses and checks every alternative of one structure in full, as polebook build does, and
writes a comparison: <out>/<input name>.comparison.pdf, .csv and .json.

  --vary PATH=VALUES  what to vary; several make a grid (every combination). Without --vary,
                      the input's compare block is used.
     PATH    by ids: A1.length (arm A1), S1.position (panel S1), pole.section.wall,
             keys joined by + take the same value: A1.length+L1.position (a tip luminaire),
             or a full path: structure.arms[A1].section.wall, criteria.basePlate.thickness
     VALUES  a list "28, 32, 36 ft" (a unit at the end applies to all), or a range
             "20 ft..45 ft:5 ft" (start..end:step, end included); numbers without a unit
             take the key's own unit; words for keys that take one (e.g. fixed)

Options:
  --out DIR       folder for the outputs (default: output)
  --packages      also write each alternative's input file, its package PDF and JSON results
  --first-order   analyse without second-order (P-delta) effects
  --workers N     threads to use (default: as many as pay on this machine)
  --quiet         no progress on stderr
  --help          show this help

A bad path or value is reported at its place with exit code 2, and nothing is written. An
alternative that is unstable or whose input is refused (e.g. a panel beyond a shortened arm)
is reported in its row. Exit code: 0 when at least one alternative passes every check, 1 when
none does, 2 bad input.
`;

export const compareCommand: Command = {
  name: 'compare',
  summary: 'analyse alternatives of one input (--vary) and write a comparison PDF, CSV and JSON',
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: ['packages', 'first-order', 'quiet'], values: ['out', 'workers'], repeatable: ['vary'] });
    if (args.positionals.length !== 1) throw new UsageError('compare takes exactly one input file');
    const input = resolve(io.cwd, args.positionals[0]!);
    const outDir = resolve(io.cwd, args.values.get('out') ?? 'output');
    const quiet = args.flags.has('quiet');
    const stem = comparisonStem(input);
    checkOutputsWritable(outDir, ['pdf', 'csv', 'json'].map((e) => join(outDir, `${stem}.${e}`)));
    const progress = progressFor(io, quiet, 'alternatives');
    const req = {
      input,
      vary: args.lists.get('vary') ?? [],
      env: io.env,
      firstOrder: args.flags.has('first-order'),
      packages: args.flags.has('packages'),
      workers: workersOption(args.values.get('workers')),
      onProgress: (done: number, total: number, row: number) => progress.step(done, total, `alternative ${row}`),
    };
    const comparison = await runComparison(req);
    progress.end();
    printWarnings(comparison.base.warnings, io);
    // The renderer is loaded when it is needed: the command line starts without it. (A render
    // thread on the other core that made the comparison document while this one analysed was
    // measured slower on a 2-core machine: 4.6-4.8 s against 4.2 s for 50 alternatives.)
    const { comparisonOutputs } = await import('../../compare/compare-outputs.ts');
    const files = await comparisonOutputs(comparison, { packages: req.packages });
    const paths = files.map((f) => join(outDir, f.name));
    checkOutputsWritable(outDir, paths);
    try {
      mkdirSync(outDir, { recursive: true });
      writeFilesAtomic(files.map((f, k) => ({ path: paths[k]!, data: f.data })));
    } catch (err) {
      if (typeof (err as NodeJS.ErrnoException).code !== 'string') throw err;
      throw new FileLevelError(outDir, `cannot write the outputs to ${outDir}: ${(err as Error).message}; give --out a folder you can write to`);
    }
    const paint = painter(io);
    for (const r of comparison.rows) {
      const m = r.result.metrics;
      const ratio = m ? `governing ratio ${formatNumber(m.governing.ratio, 3)} (${m.governing.title.toLowerCase()})` : (r.result.message ?? '').split('\n')[0];
      io.stdout(`${String(r.index).padStart(3)}  ${r.label}: ${statusText(r.result.status)}, ${ratio}\n`);
    }
    const { lightest, longestArm } = comparison.picks;
    io.stdout(lightest ? `lightest passing: no. ${lightest.index}, ${lightest.label}\n` : 'no alternative passes every check\n');
    if (longestArm) io.stdout(`longest passing arm ${longestArm.arm}: no. ${longestArm.row.index}, ${longestArm.row.label}\n`);
    if (!quiet) for (const p of paths.slice(0, 3)) io.stderr(`${paint.good('wrote')} ${p}\n`);
    if (!quiet && paths.length > 3) io.stderr(`${paint.good('wrote')} ${paths.length - 3} more files (inputs and packages of the alternatives, e.g. ${alternativeFileName(input, 1, comparison.rows.length)})\n`);
    return lightest ? EXIT.ok : EXIT.checkFails;
  },
};
