// The moment-area hand check against polebook's matrix analysis of the 'dead' case alone
// (first order) on every example. Two independent methods: the hand check integrates M/EI along
// the continuous taper, the matrix analysis solves a chain of prismatic segments and also keeps
// axial shortening and torsion coupling. Expected agreement 1 % (EXPECTED_AGREEMENT) at the
// examples' 20 segments per member, from the segment-convergence study (tests/model/
// segment-convergence.test.ts: tip deflection of a tapered cantilever within 0.5 % at 20
// segments); a quantity nil by symmetry must be nil in both (within 1e-6 of the tip drop scale).
// Also statics: the in-plane base moment of the hand check equals the matrix base reaction
// moment about the axis normal to the arm's plane (equilibrium of the whole structure).
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyseDesign } from '../../src/analyse-design.ts';
import { solveLoads } from '../../src/analysis/analyze.ts';
import { compareWithMatrix, EXPECTED_AGREEMENT, NIL_SHARE } from '../../src/handcheck/matrix-comparison.ts';
import { momentAreaCheck } from '../../src/handcheck/moment-area.ts';
import { loadDesignFile } from '../../src/input/index.ts';
import { dot } from '../../src/model/vec3.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { buildLoadCases } from '../../src/loads/index.ts';

const ROOT = join(import.meta.dirname, '..', '..');
const EXAMPLES = readdirSync(join(ROOT, 'examples')).filter((f) => /\.ya?ml$/.test(f)).sort();

describe.each(EXAMPLES)('examples/%s', (example) => {
  const { design } = loadDesignFile(join(ROOT, 'examples', example), {});
  const analysis = analyseDesign(design, { firstOrder: true });
  const check = momentAreaCheck(design);
  if (!check) throw new Error(`${example} has no arm`);
  const cmp = compareWithMatrix(check, analysis.model, analysis.cases);

  it('uses 20 segments per member (the count the stated agreement is for)', () => {
    expect(design.analysis.segmentsPerMember).toBe(20);
  });
  it.each(cmp.rows.map((r) => [r.label, r] as const))('%s: moment-area and matrix agree within 1 %', (_label, row) => {
    if (row.relativeDifference === null) {
      expect(Math.abs(row.differenceOfScale)).toBeLessThan(NIL_SHARE);
    } else {
      expect(Math.abs(row.relativeDifference)).toBeLessThan(EXPECTED_AGREEMENT);
      expect(Math.sign(row.matrix)).toBe(Math.sign(row.momentArea));
    }
  });
  it('the tip drop is not nil (the comparison compares something)', () => {
    expect(check.tipDrop_m).toBeGreaterThan(1e-4);
  });
  it('in-plane base moment = − base reaction moment about the plane normal (statics), to 1e-9 relative', () => {
    const dead = analysis.cases.find((c) => c.id === 'dead');
    if (!dead) throw new Error('no dead case');
    const r = solveLoads(analysis.model, dead.loads).reactions[0].force;
    const Mn = dot([r[3], r[4], r[5]], check.statics.n);
    const scale = Math.abs(check.statics.jointMoment_Nm);
    expect(Math.abs(Mn + check.statics.baseMoment_Nm) / scale).toBeLessThan(1e-9);
  });
});

describe.each(EXAMPLES)('examples/%s, more segments', (example) => {
  // With the pole's axial shortening added to the hand tip drop, the difference left is the
  // segment chain's prismatic approximation, which shrinks as the segments shorten (mid-length
  // properties converge as the square of the segment length, tests/model/segment-convergence.test.ts):
  // at 40 segments every non-nil difference is smaller than at 20, and the sum row is within 0.1 %.
  const { design } = loadDesignFile(join(ROOT, 'examples', example), {});
  const check = momentAreaCheck(design);
  if (!check) throw new Error(`${example} has no arm`);
  const rowsAt = (n: number) => {
    const model = buildFrame(design, { segmentsPerMember: n });
    return compareWithMatrix(check, model, buildLoadCases(design, model)).rows;
  };
  it('differences shrink from 20 to 40 segments', () => {
    const r20 = rowsAt(20);
    const r40 = rowsAt(40);
    for (const key of ['jointRotation', 'jointSway', 'tipDropWithShortening'] as const) {
      const a = r20.find((r) => r.key === key)?.relativeDifference;
      const b = r40.find((r) => r.key === key)?.relativeDifference;
      if (a === null || a === undefined || b === null || b === undefined) continue; // nil by symmetry
      expect(Math.abs(b), key).toBeLessThan(Math.abs(a));
    }
    const sum = r40.find((r) => r.key === 'tipDropWithShortening')?.relativeDifference;
    expect(Math.abs(sum ?? 1)).toBeLessThan(0.001);
  });
});
