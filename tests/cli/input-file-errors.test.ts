// An input file that cannot be read at all has no line or column to point at: the message names
// the file and the reason only (no made-up file:1:1), exit 2, nothing written. The usage text is
// printed for a misused command only, never after an input or runtime error.
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readFailureReason } from '../../src/input/read-input-file.ts';
import { cli } from './run-cli.ts';

const tempDir = () => mkdtempSync(join(tmpdir(), 'polebook-input-'));

/** One message about the file, no position, no usage text, no output folder made. */
async function expectFileLevel(command: 'build' | 'check', input: string, reason: string, dir: string): Promise<void> {
  const r = await cli([command, input, ...(command === 'build' ? ['--out', 'out', '--json'] : [])], { cwd: dir });
  expect(r.code).toBe(2);
  expect(r.stdout).toBe('');
  expect(r.stderr).toBe(`error: cannot read the input file ${join(dir, input)}: ${reason}\nnothing was written.\n`);
  expect(r.stderr).not.toMatch(/:\d+:\d+/);
  expect(r.stderr).not.toContain('Usage:');
  expect(existsSync(join(dir, 'out'))).toBe(false);
}

describe('an input file that cannot be read', () => {
  for (const command of ['build', 'check'] as const) {
    it(`${command}: a missing file`, async () => {
      const dir = tempDir();
      await expectFileLevel(command, 'pole.yaml', 'there is no such file', dir);
      await expectFileLevel(command, join('no', 'such', 'pole.yaml'), 'there is no such file', dir);
    });

    it(`${command}: a folder given as the input`, async () => {
      const dir = tempDir();
      mkdirSync(join(dir, 'pole.yaml'));
      await expectFileLevel(command, 'pole.yaml', 'it is a folder, not an input file', dir);
    });

    it(`${command}: a path through a file`, async () => {
      const dir = tempDir();
      writeFileSync(join(dir, 'notes.txt'), 'a file');
      await expectFileLevel(command, join('notes.txt', 'pole.yaml'), 'a part of its path is a file, not a folder', dir);
    });
  }

  it.skipIf(process.platform === 'win32')('a named pipe is refused without waiting to read it', async () => {
    const dir = tempDir();
    execFileSync('mkfifo', [join(dir, 'pole.yaml')]);
    await expectFileLevel('build', 'pole.yaml', 'it is not a regular file', dir);
  });

  it('no permission to read: said in words (root reads any file, so the errno is given directly)', () => {
    const denied = Object.assign(new Error("EACCES: permission denied, open 'x.yaml'"), { code: 'EACCES' });
    expect(readFailureReason(denied)).toBe('no permission to read it');
    const other = Object.assign(new Error('EIO: i/o error, read'), { code: 'EIO' });
    expect(readFailureReason(other)).toBe('EIO: i/o error, read');
  });
});

describe('the usage text is for usage errors only', () => {
  it('printed after an unknown option and a missing argument', async () => {
    const unknown = await cli(['build', 'pole.yaml', '--colour']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain('unknown option --colour');
    expect(unknown.stderr).toContain('Usage: polebook build');
    const missing = await cli(['build', 'pole.yaml', '--out']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('option --out needs a value');
    expect(missing.stderr).toContain('Usage: polebook build');
    const none = await cli(['check']);
    expect(none.stderr).toContain('Usage: polebook check');
  });

  it('absent after an input error: the located messages and the count only', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'pole.yaml'), 'formatVersion: 1\nunits: furlongs\n');
    for (const argv of [['build', 'pole.yaml', '--out', 'out'], ['check', 'pole.yaml']]) {
      const r = await cli(argv, { cwd: dir });
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(/pole\.yaml:2:\d+: units: /);
      expect(r.stderr).toMatch(/\d+ errors?; nothing was written\.\n$/);
      expect(r.stderr).not.toContain('Usage:');
    }
    expect(existsSync(join(dir, 'out'))).toBe(false);
  });
});
