// The default segment count for second-order results. The continuous taper has no closed form
// under P-delta, so this is a convergence study: the same structure with 160 segments per member
// stands in for the continuous taper, and a chain of prismatic segments approaches it as 1/n^2
// (the taper error of a piecewise-constant section; the element itself converges faster,
// tests/analysis/p-delta-element-loads.test.ts), so at 20 segments the 160-segment model is 64
// times closer to the limit than the 20-segment one. The absolute second-order answer of such a
// pole is checked against CalculiX NLGEOM in tests/reference/calculix-second-order.test.ts.
//
// Measured at 20 segments (worst over every combination of each structure): base moment within
// 0.005 % (0.02 % on the heavy-head fixture), the second-order increment of the base moment (A - 1)
// within 0.19 %, the pole-top and arm-tip translations within 0.12 % (floored at a tenth of the
// largest). Tolerances below: 0.1 %, 0.5 % and 0.5 %.
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';
import { packageRoot } from '../../src/package-root.ts';
import { DEFAULTS } from '../../src/input/defaults.ts';
import type { Design } from '../../src/design/design.ts';

const FILES = ['examples/cantilever-sign.yaml', 'examples/luminaire-twin.yaml', 'examples/signal-support.yaml', 'tests/fixtures/heavy-head-pole.yaml'];

function run(design: Design, n: number) {
  return analyseDesign({ ...design, analysis: { ...design.analysis, segmentsPerMember: n } }, {});
}

/** Worst differences of the n-segment model from the reference over every combination. */
function differences(a: ReturnType<typeof run>, ref: ReturnType<typeof run>) {
  const tips = (m: typeof a.model) => m.nodes.filter((x) => /pole-top|arm-tip/.test(x.tag));
  const ta = tips(a.model);
  const tr = tips(ref.model);
  expect(ta.map((x) => x.tag)).toEqual(tr.map((x) => x.tag));
  let moment = 0;
  let increment = 0;
  let tip = 0;
  for (const id of Object.keys(ref.results)) {
    const r = a.results[id]!;
    const q = ref.results[id]!;
    moment = Math.max(moment, Math.abs(r.baseMoment!.final_Nm / q.baseMoment!.final_Nm - 1));
    const incQ = q.baseMoment!.final_Nm / q.baseMoment!.firstOrder_Nm - 1;
    const incR = r.baseMoment!.final_Nm / r.baseMoment!.firstOrder_Nm - 1;
    // An increment below 0.1 % of the moment is round-off territory for a relative comparison.
    if (incQ > 1e-3) increment = Math.max(increment, Math.abs(incR / incQ - 1));
    const size = (v: readonly number[]) => Math.hypot(v[0], v[1], v[2]);
    const largest = Math.max(...tr.map((x) => size(q.displacements[x.id]!)));
    tr.forEach((x, k) => {
      const u = r.displacements[ta[k].id]!;
      const v = q.displacements[x.id]!;
      tip = Math.max(tip, Math.hypot(u[0] - v[0], u[1] - v[1], u[2] - v[2]) / Math.max(size(v), largest / 10));
    });
  }
  return { moment, increment, tip };
}

describe('segment count for second-order results (convergence study against 160 segments)', () => {
  it('the default is 20 segments', () => {
    expect(DEFAULTS.segments.value).toBe(20);
  });
  for (const file of FILES) {
    it(`${file}: 20 segments within 0.1 % on the base moment, 0.5 % on its second-order increment and on tip movements; errors fall as 1/n^2`, () => {
      const { design } = loadDesignFile(join(packageRoot(), file));
      expect(design.analysis.secondOrder).toBe(true);
      const ref = run(design, 160);
      const at10 = differences(run(design, 10), ref);
      const at20 = differences(run(design, 20), ref);
      console.info(`[segments, second order] ${file}: 20 segments: moment ${(at20.moment * 100).toFixed(4)} %, A - 1 ${(at20.increment * 100).toFixed(3)} %, tips ${(at20.tip * 100).toFixed(3)} %`);
      expect(at20.moment).toBeLessThan(1e-3);
      expect(at20.increment).toBeLessThan(5e-3);
      expect(at20.tip).toBeLessThan(5e-3);
      // 1/n^2 from 10 to 20 segments: a factor of about 4 (3 allows for the reference's own error).
      expect(at10.increment / at20.increment).toBeGreaterThan(3);
      expect(at10.tip / at20.tip).toBeGreaterThan(3);
    });
  }
});
