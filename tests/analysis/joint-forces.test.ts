// The free body of each pole-arm joint balances: the member end forces on the joint node (the arm's
// carried through its rigid offset, the pole's below and above) and the loads at the node sum to
// zero, forces and moments about the node (equilibrium of a joint, any statics text, e.g.
// Hibbeler, Engineering Mechanics: Statics), for every combination of every example, first and
// second order (the matrix equilibrium the solution meets holds at every node).
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';
import { combinedLoads } from '../../src/analysis/analyze.ts';
import { jointFreeBody } from '../../src/analysis/joint-forces.ts';
import { packageRoot } from '../../src/package-root.ts';

for (const file of ['examples/cantilever-sign.yaml', 'examples/luminaire-twin.yaml', 'examples/signal-support.yaml']) {
  describe(`pole-arm joints of ${file}`, () => {
    for (const firstOrder of [true, false]) {
      it(`${firstOrder ? 'first' : 'second'} order: every joint balances under every combination`, () => {
        const { design } = loadDesignFile(join(packageRoot(), file));
        const a = analyseDesign(design, { firstOrder });
        for (const combo of a.combinations) {
          for (const arm of a.model.members.filter((m) => m.kind === 'arm')) {
            const j = jointFreeBody(a.model, a.results[combo.id]!, arm.id, combinedLoads(a.cases, combo));
            expect(j.parts.filter((p) => p.what.startsWith('pole')).length).toBeGreaterThanOrEqual(1);
            const F = Math.max(1, ...j.parts.map((p) => Math.hypot(...p.force_N)));
            const M = Math.max(F, ...j.parts.map((p) => Math.hypot(...p.moment_Nm)));
            // 1e-8 of the largest part: round-off of the solution.
            expect(Math.hypot(...j.sumForce_N), `${combo.id} ${arm.id} forces`).toBeLessThan(1e-8 * F);
            expect(Math.hypot(...j.sumMoment_Nm), `${combo.id} ${arm.id} moments`).toBeLessThan(1e-8 * M);
          }
        }
      });
    }
  });
}
