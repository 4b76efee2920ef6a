// Stations along members: ends, discontinuities, loads and a regular spacing, snapped so that
// no spurious duplicate appears; left/right pairs at point loads; extremes found exactly.
import { describe, expect, it } from 'vitest';
import { analyzeCombination, solveLoads } from '../../src/analysis/analyze.ts';
import { UnstableStructureError } from '../../src/errors.ts';
import type { AppliedLoad, Combination, LoadCase } from '../../src/loads/load-types.ts';
import type { FrameModel } from '../../src/model/frame.ts';
import { cantilever, FrameBuilder, roundTube, type Section } from './frame-helpers.ts';

const sec = roundTube(0.3, 0.008);

describe('station placement', () => {
  it('positions within 1e-6 m snap together; only point loads make left/right pairs', () => {
    const L = 6;
    const { model } = cantilever(L, 4, [1, 0, 0], sec);
    const withDisc: FrameModel = {
      ...model,
      members: [{ ...model.members[0], discontinuities_m: [1.5 + 4e-7, 2.0, 2.0 + 3e-7, 3.3] }],
    };
    const loads: AppliedLoad[] = [
      // a point force at 2.0 m (inside element 1, which spans 1.5..3.0), the spacing also hits 2.0
      { kind: 'point-force', element: 1, axes: 'global', direction: [0, 0, -1], value: 1e3, a_m: 0.5 + 2e-7, origin: { source: 't' } },
      // a distributed load starting at 3.3 m
      { kind: 'distributed', element: 2, axes: 'global', direction: [0, 0, -1], wA_Npm: 500, wB_Npm: 500, a_m: 0.3 + 5e-7, b_m: 1.5, origin: { source: 't' } },
    ];
    const r = solveLoads(withDisc, loads, { stationSpacing_m: 0.5 });
    const st = r.members.m.stations;
    for (let k = 1; k < st.length; k++) {
      const gap = st[k].s_m - st[k - 1].s_m;
      expect(gap).toBeGreaterThanOrEqual(0);
      if (gap <= 1e-6) {
        // same place twice only as a left/right pair
        expect([st[k - 1].side, st[k].side]).toEqual(['left', 'right']);
      }
    }
    const at2 = st.filter((s) => Math.abs(s.s_m - 2.0) < 1e-5);
    expect(at2.map((s) => s.side)).toEqual(['left', 'right']);
    // shear steps by the load (statics)
    expect(Math.abs(Math.abs(at2[0].Vy_N - at2[1].Vy_N) - 1e3)).toBeLessThan(1e-6);
    expect(st.filter((s) => Math.abs(s.s_m - 3.3) < 1e-5).length).toBe(1);
    expect(st.filter((s) => Math.abs(s.s_m - 1.5) < 1e-5).length).toBe(1);
    expect(st[0].side).toBe('right');
    expect(st[st.length - 1].side).toBe('left');
    expect(st[st.length - 1].s_m).toBeCloseTo(L, 12);
  });
});

describe('exact extremes (AISC Steel Construction Manual, Table 3-23: simple beam, load increasing uniformly to one end)', () => {
  it('M max = 2 W l / (9 sqrt 3) at x = l / sqrt 3, found inside an element, not at a station', () => {
    const L = 6;
    const n = 3;
    const b = new FrameBuilder();
    const a = b.node([0, 0, 0], 'end-a');
    const ids = b.member('beam', 'arm', a, [L, 0, 0], n, () => sec);
    // simple supports: translations held at both ends, torsion held at one end, bending rotations free
    b.supports.push({ node: a, fixed: [true, true, true, true, false, false], springs: [0, 0, 0, 0, 0, 0] });
    b.supports.push({ node: ids[n], fixed: [false, true, true, false, false, false], springs: [0, 0, 0, 0, 0, 0] });
    const wMax = 3e3;
    const loads: AppliedLoad[] = [0, 1, 2].map((e) => ({
      kind: 'distributed', element: e, axes: 'global', direction: [0, 0, -1],
      wA_Npm: (wMax * e) / n, wB_Npm: (wMax * (e + 1)) / n, a_m: 0, b_m: L / n, origin: { source: 't' },
    }));
    const r = solveLoads(b.build(), loads, { stationSpacing_m: 10 });
    const W = (wMax * L) / 2;
    const Mmax = (2 * W * L) / (9 * Math.sqrt(3));
    const m = r.members.beam;
    const e = Math.abs(m.extremes.Mz.max.value) > Math.abs(m.extremes.Mz.min.value) ? m.extremes.Mz.max : m.extremes.Mz.min;
    expect(Math.abs(Math.abs(e.value) - Mmax) / Mmax).toBeLessThan(1e-9);
    expect(Math.abs(e.s_m - L / Math.sqrt(3))).toBeLessThan(1e-7);
    // no station sits there: the sampled maximum is smaller
    const sampled = Math.max(...m.stations.map((s) => Math.abs(s.Mz_Nm)));
    expect(sampled).toBeLessThan(Mmax * (1 - 1e-4));
    // AISC: reactions W/3 and 2W/3
    expect(Math.abs(r.reactions[0].force[2] - W / 3) / W).toBeLessThan(1e-12);
    expect(Math.abs(r.reactions[1].force[2] - (2 * W) / 3) / W).toBeLessThan(1e-12);
  });
});

