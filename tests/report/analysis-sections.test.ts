// The analysis part of the package, read back from the PDF with pdfjs-dist (a reader
// outside the project): section titles, every combination id, the base reactions of a
// combination against statics worked here by hand from the input, the statics check and the
// magnification note of the deflected shape.
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildPackage, type PackageResult } from '../../src/pipeline.ts';
import { formatTolerance, FT_M, IN_M, KIP_N, LBF_N, PSF_PA } from '../../src/units/units.ts';
import { readPdfText, squeeze } from '../support/pdf-text.ts';
import { rowNumbers } from '../support/pdf-rows.ts';

const EXAMPLE = join(import.meta.dirname, '..', '..', 'examples', 'cantilever-sign.yaml');

const TITLES = ['Structural model', 'Structure elevation and plan', 'Loads', 'Load combinations', 'Analysis results', 'Internal force and deflection diagrams'];

// ---- Hand statics of examples/cantilever-sign.yaml (values copied from the input file) ----
// Statics: the sum of the applied forces and of their moments about any point equals minus the
// reactions (equilibrium of a rigid body; any statics text, e.g. Hibbeler, Engineering Mechanics:
// Statics, ch. 5; from memory). Dead load only, so every force is vertical.
const UNIT_WEIGHT = 490 * LBF_N / FT_M ** 3; // N/m3: the default steel density 490 pcf (as the package states it) times g
// Steel area of a round tube, exact: π/4 (D² − (D − 2t)²) = π t (D − t); linear in D, so a
// tube tapering linearly weighs γ L π t (Dmean − t), and its weight per length is linear along it.
const tubeWeightPerLength = (D_m: number, t_m: number) => UNIT_WEIGHT * Math.PI * t_m * (D_m - t_m);
const pole = { H: 26 * FT_M, Droot: 24 * IN_M, taper: (0.14 * IN_M) / FT_M, t: 0.5 * IN_M };
const arm = { z: 24 * FT_M, L: 36 * FT_M, Droot: 16 * IN_M, taper: (0.14 * IN_M) / FT_M, t: 0.375 * IN_M };
const panels = [
  { W: 3.5 * PSF_PA * 12 * 7 * FT_M ** 2, s: 14 * FT_M, lateral: -10 * IN_M, area: 12 * 7 * FT_M ** 2 },
  { W: 3.5 * PSF_PA * 10 * 6 * FT_M ** 2, s: 29 * FT_M, lateral: -10 * IN_M, area: 10 * 6 * FT_M ** 2 },
];

function handDead(): { W: number; momentX: number; momentY: number } {
  const wp0 = tubeWeightPerLength(pole.Droot, pole.t);
  const wp1 = tubeWeightPerLength(pole.Droot - pole.taper * pole.H, pole.t);
  const Wpole = (pole.H * (wp0 + wp1)) / 2; // on the pole axis: no moment about the base centre
  const wa0 = tubeWeightPerLength(arm.Droot, arm.t);
  const wa1 = tubeWeightPerLength(arm.Droot - arm.taper * arm.L, arm.t);
  const Warm = (arm.L * (wa0 + wa1)) / 2;
  // centroid of a trapezoidal distribution from its w0 end: L (w0 + 2 w1) / (3 (w0 + w1))
  const face = (pole.Droot - pole.taper * arm.z) / 2; // the arm starts at the pole face (radius at its height)
  const xArm = face + (arm.L * (wa0 + 2 * wa1)) / (3 * (wa0 + wa1));
  let W = Wpole + Warm;
  let mx = 0; // Σ W y   (moment about X of a downward force W at (x, y): −W y; the reaction is +W y)
  let my = Warm * xArm; // Σ W x (moment about Y: +W x; the reaction is −W x)
  for (const p of panels) {
    W += p.W;
    // arm along +X: the lateral offset (positive to the left looking from root to tip) is along +Y
    mx += p.W * p.lateral;
    my += p.W * (face + p.s);
  }
  return { W, momentX: mx, momentY: my };
}

/** Printed with 4 significant digits (formatNumber), so a printed value is within 5e-4 of the true one, relative. */
function expectPrinted(printed: number, expected: number, what: string): void {
  const tol = Math.max(5e-4 * Math.abs(expected), 1e-9);
  expect(Math.abs(printed - expected), `${what}: printed ${printed}, hand statics ${expected}`).toBeLessThanOrEqual(tol);
}

let firstOrder: PackageResult;
let secondOrder: PackageResult;
let text1: string;
let text2: string;
let raw1: string;
let raw2: string;

beforeAll(async () => {
  firstOrder = await buildPackage(EXAMPLE, { firstOrder: true });
  secondOrder = await buildPackage(EXAMPLE);
  const [r1, r2] = [await readPdfText(firstOrder.pdf), await readPdfText(secondOrder.pdf)];
  text1 = r1.pages.join('\n');
  text2 = r2.pages.join('\n');
  raw1 = r1.raw.join('\f');
  raw2 = r2.raw.join('\f');
}, 60_000);

