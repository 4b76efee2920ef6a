// The output folder is checked before the analysis: a file in its way, a folder that cannot be
// written, or an earlier package the user protected (no owner write bit, chmod a-w) stops the run
// at once with exit 2, a message naming the path and the reason, and nothing created or changed.
// Tests run as root in CI, where writing over a read-only file succeeds, so polebook reads the mode
// bits instead of waiting for EACCES; these tests hold as root and as any other user.
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run-cli.ts';

const EXAMPLE = join(process.cwd(), 'examples/luminaire-twin.yaml');
const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const tempDir = () => mkdtempSync(join(tmpdir(), 'polebook-out-'));

/** The analysis prints its summary and the written files on stdout; a run stopped before it prints nothing there. */
function expectStoppedEarly(r: { code: number; stdout: string; stderr: string }): void {
  expect(r.code).toBe(2);
  expect(r.stdout).toBe('');
  expect(r.stderr).not.toMatch(/\n\s+at /); // no stack trace
  expect(r.stderr).not.toContain('Usage:'); // not a usage error
  expect(r.stderr).toContain('nothing was written');
}

describe('build --out: a folder in the way', () => {
  it('a file where a parent of the folder should be: exit 2, names the file, no stack trace', async () => {
    const dir = tempDir();
    const file = join(dir, 'taken');
    writeFileSync(file, 'not a folder');
    const r = await cli(['build', EXAMPLE, '--out', join(file, 'sub')], { cwd: dir, env: ENV });
    expectStoppedEarly(r);
    expect(r.stderr.split('\n')[0]).toBe(`error: cannot write the outputs to ${join(file, 'sub')}: ${file} is a file, not a folder; give --out a folder you can write to`);
    expect(readdirSync(dir)).toEqual(['taken']);
    expect(readFileSync(file, 'utf8')).toBe('not a folder');
  });

  it('--out names a file: exit 2 before the analysis, the file unchanged', async () => {
    const dir = tempDir();
    const file = join(dir, 'output');
    writeFileSync(file, 'a file named like the folder');
    const r = await cli(['build', EXAMPLE, '--out', 'output', '--json'], { cwd: dir, env: ENV });
    expectStoppedEarly(r);
    expect(r.stderr.split('\n')[0]).toBe(`error: cannot write the outputs to ${file}: it is a file, not a folder; give --out a folder you can write to`);
    expect(readFileSync(file, 'utf8')).toBe('a file named like the folder');
    expect(readdirSync(dir)).toEqual(['output']);
  });

  it('a folder where the PDF should be: exit 2, the folder and its content untouched', async () => {
    const dir = tempDir();
    mkdirSync(join(dir, 'luminaire-twin.pdf'));
    writeFileSync(join(dir, 'luminaire-twin.pdf', 'keep.txt'), 'keep');
    const r = await cli(['build', EXAMPLE, '--out', dir], { env: ENV });
    expectStoppedEarly(r);
    expect(r.stderr.split('\n')[0]).toContain(`cannot write ${join(dir, 'luminaire-twin.pdf')}: a folder of that name is in the way`);
    expect(readdirSync(dir)).toEqual(['luminaire-twin.pdf']);
    expect(readFileSync(join(dir, 'luminaire-twin.pdf', 'keep.txt'), 'utf8')).toBe('keep');
  });

  it('a read-only folder (chmod a-w): exit 2, names the folder, nothing written into it', async () => {
    const dir = tempDir();
    const out = join(dir, 'out');
    mkdirSync(out);
    chmodSync(out, 0o555);
    try {
      const r = await cli(['build', EXAMPLE, '--out', out], { env: ENV });
      expectStoppedEarly(r);
      expect(r.stderr.split('\n')[0]).toBe(`error: cannot write the outputs to ${out}: no permission to write in ${out}; give --out a folder you can write to`);
      expect(readdirSync(out)).toEqual([]);
      // A folder still to be made inside the read-only one is refused the same way, and not made.
      const r2 = await cli(['build', EXAMPLE, '--out', join(out, 'new')], { env: ENV });
      expectStoppedEarly(r2);
      expect(r2.stderr.split('\n')[0]).toContain(`no permission to write in ${out} (the folder would be made inside it)`);
      expect(readdirSync(out)).toEqual([]);
    } finally {
      chmodSync(out, 0o755);
    }
  });

  it('a missing folder is not made when the input is bad, and is made when the run succeeds', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'bad.yaml'), 'formatVersion: 1\nunits: furlongs\n');
    const bad = await cli(['build', 'bad.yaml', '--out', 'a/b'], { cwd: dir, env: ENV });
    expect(bad.code).toBe(2);
    expect(existsSync(join(dir, 'a'))).toBe(false);
    const good = await cli(['build', EXAMPLE, '--out', 'a/b'], { cwd: dir, env: ENV });
    expect(good.code).toBe(0);
    expect(readdirSync(join(dir, 'a', 'b'))).toEqual(['luminaire-twin.pdf']);
  }, 60_000);
});

