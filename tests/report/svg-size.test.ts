// setRootSize changes the root element's size only; the drawing stays byte for byte. rootSize
// reads the size pdfmake's own measureSVG reads (checked against that function, which parses the
// whole document).
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { rootSize, setRootSize } from '../../src/report/pdf/svg-size.ts';
import { renderChartSvg } from '../../src/report/charts/index.ts';

const require = createRequire(import.meta.url);
const SVGMeasure = (require('pdfmake/js/SVGMeasure.js') as { default: new () => { measureSVG(svg: string): { width?: number; height?: number } } }).default;

describe('setRootSize', () => {
  it('adds a viewBox from the old size, sets the new size, keeps the children verbatim', () => {
    const body = '<text x="1" y="9">F<tspan dy="2">x</tspan> = 3</text>';
    const out = setRootSize(`<svg xmlns="http://www.w3.org/2000/svg" width="40" height="20">${body}</svg>`, 120, 60);
    expect(out).toBe(`<svg viewBox="0 0 40 20" xmlns="http://www.w3.org/2000/svg" width="120" height="60">${body}</svg>`);
  });

  it('keeps an existing viewBox', () => {
    const out = setRootSize("<svg width='10pt' height='5pt' viewBox='0 0 100 50'><g/></svg>", 30, 15);
    expect(out).toBe("<svg viewBox='0 0 100 50' width=\"30\" height=\"15\"><g/></svg>");
  });

  it('refuses text that is not an SVG document', () => {
    expect(() => setRootSize('<div/>', 1, 1)).toThrow(/not an SVG/);
  });
});

describe('rootSize', () => {
  const pdfmakeSize = (svg: string) => new SVGMeasure().measureSVG(svg);
  const cases = [
    '<svg xmlns="http://www.w3.org/2000/svg" width="40" height="20"><g stroke-width="3"/></svg>',
    "<svg width='10pt' height='5pt' viewBox='0 0 100 50'><g/></svg>",
    '<svg viewBox="0 0 320 180"><rect width="5" height="6"/></svg>',
    '<svg height="75" viewBox="0,0,300,150"><g/></svg>',
    '<?xml version="1.0"?>\n<svg\n  width="12.5"\n  viewBox="0 0 25 40"><g/></svg>',
  ];
  for (const svg of cases) {
    it(`reads what pdfmake reads from ${JSON.stringify(svg.slice(0, 48))}`, () => {
      expect(rootSize(svg)).toEqual(pdfmakeSize(svg));
    });
  }
  it('reads what pdfmake reads from a vega chart', async () => {
    const svg = await renderChartSvg({ data: { values: [{ x: 0, y: 1 }, { x: 1, y: 3 }] }, mark: 'line', encoding: { x: { field: 'x', type: 'quantitative' }, y: { field: 'y', type: 'quantitative' } } }, { width: 200, height: 80 });
    expect(rootSize(svg)).toEqual(pdfmakeSize(svg));
  });
  it('refuses a viewBox without four numbers', () => {
    expect(() => rootSize('<svg viewBox="0 0 10"/>')).toThrow(/4 numbers/);
  });
});
