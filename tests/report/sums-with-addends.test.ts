// A total is printed with its addends (issue 9: "sums printed with their addends"): every total
// step of every load case lists the loads it adds, each with its unit, and they add up to the total
// (arithmetic), so a checker can redo the sum from the page; the dead load adds one weight per
// member and per attachment of the input.
import { describe, expect, it } from 'vitest';
import type { Qty } from '../../src/calc/step.ts';
import { buildLoadCases } from '../../src/loads/build-load-cases.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { makeDesign } from '../model/design-factory.ts';

describe.each([
  ['the test design (dead, wind, ice)', () => makeDesign()],
  ['examples/cantilever-sign.yaml (with fatigue loads)', () => loadDesignFile(join(import.meta.dirname, '..', '..', 'examples', 'cantilever-sign.yaml'), {}).design],
])('totals of the load cases of %s', (_name, designOf) => {
  const design = designOf();
  const cases = buildLoadCases(design, buildFrame(design, { segmentsPerMember: 4 }));

  it('every total step lists the loads it adds, and they add up to the total', () => {
    const totals = cases.flatMap((c) => c.steps.filter((s) => s.symbol.startsWith('Σ') && s.source === 'sum of the loads above').map((s) => ({ id: c.id, s })));
    expect(totals.length).toBeGreaterThanOrEqual(3);
    for (const { id, s } of totals) {
      const addends = s.substituted.filter((p): p is Qty => typeof p !== 'string');
      expect(addends.length, `${id} ${s.symbol}`).toBeGreaterThanOrEqual(1);
      const sum = addends.reduce((a, q) => a + q.si, 0);
      expect(Math.abs(sum - s.result.si), `${id} ${s.symbol}`).toBeLessThanOrEqual(1e-9 * Math.abs(s.result.si));
    }
  });

  it('the dead-load total adds the self-weight of each member and the weight of each attachment', () => {
    const dead = cases.find((c) => c.kind === 'dead')!;
    const total = dead.steps.find((s) => s.symbol === 'ΣD')!;
    const addends = total.substituted.filter((p): p is Qty => typeof p !== 'string');
    expect(addends).toHaveLength(1 + design.arms.length + design.attachments.length); // the pole, each arm, each attachment
  });
});
