// The command line from a newcomer's first runs: -v, the commands listed, the date error naming
// every route to a date, status lines on stderr (stdout only what was asked for), warnings in
// their own colour, and `new` printing a command that works from where the user is.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, chmodSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { cli } from './run-cli.ts';

const ROOT = join(import.meta.dirname, '../..');
const dir = mkdtempSync(join(tmpdir(), 'polebook-newcomer-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const pkg = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string };

describe('polebook for a newcomer', () => {
  it('-v prints the version like --version', async () => {
    for (const flag of ['-v', '--version']) {
      const r = await cli([flag]);
      expect(r.code).toBe(0);
      expect(r.stdout).toBe(`polebook ${pkg.version}\n`);
    }
  });

  it('the help lists compare and index', async () => {
    const r = await cli(['--help']);
    expect(r.stdout).toMatch(/^ {2}compare /m);
    expect(r.stdout).toMatch(/^ {2}index /m);
    expect(r.stdout).toContain('--version, -v');
  });

  it('no date anywhere: the error names project.date, a revision date and SOURCE_DATE_EPOCH', async () => {
    const doc = parseDocument(readFileSync(join(ROOT, 'examples/luminaire-twin.yaml'), 'utf8'));
    doc.deleteIn(['project', 'date']);
    doc.deleteIn(['project', 'revisions']);
    const file = join(dir, 'undated.yaml');
    writeFileSync(file, doc.toString());
    const r = await cli(['check', file], { env: {} });
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/project\.date: no date for the package: give project\.date \(yyyy-mm-dd\), or a revision with a date \(project\.revisions\[\]\.date\), or set SOURCE_DATE_EPOCH/);
  });

  it('build: the summary on stdout, the status lines ("wrote") on stderr', async () => {
    const r = await cli(['build', join(ROOT, 'examples/luminaire-twin.yaml'), '--out', join(dir, 'out')], { env: { SOURCE_DATE_EPOCH: '1767225600' } });
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/verdict: every check made passes/);
    expect(r.stdout).not.toContain('wrote');
    expect(r.stderr).toContain(`wrote ${join(dir, 'out', 'luminaire-twin.pdf')}`);
  }, 60_000);

  it('on a terminal, a warning is yellow and an error red, also in one report', async () => {
    const doc = parseDocument(readFileSync(join(ROOT, 'examples/cantilever-sign.yaml'), 'utf8'));
    doc.setIn(['structure', 'pole', 'height'], 70); // beyond our 60 ft scope: a warning
    doc.setIn(['structure', 'arms', 0, 'attachHeight'], 68);
    doc.setIn(['attachments', 'panels', 1, 'position'], 40); // beyond the 36 ft arm: an error
    const file = join(dir, 'mixed.yaml');
    writeFileSync(file, doc.toString());
    const r = await cli(['check', file], { isTTY: true, env: { SOURCE_DATE_EPOCH: '1767225600' } });
    expect(r.code).toBe(2);
    const lines = r.stderr.split('\n');
    const warn = lines.find((l) => l.includes('taller than'));
    const err = lines.find((l) => l.includes('beyond the tip'));
    expect(warn!.startsWith('\u001b[33m')).toBe(true);
    expect(err!.startsWith('\u001b[31m')).toBe(true);
  });

  it('new: outside the checkout with no polebook on the PATH, it prints node with the full path', async () => {
    const r = await cli(['new', 'luminaire-pole', 'pole.yaml'], { cwd: dir, env: { PATH: '/nonexistent' } });
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
    const main = join(ROOT, 'dist', 'src', 'cli', 'main.js');
    expect(r.stderr).toContain(`Edit it, then: node ${main} check pole.yaml && node ${main} build pole.yaml`);
  });

  it('new: with this polebook on the PATH (npm link), it prints polebook', async () => {
    const bin = join(dir, 'bin');
    mkdirSync(bin);
    const main = join(ROOT, 'dist', 'src', 'cli', 'main.js');
    chmodSync(main, 0o755); // as npm link does for a bin
    symlinkSync(main, join(bin, 'polebook'));
    const r = await cli(['new', 'luminaire-pole', 'pole2.yaml'], { cwd: dir, env: { PATH: bin } });
    expect(r.stderr).toContain('Edit it, then: polebook check pole2.yaml && polebook build pole2.yaml');
  });

  it('new: inside the checkout, it prints npx polebook', async () => {
    const sub = mkdtempSync(join(ROOT, 'tmp-newcomer-'));
    try {
      const r = await cli(['new', 'luminaire-pole', 'p.yaml'], { cwd: sub, env: { PATH: '/nonexistent' } });
      expect(r.stderr).toContain('Edit it, then: npx polebook check p.yaml');
    } finally {
      rmSync(sub, { recursive: true, force: true });
    }
  });
});
