#!/usr/bin/env node
// The installed `polebook` command.
import { runCli } from './run.ts';

const code = await runCli(process.argv.slice(2), {
  stdout: (t) => process.stdout.write(t),
  stderr: (t) => process.stderr.write(t),
  env: process.env,
  isTTY: Boolean(process.stderr.isTTY),
  cwd: process.cwd(),
});
process.exitCode = code;
