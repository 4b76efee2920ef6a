// Self-tests of the CalculiX harness against closed forms, before it is trusted as a reference
// for polebook (tests/reference/calculix.test.ts). Needs `ccx` (Debian package calculix-ccx);
// skipped with a message when absent. The deck writer's own rules are checked without ccx.
import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../../src/model/frame.ts';
import { FrameSketch, nodalLoad, type TubeProps } from './calculix/frame-sketch.ts';
import { roundTubeSection, pipeFromSection } from './calculix/pipe-from-section.ts';
import { runCalculix } from './calculix/run-calculix.ts';
import { writeCalculixInput, field, quadraticLineLoad, piecePositions, buildCalculixDeck } from './calculix/write-input.ts';
import { reactionsFromPointForces } from './calculix/statics.ts';
import { parseFortranNumber } from './calculix/parse-dat.ts';
import { ccxAvailableOrSkip } from './calculix/has-ccx.ts';
import { treeMotions, treeTranslations } from './calculix/tree-closed-form.ts';
import { rotationFromProbes } from './calculix/run-calculix.ts';
import { norm, sub, scale, add, cross, unit } from './calculix/vec3.ts';

const ccxPresent = ccxAvailableOrSkip();

// Steel moduli, typical values (E = 200 GPa, G = 77 GPa), verify against the governing code;
// any values serve here since both sides use the same ones.
const E_Pa = 200e9;
const G_Pa = 77e9;
const tube = (D_m: number, t_m: number): TubeProps => ({ E_Pa, G_Pa, ...roundTubeSection(D_m, t_m), diameter_m: D_m });

/** |a - b| / |b| for vectors. */
const vecError = (a: Vec3, b: Vec3): number => norm(sub(a, b)) / norm(b);

// Tolerance for ccx against Euler-Bernoulli closed forms: 0.5 %. ccx's expanded beams include
// shear deformation, measured at about 55 % of the Timoshenko term P L / (k G A), k = 0.5 for a
// thin tube; for the proportions below (L/D >= 30) that is under 0.1 %; .dat output has 7 digits.
const CLOSED_FORM_TOL = 0.005;

