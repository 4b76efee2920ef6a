// `polebook build` on every bundled example, through the compiled command (as a user runs it):
// the PDF's text (read in-process by pdfjs-dist, a PDF reader outside the project) holds the
// caution, the structure id and "page N of M" on every page; two builds give the same bytes.
import { describe, expect, it, beforeAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { parse } from 'yaml';
import { readPdfText, type PdfText } from '../support/pdf-text.ts';

const ROOT = join(import.meta.dirname, '../..');
const BIN = join(ROOT, 'dist/src/cli/main.js');
const EXAMPLES = readdirSync(join(ROOT, 'examples')).filter((f) => /\.ya?ml$/.test(f)).sort();

function build(example: string, out: string, env: Record<string, string> = {}) {
  return spawnSync(process.execPath, [BIN, 'build', join(ROOT, 'examples', example), '--out', out, '--json'], {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', ...env },
  });
}

beforeAll(() => {
  if (!existsSync(BIN)) throw new Error('dist/ is missing: run `npm run build` (npm test does it) before the tests');
});

describe.each(EXAMPLES)('polebook build examples/%s', (example) => {
  const stem = example.replace(/\.ya?ml$/, '');
  const structureId = String((parse(readFileSync(join(ROOT, 'examples', example), 'utf8')) as { project: { structureId: string } }).project.structureId);
  let out = '';
  let text: PdfText;

  beforeAll(async () => {
    out = mkdtempSync(join(tmpdir(), `polebook-${stem}-`));
    const run = build(example, out);
    expect(run.stderr).not.toMatch(/error/i);
    expect(run.status).toBeLessThanOrEqual(1); // 1 would be a failing design check, still a package
    text = await readPdfText(readFileSync(join(out, `${stem}.pdf`)));
  }, 120_000);

  it('writes the PDF and the JSON results', () => {
    expect(readdirSync(out).sort()).toEqual([`${stem}.pdf`, `${stem}.results.json`]);
    const json = JSON.parse(readFileSync(join(out, `${stem}.results.json`), 'utf8')) as { format: string; input: { structureId: string } };
    expect(json.format).toBe('polebook-results');
    expect(json.input.structureId).toBe(structureId);
  });

  it('carries the caution, and the structure id and "page N of M" on every page', () => {
    const { pages, pageCount: m } = text;
    expect(pages.length).toBe(m);
    expect(m).toBeGreaterThan(5);
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
    // Text runs with their positions from pdfjs; the layout leaves 56 pt margins left and right.
    const outside: string[] = [];
    text.words.forEach((words, k) => {
      const width = text.sizes[k][0];
      for (const w of words) {
        if (w.x < 56 - 2 || w.x + w.width > width - 56 + 2) outside.push(`page ${k + 1}: '${w.str}' at x ${w.x.toFixed(1)}..${(w.x + w.width).toFixed(1)} of ${width}`);
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
