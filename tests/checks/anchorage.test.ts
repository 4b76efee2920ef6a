// Anchor bolts and base plate: thread stress areas against the printed thread tables, the
// elastic bolt-circle formula against the statics of the bolt group, a worked hand example of
// our own through every anchorage equation, and the checks end to end on an L-frame whose base
// reaction is known by statics.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseDesign } from '../../src/analyse-design.ts';
import { runChecks } from '../../src/checks/run-checks.ts';
import { baseActions, boltForces } from '../../src/checks/anchor/bolt-group.ts';
import { nominalShear, nominalTension, nominalTensionWithShear, reducedTensileStress } from '../../src/checks/anchor/bolt-resistance.ts';
import { boltBending } from '../../src/checks/anchor/bolt-bending.ts';
import { basePlateBending } from '../../src/checks/anchor/base-plate.ts';
import { boltThread, stressArea } from '../../src/design/thread-tables.ts';
import type { AnchorBolts, CombinationSpec, Design } from '../../src/design/design.ts';
import { makeDesign, roundSection, testArm, testHead } from '../model/design-factory.ts';

// Exact unit definitions: 1 in = 0.0254 m; 1 lbf = 4.4482216152605 N.
const IN = 0.0254;
const KIP = 4448.2216152605;
const KSI = KIP / IN ** 2;
const KIP_IN = KIP * IN;

const bolts = (over: Partial<AnchorBolts> = {}): AnchorBolts => ({
  count: 6, circleDiameter_m: 24 * IN, boltDiameter_m: 1.5 * IN, grade: '55', Fu_Pa: 75 * KSI, Fy_Pa: 55 * KSI, thread: null, standOff_m: 3 * IN, ...over,
});

describe('tensile stress area of the thread', () => {
  // Printed tensile stress areas, UNC coarse series (ASME B1.1, table of thread dimensions; the
  // same values are in the AISC Steel Construction Manual's threaded-rod table), from memory.
  // Tolerance: half a unit of the last printed digit.
  const UNC: ReadonlyArray<readonly [number, number, number]> = [
    [0.5, 0.1419, 0.00005], [0.75, 0.334, 0.0005], [1, 0.606, 0.0005], [1.5, 1.405, 0.0005], [2, 2.5, 0.005],
  ];
  for (const [d, printed, tol] of UNC) {
    it(`${d} in UNC: At = ${printed} in² (ASME B1.1, from memory)`, () => {
      const t = boltThread({ boltDiameter_m: d * IN, thread: null })!;
      expect(t.standard).toBe('UNC');
      expect(Math.abs(stressArea(d * IN, t) / IN ** 2 - printed)).toBeLessThanOrEqual(tol);
    });
  }
  // Printed stress areas of ISO coarse threads (ISO 898-1, table of nominal stress areas), from memory.
  const ISO: ReadonlyArray<readonly [number, number]> = [[20, 245], [24, 353], [30, 561], [36, 817]];
  for (const [d, printed] of ISO) {
    it(`M${d}: As = ${printed} mm² (ISO 898-1, from memory)`, () => {
      const t = boltThread({ boltDiameter_m: d / 1000, thread: null })!;
      expect(t.standard).toBe('ISO metric');
      expect(Math.abs(stressArea(d / 1000, t) * 1e6 - printed)).toBeLessThanOrEqual(0.5);
    });
  }
  it('a size in neither table has no thread unless one is given', () => {
    expect(boltThread({ boltDiameter_m: 1.3 * IN, thread: null })).toBeNull();
    expect(boltThread({ boltDiameter_m: 1.3 * IN, thread: { standard: 'UNC', pitch_m: IN / 6 } })?.from).toBe('input');
  });
});