describe('CalculiX deck writer (no ccx needed)', () => {
  it('recovers the annulus radius and wall from A and I (exact inversion of the annulus formulas)', () => {
    const s = roundTubeSection(0.35, 0.0079);
    const p = pipeFromSection(s.A_m2, s.I_m4, s.I_m4, s.J_m4);
    expect(p.outerRadius_m).toBeCloseTo(0.175, 12);
    expect(p.thickness_m).toBeCloseTo(0.0079, 12);
  });

  it('refuses sections that are not a round annulus (J must equal 2 I)', () => {
    const s = roundTubeSection(0.3, 0.006);
    expect(() => pipeFromSection(s.A_m2, s.I_m4, s.I_m4, 1.5 * s.I_m4)).toThrow(/not a round annulus/);
    expect(() => pipeFromSection(s.A_m2, s.I_m4, 0.9 * s.I_m4, s.J_m4)).toThrow(/not a round annulus/);
  });

  it('keeps every numeric field within the 20 characters ccx accepts', () => {
    for (const x of [-1.2345678901234567e-123, 3.1e11, 1 / 3, -2e-7]) {
      expect(field(x).length).toBeLessThanOrEqual(20);
      expect(Number(field(x))).toBeCloseTo(x, 10 - Math.floor(Math.log10(Math.abs(x))));
    }
  });

  it('reads Fortran numbers, including three-digit exponents written without E', () => {
    expect(parseFortranNumber('-1.234567E-03')).toBeCloseTo(-1.234567e-3, 15);
    expect(parseFortranNumber('1.234567-100')).toBe(1.234567e-100);
  });

  it('recovers a rotation from two probe offsets w = theta x d (vector identity)', () => {
    const theta: Vec3 = [1.5e-3, -2e-4, 7e-4];
    const a = unit([0.61, 0.37, 0.7]);
    const b = unit(cross(a, [0.2, -0.9, 0.35]));
    const got = rotationFromProbes(a, cross(theta, a), b, cross(theta, b));
    expect(norm(sub(got, theta)) / norm(theta)).toBeLessThan(1e-12);
  });

  it('rejects loads it cannot place instead of dropping them', () => {
    const s = new FrameSketch();
    const b = s.node([0, 0, 0]);
    s.chain('pole', b, [0, 0, 5], [tube(0.3, 0.006)], [1, 0, 0]);
    const model = s.build(b);
    const beyond = { kind: 'distributed', element: 0, axes: 'global', direction: [1, 0, 0], wA_Npm: 1, wB_Npm: 1, a_m: 0, b_m: 5.5, origin: { source: 'x' } } as const;
    expect(() => writeCalculixInput(model, [beyond])).toThrow(/outside element 0/);
    const missing = { kind: 'point-force', element: 3, axes: 'local', direction: [0, 1, 0], value: 1, a_m: 1, origin: { source: 'y' } } as const;
    expect(() => writeCalculixInput(model, [missing])).toThrow(/missing element 3/);
  });

  it('lumps a linear line load onto a quadratic element with the same resultant and moment (trapezoid statics)', () => {
    const [w0, w1, h] = [1200, -300, 0.7];
    const [f0, fm, f1] = quadraticLineLoad(w0, w1, h);
    // Trapezoid: resultant (w0 + w1) h / 2, moment about the start h^2 (w0/6 + w1/3).
    expect(f0 + fm + f1).toBeCloseTo(((w0 + w1) * h) / 2, 10);
    expect(fm * (h / 2) + f1 * h).toBeCloseTo(h * h * (w0 / 6 + w1 / 3), 10);
  });

  it('cuts the element at every load position and keeps pieces no longer than L/n', () => {
    const p = piecePositions(4, [1.1, 2, 2 + 1e-9, 0], 4);
    expect(p).toContain(1.1);
    expect(p).toContain(2);
    expect(p[0]).toBe(0);
    expect(p[p.length - 1]).toBe(4);
    for (let k = 1; k < p.length; k++) expect(p[k]! - p[k - 1]!).toBeLessThanOrEqual(1 + 1e-12);
    expect(p.filter((x) => Math.abs(x - 2) < 1e-6)).toHaveLength(1);
  });

  it('writes element loads whose statics equal the loads given (resultant and moment about the base)', () => {
    const s = new FrameSketch();
    const base = s.node([0, 0, 0]);
    const tp = tube(0.3, 0.006);
    s.chain('pole', base, [0, 0, 6], [tp, tp], [1, 0, 0]);
    const model = s.build(base);
    // Element 1 spans z = 3..6 m. A trapezoid in global x over [0.5, 2.5] m of it: resultant
    // (400 + 100) / 2 x 2 = 500 N at the trapezoid centroid z = 3.5 + 2 (400 + 2 x 100) / (3 (400 + 100)).
    const loads = [
      { kind: 'distributed', element: 1, axes: 'global', direction: [1, 0, 0], wA_Npm: 400, wB_Npm: 100, a_m: 0.5, b_m: 2.5, origin: { source: 't' } },
      { kind: 'point-moment', element: 0, axes: 'global', direction: [0, 1, 0], value: 700, a_m: 1.3, origin: { source: 'm' } },
    ] as const;
    const { pointForces } = buildCalculixDeck(model, loads);
    const r = reactionsFromPointForces(model, pointForces)[0]!.force;
    const zc = 3.5 + (2 * (400 + 2 * 100)) / (3 * 500);
    expect(r[0]).toBeCloseTo(-500, 9);
    expect(r[4]).toBeCloseTo(-(500 * zc + 700), 8); // My about the base: z Fx plus the couple
  });
});

