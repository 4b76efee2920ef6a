#!/usr/bin/env node
// The installed `polebook` command.
import { runCli } from './run.ts';

// `polebook ... | head`: a reader that stops early is not an error of ours.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw err;
  });
}

const code = await runCli(process.argv.slice(2), {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
  env: process.env,
  isTTY: Boolean(process.stderr.isTTY),
  cwd: process.cwd(),
});
process.exitCode = code;
