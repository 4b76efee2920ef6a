// polebook check <input>: validate and summarise the normalised design; writes nothing.
import { resolve } from 'node:path';
import { EXIT } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { loadDesignFile } from '../../input/index.ts';
import { summariseDesign } from '../../design/summary.ts';
import { printWarnings } from './print-warnings.ts';
import { assertPrintable } from '../../printable-input.ts';

const HELP = `Usage: polebook check <input.yaml>

Validates the input and prints a summary of the normalised design in your units:
geometry, sections, attachments, wind directions, combinations and every default
taken with its source. Writes no files.
`;

export const checkCommand: Command = {
  name: 'check',
  summary: 'validate an input file and print a summary of the design',
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: [], values: [] });
    if (args.positionals.length !== 1) throw new UsageError('check takes exactly one input file');
    const loaded = loadDesignFile(resolve(io.cwd, args.positionals[0]!));
    assertPrintable(loaded);
    printWarnings(loaded.warnings, io);
    io.stdout(summariseDesign(loaded));
    return EXIT.ok;
  },
};