describe('tree closed form used to check the harness (no ccx needed)', () => {
  it('reproduces the moment-area results for an L-frame with a tip load (sway P a h^2/(2EI), tip drop P a^3/(3EI) + P a^2 h/EI)', () => {
    // Source: the moment-area theorems applied to an L-shaped frame (e.g. Hibbeler, Structural
    // Analysis, deflections by the moment-area method; the results are derived by hand from them). Axial strain is left out of those formulas, so A is made very large here.
    const stiffAxial: TubeProps = { ...tube(0.3, 0.006), A_m2: 1e6 };
    const h = 7;
    const a = 6;
    const P = -1000;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0]);
    const top = s.chain('pole', base, [0, 0, h], [stiffAxial], [1, 0, 0]);
    const tip = s.chain('A1', top, [a, 0, h], [stiffAxial], [0, 0, 1]);
    const u = treeTranslations(s.build(base), [nodalLoad(tip, [0, 0, P])]);
    const EI = E_Pa * stiffAxial.I_m4;
    // A downward load on an arm along +x turns the joint so the arm tip drops: the pole top
    // tilts and sways toward +x by |P| a h^2/(2EI).
    expect(u[top]![0]).toBeCloseTo((-P * a * h * h) / (2 * EI), 12);
    expect(u[tip]![2]).toBeCloseTo((P * a ** 3) / (3 * EI) + (P * a * a * h) / EI, 12);
  });
});

