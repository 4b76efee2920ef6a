// The command line: a thin layer over the library API. Tests call runCli in-process.
import { EXIT, InputError, PolebookError, formatDiagnostic } from '../errors.ts';
import { UsageError } from './args.ts';
import type { CliIO } from './io.ts';
import { painter } from './io.ts';
import { buildCommand } from './commands/build.ts';
import { checkCommand } from './commands/check.ts';
import { schemaCommand } from './commands/schema.ts';
import { newCommand } from './commands/new.ts';
import { compareCommand } from './commands/compare.ts';
import { indexCommand } from './commands/index-command.ts';
import { toolVersion } from '../version.ts';

export interface Command {
  readonly name: string;
  readonly summary: string;
  readonly help: string;
  readonly run: (argv: readonly string[], io: CliIO) => Promise<number>;
}

const COMMANDS: readonly Command[] = [buildCommand, compareCommand, indexCommand, checkCommand, schemaCommand, newCommand];

function mainHelp(): string {
  const width = Math.max(...COMMANDS.map((c) => c.name.length));
  return [
    'polebook: calculation packages for pole-and-arm supports of signs, luminaires and signals',
    '',
    'Usage: polebook <command> [options]',
    '',
    'Commands:',
    ...COMMANDS.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    'Options:',
    '  --help, -h     show help (also after a command: polebook build --help)',
    '  --version, -v  print the version',
    '',
    'Exit codes: 0 done, 1 a design check fails, 2 bad input, 3 unstable or unsolvable structure, 4 internal error.',
    'The package is a draft for review by a licensed engineer; it defers to the governing codes.',
    '',
  ].join('\n');
}

export async function runCli(argv: readonly string[], io: CliIO): Promise<number> {
  const paint = painter(io);
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    (name === undefined ? io.stderr : io.stdout)(mainHelp());
    return name === undefined ? EXIT.badInput : EXIT.ok;
  }
  if (name === '--version' || name === '-V' || name === '-v') {
    io.stdout(`polebook ${toolVersion()}\n`);
    return EXIT.ok;
  }
  const command = COMMANDS.find((c) => c.name === name);
  if (!command) {
    io.stderr(`${paint.error('error:')} unknown command '${name}'; expected one of: ${COMMANDS.map((c) => c.name).join(', ')}\n`);
    return EXIT.badInput;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.stdout(command.help);
    return EXIT.ok;
  }
  try {
    return await command.run(rest, io);
  } catch (err) {
    if (err instanceof UsageError) {
      io.stderr(`${paint.error('error:')} ${err.message}\n\n${command.help}`);
      return EXIT.badInput;
    }
    if (err instanceof InputError) {
      // Warnings in their own colour: only errors are red.
      for (const d of err.diagnostics) io.stderr(`${(d.severity === 'warning' ? paint.warn : paint.error)(formatDiagnostic(d))}\n`);
      const n = err.diagnostics.filter((d) => d.severity === 'error').length;
      io.stderr(`${n} error${n === 1 ? '' : 's'}; nothing was written.\n`);
      return EXIT.badInput;
    }
    if (err instanceof PolebookError) {
      io.stderr(`${paint.error('error:')} ${err.message}\nnothing was written.\n`);
      return err.exitCode;
    }
    const text = err instanceof Error ? (err.stack ?? err.message) : String(err);
    io.stderr(`${paint.error('internal error:')} ${text}\nThis is a fault in polebook, not in your input; nothing was written.\n`);
    return EXIT.internal;
  }
}
