// Cantilevers and fixed-fixed beams against beam-formula tables.
// Sources: AISC Steel Construction Manual (15th ed.), Table 3-23 "Shears, Moments and Deflections",
// cases named by their titles (case numbers not quoted: recalled from memory, not at hand);
// Roark's Formulas for Stress and Strain (7th ed.), Table 8.1 (from memory).
import { describe, expect, it } from 'vitest';
import { solveLoads } from '../../src/analysis/analyze.ts';
import type { AppliedLoad } from '../../src/loads/load-types.ts';
import type { Vec3 } from '../../src/model/frame.ts';
import { cantilever, FrameBuilder, nodal, roundTube, uniformOn } from './frame-helpers.ts';

const sec = roundTube(0.3, 0.008);
const EI = sec.E_Pa * sec.Iz_m4;
const L = 6;
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

const directions: [string, Vec3, Vec3][] = [
  // member direction, load direction (perpendicular)
  ['horizontal along X, load down', [1, 0, 0], [0, 0, -1]],
  ['horizontal along Y, load along X', [0, 1, 0], [1, 0, 0]],
  ['vertical along Z, load along Y', [0, 0, 1], [0, 1, 0]],
];

describe('cantilever with a tip load (AISC Table 3-23: cantilever beam, concentrated load at free end)', () => {
  for (const [name, dir, load] of directions) {
    it(name, () => {
      const P = 12e3;
      const { model, nodes } = cantilever(L, 8, dir, sec);
      const tip = nodes[nodes.length - 1];
      const r = solveLoads(model, [nodal(tip, [P * load[0], P * load[1], P * load[2]])]);
      const u = r.displacements[tip];
      const defl = u[0] * load[0] + u[1] * load[1] + u[2] * load[2];
      // AISC: max deflection at free end P l^3 / (3 E I); tolerance 1e-9 (exact for cubic elements)
      expect(rel(defl, (P * L ** 3) / (3 * EI))).toBeLessThan(1e-9);
      // AISC / Roark: end slope P l^2 / (2 E I) about the axis dir x load
      const axis = [dir[1] * load[2] - dir[2] * load[1], dir[2] * load[0] - dir[0] * load[2], dir[0] * load[1] - dir[1] * load[0]];
      const rot = u[3] * axis[0] + u[4] * axis[1] + u[5] * axis[2];
      expect(rel(rot, (P * L ** 2) / (2 * EI))).toBeLessThan(1e-9);
      // AISC: M max = P l at the fixed end (reaction moment magnitude)
      const R = r.reactions[0].force;
      expect(rel(Math.hypot(R[3], R[4], R[5]), P * L)).toBeLessThan(1e-9);
      // Statics: reactions balance the load (equilibrium)
      expect(r.statics.relativeResidual).toBeLessThan(1e-12);
      // Member stations: |M| = P (L - s), linear; extreme P L at the root
      const m = r.members.m;
      for (const st of m.stations) expect(Math.abs(Math.hypot(st.My_Nm, st.Mz_Nm) - P * (L - st.s_m))).toBeLessThan(1e-6 * P * L);
      expect(rel(m.extremes.Mres.max.value, P * L)).toBeLessThan(1e-9);
      expect(m.extremes.Mres.max.s_m).toBeCloseTo(0, 9);
    });
  }
});

