// L-shaped frame: fixed-base column of height h, rigid joint, arm of length a, tip load P.
// Reference: moment-area method (Mohr's theorems), e.g. Hibbeler, Structural Analysis, ch. 8
// (deflections by moment-area) — the closed forms below follow from M/EI diagrams.
// The closed forms neglect axial deformation: the elements here carry A x 1e4, which brings the
// axial contribution below 1e-8 of the results; tolerance 1e-7 relative.
import { describe, expect, it } from 'vitest';
import { solveLoads } from '../../src/analysis/analyze.ts';
import { FrameBuilder, nodal, roundTube, type Section } from './frame-helpers.ts';

const base = roundTube(0.35, 0.008);
const sec: Section = { ...base, A_m2: base.A_m2 * 1e4 };
const EI = sec.E_Pa * sec.Iz_m4;
const GJ = sec.G_Pa * sec.J_m4;
const h = 7;
const a = 9;
const P = 5e3;
const TOL = 1e-7;
const rel = (x: number, y: number): number => Math.abs(x - y) / Math.abs(y);

function lFrame(offset_m: number) {
  const b = new FrameBuilder();
  const b0 = b.node([0, 0, 0], 'base');
  b.fix(b0);
  const pole = b.member('pole', 'pole', b0, [0, 0, h], 7, () => sec, { tipTag: 'pole-top' });
  const top = pole[pole.length - 1];
  const arm = b.member('A1', 'arm', top, [offset_m + a, 0, h], 9, () => sec, { offsetRoot: [offset_m, 0, 0], tipTag: 'arm-tip:A1' });
  return { model: b.build(), top, tip: arm[arm.length - 1] };
}

describe('L-frame, load in the plane of the frame (moment-area)', () => {
  for (const r of [0, 0.2]) {
    it(`tip load down, rigid offset at the arm root ${r} m`, () => {
      const { model, top, tip } = lFrame(r);
      const res = solveLoads(model, [nodal(tip, [0, 0, -P])], { stationSpacing_m: 0.5 });
      const lever = a + r; // the rigid offset adds lever arm but no flexibility
      // uniform column moment P a, zero column shear
      for (const st of res.members.pole.stations) {
        expect(rel(Math.hypot(st.My_Nm, st.Mz_Nm), P * lever)).toBeLessThan(TOL);
        expect(Math.hypot(st.Vy_N, st.Vz_N)).toBeLessThan(1e-7 * P);
      }
      const uTop = res.displacements[top];
      // joint rotation P a h / (E I), about +Y (the load's moment (a,0,0) x (0,0,-P) is +Y)
      expect(rel(uTop[4], (P * lever * h) / EI)).toBeLessThan(TOL);
      // joint sway P a h^2 / (2 E I), toward +X (the arm side)
      expect(rel(uTop[0], (P * lever * h ** 2) / (2 * EI))).toBeLessThan(TOL);
      // arm-tip drop P a^3 / (3 E I) + P a^2 h / (E I)
      expect(rel(-res.displacements[tip][2], (P * a ** 3) / (3 * EI) + (P * lever ** 2 * h) / EI)).toBeLessThan(TOL);
      // the rigid joint keeps its angle: arm root end slope = joint rotation (station displacement
      // at the clear arm root = node displacement + rotation x offset)
      const root = res.members.A1.stations[0];
      // theta x (r, 0, 0) has z component -theta_y r
      expect(Math.abs(root.uz_m - (uTop[2] - uTop[4] * r))).toBeLessThan(1e-12);
      expect(Math.abs(root.ux_m - uTop[0])).toBeLessThan(1e-12);
      // statics (equilibrium); A x 1e4 turns round-off of the end forces into about 1e-8
      expect(res.statics.relativeResidual).toBeLessThan(1e-7);
    });
  }
});

describe('L-frame, load normal to the plane of the frame (moment-area plus torsion)', () => {
  it('tip load along Y: column torsion P a; tip deflection P a^3/(3EI) + P h^3/(3EI) + P a^2 h/(GJ)', () => {
    const { model, tip } = lFrame(0);
    const res = solveLoads(model, [nodal(tip, [0, P, 0])]);
    for (const st of res.members.pole.stations) expect(rel(Math.abs(st.T_Nm), P * a)).toBeLessThan(TOL);
    const expected = (P * a ** 3) / (3 * EI) + (P * h ** 3) / (3 * EI) + (P * a ** 2 * h) / GJ;
    expect(rel(res.displacements[tip][1], expected)).toBeLessThan(TOL);
    // base reactions: shear P, torque P a, overturning moment P h (statics)
    const R = res.reactions[0].force;
    expect(rel(-R[1], P)).toBeLessThan(1e-12);
    expect(rel(Math.abs(R[5]), P * a)).toBeLessThan(1e-9);
    expect(rel(Math.abs(R[3]), P * h)).toBeLessThan(1e-9);
  });
});
