// Runs the CLI in-process and captures what it prints.
import { runCli } from '../../src/cli/run.ts';

export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

export async function cli(argv: string[], opts: { cwd?: string; env?: Record<string, string | undefined>; isTTY?: boolean } = {}): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, {
    stdout: (t) => (stdout += t),
    stderr: (t) => (stderr += t),
    env: opts.env ?? {},
    isTTY: opts.isTTY ?? false,
    cwd: opts.cwd ?? process.cwd(),
  });
  return { code, stdout, stderr };
}
