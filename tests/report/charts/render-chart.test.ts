// The vega-lite chart renderer: same specification, same bytes; text measured as the PDF draws it.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import type { TopLevelSpec } from 'vega-lite';
import { measureText, renderChartSvg } from '../../../src/report/charts/index.ts';
import { fontFiles } from '../../../src/report/pdf/fonts.ts';

const require = createRequire(import.meta.url);

const spec = {
  data: { values: [{ x: -2, y: -1500 }, { x: 0, y: 200 }, { x: 3, y: 1800 }] },
  layer: [
    { mark: { type: 'line', point: true }, encoding: { x: { field: 'x', type: 'quantitative', title: 'Arm length (ft)' }, y: { field: 'y', type: 'quantitative', title: 'Base moment (kip·ft)' } } },
    { mark: { type: 'rule', strokeDash: [4, 3] }, encoding: { y: { datum: 1000 } } },
  ],
} as TopLevelSpec;

describe('renderChartSvg', () => {
  it('gives the same bytes for the same specification, also after another chart', async () => {
    const a = await renderChartSvg(spec, { width: 300, height: 160 });
    await renderChartSvg({ ...spec, title: 'another chart in between' } as TopLevelSpec, { width: 200, height: 100 });
    const b = await renderChartSvg(spec, { width: 300, height: 160 });
    expect(b).toBe(a);
    expect(a.startsWith('<svg')).toBe(true);
  });

  it('prints negative axis labels with a hyphen-minus, never U+2212', async () => {
    const svg = await renderChartSvg(spec, { width: 300, height: 160 });
    expect(svg).toMatch(/>-1,000</);
    expect(svg).not.toContain('\u2212');
    expect(svg).toContain('font-family="DejaVuSans"');
  });

  it('sizes the plotting area as asked (the SVG adds the axes around it)', async () => {
    const svg = await renderChartSvg(spec, { width: 300, height: 160 });
    // The frame of the plotting area is drawn as a 300 x 160 path.
    expect(svg).toContain('h300v160h-300Z');
  });
});

describe('measureText', () => {
  // Independent of our measure: pdfkit's own widthOfString for the same embedded font, which is
  // how the PDF lays out text. The widths must agree to round-off.
  const PDFDocument = require('pdfkit') as new (opts: object) => { font(path: string): unknown; fontSize(s: number): unknown; widthOfString(s: string): number };
  const cases = ['Arm length (ft)', 'Base moment (kip·ft)', '-1,250.5', 'δ ≤ L/40', 'WMW iii'];
  for (const text of cases) {
    it(`measures "${text}" as pdfkit does with DejaVu Sans at 8.5 pt`, () => {
      const doc = new PDFDocument({ autoFirstPage: false });
      doc.font(fontFiles().regular);
      doc.fontSize(8.5);
      expect(measureText({ fontSize: 8.5 }, text)).toBeCloseTo(doc.widthOfString(text), 6);
    });
  }
  it('measures bold with the bold face (wider than regular)', () => {
    const doc = new PDFDocument({ autoFirstPage: false });
    doc.font(fontFiles().bold);
    doc.fontSize(10);
    expect(measureText({ fontSize: 10, fontWeight: 'bold' }, 'Governing ratio')).toBeCloseTo(doc.widthOfString('Governing ratio'), 6);
    expect(measureText({ fontSize: 10, fontWeight: 'bold' }, 'Governing ratio')).toBeGreaterThan(measureText({ fontSize: 10 }, 'Governing ratio'));
  });
  it('is far narrower than vega\u2019s canvas-free guess of 0.8 em per character (the reason it exists)', () => {
    // DejaVu Sans digits are 0.636 em wide (from memory: 1303/2048 font units); vega guesses 0.8 em.
    expect(measureText({ fontSize: 10 }, '0123456789')).toBeCloseTo(100 * 1303 / 2048, 3);
  });
});
