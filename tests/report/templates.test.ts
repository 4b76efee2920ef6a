// The narrative templates (Handlebars, strict, no HTML escaping): a missing value is refused with
// its key, helpers print quantities with their units, every template in templates/ compiles and is
// rendered by some section of some package (none left orphaned), blocks are read as before.
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { parseDocument } from 'yaml';
import { cli } from '../cli/run-cli.ts';
import { buildPackage } from '../../src/pipeline.ts';
import { compileTemplate, parseTemplate, readTemplate, renderTemplate, renderedTemplates } from '../../src/report/sections/templates.ts';
import { FT_M, KIP_N } from '../../src/units/units.ts';

const ROOT = join(import.meta.dirname, '..', '..');
const TEMPLATE_NAMES = readdirSync(join(ROOT, 'templates'))
  .filter((f) => f.endsWith('.md'))
  .map((f) => f.replace(/\.md$/, ''))
  .sort();

describe('templates', () => {
  it('fills values and refuses one the section did not give, naming the key and its line:column', () => {
    expect(compileTemplate('pole {{ id }} of {{kind}}')({ id: 'P-1', kind: 'luminaire pole' })).toBe('pole P-1 of luminaire pole');
    // line 1-based, column 0-based at the name, as Handlebars reports positions
    expect(() => compileTemplate('pole {{idd}}', 'x.md')({ id: 'P-1' })).toThrow(/x\.md: "idd" not defined - 1:7/);
    // Handlebars' strict mode does not look at helper arguments; ours does
    expect(() => compileTemplate('line one\nheight {{qty height "length"}}')({}, { units: 'us' })).toThrow(/"height" not defined - 2:13/);
    expect(() => compileTemplate('{{#if flag}}yes{{/if}}')({})).toThrow(/"flag" not defined/);
    // a real template, through the cache
    expect(() => renderTemplate('caution', { inputFile: 'x.yaml' })).toThrow(/templates\/caution\.md: "inputHash" not defined/);
  });

  it('keeps & and < as typed (a PDF is not HTML)', () => {
    expect(compileTemplate('{{a}}')({ a: 'M < 5 & N > 2 "quoted"' })).toBe('M < 5 & N > 2 "quoted"');
  });

  it('{{qty}} prints an SI value in the package units with its unit; {{num}}, {{tol}}, {{pct}} the plain forms', () => {
    const t = compileTemplate('{{qty h "length"}}; {{qty P "force"}}; {{num n}}; {{num n 2}}; {{tol e}}; {{pct s}}');
    // NIST SP 811 (2008) App. B: 1 ft = 0.3048 m and 1 kip = 4448.2216152605 N, exactly
    const text = t({ h: 28 * FT_M, P: 2.5 * KIP_N, n: 1.23456, e: 1e-6, s: 0.0177 }, { units: 'us' });
    expect(text.replace(/\u00a0/g, ' ')).toBe('28 ft; 2.5 kip; 1.235; 1.2; 1 × 10⁻⁶; 1.77 %');
    expect(t({ h: 8.5, P: 12_000, n: 1, e: 0.05, s: 1 }, { units: 'si' }).replace(/\u00a0/g, ' ')).toBe('8.5 m; 12 kN; 1; 1; 0.05; 100 %');
    expect(() => t({ h: 1, P: 1, n: 1, e: 1, s: 1 })).toThrow(/\{\{qty\}\} needs the unit system/);
    // the package's own printing: a density in US units as the unit weight it gives
    // (7850 kg/m³ × 9.80665 m/s² / 157.0875 N/m³ per lb/ft³ = 490.06 lb/ft³, NIST SP 811 App. B)
    expect(compileTemplate('{{qty rho "density"}}')({ rho: 7850 }, { units: 'us' })).toBe('490.1 lb/ft³');
    expect(() => t({ h: Number.NaN, P: 1, n: 1, e: 1, s: 1 }, { units: 'si' })).toThrow(/\{\{qty\}\} needs a finite number/);
  });

  it('{{#if}} chooses narrative text; a false flag must still be given', () => {
    const t = compileTemplate('{{#if secondOrder}}P-delta{{else}}first order{{/if}}');
    expect(t({ secondOrder: true })).toBe('P-delta');
    expect(t({ secondOrder: false })).toBe('first order');
  });

  it('reads the title, headings, bullets with continuation lines and paragraphs', () => {
    const t = parseTemplate('# Title\n\nFirst line\nsecond line.\n\n## Part\n\n- one\n  more\n- two\n\nLast.\n');
    expect(t.title).toBe('Title');
    expect(t.blocks).toEqual([
      { kind: 'paragraph', text: 'First line second line.' },
      { kind: 'heading', level: 2, text: 'Part' },
      { kind: 'bullets', items: ['one more', 'two'] },
      { kind: 'paragraph', text: 'Last.' },
    ]);
  });

  it('every template in templates/ compiles', () => {
    expect(TEMPLATE_NAMES.length).toBeGreaterThan(10);
    for (const name of TEMPLATE_NAMES) expect(() => compileTemplate(readTemplate(name), name), name).not.toThrow();
  });

  it('every template in templates/ is rendered by some section (no orphans)', async () => {
    // the bundled examples, second order and first order, reach every conditional section
    for (const example of readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml'))) {
      await buildPackage(join(ROOT, 'examples', example));
    }
    await buildPackage(join(ROOT, 'examples', 'cantilever-sign.yaml'), { firstOrder: true });
    // an issued revision (its own caution) and a comparison (its notes)
    const dir = mkdtempSync(join(tmpdir(), 'polebook-templates-'));
    try {
      const doc = parseDocument(readFileSync(join(ROOT, 'examples', 'luminaire-twin.yaml'), 'utf8'));
      doc.setIn(['project', 'revisions', 0, 'issued'], doc.createNode({ engineer: 'A. Engineer', licence: 'L-1' }));
      writeFileSync(join(dir, 'issued.yaml'), doc.toString());
      await buildPackage(join(dir, 'issued.yaml'));
      await cli(['compare', join(ROOT, 'examples', 'luminaire-twin.yaml'), '--vary', 'A1.length=2.5,3 m', '--out', join(dir, 'cmp'), '--quiet'], { cwd: dir });
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
    const unused = TEMPLATE_NAMES.filter((n) => !renderedTemplates().has(n));
    expect(unused).toEqual([]);
  }, 120_000);
});