describe.skipIf(!ccxPresent)('CalculiX harness against closed forms', () => {
  it('prismatic vertical cantilever, tip shear: P L^3/(3 E I) (beam-formula tables)', async () => {
    const tp = tube(0.3, 0.006);
    const L = 12;
    const P = 2000;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const tip = s.chain('pole', base, [0, 0, L], [tp, tp, tp], [1, 0, 0]);
    const r = await runCalculix(s.build(base), [nodalLoad(tip, [P, 0, 0])]);
    const exact = (P * L ** 3) / (3 * E_Pa * tp.I_m4);
    expect(Math.abs(r.translations_m[tip]![0] / exact - 1)).toBeLessThan(CLOSED_FORM_TOL);
    // Deflection at mid-height, beam-formula tables: P x^2 (3L - x) / (6 E I) at x = 2L/3... node at L/3 and 2L/3.
    const node1 = 1;
    const x = s.xyz(node1)[2];
    const exactMid = (P * x * x * (3 * L - x)) / (6 * E_Pa * tp.I_m4);
    expect(Math.abs(r.translations_m[node1]![0] / exactMid - 1)).toBeLessThan(CLOSED_FORM_TOL);
  });

  it('axial load on a column: N L/(E A) (Hooke)', async () => {
    const tp = tube(0.3, 0.006);
    const L = 10;
    const N = -50_000;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const tip = s.chain('pole', base, [0, 0, L], [tp, tp], [1, 0, 0]);
    const r = await runCalculix(s.build(base), [nodalLoad(tip, [0, 0, N])]);
    // 1 %: ccx's expanded PIPE section is measured 0.5-0.8 % softer axially than the exact
    // annulus (0.56 % at D/t = 50); axial strain is a negligible part of a pole's deflection.
    expect(Math.abs(r.translations_m[tip]![2] / ((N * L) / (E_Pa * tp.A_m2)) - 1)).toBeLessThan(0.01);
  });

  it('torsion through a rigid lever: T L/(G J) plus bending (Roark cantilever cases, uniform torsion)', async () => {
    // Horizontal member along y, lever of 2.5 m along x at its tip made by a rigid offset;
    // the vertical load twists the member: about a third of the tip drop is twist.
    const tp = tube(0.25, 0.006);
    const L = 8;
    const lever: Vec3 = [2.5, 0, 0];
    const P = -1500;
    const s = new FrameSketch();
    const root = s.node([0, 0, 3], 'root');
    const tipNode = s.node(add([0, L, 3], lever), 'tip');
    s.element('arm', root, tipNode, tp, [0, 0, 1], [0, 0, 0], scale(lever, -1));
    const r = await runCalculix(s.build(root), [nodalLoad(tipNode, [0, 0, P])]);
    // Tip drop = bending P L^3/(3EI) + twist (P e) L/(GJ) times the lever e (Roark; uniform torsion).
    const bending = (P * L ** 3) / (3 * E_Pa * tp.I_m4);
    const twist = (P * 2.5 * 2.5 * L) / (G_Pa * tp.J_m4);
    expect(twist / (bending + twist)).toBeGreaterThan(0.25); // the case really exercises torsion
    expect(Math.abs(r.translations_m[tipNode]![2] / (bending + twist) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    // The twist does not move the tip sideways or along the member (to 1e-3 of the drop, ccx precision).
    expect(Math.abs(r.translations_m[tipNode]![0])).toBeLessThan(1e-3 * Math.abs(bending + twist));
  });

  it('L-frame with a plan-angled, rising arm, rigid offset at its root, 3D force and moment at the tip and a torque at the pole top (superposed cantilever cases)', async () => {
    // Checks the per-member material orientation (an arm aligned with no global axis), the stiff
    // offset stubs and the force couples that stand in for nodal moments, at every node.
    const pole = tube(0.35, 0.008);
    const arm = tube(0.2, 0.005);
    const phi = (30 * Math.PI) / 180;
    const rise = (10 * Math.PI) / 180;
    const dir: Vec3 = [Math.cos(phi) * Math.cos(rise), Math.sin(phi) * Math.cos(rise), Math.sin(rise)];
    const off: Vec3 = [0.175 * Math.cos(phi), 0.175 * Math.sin(phi), 0];
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const top = s.chain('pole', base, [0, 0, 8], [pole, pole], [1, 0, 0]);
    const tip = s.chain('A1', top, add(add(s.xyz(top), off), scale(dir, 9)), [arm, arm], [0, 0, 1], off);
    const model = s.build(base);
    const loads = [nodalLoad(tip, [300, -500, -800], [200, -300, 150]), nodalLoad(top, [0, 0, 0], [0, 0, 900])];
    const r = await runCalculix(model, loads, { rotationProbes: [top, tip] });
    const expected = treeMotions(model, loads);
    for (const n of [top, tip, 1, 3]) {
      expect(vecError(r.translations_m[n]!, expected[n]!.u)).toBeLessThan(CLOSED_FORM_TOL);
    }
    for (const n of [top, tip]) {
      expect(vecError(r.rotations_rad.get(n)!, expected[n]!.theta)).toBeLessThan(CLOSED_FORM_TOL);
    }
  });

  it('refuses a support on a member not parallel to a global axis (ccx 2.20 fails there)', () => {
    const s = new FrameSketch();
    const root = s.node([0, 0, 0]);
    s.chain('arm', root, [3, 4, 5], [tube(0.3, 0.006)], [0, 0, 1]);
    expect(() => writeCalculixInput(s.build(root), [])).toThrow(/not parallel to a global axis/);
  });

  it('stepped (tapered) cantilever of 8 segments: moment-area sum of P/(3EI_k)[(L-a)^3-(L-b)^3] (Mohr)', async () => {
    // Section changes are where ccx ties sections rigidly; with an isotropic material this case
    // came out stiff (measured on this machine); the orthotropic zero-Poisson material fixes it.
    const L = 12;
    const n = 8;
    const tubes = Array.from({ length: n }, (_, k) => tube(0.4 - (0.2 * k) / (n - 1), 0.006));
    const P = 1000;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const tip = s.chain('pole', base, [0, 0, L], tubes, [1, 0, 0]);
    const r = await runCalculix(s.build(base), [nodalLoad(tip, [0, P, 0])]);
    // Mohr's second theorem: tip deflection = integral of M(x) (L - x) / (E I(x)) dx, M = P (L - x).
    let exact = 0;
    tubes.forEach((t, k) => {
      const a = (k * L) / n;
      const b = ((k + 1) * L) / n;
      exact += (P / (3 * E_Pa * t.I_m4)) * ((L - a) ** 3 - (L - b) ** 3);
    });
    expect(Math.abs(r.translations_m[tip]![1] / exact - 1)).toBeLessThan(CLOSED_FORM_TOL);
  });

  it('rotations from probes: cantilever tip P L^2/(2EI) and twist T L/(GJ) (beam-formula tables, uniform torsion)', async () => {
    const tp = tube(0.3, 0.006);
    const L = 10;
    const P = 1500;
    const T = 2000;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const tip = s.chain('pole', base, [0, 0, L], [tp, tp], [1, 0, 0]);
    const r = await runCalculix(s.build(base), [nodalLoad(tip, [P, 0, 0], [0, 0, T])], { rotationProbes: [tip] });
    const rot = r.rotations_rad.get(tip)!;
    // Force +X on a pole along +Z turns the tip about +Y.
    expect(Math.abs(rot[1] / ((P * L * L) / (2 * E_Pa * tp.I_m4)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    expect(Math.abs(rot[2] / ((T * L) / (G_Pa * tp.J_m4)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    expect(Math.abs(rot[0])).toBeLessThan(1e-3 * Math.abs(rot[1]));
  });

  it('rotations from probes on the L-frame: joint rotation P a h/(EI) (moment-area theorems, e.g. Hibbeler, Structural Analysis)', async () => {
    const t = tube(0.35, 0.008);
    const h = 7;
    const a = 8;
    const P = -3000;
    const s = new FrameSketch();
    const base = s.node([0, 0, 0]);
    const top = s.chain('pole', base, [0, 0, h], [t, t], [1, 0, 0]);
    const tip = s.chain('A1', top, [a, 0, h], [t, t], [0, 0, 1]);
    const model = s.build(base);
    const loads = [nodalLoad(tip, [0, 0, P])];
    const r = await runCalculix(model, loads, { rotationProbes: [top, tip] });
    // The arm tip drops, so the joint turns about +Y by |P| a h/(EI).
    expect(Math.abs(r.rotations_rad.get(top)![1] / ((-P * a * h) / (E_Pa * t.I_m4)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    const tipRotation = treeMotions(model, loads)[tip]!.theta;
    expect(vecError(r.rotations_rad.get(tip)!, tipRotation)).toBeLessThan(CLOSED_FORM_TOL);
  });

  it('rotation probes leave the translations unchanged (they carry no load)', async () => {
    const t = tube(0.3, 0.006);
    const s = new FrameSketch();
    const base = s.node([0, 0, 0]);
    const mid = s.chain('pole', base, [0, 0, 5], [t, t], [1, 0, 0]);
    const tip = s.chain('pole', mid, [0, 0, 10], [t, t], [1, 0, 0]);
    const loads = [nodalLoad(tip, [800, -600, -2000])];
    const plain = await runCalculix(s.build(base), loads);
    const probed = await runCalculix(s.build(base), loads, { rotationProbes: [mid, tip] });
    expect(vecError(probed.translations_m[tip]!, plain.translations_m[tip]!)).toBeLessThan(1e-3);
    expect(vecError(probed.translations_m[mid]!, plain.translations_m[mid]!)).toBeLessThan(1e-3);
  });

  // Element loads on a vertical cantilever of 8 m in two frame elements of 4 m (tube 0.3 x 0.006,
  // L/D = 27), loads along global x. Closed forms: beam-formula tables for cantilevers (Roark,
  // Formulas for Stress and Strain, table of beam deflections, from memory), each quoted below.
  describe('element loads (lumped on ccx nodes along the element)', () => {
    const tp = tube(0.3, 0.006);
    const L = 8;
    const EI = E_Pa * tp.I_m4;
    const column = (): { model: ReturnType<FrameSketch['build']>; mid: number; tip: number } => {
      const s = new FrameSketch();
      const base = s.node([0, 0, 0], 'base');
      const tip = s.chain('pole', base, [0, 0, L], [tp, tp], [1, 0, 0]);
      return { model: s.build(base), mid: 1, tip };
    };
    const along = (element: number, axes: 'global' | 'local', wA: number, wB: number, a: number, b: number, direction: Vec3 = [1, 0, 0]) =>
      ({ kind: 'distributed', element, axes, direction, wA_Npm: wA, wB_Npm: wB, a_m: a, b_m: b, origin: { source: 'test' } }) as const;
    const ux = async (loads: Parameters<typeof runCalculix>[1], node: 'mid' | 'tip', subdivisions?: number): Promise<number> => {
      const c = column();
      const r = await runCalculix(c.model, loads, subdivisions === undefined ? {} : { subdivisions });
      return r.translations_m[c[node]]![0];
    };
    const w = 900;

    it('uniform load: tip w L^4/(8EI), mid-height w x^2 (6L^2 - 4Lx + x^2)/(24EI)', async () => {
      const loads = [along(0, 'global', w, w, 0, 4), along(1, 'global', w, w, 0, 4)];
      expect(Math.abs((await ux(loads, 'tip')) / ((w * L ** 4) / (8 * EI)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
      const x = 4;
      const exactMid = (w * x * x * (6 * L * L - 4 * L * x + x * x)) / (24 * EI);
      expect(Math.abs((await ux(loads, 'mid')) / exactMid - 1)).toBeLessThan(CLOSED_FORM_TOL);
    });

    it('lumping converges: tip deflection with 2, 4 and 8 B32R per frame element differs by under 0.1 % (discretisation error)', async () => {
      const loads = [along(0, 'global', w, w / 2, 0, 4), along(1, 'global', w / 2, 0, 0, 4)];
      const u2 = await ux(loads, 'tip', 2);
      const u4 = await ux(loads, 'tip', 4);
      const u8 = await ux(loads, 'tip', 8);
      console.info(`[CalculiX] lumped triangular load, tip: 2 -> 8 pieces ${(100 * (u2 / u8 - 1)).toFixed(4)} %, 4 -> 8 ${(100 * (u4 / u8 - 1)).toFixed(4)} %`);
      expect(Math.abs(u4 / u8 - 1)).toBeLessThan(1e-3);
      expect(Math.abs(u2 / u8 - 1)).toBeLessThan(1e-3);
    });

    it('triangular load, w0 at the support to 0 at the tip, in local axes: tip w0 L^4/(30EI)', async () => {
      // Local y of a vertical member with refVector +x is +x (src/model/frame.ts).
      const loads = [along(0, 'local', w, w / 2, 0, 4, [0, 1, 0]), along(1, 'local', w / 2, 0, 0, 4, [0, 1, 0])];
      expect(Math.abs((await ux(loads, 'tip')) / ((w * L ** 4) / (30 * EI)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    });

    it('uniform load over a = 5 m from the support (crosses the element joint): tip w a^3 (4L - a)/(24EI)', async () => {
      const a = 5;
      const loads = [along(0, 'global', w, w, 0, 4), along(1, 'global', w, w, 0, 1)];
      expect(Math.abs((await ux(loads, 'tip')) / ((w * a ** 3 * (4 * L - a)) / (24 * EI)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    });

    it('point force at a = 5.3 m inside an element: tip P a^2 (3L - a)/(6EI)', async () => {
      const P = 2500;
      const a = 5.3;
      const loads = [{ kind: 'point-force', element: 1, axes: 'global', direction: [1, 0, 0], value: P, a_m: a - 4, origin: { source: 'test' } }] as const;
      expect(Math.abs((await ux(loads, 'tip')) / ((P * a * a * (3 * L - a)) / (6 * EI)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    });

    it('point moment at a = 2.2 m inside an element: tip M a (2L - a)/(2EI)', async () => {
      const M = 4000; // about +y: turns the member's axis (+z) toward +x
      const a = 2.2;
      const loads = [{ kind: 'point-moment', element: 0, axes: 'global', direction: [0, 1, 0], value: M, a_m: a, origin: { source: 'test' } }] as const;
      expect(Math.abs((await ux(loads, 'tip')) / ((M * a * (2 * L - a)) / (2 * EI)) - 1)).toBeLessThan(CLOSED_FORM_TOL);
    });

    it('axial line load (self-weight of a column): top w L^2/(2EA) (Hooke, integrated)', async () => {
      const loads = [along(0, 'global', w, w, 0, 4, [0, 0, -1]), along(1, 'global', w, w, 0, 4, [0, 0, -1])];
      const c = column();
      const r = await runCalculix(c.model, loads);
      // 1 %: ccx's expanded PIPE section is 0.5-0.8 % softer axially (see the axial test above).
      expect(Math.abs(r.translations_m[c.tip]![2] / (-(w * L * L) / (2 * E_Pa * tp.A_m2)) - 1)).toBeLessThan(0.01);
    });
  });

  it('multisided tube, torsion matched by the shear modulus: tip drop P L^3/(3EI) + (P e) e L/(G J) with J = 0.85 x 2I', async () => {
    // Same lever case as the torsion test above, with a section whose J is not 2I (a polygonal
    // tube has J < 2I: about 0.977 x 2I for 12 sides); 0.85 makes the difference well above the tolerance.
    const round = tube(0.25, 0.006);
    const tp: TubeProps = { ...round, J_m4: 0.85 * round.J_m4 };
    const L = 8;
    const e = 2.5;
    const lever: Vec3 = [e, 0, 0];
    const P = -1500;
    const s = new FrameSketch();
    const root = s.node([0, 0, 3], 'root');
    const tipNode = s.node(add([0, L, 3], lever), 'tip');
    s.element('arm', root, tipNode, tp, [0, 0, 1], [0, 0, 0], scale(lever, -1));
    const model = s.build(root);
    expect(() => writeCalculixInput(model, [nodalLoad(tipNode, [0, 0, P])])).toThrow(/not a round annulus/);
    const r = await runCalculix(model, [nodalLoad(tipNode, [0, 0, P])], { torsion: 'scale-shear-modulus' });
    const bending = (P * L ** 3) / (3 * E_Pa * tp.I_m4);
    const twist = (P * e * e * L) / (G_Pa * tp.J_m4);
    const withRoundJ = bending + (P * e * e * L) / (G_Pa * round.J_m4);
    expect(Math.abs((bending + twist) / withRoundJ - 1)).toBeGreaterThan(3 * CLOSED_FORM_TOL); // J visibly matters
    expect(Math.abs(r.translations_m[tipNode]![2] / (bending + twist) - 1)).toBeLessThan(CLOSED_FORM_TOL);
  });

  it('reactions by statics: base moment of a tip-loaded cantilever is P L (beam-formula tables)', async () => {
    const tp = tube(0.3, 0.006);
    const s = new FrameSketch();
    const base = s.node([0, 0, 0], 'base');
    const tip = s.chain('pole', base, [0, 0, 9], [tp], [1, 0, 0]);
    const r = await runCalculix(s.build(base), [nodalLoad(tip, [500, 0, -300])]);
    const f = r.reactions[0]!.force;
    expect(f[0]).toBeCloseTo(-500, 9);
    expect(f[2]).toBeCloseTo(300, 9);
    expect(f[4]).toBeCloseTo(-500 * 9, 9); // My = -(z Fx) about the base
  });
});
