// polebook new <kind> [file]: a commented starter input for a kind of structure.
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { EXIT } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { STRUCTURE_KINDS, starterInput } from '../../input/index.ts';
import type { StructureKind } from '../../design/design.ts';
import { writeFileAtomic } from '../../output/write-atomic.ts';
import { painter } from '../io.ts';
import { commandName } from '../command-name.ts';

const HELP = `Usage: polebook new <kind> [file] [--units us|si] [--force]

Writes a commented starter input for a kind of structure, to the file or to stdout.
Kinds: ${STRUCTURE_KINDS.join(', ')}

Options:
  --units   us (default) or si: the starter's unit system, with round values in that system
  --force   overwrite the file if it exists
`;

export const newCommand: Command = {
  name: 'new',
  summary: `write a commented starter input (${STRUCTURE_KINDS.join(', ')})`,
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: ['force'], values: ['units'] });
    const units = args.values.get('units') ?? 'us';
    if (units !== 'us' && units !== 'si') throw new UsageError(`unknown --units '${units}'; expected us or si`);
    const [kind, file, ...extra] = args.positionals;
    if (kind === undefined || extra.length > 0) throw new UsageError('new takes a kind and an optional file name');
    if (!(STRUCTURE_KINDS as readonly string[]).includes(kind)) {
      throw new UsageError(`unknown kind '${kind}'; expected one of: ${STRUCTURE_KINDS.join(', ')}`);
    }
    const text = starterInput(kind as StructureKind, units);
    if (file === undefined) {
      io.stdout(text);
      return EXIT.ok;
    }
    const path = resolve(io.cwd, file);
    if (existsSync(path) && !args.flags.has('force')) {
      io.stderr(`${painter(io).error('error:')} ${path} exists; use --force to overwrite it\n`);
      return EXIT.badInput;
    }
    writeFileAtomic(path, text);
    const run = commandName(io);
    io.stderr(`${painter(io).good('wrote')} ${path}\n`);
    io.stderr(`Edit it, then: ${run} check ${file} && ${run} build ${file}\n`);
    return EXIT.ok;
  },
};