describe('elastic bolt circle against the statics of the bolt group', () => {
  // Rigid plate on n equal axially elastic bolts: the bolt forces are linear in the plan
  // coordinates, f = a + b x + c y. Solving the three equilibrium equations (vertical force,
  // two moments) for a, b, c directly, with no closed form for Σy², gives every bolt's force.
  function boltForcesByStatics(n: number, R: number, rot: number, Mx: number, My: number, P: number): number[] {
    const pts = Array.from({ length: n }, (_, i) => [R * Math.cos(rot + (2 * Math.PI * i) / n), R * Math.sin(rot + (2 * Math.PI * i) / n)] as const);
    // Normal equations of Σ f_i = −P (tension +, P down), Σ f_i y_i = Mx, Σ f_i x_i = −My.
    const S = (g: (x: number, y: number) => number) => pts.reduce((s, [x, y]) => s + g(x, y), 0);
    const A = [
      [n, S((x) => x), S((_, y) => y)],
      [S((x) => x), S((x) => x * x), S((x, y) => x * y)],
      [S((_, y) => y), S((x, y) => x * y), S((_, y) => y * y)],
    ];
    const rhs = [-P, -My, Mx];
    // Cramer's rule on the 3 × 3 system.
    const det = (m: number[][]) => m[0]![0]! * (m[1]![1]! * m[2]![2]! - m[1]![2]! * m[2]![1]!) - m[0]![1]! * (m[1]![0]! * m[2]![2]! - m[1]![2]! * m[2]![0]!) + m[0]![2]! * (m[1]![0]! * m[2]![1]! - m[1]![1]! * m[2]![0]!);
    const d0 = det(A);
    const col = (k: number) => det(A.map((row, i) => row.map((v, j) => (j === k ? rhs[i]! : v))));
    const [a, b, c] = [col(0) / d0, col(1) / d0, col(2) / d0];
    return pts.map(([x, y]) => a + b * x + c * y);
  }

  it('4M/(nD) − P/n bounds the largest bolt tension for every rotation of the bolts, and is reached when a bolt lies on the moment direction', () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 16 }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), fc.double({ min: -50e3, max: 200e3, noNaN: true }), (n, rot, dir, P) => {
        const R = 0.3;
        const M = 100e3;
        const f = boltForcesByStatics(n, R, rot, M * Math.cos(dir), M * Math.sin(dir), P);
        const closed = boltForces({ M_Nm: M, P_N: P, V_N: 0, T_Nm: 0 }, n, 2 * R);
        expect(Math.max(...f)).toBeLessThanOrEqual(closed.tension_N * (1 + 1e-9) + 1e-6);
        expect(-Math.min(...f)).toBeLessThanOrEqual(closed.compression_N * (1 + 1e-9) + 1e-6);
      }),
    );
    // Mx alone puts the tension at +Y; bolts turned by 90 degrees put bolt 0 there.
    const f = boltForcesByStatics(8, 0.3, Math.PI / 2, 100e3, 0, 20e3);
    const closed = boltForces({ M_Nm: 100e3, P_N: 20e3, V_N: 0, T_Nm: 0 }, 8, 0.6);
    expect(Math.abs(Math.max(...f) / closed.tension_N - 1)).toBeLessThan(1e-12);
  });

  it('reads the reaction as M = √(Mx² + My²), P = Fz, V = √(Fx² + Fy²), T = |Mz|', () => {
    expect(baseActions([3, 4, -7, 6, 8, -2])).toEqual({ M_Nm: 10, P_N: -7, V_N: 5, T_Nm: 2 });
  });
});

