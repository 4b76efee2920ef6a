// polebook compare through the compiled command, as a user runs it: the comparison PDF carries
// the caution and the picks (text read back by poppler's pdftotext, an outside tool), two runs
// give the same bytes, and two worker threads give exactly what one thread gives.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '../..');
const BIN = join(ROOT, 'dist/src/cli/main.js');
const dir = mkdtempSync(join(tmpdir(), 'polebook-cmp-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const hasPoppler = spawnSync('pdftotext', ['-v']).status === 0;

function compare(out: string, extra: string[]) {
  return spawnSync(process.execPath, [BIN, 'compare', join(ROOT, 'examples/luminaire-twin.yaml'), '--vary', 'A1.length+L1.position=2.5..4:0.5 m', '--out', out, ...extra], {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', SOURCE_DATE_EPOCH: '1767225600' },
  });
}

const OUTS = ['luminaire-twin.comparison.csv', 'luminaire-twin.comparison.json', 'luminaire-twin.comparison.pdf'];
let one: ReturnType<typeof compare>;
beforeAll(() => {
  if (!existsSync(BIN)) throw new Error('dist/ is missing: run `npm run build` (npm test does it) before the tests');
  one = compare(join(dir, 'one'), ['--workers', '1']);
}, 120_000);

describe('polebook compare (compiled command)', () => {
  it('exits 0 (an alternative passes), lists every alternative on stdout and names the picks', () => {
    expect(one.status).toBe(0);
    expect(one.stdout.trim().split('\n')).toHaveLength(4 + 2);
    expect(one.stdout).toMatch(/lightest passing: no\. 1, A1\.length\+L1\.position = 2\.5 m/);
    expect(one.stdout).toMatch(/longest passing arm A1: no\. 3, A1\.length\+L1\.position = 3\.5 m/);
    expect(one.stdout).toMatch(/4 {2}A1\.length\+L1\.position = 4 m: FAILS, governing ratio 1\.31 \(arm tip vertical deflection, dead load\)/);
    expect(readdirSync(join(dir, 'one')).sort()).toEqual(OUTS);
    expect(one.stderr).not.toMatch(/WARN|error/i);
  });

  it('two worker threads and two runs give the same bytes as one thread', () => {
    const two = compare(join(dir, 'two'), ['--workers', '2', '--quiet']);
    expect(two.status).toBe(0);
    expect(two.stderr).toBe('');
    for (const f of OUTS) expect(readFileSync(join(dir, 'two', f)).equals(readFileSync(join(dir, 'one', f)))).toBe(true);
  }, 120_000);

  it('--packages writes each alternative\u2019s input, package and JSON results', () => {
    const r = compare(join(dir, 'pk'), ['--packages', '--quiet']);
    expect(r.status).toBe(0);
    const files = readdirSync(join(dir, 'pk'));
    for (const k of ['1', '2', '3', '4']) {
      expect(files).toContain(`luminaire-twin.alt-0${k}.yaml`);
      expect(files).toContain(`luminaire-twin.alt-0${k}.pdf`);
      expect(files).toContain(`luminaire-twin.alt-0${k}.results.json`);
    }
    // The alternative's input builds on its own to the same package bytes.
    const b = spawnSync(process.execPath, [BIN, 'build', join(dir, 'pk', 'luminaire-twin.alt-02.yaml'), '--out', join(dir, 'pk-single')], { encoding: 'utf8', env: { ...process.env, SOURCE_DATE_EPOCH: '1767225600' } });
    expect(b.status).toBe(0);
    expect(readFileSync(join(dir, 'pk-single', 'luminaire-twin.alt-02.pdf')).equals(readFileSync(join(dir, 'pk', 'luminaire-twin.alt-02.pdf')))).toBe(true);
  }, 180_000);

  it.skipIf(!hasPoppler)('the comparison PDF carries the caution, what was varied, the picks and the marks', () => {
    const text = execFileSync('pdftotext', ['-layout', join(dir, 'one', 'luminaire-twin.comparison.pdf'), '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text.replace(/ /g, '')).toContain('COMPARISONOFALTERNATIVES'); // letter-spaced title
    expect(text).toContain('DRAFT FOR REVIEW');
    expect(text).toContain('licensed professional engineer');
    expect(text).toContain('it is not a calculation package and it is not for construction');
    expect(text).toContain('A1.length+L1.position');
    expect(text).toMatch(/Lightest alternative that passes every check: no\. 1/);
    expect(text).toMatch(/Longest arm that passes: arm A1 of 3\.5 m/);
    expect(text).toContain('Governing ratio against A1.length+L1.position (m)');
    expect(text).toMatch(/4 ?✗ 4 ?m FAILS 1\.31 /);
    expect(text).toMatch(/1 ?★/);
  });

  it('leaves no near-empty page in the comparison PDF: its short sections run on (read in-process)', async () => {
    const { text } = await import('../support/pdf-text.ts').then(async (m) => ({ text: await m.readPdfText(readFileSync(join(dir, 'one', 'luminaire-twin.comparison.pdf'))) }));
    // Fewer than 6 lines of body text (header and footer aside) on a page without a chart is near-empty (common practice for us: an eighth of a page).
    const sparse = text.pages
      .map((page, k) => ({ page: k + 1, body: page.split('\n').filter((l) => l.trim() !== '').slice(1, -1) }))
      .filter(({ body }) => body.length < 6 && !body.some((l) => /^Figure \d+\.\d+/.test(l)))
      .map(({ page, body }) => `page ${page}: ${body.length} lines`);
    expect(sparse).toEqual([]);
    // The contents share their page with the first section.
    expect(text.pages[1]).toMatch(/Contents[\s\S]*1 {1,2}What was compared/);
  });
});
