// polebook schema: the JSON Schema of the input format, for editors.
import { EXIT } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { designJsonSchema } from '../../input/index.ts';

const HELP = `Usage: polebook schema

Prints the JSON Schema of the input format to stdout. Point your editor's YAML
support at it to get completion and checking while you type.
`;

export const schemaCommand: Command = {
  name: 'schema',
  summary: 'print the JSON Schema of the input format',
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: [], values: [] });
    if (args.positionals.length !== 0) throw new UsageError('schema takes no arguments');
    io.stdout(`${JSON.stringify(designJsonSchema(), null, 2)}\n`);
    return EXIT.ok;
  },
};