describe('second-order member forces', () => {
  const big: Section = { ...sec, A_m2: sec.A_m2 * 1e4 };
  const EI = big.E_Pa * big.Iz_m4;
  const L = 8;
  const column = (qAxial: number, qLateral: number) => {
    const { model } = cantilever(L, 30, [0, 0, 1], big);
    const loads: AppliedLoad[] = model.elements.flatMap((el): AppliedLoad[] => [
      { kind: 'distributed', element: el.id, axes: 'global', direction: [0, 0, -1], wA_Npm: qAxial, wB_Npm: qAxial, a_m: 0, b_m: L / 30, origin: { source: 'weight' } },
      { kind: 'distributed', element: el.id, axes: 'global', direction: [1, 0, 0], wA_Npm: qLateral, wB_Npm: qLateral, a_m: 0, b_m: L / 30, origin: { source: 'wind' } },
    ]);
    const cases: LoadCase[] = [{ id: 'all', kind: 'dead', description: '', windAngle_rad: null, loads, steps: [] }];
    const combo: Combination = { id: 'sw', specId: 'sw', category: 'strength', description: '', source: 'test', factors: [{ caseId: 'all', factor: 1 }] };
    return { model, cases, combo };
  };
  const opts = { secondOrder: true, tolerance: 1e-10, maxIterations: 100, stationSpacing_m: 0.5 };
  // Timoshenko & Gere, Theory of Elastic Stability, section 2.3, column under its own weight:
  // (q L)cr = 7.837 E I / L^2 (from memory)
  const qcr = (7.837 * EI) / L ** 3;

  it('member forces are continuous across element joints and match the end forces (statics of the deformed segment)', () => {
    const { model, cases, combo } = column(0.6 * qcr, 500);
    const r = analyzeCombination(model, cases, combo, opts);
    const st = r.members.m.stations;
    for (const ef of r.elementEndForces.slice(1)) {
      // internal force just after end i is minus the end force on the element there
      const s = model.elements[ef.element].sI_m;
      const at = st.find((x) => Math.abs(x.s_m - s) < 1e-9)!;
      const scale = Math.max(...st.map((x) => Math.hypot(x.My_Nm, x.Mz_Nm)));
      expect(Math.abs(at.My_Nm + ef.i[4])).toBeLessThan(1e-9 * scale);
      expect(Math.abs(at.Mz_Nm + ef.i[5])).toBeLessThan(1e-9 * scale);
      expect(Math.abs(at.N_N + ef.i[0])).toBeLessThan(1e-6 * 0.6 * qcr * L);
    }
    // amplification > 1 is reported with the combination's base moment
    expect(r.baseMoment!.amplification!).toBeGreaterThan(1.2);
  });

  it('buckling under distributed axial load: converges at 0.9 (q L)cr and throws at 1.1 (q L)cr', () => {
    const ok = column(0.9 * qcr, 100);
    expect(() => analyzeCombination(ok.model, ok.cases, ok.combo, opts)).not.toThrow();
    const bad = column(1.1 * qcr, 100);
    expect(() => analyzeCombination(bad.model, bad.cases, bad.combo, opts)).toThrow(UnstableStructureError);
  });
});
