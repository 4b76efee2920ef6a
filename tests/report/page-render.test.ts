// Pages rendered to images by poppler's pdftoppm (a renderer outside the project): every page of
// the fixture package draws ink in its body, not only its running header and footer. Skipped, with
// a message, where poppler-utils is not installed (CI installs it; the text tests need only Node).
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { renderPdf } from '../../src/report/pdf/render-pdf.ts';
import { buildDocument } from '../../src/report/sections/build-document.ts';
import { readPdfText } from '../support/pdf-text.ts';
import { FIXTURE_LOADED } from './fixture-design.ts';
import { demoStepsSection } from './fixture-extra.ts';

const HAS_PDFTOPPM = spawnSync('pdftoppm', ['-v'], { encoding: 'utf8' }).error === undefined;
if (!HAS_PDFTOPPM) console.warn('page-render tests skipped: pdftoppm (poppler-utils) is not installed; apt-get install poppler-utils to run them');

interface Gray {
  readonly width: number;
  readonly height: number;
  readonly pixels: Uint8Array;
}

/** A binary PGM (P5, 8 bit), as pdftoppm -gray writes it. */
function readPgm(buf: Buffer): Gray {
  const m = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(buf.subarray(0, 64).toString('latin1'));
  if (!m) throw new Error('not an 8-bit binary PGM');
  const width = Number(m[1]);
  const height = Number(m[2]);
  return { width, height, pixels: buf.subarray(m[0].length, m[0].length + width * height) };
}

/** Share of dark pixels between 12 % and 88 % of the page height (below the header, above the footer). */
function bodyInk(g: Gray): number {
  let dark = 0;
  const top = Math.floor(0.12 * g.height);
  const bottom = Math.ceil(0.88 * g.height);
  for (let y = top; y < bottom; y++) for (let x = 0; x < g.width; x++) if (g.pixels[y * g.width + x]! < 160) dark++;
  return dark / ((bottom - top) * g.width);
}

describe.skipIf(!HAS_PDFTOPPM)('pages rendered by pdftoppm (poppler-utils)', () => {
  let pages: Gray[] = [];
  let pageCount = 0;

  beforeAll(async () => {
    const pdf = await renderPdf(buildDocument(FIXTURE_LOADED, { sections: [demoStepsSection()] }));
    pageCount = (await readPdfText(pdf)).pageCount;
    const dir = mkdtempSync(join(tmpdir(), 'polebook-render-'));
    try {
      writeFileSync(join(dir, 'p.pdf'), pdf);
      execFileSync('pdftoppm', ['-gray', '-r', '24', join(dir, 'p.pdf'), join(dir, 'page')]);
      pages = readdirSync(dir)
        .filter((f) => f.endsWith('.pgm'))
        .sort()
        .map((f) => readPgm(readFileSync(join(dir, f))));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000);

  it('renders every page', () => {
    expect(pages.length).toBe(pageCount);
    expect(pageCount).toBeGreaterThan(5);
  });

  it('no page is blank below its header: each draws some ink in its body', () => {
    // a page holding only the running header and footer draws nothing between them; the least
    // body text (a heading and a line or two) is well above a thousandth of the area in ink
    const blank = pages.map((g, k) => ({ page: k + 1, ink: bodyInk(g) })).filter((p) => p.ink < 1e-3);
    expect(blank).toEqual([]);
  });
});
