// setRootSize changes the root element's size only; the drawing stays byte for byte.
import { describe, expect, it } from 'vitest';
import { setRootSize } from '../../src/report/pdf/svg-size.ts';

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