describe('analysis sections in the package', () => {
  it('prints every section title in the contents and as a heading', () => {
    for (const title of TITLES) {
      const headings = [...text2.matchAll(new RegExp(`^\\s*(\\d+) ${title}\\s*(\\d+)?\\s*$`, 'gm'))];
      expect(headings.length, title).toBeGreaterThanOrEqual(2); // once in the contents, once as the heading
    }
  });

  it('prints the id of every analysed combination', () => {
    // content order, with cells broken after a hyphen joined again
    const flat = squeeze(raw2.replace(/-\n/g, '-'));
    expect(secondOrder.analysis.combinations.length).toBeGreaterThan(10);
    for (const c of secondOrder.analysis.combinations) expect(flat, c.id).toContain(c.id);
  });

  it('first order: base reactions of strength-dead (1.25 D) equal minus the hand statics of the loads', () => {
    const h = handDead();
    const f = 1.25; // the default strength factor on dead load, as printed in the combination
    const kip = (N: number) => N / KIP_N;
    const kipft = (Nm: number) => Nm / (KIP_N * FT_M);
    const n = rowNumbers(raw1, 'Base reactions, factored combinations', 'strength-dead', 'extreme-wind-max@wind-000');
    expect(n).toHaveLength(6);
    const [Fx, Fy, Fz, Mx, My, Mz] = n;
    expectPrinted(Fx, 0, 'Fx');
    expectPrinted(Fy, 0, 'Fy');
    expectPrinted(Fz, kip(f * h.W), 'Fz');
    expectPrinted(Mx, kipft(f * h.momentX), 'Mx');
    expectPrinted(My, kipft(-f * h.momentY), 'My');
    expectPrinted(Mz, 0, 'Mz');
    // the statics check prints the applied vertical load and the reactions, opposite
    const s = rowNumbers(raw1, 'Statics check: forces', 'strength-dead', 'extreme-wind-max@wind-000');
    expect(s).toHaveLength(8); // six components, |residual| and the relative residual
    expectPrinted(s[2], -kip(f * h.W), 'applied ΣFz');
    expectPrinted(s[5], kip(f * h.W), 'reactions ΣFz');
  });

  it('second order: base forces of extreme-wind-max@wind-090 equal minus the applied wind and dead loads', () => {
    // Wind toward +Y, square to the pole and the arm (along X) and onto both panel faces:
    // force = pressure × projected area (members: length × mean outside diameter of the
    // linear taper; panels: width × height), the rule the package states (force = pressure × projected area,
    // as in the wind-load provisions of AASHTO LRFD-LTS, from memory).
    const pm = 38 * PSF_PA;
    const pp = 42 * PSF_PA;
    const poleArea = pole.H * (pole.Droot - (pole.taper * pole.H) / 2);
    const armArea = arm.L * (arm.Droot - (arm.taper * arm.L) / 2);
    const Fy = pm * (poleArea + armArea) + pp * (panels[0].area + panels[1].area);
    const W = 1.1 * handDead().W; // 1.1 D + 1.0 W, as printed in the combination
    const n = rowNumbers(raw2, 'Base reactions, factored combinations', 'extreme-wind-max@wind-090', 'extreme-wind-max@wind-270');
    expect(n).toHaveLength(6);
    expectPrinted(n[0], 0, 'Fx');
    expectPrinted(n[1], -Fy / KIP_N, 'Fy');
    expectPrinted(n[2], W / KIP_N, 'Fz');
  });

  it('prints the statics check with its configuration, and names the worst residual honestly', () => {
    const flat = text2.replace(/\s+/g, ' ');
    expect(flat).toContain('Statics check: forces');
    expect(flat).toContain('Statics check: moments about the origin');
    expect(flat).toContain('Configuration of the check: deformed');
    // the largest moment residual is printed with its combination and configuration, not hidden
    const worst = Object.values(secondOrder.analysis.results).reduce((a, b) => (b.statics.relativeMomentResidual > a.statics.relativeMomentResidual ? b : a));
    expect(worst.statics.configuration).toBe('deformed');
    expect(flat).toContain('Statics residual in the deformed configuration');
    expect(squeeze(text2)).toContain(squeeze(`under ${worst.combination}, a relative residual of ${formatTolerance(worst.statics.relativeMomentResidual)}`));
    const flat1 = text1.replace(/\s+/g, ' ');
    expect(flat1).toContain('Configuration of the check: undeformed');
    expect(flat1).toContain('Equilibrium is met to round-off');
  });

  it('states the magnification of the deflected shape', () => {
    const flat = text2.replace(/\s+/g, ' ');
    expect(flat).toMatch(/Displacements (magnified \d+ times|not magnified \(magnification 1\))/);
    expect(flat).toMatch(/Deflected shape in elevation/);
    expect(flat).toMatch(/Deflected shape in plan/);
  });
});