describe('worked example of our own: 6 bolts 1-1/2 in F1554 Grade 55 on a 24 in circle', () => {
  // M = 100 kip·ft, P = 5 kip down, V = 3 kip, T = 10 kip·ft; pole 14 in at the base; plate
  // 1.75 in, Fy 50 ksi; stand-off 3 in. Hand values (AISC 360-16 J3; Fu = 75 ksi, Fy = 55 ksi):
  //   T_b = 4(1200)/(6 × 24) − 5/6 = 32.500 kip; C_b = 33.333 + 0.833 = 34.167 kip
  //   V_b = 3/6 + 120/(6 × 12) = 2.1667 kip
  //   Ab = 1.7671 in²; At = 0.7854 (1.5 − 0.9743/6)² = 1.4052 in²
  //   φRn = 0.75 min(75 × 1.4052, 0.75 × 75 × 1.7671) = 0.75 × 99.40 = 74.55 kip; ratio 0.4583
  //   φRnv = 0.75 × 0.45 × 75 × 1.7671 = 44.73 kip
  //   J3-3a with V_b = 15 kip: frv = 8.488 ksi, F′nt = 73.125 − 56.25/(0.75 × 33.75) × 8.488 = 54.26 ksi;
  //     φR′n = 0.75 min(105.39, 54.26 × 1.7671) = 71.92 kip
  //   plate: a = (24 − 14)/2 = 5 in, b_eff = min(10, π 14/6) = 7.330 in, M_p = 34.167 × 5 = 170.83 kip·in,
  //     φMn = 0.9 × 50 × 7.330 × 1.75²/4 = 252.55 kip·in
  //   bending: M_b = 2.1667 × 3/2 = 3.250 kip·in, d_e = 1.3376 in, S = π d_e³/32 = 0.23496 in³,
  //     f = 34.167/1.4052 + 3.250/0.23496 = 38.15 ksi
  // Tolerance: 5e-4 relative, the rounding of the hand values to four or five digits.
  const rel = (a: number, b: number) => Math.abs(a / b - 1);
  const b = bolts();
  const f = boltForces({ M_Nm: 1200 * KIP_IN, P_N: 5 * KIP, V_N: 3 * KIP, T_Nm: 120 * KIP_IN }, b.count, b.circleDiameter_m);
  const t = boltThread(b)!;
  const areas = { Ab_m2: (Math.PI / 4) * b.boltDiameter_m ** 2, At_m2: stressArea(b.boltDiameter_m, t) };

  it('bolt forces', () => {
    expect(rel(f.tension_N, 32.5 * KIP)).toBeLessThan(5e-4);
    expect(rel(f.compression_N, 34.167 * KIP)).toBeLessThan(5e-4);
    expect(rel(f.shear_N, 2.1667 * KIP)).toBeLessThan(5e-4);
  });
  it('resistances of AISC 360-16 J3.6 and J3.7', () => {
    expect(rel(areas.At_m2, 1.4052 * IN ** 2)).toBeLessThan(5e-4);
    expect(rel(0.75 * nominalTension(b, areas), 74.55 * KIP)).toBeLessThan(5e-4);
    expect(rel(0.75 * nominalShear(b, areas), 44.73 * KIP)).toBeLessThan(5e-4);
    // Small shear: J3-3a gives more than Fnt and is capped at Fnt = 0.75 Fu.
    expect(reducedTensileStress(b, f.shear_N / areas.Ab_m2, 0.75)).toBe(0.75 * b.Fu_Pa);
    const FntP = reducedTensileStress(b, (15 * KIP) / areas.Ab_m2, 0.75);
    expect(rel(FntP, 54.26 * KSI)).toBeLessThan(5e-4);
    expect(rel(0.75 * nominalTensionWithShear(b, areas, FntP), 71.92 * KIP)).toBeLessThan(5e-4);
  });
  it('bolt bending over the stand-off and base plate bending', () => {
    const bb = boltBending(b, areas, f.compression_N, f.shear_N);
    expect(rel(bb.M_Nm, 3.25 * KIP_IN)).toBeLessThan(5e-4);
    expect(rel(bb.S_m3, 0.23496 * IN ** 3)).toBeLessThan(5e-4);
    expect(rel(bb.stress_Pa, 38.15 * KSI)).toBeLessThan(5e-4);
    const design = makeDesign({ pole: { height_m: 6, section: roundSection(14 * IN, 10 * IN, 0.25 * IN), base: { kind: 'fixed' } } });
    const plate = basePlateBending(design, b, { thickness_m: 1.75 * IN, Fy_Pa: 50 * KSI }, f.compression_N);
    if ('cannot' in plate) throw new Error(plate.cannot);
    expect(rel(plate.b_m, 7.330 * IN)).toBeLessThan(5e-4);
    expect(rel(plate.Mu_Nm, 170.83 * KIP_IN)).toBeLessThan(5e-4);
    expect(rel(plate.phiMn_Nm, 252.55 * KIP_IN)).toBeLessThan(5e-4);
  });
});

