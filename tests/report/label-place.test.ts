// Label placement of the free-body figures: a label's reserved box is as wide as the text drawn,
// measured by pdfkit's own widthOfString for the embedded face (an outside measure), bold or not.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { LABEL_SIZE, overlaps, placeLabel, placeLabelNear, type Rect } from '../../src/report/figures/label-place.ts';
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

// Distance from an anchor to the nearest point of a box, as the placement measures it.
const gap = (x: number, y: number, b: Rect) => Math.hypot(Math.max(b[0] - x, 0, x - b[2]), Math.max(b[1] - y, 0, y - b[3]));

describe('placeLabelNear', () => {
  const bounds: Rect = [0, 0, 400, 300];
  it('puts a label on free paper right beside its anchor (2 to 4 units off, the grid being 2 units)', () => {
    const { box } = placeLabelNear([], 200, 150, 'V 1.23 kip', bounds);
    expect(gap(200, 150, box)).toBeGreaterThanOrEqual(2);
    expect(gap(200, 150, box)).toBeLessThan(4);
  });
  it('keeps off what is reserved, inside the figure, and as near as the free paper allows', () => {
    // A wall of reserved squares around the anchor out to 20 units, open nowhere.
    const taken: Rect[] = [[170, 130, 230, 170]];
    const { box } = placeLabelNear(taken, 200, 150, 'N 4.5 kip', bounds);
    expect(overlaps(box, [170, 130, 230, 170])).toBe(false);
    expect(box[0] >= 0 && box[1] >= 0 && box[2] <= 400 && box[3] <= 300).toBe(true);
    // The nearest free point is 20 units off (the wall's edge); the label is within a grid step of it.
    expect(gap(200, 150, box)).toBeGreaterThanOrEqual(20);
    expect(gap(200, 150, box)).toBeLessThan(20 + 2 * Math.SQRT2 + 1e-9);
    // The box is reserved for the next label.
    expect(taken.at(-1)).toEqual(box);
  });
  it('is not moved by anything reserved beyond its reach', () => {
    const alone = placeLabelNear([], 100, 100, 'M 9.9 kip·ft', bounds);
    const far: Rect[] = [[300, 250, 310, 260], [0, 280, 400, 300]];
    const withFar = placeLabelNear(far, 100, 100, 'M 9.9 kip·ft', bounds);
    expect(withFar.box).toEqual(alone.box);
  });
  it('stays inside the figure when its anchor is at the edge', () => {
    const { box } = placeLabelNear([], 398, 2, 'T 0.5 kip·ft', bounds);
    expect(box[0] >= 0 && box[1] >= 0 && box[2] <= 400 && box[3] <= 300).toBe(true);
  });
});
