// An --out that cannot be a folder is a misused command (exit 2 with a message), not an internal
// error: found while checking that no input gets a stack trace (tests/fuzz).
import { mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run-cli.ts';

describe('build --out', () => {
  it('a file where the folder should be: exit 2, says why, no stack trace', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-out-'));
    const file = join(dir, 'taken');
    writeFileSync(file, 'not a folder');
    const r = await cli(['build', join(process.cwd(), 'examples/luminaire-twin.yaml'), '--out', join(file, 'sub')], { cwd: dir, env: { SOURCE_DATE_EPOCH: '1767225600' } });
    expect(r.code).toBe(2);
    expect(r.stderr.split('\n')[0]).toContain(`cannot write the outputs to ${join(file, 'sub')}`);
    expect(r.stderr).not.toMatch(/\n\s+at /);
    expect(readdirSync(dir)).toEqual(['taken']);
  });
});
