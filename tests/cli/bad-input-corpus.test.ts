// Every file of the bad-input corpus, run through the command line: one clear located
// message, exit code 2, and no output created or changed (an earlier package survives).
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { cli } from './run-cli.ts';

const CORPUS = join(import.meta.dirname, '../fixtures/bad');
const expected = JSON.parse(readFileSync(join(CORPUS, 'expected.json'), 'utf8')) as Record<
  string,
  { line: number; col: number; path: string; messageIncludes?: string; fileLevel?: boolean }
>;

describe('bad input through `polebook build`', () => {
  it('the corpus holds at least 25 files, each with its expected location', () => {
    const files = readdirSync(CORPUS).filter((f) => f !== 'expected.json');
    expect(files.length).toBeGreaterThanOrEqual(25);
    for (const f of files) expect(expected[f], `expected.json lacks ${f}`).toBeDefined();
  });

  for (const [file, want] of Object.entries(expected)) {
    it(`${file}: exit 2 at ${want.line}:${want.col} (${want.path}), nothing written`, async () => {
      const out = mkdtempSync(join(tmpdir(), 'polebook-bad-'));
      const stem = file.replace(/\.(ya?ml|json)$/, '');
      // An earlier package in the output folder must survive the failed run.
      const earlier = join(out, `${stem}.pdf`);
      writeFileSync(earlier, 'earlier package');
      const before = statSync(earlier).mtimeMs;
      const run = await cli(['build', join(CORPUS, file), '--out', out, '--json']);
      expect(run.code).toBe(2);
      expect(run.stdout).toBe('');
      const first = run.stderr.split('\n')[0]!;
      if (want.fileLevel) {
        expect(first).toContain(file);
        expect(first).not.toMatch(/:\d+:\d+:/);
      } else expect(first).toContain(`${file}:${want.line}:${want.col}: ${want.path === '' ? '' : `${want.path}: `}`);
      if (want.messageIncludes) expect(run.stderr).toContain(want.messageIncludes);
      expect(run.stderr).not.toMatch(/at .*\.ts:\d+/); // no stack trace
      // No raw control character or undecodable byte reaches the terminal.
      expect(run.stderr).not.toMatch(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\uFFFD]/);
      expect(readdirSync(out).sort()).toEqual([`${stem}.pdf`]);
      expect(readFileSync(earlier, 'utf8')).toBe('earlier package');
      expect(statSync(earlier).mtimeMs).toBe(before);
    });
  }
});

describe('command line basics', () => {
  it('a missing file is bad input with exit 2', async () => {
    const run = await cli(['build', 'no/such/file.yaml']);
    expect(run.code).toBe(2);
    expect(run.stderr.split('\n')[0]).toMatch(/cannot read the input file .*no[/\\]such[/\\]file\.yaml: there is no such file$/);
    expect(run.stderr).not.toMatch(/file\.yaml:\d+:\d+/);
  });
  it('an unknown command and an unknown option are usage errors (exit 2)', async () => {
    expect((await cli(['bild'])).code).toBe(2);
    expect((await cli(['build', 'x.yaml', '--colour'])).stderr).toContain('unknown option --colour');
  });
  it('every command has --help, and --version prints the package version', async () => {
    for (const c of ['build', 'check', 'schema', 'new']) {
      const run = await cli([c, '--help']);
      expect(run.code).toBe(0);
      expect(run.stdout).toContain(`Usage: polebook ${c}`);
    }
    const pkg = JSON.parse(readFileSync(join(import.meta.dirname, '../../package.json'), 'utf8')) as { version: string };
    expect((await cli(['--version'])).stdout.trim()).toBe(`polebook ${pkg.version}`);
  });
  it('colour only on a terminal and never with NO_COLOR', async () => {
    const file = join(CORPUS, Object.keys(expected)[0]!);
    expect((await cli(['check', file], { isTTY: true })).stderr).toContain('\u001b[');
    expect((await cli(['check', file], { isTTY: true, env: { NO_COLOR: '1' } })).stderr).not.toContain('\u001b[');
    expect((await cli(['check', file], { isTTY: false })).stderr).not.toContain('\u001b[');
  });
});
