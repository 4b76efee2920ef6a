// No element's geometric stiffness short of the axial force it carries: on every example, and on a
// heavy-head pole with a bracket-mounted attachment, the axial force each element's geometric
// stiffness uses equals the length-weighted mean of the axial force N(x) along it, integrated from
// the member stations (N(x) is the element's statics: the end force and the loads along it). The
// attachments at nodes act on the ends of elements and the wind along a signal arm loads its tip
// element axially: the cases where the mean of the two end forces falls short.
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';
import { packageRoot } from '../../src/package-root.ts';

const FILES = ['examples/cantilever-sign.yaml', 'examples/luminaire-twin.yaml', 'examples/signal-support.yaml', 'tests/fixtures/heavy-head-pole.yaml'];

describe('geometric stiffness uses the axial force each element carries', () => {
  for (const file of FILES) {
    it(file, () => {
      const { design } = loadDesignFile(join(packageRoot(), file));
      // Stations every 20 mm so the trapezoid rule integrates N(x) finely.
      const a = analyseDesign({ ...design, analysis: { ...design.analysis, stationSpacing_m: 0.02 } }, {});
      let checked = 0;
      for (const r of Object.values(a.results)) {
        if (!r.secondOrder) continue;
        const largest = Math.max(...r.elementEndForces.map((e) => Math.abs(e.Ngeometric_N)));
        for (const m of Object.values(r.members)) {
          const byElement = new Map<number, { x: number; N: number }[]>();
          for (const s of m.stations) {
            const list = byElement.get(s.element) ?? [];
            list.push({ x: s.x_m, N: s.N_N });
            byElement.set(s.element, list);
          }
          for (const [e, pts] of byElement) {
            pts.sort((p, q) => p.x - q.x);
            const L = pts[pts.length - 1].x - pts[0].x;
            if (L <= 0) continue;
            let area = 0;
            for (let k = 1; k < pts.length; k++) area += ((pts[k].N + pts[k - 1].N) / 2) * (pts[k].x - pts[k - 1].x);
            const mean = area / L;
            const used = r.elementEndForces[e].Ngeometric_N;
            // Tolerance: 0.1 % of the largest axial force of the combination, for the trapezoid rule
            // on a 20 mm grid (N varies linearly under self-weight; a point load steps at a station).
            expect(Math.abs(used - mean), `${r.combination} element ${e}: used ${used} N, carries ${mean} N`).toBeLessThan(1e-3 * largest + 1e-6);
            checked++;
          }
        }
      }
      expect(checked).toBeGreaterThan(50);
    });
  }
});
