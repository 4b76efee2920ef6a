// The document model built from a design: order of sections, what each holds, and that
// every printed quantity comes with its unit.
import { describe, expect, it } from 'vitest';
import type { Block, DocSection } from '../../src/report/document.ts';
import { buildDocument } from '../../src/report/sections/build-document.ts';
import { FIXTURE_DESIGN, FIXTURE_HASH, FIXTURE_INPUT_TEXT, FIXTURE_LOADED } from './fixture-design.ts';
import { demoStepsSection } from './fixture-extra.ts';

function tables(section: DocSection): Extract<Block, { kind: 'table' }>[] {
  return section.blocks.filter((b): b is Extract<Block, { kind: 'table' }> => b.kind === 'table');
}

function section(id: string, sections: readonly DocSection[]): DocSection {
  const s = sections.find((x) => x.id === id);
  if (!s) throw new Error(`no section ${id}`);
  return s;
}

describe('buildDocument', () => {
  it('orders the sections: scope, criteria, geometry, loads, later sections, the appendices given, then the input echo', () => {
    const appendixExtra: DocSection = { id: 'statics', title: 'Statics check', blocks: [], appendix: true };
    const doc = buildDocument(FIXTURE_LOADED, { sections: [demoStepsSection(), appendixExtra] });
    expect(doc.sections.map((s) => s.id)).toEqual(['scope', 'criteria', 'geometry', 'loads', 'demo-steps', 'statics', 'input-echo']);
    expect(doc.sections.map((s) => s.appendix === true)).toEqual([false, false, false, false, false, true, true]);
    const scopeText = section('scope', doc.sections).blocks.flatMap((b) => (b.kind === 'bullets' ? b.items : []));
    expect(scopeText).toContain('Section 5: Demonstration steps');
    expect(scopeText).toContain('Appendix A: Statics check');
    expect(scopeText).toContain('Appendix B: Input echo');
  });

  it('fills the meta from the project, the last revision and the input', () => {
    const { meta } = buildDocument(FIXTURE_LOADED);
    expect(meta).toMatchObject({
      projectName: 'Quarry Mill Road widening',
      structureId: 'QM-CS-07',
      structureKind: 'Cantilevered sign support',
      revision: 'A',
      revisionDate: '2026-03-15',
      status: 'DRAFT FOR REVIEW',
      date: '2026-03-15',
      inputHash: FIXTURE_HASH,
      inputFile: 'quarry-mill-qm-cs-07.yaml',
      units: 'si',
    });
  });

  it('puts the caution and a sign-off with the three roles on the cover', () => {
    const { cover } = buildDocument(FIXTURE_LOADED);
    expect(cover.map((b) => b.kind)).toEqual(['caution', 'signoff']);
    const caution = cover[0] as Extract<Block, { kind: 'caution' }>;
    expect(caution.text).toContain(FIXTURE_HASH);
    expect(caution.text).toContain('licensed professional engineer');
    const signoff = cover[1] as Extract<Block, { kind: 'signoff' }>;
    expect(signoff.rows.map((r) => r.role)).toEqual(['Prepared by', 'Checked by', 'Engineer of record']);
  });

  it('lists every assumption with its value, given/default and source', () => {
    const doc = buildDocument(FIXTURE_LOADED);
    const table = tables(section('criteria', doc.sections)).find((t) => t.title === 'Assumptions and defaults')!;
    expect(table.rows).toHaveLength(FIXTURE_DESIGN.assumptions.length);
    FIXTURE_DESIGN.assumptions.forEach((a, i) => {
      const row = table.rows[i];
      expect(row[0]).toContain(a.label);
      expect(row[0]!.replace(/\u200b/g, '')).toContain(a.key); // the key may break after its dots (zero-width spaces)
      expect(row[2]).toBe(a.defaulted ? 'default' : 'given');
      expect(row[3]).toBe(a.source);
    });
    // 345e6 Pa = 345 MPa; 144 Pa = 0.144 kPa (SI display units of units.ts).
    expect(table.rows.map((r) => r[1])).toEqual(expect.arrayContaining(['345 MPa', '0.144 kPa', 'fixed', 'yes', '0.9', '0.01 (1/100)']));
  });

  it('echoes the input text verbatim in a code block', () => {
    const doc = buildDocument(FIXTURE_LOADED);
    const code = section('input-echo', doc.sections).blocks.find((b) => b.kind === 'code') as Extract<Block, { kind: 'code' }>;
    expect(code.text).toBe(FIXTURE_INPUT_TEXT);
  });

  it('every number in the geometry and loads tables carries a unit, or is a labelled dimensionless factor', () => {
    const doc = buildDocument(FIXTURE_LOADED);
    const unit = /\d(?:\.\d+)?(?:\u00a0×\u00a010[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)? ?(?:m|mm|m²|kN|N|kPa|MPa|kg\/m³|deg|kN·m|segments|iterations|bolts)(?![A-Za-z0-9])/;
    for (const id of ['geometry', 'loads', 'criteria']) {
      for (const t of tables(section(id, doc.sections))) {
        if (t.title === 'Assumptions and defaults') continue; // checked above, value by value
        for (const row of t.rows) {
          const label = row.join(' | ');
          const dimensionless = /dimensionless|^(STR|EXW|EXI|SVC)[-\u2011]\d/.test(label) || /^[LH]\/\d+$/.test(row[1] ?? '');
          for (const cell of row.slice(1)) {
            if (!/\d/.test(cell) || dimensionless) continue;
            // Ids such as "S1" and "A1" and steel grades are names, not numbers.
            if (/^[A-Z]+\d+$/.test(cell) || /arm A\d/.test(cell) || /EXIT \d+/.test(cell) || /^\d+-sided/.test(cell) || /^ASTM F\d+ Grade \d+$/.test(cell)) continue;
            expect(cell, `${t.title}: ${label}`).toMatch(unit);
          }
        }
      }
    }
  });
});
