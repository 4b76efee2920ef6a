// The warning of results outside the small-displacement method, in the package and on the terminal:
// the test design of tests/model/design-factory.ts with a steel 40 times too soft moves its arm tip
// far beyond a tenth of the arm length; with real steel (E = 200 GPa) nothing is reported.
import { describe, expect, it } from 'vitest';
import { analyseDesign } from '../../src/analyse-design.ts';
import { movementWarningLines } from '../../src/analysis-summary.ts';
import { largeMovements } from '../../src/analysis/displacement-range.ts';
import type { Design, LoadedDesign } from '../../src/design/design.ts';
import { resultsSection } from '../../src/report/sections/results-section.ts';
import { makeDesign } from '../model/design-factory.ts';
import { checkSections } from '../../src/report/sections/check-sections.ts';
import { runChecks } from '../../src/checks/run-checks.ts';
import { unbrokenId } from '../../src/report/format/unbroken-ids.ts';

const loadedOf = (design: Design): LoadedDesign => ({ design, file: 'test.yaml', text: '', inputHash: '000000000000', warnings: [] });
const soft = makeDesign({ material: { E_Pa: 5e9, G_Pa: 1.9e9, Fy_Pa: 345e6, density_kgm3: 7850 } });
const cautionsOf = (design: Design) =>
  resultsSection(loadedOf(design), analyseDesign(design, {})).blocks.filter((b) => b.kind === 'caution' && b.title === 'Results outside the small-displacement analysis');

describe('results outside the small-displacement method', () => {
  it('names the member, the combination and the movement in the package and on the terminal', () => {
    const a = analyseDesign(soft, {});
    const found = largeMovements(a.model, a.results);
    const arm = found.filter((x) => x.member === 'A1');
    expect(arm.length).toBeGreaterThan(0);
    const worst = arm.reduce((x, y) => (y.ratio > x.ratio ? y : x));
    const cautions = cautionsOf(soft);
    expect(cautions).toHaveLength(1);
    const text = cautions[0]!.kind === 'caution' ? cautions[0]!.text : '';
    expect(text).toContain(`The tip of arm A1 moves `);
    expect(text).toContain(`under combination ${worst.combination}`);
    expect(text).toContain('of the member length L = 9 m');
    expect(text).toContain('L/10, a limit of ours (common practice)');
    const lines = movementWarningLines(soft, a);
    const line = lines.find((l) => l.startsWith('warning: arm A1 tip moves ')) ?? '';
    expect(line).toContain(` m under ${worst.combination}, `);
    expect(line).toMatch(/ of its length 9 m from the pole face, beyond our limit of L\/10 for a small-displacement analysis/);
    // one line per member, at its worst combination
    expect(lines.filter((l) => l.includes('arm A1 tip'))).toHaveLength(1);
    // the design checks say that they rest on these results
    const checks = checkSections(loadedOf(soft), a, runChecks(soft, a))[0]!.blocks.filter((b) => b.kind === 'caution');
    expect(checks.map((b) => (b.kind === 'caution' ? b.title : ''))).toEqual(['Checks on results outside the small-displacement analysis']);
    // printed with its hyphens non-breaking (the terminal keeps the plain id)
    expect(checks[0]!.kind === 'caution' && checks[0]!.text).toContain(unbrokenId(worst.combination));
  });

  it('the same design in real steel gives no warning', () => {
    const design = makeDesign();
    const a = analyseDesign(design, {});
    expect(largeMovements(a.model, a.results)).toEqual([]);
    expect(movementWarningLines(design, a)).toEqual([]);
    expect(cautionsOf(design)).toEqual([]);
    expect(checkSections(loadedOf(design), a, runChecks(design, a))[0]!.blocks.filter((b) => b.kind === 'caution' && b.title.includes('small-displacement'))).toEqual([]);
  });
});
