// Joining a line's laid-out words before pdfmake draws them (src/report/pdf/join-inlines.ts): the
// rules on made-up lines, then a page of paragraphs (left, justified, right, letter-spaced,
// superscripts, a link, a table) drawn by pdfmake without and with the joining: the same text as
// read by pdfjs-dist, fewer text operators, and, where poppler is installed, the same picture as
// rendered by pdftoppm (a renderer outside the project).
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions } from 'pdfmake/interfaces.js';
import { beforeAll, describe, expect, it } from 'vitest';
import { FONT_SANS, fontDictionary, isAllowedLocalFile } from '../../src/report/pdf/fonts.ts';
import { joinLineWords, joinWordsAfterLayout, type LaidOutLine, type LaidOutWord } from '../../src/report/pdf/join-inlines.ts';
import { readPdfText } from '../support/pdf-text.ts';

const HAS_PDFTOPPM = spawnSync('pdftoppm', ['-v'], { encoding: 'utf8' }).error === undefined;
if (!HAS_PDFTOPPM) console.warn('join-inlines picture test skipped: pdftoppm (poppler-utils) is not installed; apt-get install poppler-utils to run it');

const FONT = { name: 'regular' };
const word = (text: string, x: number, width: number, extra: Partial<LaidOutWord> = {}): LaidOutWord => ({ text, x, width, height: 10, font: FONT, fontSize: 9, color: '#000', opacity: 1, characterSpacing: 0, sup: false, sub: false, ...extra });
const texts = (line: LaidOutLine) => line.inlines.map((w) => w.text);

describe('joinLineWords', () => {
  it('joins touching words that look alike, from the first word on', () => {
    const line: LaidOutLine = { inlines: [word('The ', 0, 20), word('pole ', 20, 22), word('top', 42, 15)] };
    joinLineWords(line);
    expect(texts(line)).toEqual(['The pole top']);
    expect(line.inlines[0]!.x).toBe(0);
    expect(line.inlines[0]!.width).toBe(57);
  });
  it('keeps apart words with a gap (justified), another colour, size, face, a baseline shift or letter spacing', () => {
    const cases: [LaidOutWord, LaidOutWord][] = [
      [word('a ', 0, 10), word('b', 12, 5)],
      [word('a ', 0, 10), word('b', 10, 5, { color: '#a3161b' })],
      [word('a ', 0, 10), word('b', 10, 5, { fontSize: 8 })],
      [word('a ', 0, 10), word('b', 10, 5, { font: { name: 'bold' } })],
      [word('10 ', 0, 10), word('6', 10, 5, { sup: true })],
      [word('A ', 0, 10, { characterSpacing: 1.5 }), word('B', 10, 5, { characterSpacing: 1.5 })],
    ];
    for (const [a, b] of cases) {
      const line: LaidOutLine = { inlines: [a, b] };
      joinLineWords(line);
      expect(texts(line)).toEqual([a.text, b.text]);
    }
  });
  it('keeps apart a word that does not end in a space (a break inside "HV-TS") and words with a link or page reference', () => {
    for (const inlines of [
      [word('HV-', 0, 12), word('TS', 12, 10)],
      [word('see ', 0, 15), word('page', 15, 18, { link: 'https://example.org' })],
      [word('page ', 0, 15, { _pageRef: {} }), word('3', 15, 5)],
    ]) {
      const line: LaidOutLine = { inlines };
      joinLineWords(line);
      expect(line.inlines).toHaveLength(2);
    }
    const referenced: LaidOutLine = { inlines: [word('Loads ', 0, 20), word('12', 20, 8)], _pageNodeRef: {} };
    joinLineWords(referenced);
    expect(referenced.inlines).toHaveLength(2);
  });
  it('does not change the words it joins', () => {
    const a = word('a ', 0, 10);
    joinLineWords({ inlines: [a, word('b', 10, 5)] });
    expect(a.text).toBe('a ');
    expect(a.width).toBe(10);
  });
});

const PARAGRAPH = 'The pole is a tapered steel tube fixed at its base; the mast arm is cantilevered from a rigid joint near the top. Wind on the sign panel bends the arm about its vertical axis and twists the pole. ';

function definition(): TDocumentDefinitions {
  return {
    pageSize: 'LETTER',
    compress: false,
    defaultStyle: { font: FONT_SANS, fontSize: 9.5, lineHeight: 1.15 },
    info: { creationDate: new Date(Date.UTC(2026, 0, 1)), modDate: new Date(Date.UTC(2026, 0, 1)) },
    content: [
      { text: 'CALCULATION PACKAGE', characterSpacing: 2, bold: true, fontSize: 10 },
      { text: PARAGRAPH.repeat(3) },
      { text: PARAGRAPH.repeat(2), alignment: 'justify', margin: [0, 6, 0, 0] },
      { text: 'Right-aligned: 23.39 × 10⁶ mm⁴ and HV-TS-2210-NE', alignment: 'right' },
      { text: ['Moment of inertia 23.39 × 10', { text: '6', sup: true }, ' mm', { text: '4', sup: true }, ' at the base; ', { text: 'bold words here', bold: true }, ' and ', { text: 'a link', link: 'https://example.org/' }, ' follow.'] },
      { table: { headerRows: 1, body: [['Member', 'Quantity', 'Value'], ['pole', 'Resultant moment Mres, largest', '99.35 kip·ft'], ['arm SA', 'Torque T, most negative', '-2.975 kip·ft']] } },
    ],
  } as TDocumentDefinitions;
}

const render = (): Promise<Buffer> => pdfmake.createPdf(definition()).getBuffer();
const textOperators = (pdf: Buffer) => (pdf.toString('latin1').match(/\] TJ|\) Tj|> Tj/g) ?? []).length;

describe('a page drawn without and with the joining', () => {
  let apart: Buffer;
  let joined: Buffer;
  beforeAll(async () => {
    pdfmake.setUrlAccessPolicy(() => false);
    pdfmake.setLocalAccessPolicy(isAllowedLocalFile);
    pdfmake.setFonts(fontDictionary());
    apart = await render();
    joinWordsAfterLayout();
    joined = await render();
  }, 60_000);

  it('draws fewer pieces of text', () => {
    expect(textOperators(joined)).toBeLessThan(0.6 * textOperators(apart));
  });

  it('reads the same text (pdfjs-dist)', async () => {
    const [a, b] = await Promise.all([readPdfText(apart), readPdfText(joined)]);
    expect(b.pageCount).toBe(a.pageCount);
    expect(b.pages).toEqual(a.pages);
  });

  it.skipIf(!HAS_PDFTOPPM)('renders the same picture (pdftoppm at 100 dpi: only anti-aliasing of positions rounded in the PDF may differ)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-join-'));
    try {
      const gray = (pdf: Buffer, name: string) => {
        writeFileSync(join(dir, `${name}.pdf`), pdf);
        execFileSync('pdftoppm', ['-gray', '-r', '100', '-singlefile', join(dir, `${name}.pdf`), join(dir, name)]);
        const buf = readFileSync(join(dir, `${name}.pgm`));
        const m = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(buf.subarray(0, 64).toString('latin1'))!;
        return buf.subarray(m[0].length);
      };
      const a = gray(apart, 'apart');
      const b = gray(joined, 'joined');
      expect(b.length).toBe(a.length);
      let differing = 0;
      for (let k = 0; k < a.length; k++) if (Math.abs(a[k]! - b[k]!) > 48) differing++;
      // A glyph moved by a whole pixel would change hundreds of pixels of its line.
      expect(differing).toBeLessThan(0.0005 * a.length);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