describe('cantilever with a uniform load (AISC Table 3-23: cantilever beam, uniformly distributed load)', () => {
  for (const [name, dir, load] of directions) {
    for (const axes of ['global', 'local'] as const) {
      it(`${name}, load given in ${axes} axes`, () => {
        const w = 2.5e3;
        const n = 6;
        const { model, nodes } = cantilever(L, n, dir, sec);
        const loads: AppliedLoad[] = model.elements.map((el) => {
          if (axes === 'global') return uniformOn(el.id, L / n, load, w, 'global');
          // local y of this element is the refVector made perpendicular; find the load's local direction
          return uniformOn(el.id, L / n, localOf(el.refVector, dir, load), w, 'local');
        });
        const r = solveLoads(model, loads, { stationSpacing_m: 0.25 });
        const tip = nodes[nodes.length - 1];
        const u = r.displacements[tip];
        const defl = u[0] * load[0] + u[1] * load[1] + u[2] * load[2];
        // AISC: max deflection at free end w l^4 / (8 E I); tolerance 1e-9 (nodal values exact)
        expect(rel(defl, (w * L ** 4) / (8 * EI))).toBeLessThan(1e-9);
        // Roark Table 8.1: end slope w l^3 / (6 E I) (from memory)
        const rot = Math.hypot(u[3], u[4], u[5]);
        expect(rel(rot, (w * L ** 3) / (6 * EI))).toBeLessThan(1e-9);
        // AISC: M max = w l^2 / 2 at fixed end; M(x) = w x^2 / 2 with x from the free end
        const m = r.members.m;
        for (const st of m.stations) {
          expect(Math.abs(Math.hypot(st.My_Nm, st.Mz_Nm) - (w * (L - st.s_m) ** 2) / 2)).toBeLessThan(1e-6 * w * L * L);
          // AISC: V = w x
          expect(Math.abs(Math.hypot(st.Vy_N, st.Vz_N) - w * (L - st.s_m))).toBeLessThan(1e-6 * w * L);
        }
        expect(rel(m.extremes.Mres.max.value, (w * L ** 2) / 2)).toBeLessThan(1e-9);
        // station deflection at mid-length from the Hermite shape functions vs the elastic curve
        // AISC: Delta_x = w / (24 E I) (x^4 - 4 l^3 x + 3 l^4), x from the free end; the station
        // (inside an element: 6 elements of 1 m, station at 3.0 m is a node, so also check 3.25 m)
        // adds the element's particular solution, so the elastic curve is exact: tolerance 1e-9
        const mid = m.stations.find((s) => Math.abs(s.s_m - L / 2) < 1e-9)!;
        const x = L / 2;
        const expected = (w / (24 * EI)) * (x ** 4 - 4 * L ** 3 * x + 3 * L ** 4); // x = l/2 from either end
        const got = mid.ux_m * load[0] + mid.uy_m * load[1] + mid.uz_m * load[2];
        expect(Math.abs(got - expected)).toBeLessThan(1e-9 * (w * L ** 4) / (8 * EI));
        const inner = m.stations.find((s) => Math.abs(s.s_m - 3.25) < 1e-9)!;
        const xi = L - 3.25;
        const expectedInner = (w / (24 * EI)) * (xi ** 4 - 4 * L ** 3 * xi + 3 * L ** 4);
        const gotInner = inner.ux_m * load[0] + inner.uy_m * load[1] + inner.uz_m * load[2];
        expect(Math.abs(gotInner - expectedInner)).toBeLessThan(1e-9 * (w * L ** 4) / (8 * EI));
      });
    }
  }
});

/** The load direction in the element's local axes (x along dir, y from refVector). */
function localOf(ref: Vec3, dir: Vec3, load: Vec3): Vec3 {
  const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
  const along = dot(ref, dir);
  const yRaw: Vec3 = [ref[0] - along * dir[0], ref[1] - along * dir[1], ref[2] - along * dir[2]];
  const n = Math.hypot(...yRaw);
  const y: Vec3 = [yRaw[0] / n, yRaw[1] / n, yRaw[2] / n];
  const z: Vec3 = [dir[1] * y[2] - dir[2] * y[1], dir[2] * y[0] - dir[0] * y[2], dir[0] * y[1] - dir[1] * y[0]];
  return [dot(load, dir), dot(load, y), dot(load, z)];
}

