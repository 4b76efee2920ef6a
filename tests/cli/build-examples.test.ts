// `polebook build` on every bundled example, through the compiled command (as a user runs it):
// the PDF's text (extracted by poppler's pdftotext, an outside tool) holds the caution, the
// structure id and "page N of M" on every page; two builds give the same bytes.
import { describe, expect, it, beforeAll } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { parse } from 'yaml';

const ROOT = join(import.meta.dirname, '../..');
const BIN = join(ROOT, 'dist/src/cli/main.js');
const EXAMPLES = readdirSync(join(ROOT, 'examples')).filter((f) => /\.ya?ml$/.test(f)).sort();

function build(example: string, out: string, env: Record<string, string> = {}) {
  return spawnSync(process.execPath, [BIN, 'build', join(ROOT, 'examples', example), '--out', out, '--json'], {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', ...env },
  });
}

function pdfPages(pdf: string): string[] {
  const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
  return text.split('\f').filter((p) => p.trim() !== '');
}

function pageCount(pdf: string): number {
  const info = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
  return Number(/Pages:\s+(\d+)/.exec(info)![1]);
}

beforeAll(() => {
  if (!existsSync(BIN)) throw new Error('dist/ is missing: run `npm run build` (npm test does it) before the tests');
});

describe.each(EXAMPLES)('polebook build examples/%s', (example) => {
  const stem = example.replace(/\.ya?ml$/, '');
  const structureId = String((parse(readFileSync(join(ROOT, 'examples', example), 'utf8')) as { project: { structureId: string } }).project.structureId);
  let out = '';

  beforeAll(() => {
    out = mkdtempSync(join(tmpdir(), `polebook-${stem}-`));
    const run = build(example, out);
    expect(run.stderr).not.toMatch(/error/i);
    expect(run.status).toBeLessThanOrEqual(1); // 1 would be a failing design check, still a package
  });

  it('writes the PDF and the JSON results', () => {
    expect(readdirSync(out).sort()).toEqual([`${stem}.pdf`, `${stem}.results.json`]);
    const json = JSON.parse(readFileSync(join(out, `${stem}.results.json`), 'utf8')) as { format: string; input: { structureId: string } };
    expect(json.format).toBe('polebook-results');
    expect(json.input.structureId).toBe(structureId);
  });

  it('carries the caution, and the structure id and "page N of M" on every page', () => {
    const pdf = join(out, `${stem}.pdf`);
    const pages = pdfPages(pdf);
    const m = pageCount(pdf);
    expect(pages.length).toBe(m);
    const all = pages.join('\n').replace(/\s+/g, ' ');
    expect(all).toMatch(/draft for review/i);
    expect(all).toMatch(/licensed professional engineer/i);
    expect(all).toMatch(/governing (design )?code/i);
    pages.forEach((page, k) => {
      expect(page, `page ${k + 1}`).toContain(structureId);
      expect(page, `page ${k + 1}`).toContain(`page ${k + 1} of ${m}`);
    });
  });

  it('keeps every word inside the page margins (nothing cut off at the right edge)', () => {
    // Word boxes from poppler's pdftotext -bbox; the layout leaves 56 pt margins left and right.
    const pdf = join(out, `${stem}.pdf`);
    const html = execFileSync('pdftotext', ['-bbox', pdf, '-'], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
    const pages = html.split('<page ').slice(1);
    const outside: string[] = [];
    pages.forEach((page, k) => {
      const width = Number(/width="([\d.]+)"/.exec(page)![1]);
      for (const m of page.matchAll(/<word xMin="([\d.]+)" yMin="[\d.]+" xMax="([\d.]+)" yMax="[\d.]+">([^<]*)<\/word>/g)) {
        if (Number(m[1]) < 56 - 2 || Number(m[2]) > width - 56 + 2) outside.push(`page ${k + 1}: '${m[3]}' at x ${m[1]}..${m[2]} of ${width}`);
      }
    });
    expect(outside).toEqual([]);
  });

  it('gives the same bytes on a second build, in another time zone and locale', () => {
    const again = mkdtempSync(join(tmpdir(), `polebook-${stem}-again-`));
    build(example, again, { TZ: 'Pacific/Chatham', LANG: 'de_DE.UTF-8', LC_ALL: 'de_DE.UTF-8' });
    expect(readFileSync(join(again, `${stem}.pdf`)).equals(readFileSync(join(out, `${stem}.pdf`)))).toBe(true);
    expect(readFileSync(join(again, `${stem}.results.json`), 'utf8')).toBe(readFileSync(join(out, `${stem}.results.json`), 'utf8'));
  });
});
