// Appendix "Frame model: nodes and elements": every node and element of the solved model, printed in the
// units of the input. Expected values are the fixture's input dimensions (pole height 7.6 m, arm at
// 7.0 m), not the program's output.
import { describe, expect, it } from 'vitest';
import { analyseDesign } from '../../src/analyse-design.ts';
import { modelTablesSection } from '../../src/report/sections/model-tables-section.ts';
import { FIXTURE_DESIGN, FIXTURE_LOADED } from './fixture-design.ts';

describe('the frame model appendix', () => {
  const analysis = analyseDesign(FIXTURE_DESIGN, {});
  const section = modelTablesSection(FIXTURE_LOADED, analysis);
  const tables = section.blocks.filter((b) => b.kind === 'table');

  it('is an appendix with one row per node and per element', () => {
    expect(section.appendix).toBe(true);
    expect(tables).toHaveLength(2);
    const [nodes, elements] = tables as Extract<(typeof tables)[number], { kind: 'table' }>[];
    expect(nodes!.rows).toHaveLength(analysis.model.nodes.length);
    expect(elements!.rows).toHaveLength(analysis.model.elements.length);
  });

  it('places the base, the pole top and the arm joint where the input puts them', () => {
    const nodes = tables[0] as Extract<(typeof tables)[number], { kind: 'table' }>;
    const row = (what: RegExp) => nodes.rows.find((r) => what.test(r[4]!))!;
    expect(row(/^pole base$/).slice(1, 4)).toEqual(['0 m', '0 m', '0 m']);
    expect(row(/^pole base$/)[5]).toBe('all six (fixed)');
    expect(row(/pole top/)[3]).toBe('7.6 m');
    expect(row(/joint of arm A1/)[3]).toBe('7 m');
  });
});
