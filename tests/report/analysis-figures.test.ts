// The figures of the analysis sections for every bundled example: each SVG is well-formed
// (checked by a small XML reader in this folder), keeps to what the PDF renderer draws reliably
// (no mixed text and tspan, no markers: pdfmake's SVG support, measured on this machine), names the members and the
// attachments in the structure drawings, and comes out the same on a second build.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyseDesign } from '../../src/analyse-design.ts';
import { loadDesignFile } from '../../src/input/index.ts';
import type { Block } from '../../src/report/document.ts';
import { niceTicks, tickLabel } from '../../src/report/figures/axis-ticks.ts';
import { analysisSections } from '../../src/report/sections/analysis-sections.ts';
import { checkXml } from './xml-check.ts';

const ROOT = join(import.meta.dirname, '..', '..');
const EXAMPLES = readdirSync(join(ROOT, 'examples')).filter((f) => /\.ya?ml$/.test(f)).sort();

type Figure = Extract<Block, { kind: 'figure' }>;

function figuresOf(example: string): { figures: Figure[]; members: string[]; attachments: string[] } {
  const loaded = loadDesignFile(join(ROOT, 'examples', example), {});
  const analysis = analyseDesign(loaded.design, {});
  const sections = analysisSections(loaded, analysis);
  const figures = sections.flatMap((s) => s.blocks.filter((b): b is Figure => b.kind === 'figure'));
  return { figures, members: loaded.design.arms.map((a) => a.id), attachments: loaded.design.attachments.map((a) => a.id) };
}

describe.each(EXAMPLES)('figures of examples/%s', (example) => {
  const { figures, members, attachments } = figuresOf(example);

  it('every SVG is well-formed, sized, and uses only plain text runs and polygon arrowheads', () => {
    expect(figures.length).toBeGreaterThanOrEqual(5);
    for (const f of figures) {
      const xml = checkXml(f.svg);
      const root = xml.elements[0];
      expect(root.name, f.title).toBe('svg');
      expect(Number(root.attrs.width), f.title).toBeGreaterThan(0);
      expect(root.attrs.viewBox, f.title).toMatch(/^0 0 [\d.]+ [\d.]+$/);
      const names = new Set(xml.elements.map((e) => e.name));
      expect(names.has('tspan'), f.title).toBe(false);
      expect(names.has('marker'), f.title).toBe(false);
      for (const e of xml.elements.filter((x) => x.name === 'text')) expect(e.attrs['font-family']).toBe('DejaVuSans');
      // no coordinate is NaN or written with an exponent
      expect(f.svg, f.title).not.toMatch(/NaN|Infinity|\d[eE][-+]?\d/);
    }
  });

  it('the elevation and the plan name the pole, every arm and every attachment', () => {
    for (const title of ['Elevation', 'Plan']) {
      const f = figures.find((x) => x.title === title);
      expect(f, title).toBeDefined();
      const texts = checkXml(f!.svg).texts;
      expect(texts, title).toContain('pole');
      for (const id of members) expect(texts.some((t) => t === id || t.startsWith(`${id} (`)), `${title}: arm ${id}`).toBe(true);
      for (const id of attachments) expect(texts, `${title}: ${id}`).toContain(id);
    }
  });

  it('the elevation carries the pole height and the arm lengths as dimensions', () => {
    const texts = checkXml(figures.find((x) => x.title === 'Elevation')!.svg).texts;
    expect(texts.some((t) => t.includes('pole top'))).toBe(true);
    for (const id of members) expect(texts.some((t) => t.includes(`arm ${id}`)), `arm ${id}`).toBe(true);
  });

  it('a second build gives the same SVG text', () => {
    const again = figuresOf(example).figures;
    expect(again.map((f) => f.svg)).toEqual(figures.map((f) => f.svg));
  });
});

describe('axis ticks', () => {
  // Round tick steps of 1, 2 or 5 times a power of ten: common practice for chart axes.
  it.each([
    [0, 190.2],
    [-145.6, 0],
    [-3.645, 1e-13],
    [0, 0.0425],
    [12, 12],
  ])('cover [%d, %d] with a 1-2-5 step and labels of one format', (lo, hi) => {
    const t = niceTicks(lo, hi, 5);
    const step = t.values[1] - t.values[0];
    // covered up to a billionth of a step (a value that close to a tick is drawn on it)
    expect(t.min).toBeLessThanOrEqual(lo + 1e-9 * step);
    expect(t.max).toBeGreaterThanOrEqual(hi - 1e-9 * step);
    const mantissa = step / 10 ** Math.floor(Math.log10(step) + 1e-12);
    expect([1, 2, 5, 10].some((m) => Math.abs(mantissa - m) < 1e-9)).toBe(true);
    expect(t.values.length).toBeGreaterThanOrEqual(2);
    expect(t.values.length).toBeLessThanOrEqual(12);
    const decimals = t.values.map((v) => (tickLabel(v, t.decimals).split('.')[1] ?? '').length);
    expect(new Set(decimals).size).toBe(1);
    expect(t.values.map((v) => tickLabel(v, t.decimals))).not.toContain('-0');
  });
});
