// Label placement of the free-body figures: a label's reserved box is as wide as the text drawn,
// measured by pdfkit's own widthOfString for the embedded face (an outside measure), bold or not.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { LABEL_SIZE, placeLabel } from '../../src/report/figures/label-place.ts';
import { fontFiles } from '../../src/report/pdf/fonts.ts';

const require = createRequire(import.meta.url);
const PDFDocument = require('pdfkit') as new (opts: object) => { font(path: string): unknown; fontSize(s: number): unknown; widthOfString(s: string): number };

function pdfkitWidth(text: string, bold: boolean): number {
  const doc = new PDFDocument({ autoFirstPage: false });
  doc.font(bold ? fontFiles().bold : fontFiles().regular);
  doc.fontSize(LABEL_SIZE);
  return doc.widthOfString(text);
}

describe('placeLabel', () => {
  const bounds = [0, 0, 400, 300] as const;
  for (const bold of [false, true]) {
    it(`reserves the width of the ${bold ? 'bold' : 'regular'} text it draws (plus 1 pt each side)`, () => {
      const text = 'M 154.9 kip·ft';
      const { box } = placeLabel([], 100, 100, text, bounds, 7, bold);
      // Round-off of the two measures only: 1e-6 pt.
      expect(box[2] - box[0] - 2).toBeCloseTo(pdfkitWidth(text, bold), 6);
    });
  }
});
