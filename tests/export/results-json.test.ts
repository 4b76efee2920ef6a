// The JSON results must hold the model exactly as analysed, so that another frame program
// can solve it again: rebuild the model and one combination's loads from the JSON alone
// (a reader written here, independent of the writer), solve them, and get the displacements
// and reactions the JSON reports. First order, so the re-solve is the same linear problem.
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { buildPackage } from '../../src/pipeline.ts';
import { solveLoads } from '../../src/analysis/analyze.ts';
import type { FrameModel, Vec3, Vec6 } from '../../src/model/frame.ts';
import type { AppliedLoad } from '../../src/loads/load-types.ts';

type Json = Record<string, any>;

function modelFromJson(m: Json): FrameModel {
  return {
    nodes: m.nodes.map((n: Json) => ({ id: n.id, xyz_m: [n.x_m, n.y_m, n.z_m], tag: n.tag })),
    elements: m.elements.map((e: Json) => ({
      id: e.id, member: e.member, i: e.i, j: e.j, E_Pa: e.E_Pa, G_Pa: e.G_Pa, A_m2: e.A_m2, Iy_m4: e.Iy_m4, Iz_m4: e.Iz_m4, J_m4: e.J_m4,
      refVector: e.refVector, offsetI_m: e.offsetI_m, offsetJ_m: e.offsetJ_m, massPerLength_kgm: e.massPerLength_kg_per_m,
      sI_m: e.sI_m, sJ_m: e.sJ_m, diameterI_m: e.diameterI_m, diameterJ_m: e.diameterJ_m,
    })),
    supports: m.supports.map((s: Json) => ({
      node: s.node,
      fixed: [s.fixed.ux, s.fixed.uy, s.fixed.uz, s.fixed.rx, s.fixed.ry, s.fixed.rz],
      springs: [s.springs.kx_N_per_m, s.springs.ky_N_per_m, s.springs.kz_N_per_m, s.springs.krx_Nm_per_rad, s.springs.kry_Nm_per_rad, s.springs.krz_Nm_per_rad],
    })),
    members: m.members.map((x: Json) => ({ id: x.id, kind: x.kind, elements: x.elements, length_m: x.length_m, discontinuities_m: x.discontinuities_m })),
    masses: m.lumpedMasses.map((x: Json) => ({ node: x.node, mass_kg: x.mass_kg, origin: x.origin })),
  };
}

function loadFromJson(l: Json): AppliedLoad {
  const origin = { source: l.origin };
  switch (l.type) {
    case 'nodal':
      return { kind: 'nodal', node: l.node, F_N: l.F_N as Vec3, M_Nm: l.M_Nm as Vec3, origin };
    case 'distributed-linear':
      return { kind: 'distributed', element: l.element, axes: l.axes, direction: l.direction, wA_Npm: l.wA_N_per_m, wB_Npm: l.wB_N_per_m, a_m: l.a_m, b_m: l.b_m, origin };
    case 'point-force':
      return { kind: 'point-force', element: l.element, axes: l.axes, direction: l.direction, value: l.value_N, a_m: l.a_m, origin };
    case 'point-moment':
      return { kind: 'point-moment', element: l.element, axes: l.axes, direction: l.direction, value: l.value_Nm, a_m: l.a_m, origin };
    default:
      throw new Error(`unknown load type ${l.type}`);
  }
}

describe.each(['cantilever-sign.yaml', 'signal-support.yaml'])('JSON results of %s', (example) => {
  it('re-solves from the JSON alone to the displacements and reactions it reports', async () => {
    const out = await buildPackage(join(import.meta.dirname, '../../examples', example), { json: true, firstOrder: true });
    const doc = JSON.parse(out.json!) as Json;
    expect(doc.format).toBe('polebook-results');
    expect(doc.analysis.secondOrder).toBe(false);
    const model = modelFromJson(doc.model);
    for (const k of [0, doc.combinations.length - 1]) {
      const combo = doc.combinations[k];
      const reported = doc.results.find((r: Json) => r.combination === combo.id);
      const sol = solveLoads(model, combo.loads.map(loadFromJson));
      const scale = Math.max(...reported.displacements.flatMap((d: Vec6) => d.slice(0, 3).map(Math.abs)));
      sol.displacements.forEach((d, n) => {
        for (let c = 0; c < 3; c++) expect(Math.abs(d[c]! - reported.displacements[n][c])).toBeLessThan(1e-9 * scale);
      });
      const R = sol.reactions[0]!.force;
      const Rj = reported.reactions[0].force as Vec6;
      for (let c = 0; c < 6; c++) expect(Math.abs(R[c]! - Rj[c]!)).toBeLessThan(1e-9 * Math.max(...Rj.map(Math.abs)));
    }
  });

  it('names its units and the columns of its six-value arrays', async () => {
    const out = await buildPackage(join(import.meta.dirname, '../../examples', example), { json: true });
    const doc = JSON.parse(out.json!) as Json;
    expect(doc.units.length).toBe('m');
    expect(doc.columns.displacement).toEqual(['ux_m', 'uy_m', 'uz_m', 'rx_rad', 'ry_rad', 'rz_rad']);
    expect(doc.caution).toMatch(/licensed engineer/);
    expect(doc.results.length).toBe(doc.combinations.length);
  });
});