describe('anchorage checks end to end on an L-frame', () => {
  // Weightless steel, one weight W at the tip of a horizontal arm: by statics the base carries
  // P = W down and M = W x, x the horizontal distance of the weight from the pole axis, no shear
  // and no torque (first order).
  const STRENGTH: CombinationSpec = { id: 'str-dead', category: 'strength', description: 'D', factors: { dead: 1 }, source: 'test' };
  const L = 5;
  function lFrame(W_N: number, anchor: Partial<AnchorBolts>): Design {
    const base = makeDesign({});
    return makeDesign({
      material: { E_Pa: 200e9, G_Pa: 77e9, Fy_Pa: 345e6, density_kgm3: 1e-6 },
      pole: { height_m: 6, section: roundSection(0.3, 0.3, 0.008), base: { kind: 'fixed' } },
      arms: [testArm({ attachHeight_m: 6, rise_rad: 0, length_m: L, section: roundSection(0.2, 0.2, 0.006) })],
      attachments: [testHead({ position_m: L, weight_N: W_N, windArea_m2: 0, offset: { vertical_m: 0, lateral_m: 0, direction_rad: 0 } })],
      combinations: [STRENGTH],
      criteria: { ...base.criteria, anchorBolts: { ...bolts({ count: 4, circleDiameter_m: 0.45, boltDiameter_m: 0.024, grade: null, Fu_Pa: 800e6, Fy_Pa: 640e6, standOff_m: 0 }), ...anchor }, basePlate: { thickness_m: 0.03, Fy_Pa: 345e6 } },
      analysis: { segmentsPerMember: 8, secondOrder: false, pDeltaTolerance: 1e-6, pDeltaMaxIterations: 50, stationSpacing_m: 0.5 },
    });
  }
  // Hand values for 4 M24 bolts (As 353 mm², ISO 898-1) of Fu 800 MPa on a 450 mm circle,
  // W = 20 kN at x = 0.15 + 5 = 5.15 m (the arm starts at the pole face, radius 0.15 m):
  //   C_b = 4 × 103 kN·m /(4 × 0.45 m) + 20/4 kN = 228.89 + 5 = 233.89 kN
  //   φRn = 0.75 min(800 × 352.5, 0.75 × 800 × 452.4) N = 0.75 × 271.4 kN = 203.6 kN → ratio 1.149, fails
  //   plate: a = (450 − 300)/2 = 75 mm, b_eff = min(150, π 300/4 = 235.6) = 150 mm,
  //     ratio = 233.89 kN × 75 mm / (0.9 × 345 MPa × 150 mm × 30²/4 mm²) = 17.54 / 10.48 = 1.674, fails
  it('reads the reaction the statics give and fails where the hand calculation does', () => {
    const design = lFrame(20e3, {});
    const checks = runChecks(design, analyseDesign(design, {}));
    const rec = (type: string) => checks.records.find((r) => r.type === type && r.combination === 'str-dead')!;
    const axial = rec('bolt-tension');
    expect(axial.member).toBe('anchor-bolts');
    expect(Math.abs(axial.demand.si / 233.89e3 - 1)).toBeLessThan(5e-4);
    expect(Math.abs(axial.ratio / 1.149 - 1)).toBeLessThan(1e-3);
    expect(axial.status).toBe('fail');
    expect(rec('bolt-shear').demand.si).toBeLessThan(1e-6 * axial.demand.si);
    const plate = rec('base-plate');
    expect(plate.member).toBe('base-plate');
    expect(Math.abs(plate.ratio / 1.674 - 1)).toBeLessThan(1e-3);
    expect(checks.fails).toBe(true);
    // No stand-off: bolt bending is not checked.
    expect(checks.records.some((r) => r.type === 'bolt-bending')).toBe(false);
  });

  it('a modest weight passes; a stand-off over one diameter adds the bending check', () => {
    const design = lFrame(5e3, { standOff_m: 0.05 });
    const checks = runChecks(design, analyseDesign(design, {}));
    const types = ['bolt-tension', 'bolt-shear', 'bolt-combined', 'bolt-bending', 'base-plate'];
    for (const t of types) expect(checks.records.find((r) => r.type === t)?.status, t).toBe('ok');
  });

  it('a bolt size in no thread table is a failed check with its reason, not a guess', () => {
    const design = lFrame(5e3, { boltDiameter_m: 0.025 });
    const checks = runChecks(design, analyseDesign(design, {}));
    const r = checks.records.find((x) => x.type === 'bolt-tension')!;
    expect(r.status).toBe('fail');
    expect(r.reason).toContain('threadsPerInch or pitch');
  });
});