describe('cantilever with a partial trapezoidal load', () => {
  // Reference: superposition of the tip deflection for a concentrated load at distance xi from
  // the support, P xi^2 (3 l - xi) / (6 E I) (AISC Table 3-23: cantilever beam, concentrated load
  // at any point; Roark Table 8.1, from memory), integrated over the load by 3-point Gauss
  // quadrature, which is exact for this quartic integrand. Base shear = integral of q, base
  // moment = integral of q xi (statics).
  const cases: [number, number, number, number][] = [
    [1.2, 4.3, 800, 3100],
    [0.0, 6.0, 3000, 0],
    [2.0, 2.9, -500, 1500],
  ];
  for (const [a, b, wA, wB] of cases) {
    it(`load from ${a} m to ${b} m, ${wA} -> ${wB} N/m, on one element and on a 7-element chain`, () => {
      const q = (xi: number): number => wA + ((wB - wA) * (xi - a)) / (b - a);
      let tip = 0;
      let shear = 0;
      let moment = 0;
      const gt = [-Math.sqrt(0.6), 0, Math.sqrt(0.6)];
      const gw = [5 / 9, 8 / 9, 5 / 9];
      const h = (b - a) / 2;
      for (let g = 0; g < 3; g++) {
        const xi = a + h * (1 + gt[g]);
        tip += gw[g] * h * q(xi) * ((xi ** 2) * (3 * L - xi)) / (6 * EI);
        shear += gw[g] * h * q(xi);
        moment += gw[g] * h * q(xi) * xi;
      }
      for (const n of [1, 7]) {
        const { model, nodes } = cantilever(L, n, [1, 0, 0], sec);
        const loads: AppliedLoad[] = [];
        const le = L / n;
        for (let e = 0; e < n; e++) {
          const s0 = Math.max(a, e * le);
          const s1 = Math.min(b, (e + 1) * le);
          if (s1 <= s0) continue;
          loads.push({
            kind: 'distributed', element: e, axes: 'global', direction: [0, 0, -1],
            wA_Npm: q(s0), wB_Npm: q(s1), a_m: s0 - e * le, b_m: s1 - e * le, origin: { source: 'test' },
          });
        }
        const r = solveLoads(model, loads);
        const uz = -r.displacements[nodes[nodes.length - 1]][2];
        expect(rel(uz, tip)).toBeLessThan(1e-9);
        const R = r.reactions[0].force;
        expect(rel(R[2], shear)).toBeLessThan(1e-12);
        // moment about +Y of the reaction balances the load's moment q xi (downward load at +X)
        expect(rel(-R[4], moment)).toBeLessThan(1e-9);
        // exact extremes: max |Vz| and |My| at the root; station at load start present
        const m = r.members.m;
        expect(m.stations.some((s) => Math.abs(s.s_m - a) < 1e-9 || a === 0)).toBe(true);
        // local axes of a member along X with refVector Z: y = Z, z = -Y, so this load bends about local z
        expect(rel(Math.max(Math.abs(m.extremes.Mz.max.value), Math.abs(m.extremes.Mz.min.value)), Math.abs(moment))).toBeLessThan(1e-9);
      }
    });
  }
});

describe('tip moment and torque (AISC Table 3-23 / Roark Table 8.1: cantilever, end moment; torsion of a shaft)', () => {
  it('moment M at the tip: slope M l / (E I), deflection M l^2 / (2 E I)', () => {
    const M = 40e3;
    const { model, nodes } = cantilever(L, 5, [1, 0, 0], sec);
    const tip = nodes[nodes.length - 1];
    const r = solveLoads(model, [nodal(tip, [0, 0, 0], [0, M, 0])]);
    const u = r.displacements[tip];
    // Roark Table 8.1 (from memory): theta = M l / (E I), y = M l^2 / (2 E I); +My rotates +X toward -Z
    expect(rel(u[4], (M * L) / EI)).toBeLessThan(1e-9);
    expect(rel(-u[2], (M * L ** 2) / (2 * EI))).toBeLessThan(1e-9);
  });
  it('torque T at the tip: twist T l / (G J) (Roark Table 10.1, circular tube, from memory)', () => {
    const T = 15e3;
    const { model, nodes } = cantilever(L, 5, [0, 0, 1], sec);
    const tip = nodes[nodes.length - 1];
    const r = solveLoads(model, [nodal(tip, [0, 0, 0], [0, 0, T])]);
    expect(rel(r.displacements[tip][5], (T * L) / (sec.G_Pa * sec.J_m4))).toBeLessThan(1e-9);
    for (const st of r.members.m.stations) expect(rel(st.T_Nm, T)).toBeLessThan(1e-9);
  });
  it('point moment and point torque inside an element give the tip rotations of the cantilever', () => {
    const { model, nodes } = cantilever(L, 3, [1, 0, 0], sec);
    const a = 1.3; // inside element 0 (length 2)
    const My = 9e3;
    const Tx = 7e3;
    const r = solveLoads(model, [
      { kind: 'point-moment', element: 0, axes: 'global', direction: [0, 1, 0], value: My, a_m: a, origin: { source: 't' } },
      { kind: 'point-moment', element: 0, axes: 'local', direction: [1, 0, 0], value: Tx, a_m: a, origin: { source: 't' } },
    ]);
    const u = r.displacements[nodes[3]];
    // Roark Table 8.1 (from memory): a moment at distance a rotates the beam beyond it by M a / (E I),
    // deflection at the tip M a (L - a/2) / (E I); twist T a / (G J)
    expect(rel(u[4], (My * a) / EI)).toBeLessThan(1e-9);
    expect(rel(-u[2], (My * a * (L - a / 2)) / EI)).toBeLessThan(1e-9);
    expect(rel(u[3], (Tx * a) / (sec.G_Pa * sec.J_m4))).toBeLessThan(1e-9);
    // the moment steps at the load: two stations at the same s (left and right) differing by My
    const at = r.members.m.stations.filter((s) => Math.abs(s.s_m - a) < 1e-9);
    expect(at.map((s) => s.side)).toEqual(['left', 'right']);
    // global Y is local -z for this member (y = Z, z = -Y)
    expect(Math.abs(Math.abs(at[1].Mz_Nm - at[0].Mz_Nm) - My)).toBeLessThan(1e-6 * My);
    expect(Math.abs(Math.abs(at[1].T_Nm - at[0].T_Nm) - Tx)).toBeLessThan(1e-6 * Tx);
  });
});

