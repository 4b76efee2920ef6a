// The load groups of the free-body diagrams lose nothing: for every combination of every example,
// the groups' forces sum to the applied total and, with their moments about their own points,
// to the applied moment about the origin (the resultant of the loads, load-resultant.ts); and in a
// first-order analysis they balance the base reaction exactly (statics: the sum of forces and of
// moments on a free body is zero, any statics text, e.g. Hibbeler, Engineering Mechanics: Statics).
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';
import { combinedLoads } from '../../src/analysis/analyze.ts';
import { loadGroups } from '../../src/loads/load-groups.ts';
import { packageRoot } from '../../src/package-root.ts';
import { cross } from '../../src/model/vec3.ts';
import type { Vec3 } from '../../src/model/frame.ts';

const FILES = ['examples/cantilever-sign.yaml', 'examples/luminaire-twin.yaml', 'examples/signal-support.yaml'];

describe('load groups of the free-body diagrams', () => {
  for (const file of FILES) {
    it(`${file}: every combination's groups balance the first-order base reaction`, () => {
      const { design } = loadDesignFile(join(packageRoot(), file));
      const a = analyseDesign(design, { firstOrder: true });
      for (const combo of a.combinations) {
        const groups = loadGroups(a.model, combinedLoads(a.cases, combo));
        const F = [0, 0, 0];
        const M = [0, 0, 0];
        for (const g of groups) {
          const m = cross(g.at_m, g.force_N);
          for (let k = 0; k < 3; k++) {
            F[k] += g.force_N[k];
            M[k] += m[k] + g.moment_Nm[k];
          }
        }
        const r = a.results[combo.id]!.reactions[0]!;
        const base = a.model.nodes[r.node]!.xyz_m;
        const rm = cross(base as Vec3, [r.force[0], r.force[1], r.force[2]]);
        const scaleF = Math.max(1, ...groups.map((g) => Math.hypot(...g.force_N)));
        const scaleM = scaleF * 20;
        for (let k = 0; k < 3; k++) {
          // 1e-9 of the largest force (and that force times 20 m for moments): round-off.
          expect(Math.abs(F[k] + r.force[k]), `${combo.id} F${'xyz'[k]}`).toBeLessThan(1e-9 * scaleF);
          expect(Math.abs(M[k] + r.force[3 + k] + rm[k]), `${combo.id} M${'xyz'[k]}`).toBeLessThan(1e-9 * scaleM);
        }
      }
    });
  }
});