describe('build --out: an earlier package the user protected is not replaced', () => {
  it('a read-only PDF: exit 2 with the reason, the PDF byte-identical, the JSON not written', async () => {
    const out = tempDir();
    const pdf = join(out, 'luminaire-twin.pdf');
    const earlier = Buffer.from('%PDF-1.7 earlier signed package\n');
    writeFileSync(pdf, earlier);
    chmodSync(pdf, 0o444);
    const before = statSync(pdf);
    const r = await cli(['build', EXAMPLE, '--out', out, '--json'], { env: ENV });
    expectStoppedEarly(r);
    expect(r.stderr.split('\n')[0]).toBe(
      `error: ${pdf} is read-only: polebook does not replace a protected package; remove the protection or choose another --out`,
    );
    expect(readFileSync(pdf).equals(earlier)).toBe(true);
    const after = statSync(pdf);
    expect(after.mtimeMs).toBe(before.mtimeMs);
    expect(after.ino).toBe(before.ino); // not replaced by a rename either
    expect(after.mode & 0o777).toBe(0o444);
    expect(readdirSync(out)).toEqual(['luminaire-twin.pdf']);
  });

  it('is checked before the input is read: a protected PDF is reported even for an input that would fail', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'pole.yaml'), 'formatVersion: 1\nunits: furlongs\n');
    writeFileSync(join(dir, 'pole.pdf'), 'earlier');
    chmodSync(join(dir, 'pole.pdf'), 0o444);
    const r = await cli(['build', 'pole.yaml', '--out', '.'], { cwd: dir, env: ENV });
    expectStoppedEarly(r);
    expect(r.stderr.split('\n')[0]).toContain(`${join(dir, 'pole.pdf')} is read-only`);
  });

  it('a read-only JSON with --json: exit 2, neither the earlier PDF nor the JSON changed', async () => {
    const out = tempDir();
    const pdf = join(out, 'luminaire-twin.pdf');
    const json = join(out, 'luminaire-twin.results.json');
    writeFileSync(pdf, 'earlier pdf');
    writeFileSync(json, '{"earlier": true}');
    chmodSync(json, 0o444);
    const r = await cli(['build', EXAMPLE, '--out', out, '--json'], { env: ENV });
    expectStoppedEarly(r);
    expect(r.stderr.split('\n')[0]).toBe(
      `error: ${json} is read-only: polebook does not replace a protected package; remove the protection or choose another --out`,
    );
    expect(readFileSync(pdf, 'utf8')).toBe('earlier pdf');
    expect(readFileSync(json, 'utf8')).toBe('{"earlier": true}');
    expect(readdirSync(out).sort()).toEqual(['luminaire-twin.pdf', 'luminaire-twin.results.json']);
  });

  it('a read-only JSON is no obstacle when --json is not asked: the PDF is written, the JSON left alone', async () => {
    const out = tempDir();
    const json = join(out, 'luminaire-twin.results.json');
    writeFileSync(json, '{"earlier": true}');
    chmodSync(json, 0o444);
    const r = await cli(['build', EXAMPLE, '--out', out], { env: ENV });
    expect(r.code).toBe(0);
    expect(r.stderr).toContain(`wrote ${join(out, 'luminaire-twin.pdf')}`);
    expect(readFileSync(join(out, 'luminaire-twin.pdf')).subarray(0, 5).toString()).toBe('%PDF-');
    expect(readFileSync(json, 'utf8')).toBe('{"earlier": true}');
  }, 60_000);

  it('a writable earlier PDF is still replaced by a successful run', async () => {
    const out = tempDir();
    const pdf = join(out, 'luminaire-twin.pdf');
    writeFileSync(pdf, 'earlier pdf');
    const r = await cli(['build', EXAMPLE, '--out', out, '--json'], { env: ENV });
    expect(r.code).toBe(0);
    expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
    expect(readdirSync(out).sort()).toEqual(['luminaire-twin.pdf', 'luminaire-twin.results.json']);
  }, 60_000);
});