describe('beam fixed at both ends (AISC Table 3-23)', () => {
  const span = 5;
  function fixedFixed(n: number) {
    const b = new FrameBuilder();
    const a = b.node([0, 0, 0], 'end-a');
    b.fix(a);
    const ids = b.member('beam', 'arm', a, [span, 0, 0], n, () => sec);
    b.fix(ids[ids.length - 1]);
    return b.build();
  }
  it('uniformly distributed load: end moments w l^2/12, centre w l^2/24, reactions w l/2', () => {
    const w = 4e3;
    for (const n of [1, 4]) {
      const model = fixedFixed(n);
      const r = solveLoads(model, model.elements.map((el) => uniformOn(el.id, span / n, [0, 0, -1], w)), { stationSpacing_m: 0.5 });
      expect(rel(r.reactions[0].force[2], (w * span) / 2)).toBeLessThan(1e-12);
      expect(rel(Math.abs(r.reactions[0].force[4]), (w * span ** 2) / 12)).toBeLessThan(1e-9);
      const m = r.members.beam;
      const centre = m.stations.find((s) => Math.abs(s.s_m - span / 2) < 1e-9)!;
      expect(rel(Math.abs(centre.Mz_Nm), (w * span ** 2) / 24)).toBeLessThan(1e-9);
      // exact extremes: the positive-moment maximum at the zero-shear point, the centre
      const ext = [m.extremes.Mz.max, m.extremes.Mz.min].find((e) => e.s_m > 0.1 && e.s_m < span - 0.1)!;
      expect(rel(Math.abs(ext.value), (w * span ** 2) / 24)).toBeLessThan(1e-9);
      expect(ext.s_m).toBeCloseTo(span / 2, 6);
      // AISC: max deflection at centre w l^4 / (384 E I) (node 2 sits at the centre; nodal values exact)
      if (n === 4) expect(rel(-r.displacements[2][2], (w * span ** 4) / (384 * EI))).toBeLessThan(1e-9);
    }
  });
  it('concentrated load at any point: end moments P a b^2 / l^2 and P a^2 b / l^2; reactions P b^2 (3a+b)/l^3', () => {
    const P = 10e3;
    const a = 1.7;
    const bb = span - a;
    const model = fixedFixed(1);
    const r = solveLoads(model, [
      { kind: 'point-force', element: 0, axes: 'global', direction: [0, 0, -1], value: P, a_m: a, origin: { source: 't' } },
    ]);
    const [Ra, Rb] = r.reactions.map((x) => x.force);
    expect(rel(Math.abs(Ra[4]), (P * a * bb ** 2) / span ** 2)).toBeLessThan(1e-9);
    expect(rel(Math.abs(Rb[4]), (P * a ** 2 * bb) / span ** 2)).toBeLessThan(1e-9);
    expect(rel(Ra[2], (P * bb ** 2 * (3 * a + bb)) / span ** 3)).toBeLessThan(1e-9);
    // AISC: moment at the point of load 2 P a^2 b^2 / l^3; shear steps by P across the load
    const at = r.members.beam.stations.filter((s) => Math.abs(s.s_m - a) < 1e-9);
    expect(at.length).toBe(2);
    expect(rel(Math.abs(at[0].Mz_Nm), (2 * P * a ** 2 * bb ** 2) / span ** 3)).toBeLessThan(1e-9);
    expect(rel(Math.abs(at[0].Vy_N - at[1].Vy_N), P)).toBeLessThan(1e-9);
  });
});
