// A word too wide for its line breaks after one of its no-break spaces rather than between two
// letters (src/report/pdf/whole-words.ts): the rule on made-up words, then a narrow column drawn
// by pdfmake and read back with pdfjs-dist (a reader outside the project), before and after.
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions } from 'pdfmake/interfaces.js';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { FONT_SANS, fontDictionary, fontFiles, isAllowedLocalFile } from '../../src/report/pdf/fonts.ts';
import { breakTooWideWordsAtNoBreakSpaces, splitTooWide, type MeasuredWord } from '../../src/report/pdf/whole-words.ts';
import { readPdfText } from '../support/pdf-text.ts';

const NB = '\u00a0';
const width = (text: string) => 5 * text.length;

describe('splitTooWide', () => {
  const word = (text: string, extra: Partial<MeasuredWord> = {}): MeasuredWord => ({ text, width: width(text), trailingCut: /\s$/.test(text) ? 5 : 0, ...extra });
  it('leaves a word that fits, or one without a no-break space', () => {
    const fits = word(`1.5${NB}×${NB}10⁶ `);
    expect(splitTooWide(fits, 100, width)).toEqual([fits]);
    const long = word('HV-TS-2210-NE-NORTH-EAST');
    expect(splitTooWide(long, 20, width)).toEqual([long]);
  });
  it('splits a word too wide after each no-break space, measuring each part', () => {
    const parts = splitTooWide(word(`50.89${NB}×${NB}10⁻⁶ `, { leadingCut: 1, lineEnd: true, color: '#000' }), 40, width);
    expect(parts.map((p) => p.text)).toEqual([`50.89${NB}`, `×${NB}`, '10⁻⁶ ']);
    expect(parts.map((p) => p.width)).toEqual([30, 10, 25]);
    // The trailing space of each part is cut at a line end, as pdfmake cuts a space.
    expect(parts.map((p) => p.trailingCut)).toEqual([5, 5, 5]);
    expect(parts.map((p) => p.leadingCut)).toEqual([1, 0, 0]);
    expect(parts.map((p) => p.lineEnd === true)).toEqual([false, false, true]);
    expect(parts.every((p) => p.color === '#000')).toBe(true);
  });
});

describe('a quantity in a column narrower than it', () => {
  const require = createRequire(import.meta.url);
  const PDFDocument = require('pdfkit') as new (opts: object) => { font(path: string): unknown; fontSize(s: number): unknown; widthOfString(s: string): number };
  const quantity = `50.89${NB}×${NB}10⁻⁶ kip·ft`;
  // The column: wider than "50.89 × " and "10⁻⁶ kip·ft", narrower than "50.89 × 10⁻⁶".
  const pdfkit = new PDFDocument({ autoFirstPage: false });
  pdfkit.font(fontFiles().regular);
  pdfkit.fontSize(8.5);
  const column = (pdfkit.widthOfString(`50.89${NB}×${NB}10⁻⁶`) + pdfkit.widthOfString(`50.89${NB}×`)) / 2;
  const definition = (): TDocumentDefinitions => ({
    pageSize: { width: column + 20, height: 120 },
    pageMargins: [10, 10, 10, 10],
    defaultStyle: { font: FONT_SANS, fontSize: 8.5 },
    info: { creationDate: new Date(Date.UTC(2026, 0, 1)), modDate: new Date(Date.UTC(2026, 0, 1)) },
    content: [{ text: quantity }],
  }) as TDocumentDefinitions;
  const lines = async () => (await readPdfText(await pdfmake.createPdf(definition()).getBuffer())).pages[0]!.split('\n').map((l) => l.trim()).filter((l) => l !== '');

  it('is cut inside its power of ten by pdfmake alone, and after "×" with the adjustment', async () => {
    pdfmake.setUrlAccessPolicy(() => false);
    pdfmake.setLocalAccessPolicy(isAllowedLocalFile);
    pdfmake.setFonts(fontDictionary());
    const before = (await readPdfText(await pdfmake.createPdf(definition()).getBuffer())).pages[0]!;
    // pdfmake alone fills the first line with as many letters as fit: a piece of "10⁻⁶" ends it.
    expect(before.split('\n')[0]!.trim()).toMatch(/^50\.89 × [10⁻⁶]+$/);
    breakTooWideWordsAtNoBreakSpaces();
    expect(await lines()).toEqual(['50.89 ×', '10⁻⁶ kip·ft']);
  });
});
