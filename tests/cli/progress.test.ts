// Progress of long runs on stderr: a bar redrawn in place on a terminal, one plain line per step
// in a log, nothing with --quiet.
import { describe, expect, it } from 'vitest';
import { progressFor } from '../../src/cli/progress.ts';
import type { CliIO } from '../../src/cli/io.ts';

function io(isTTY: boolean): CliIO & { err: string } {
  const o = { err: '', stdout: () => {}, env: {}, isTTY, cwd: '/', stderr: (t: string) => (o.err += t) };
  return o;
}

describe('progress', () => {
  it('on a terminal: one line redrawn with \\r, ended by a newline', () => {
    const t = io(true);
    const p = progressFor(t, false, 'inputs');
    p.step(1, 4, 'a.yaml');
    p.step(4, 4, 'd.yaml');
    p.end();
    expect(t.err).toBe(`\r[${'#'.repeat(7)}${'.'.repeat(21)}] 1/4 inputs\r[${'#'.repeat(28)}] 4/4 inputs\n`);
  });
  it('in a log: plain lines', () => {
    const t = io(false);
    const p = progressFor(t, false, 'inputs');
    p.step(1, 2, 'a.yaml passes');
    p.end();
    expect(t.err).toBe('inputs 1/2: a.yaml passes\n');
  });
  it('--quiet: nothing', () => {
    const t = io(true);
    const p = progressFor(t, true, 'inputs');
    p.step(1, 2, 'a');
    p.end();
    expect(t.err).toBe('');
  });
});
