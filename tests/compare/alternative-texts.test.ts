// The alternatives' input texts: written once with placeholders and filled in per alternative,
// each text must be exactly the text written out in full for that alternative (the YAML library's
// own writing of the document with the values set), or the full writing is used. The reference is
// the yaml library's Document.setIn + toString, an outside implementation of YAML.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { alternativeText, alternativesOf } from '../../src/compare/alternatives.ts';
import { varyFromOption } from '../../src/compare/vary-spec.ts';

const ROOT = join(import.meta.dirname, '../..');

function check(example: string, options: string[], inputText?: string): number {
  const text = inputText ?? readFileSync(join(ROOT, 'examples', example), 'utf8');
  const doc = parseDocument(text, { uniqueKeys: true });
  const data: unknown = doc.toJS();
  const specs = options.map((o) => varyFromOption(o, data));
  const alts = alternativesOf(doc, specs);
  for (const a of alts) expect(a.text, `alternative ${a.index}`).toBe(alternativeText(doc, specs, a.values));
  return alts.length;
}

describe('alternative texts', () => {
  it('a range of lengths with a unit (cantilever-sign)', () => {
    expect(check('cantilever-sign.yaml', ['A1.length=36..40.9:0.1 ft'])).toBe(50);
  });
  it('a grid of two keys, one of them two paths at once (luminaire-twin)', () => {
    expect(check('luminaire-twin.yaml', ['A1.length+L1.position=2.5,2.75,3 m', 'A1.section.wall=4,5 mm'])).toBe(6);
  });
  it('a wall thickness inside a flow map (signal-support)', () => {
    expect(check('signal-support.yaml', ['pole.section.wall=0.4375,0.5 in'])).toBe(2);
  });
  it('a varied value that the input wrote quoted', () => {
    const text = readFileSync(join(ROOT, 'examples', 'luminaire-twin.yaml'), 'utf8').replace(/length: 2\.5( +#[^\n]*)?\n/, 'length: "2.5 m"\n');
    expect(text).toContain('length: "2.5 m"');
    expect(check('luminaire-twin.yaml', ['A1.length=2.5,3 m'], text)).toBe(2);
  });
});
