// Trends a comparison must follow because mechanics demands them, checked against hand statics.
import { join } from 'node:path';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { afterAll, describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { runComparison } from '../../src/compare/run-compare.ts';
import { starterInput } from '../../src/input/index.ts';

const ROOT = join(import.meta.dirname, '../..');
const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const dir = mkdtempSync(join(tmpdir(), 'polebook-cmp-trend-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const LBF_N = 4.4482216152605; // NIST SP 811
const FT_M = 0.3048;
const IN_M = 0.0254;

describe('base moment against arm length, a weight at the tip', () => {
  // The luminaire starter made a statics problem: one horizontal prismatic arm (3.5 in x 0.154 in)
  // from the pole top, the 50 lb luminaire at its tip (position = length), dead load only, first
  // order. Moment of the weights about the pole base (statics of rigid bodies, e.g. Hibbeler,
  // Engineering Mechanics: Statics, moment of a force about an axis): the pole's own weight acts on
  // its axis; the arm, from the pole face at radius r to r + L, weighs w per length; so
  //   M(L) = P (r + L) + w L (r + L/2)
  // with P = 50 lb, w = 490 pcf x A (steel density default, stated in the package), A the annulus.
  const doc = parseDocument(starterInput('luminaire-pole', 'us'));
  doc.setIn(['structure', 'arms', 0, 'rise'], '0 deg');
  doc.setIn(['combinations'], [{ id: 'D', category: 'strength', factors: { dead: 1 } }]);
  doc.setIn(['analysis', 'secondOrder'], false);
  const file = join(dir, 'statics.yaml');
  writeFileSync(file, doc.toString());
  const lengths = [4, 6, 8, 10, 12];

  it('grows with the length and matches M = P (r + L) + w L (r + L/2) (relative 1e-6)', async () => {
    const c = await runComparison({ input: file, vary: [`A1.length+L1.position=${lengths.join(',')} ft`], env: ENV, firstOrder: false, packages: false, workers: 1 });
    const M = c.rows.map((r) => r.result.metrics!.baseMoment!.value);
    for (let k = 1; k < M.length; k++) expect(M[k]!).toBeGreaterThan(M[k - 1]!);
    const D = 3.5 * IN_M;
    const t = 0.154 * IN_M;
    const A = (Math.PI / 4) * (D ** 2 - (D - 2 * t) ** 2);
    const w = 490 * (LBF_N / FT_M ** 3) * A; // N/m: 490 lb/ft3 weight density
    const P = 50 * LBF_N;
    const r = ((10 - 0.14 * 30) / 2) * IN_M; // pole face radius at 30 ft: (10 in - 0.14 in/ft x 30 ft) / 2
    lengths.forEach((Lft, k) => {
      const L = Lft * FT_M;
      const hand = P * (r + L) + w * L * (r + L / 2);
      expect(Math.abs(M[k]! - hand) / hand).toBeLessThan(1e-6);
    });
  }, 60_000);
});

describe('ratio against wall thickness', () => {
  // cantilever-sign: the fatigue stress range at the arm A1 root governs. Its moment range comes
  // from the galloping pressure on the panels and does not depend on the arm wall, so the stress
  // range, and the ratio, go as 1/S with the elastic section modulus of the round tube
  //   S = π (D⁴ − (D − 2t)⁴) / (32 D)   (Roark's Formulas for Stress and Strain, hollow circle).
  // Within 1%: the second-order analysis changes the moment a little with the stiffness.
  it('grows as the wall thins, as 1/S', async () => {
    const walls = [0.25, 0.3125, 0.375, 0.5];
    const c = await runComparison({ input: join(ROOT, 'examples/cantilever-sign.yaml'), vary: [`A1.section.wall=${walls.join(',')} in`], env: ENV, firstOrder: false, packages: false, workers: 1 });
    const ratios = c.rows.map((r) => r.result.metrics!.governing.ratio);
    for (let k = 1; k < ratios.length; k++) expect(ratios[k]!).toBeLessThan(ratios[k - 1]!);
    for (const r of c.rows) expect(r.result.metrics!.governing.title).toMatch(/Fatigue/);
    const D = 16;
    const S = (t: number) => (Math.PI * (D ** 4 - (D - 2 * t) ** 4)) / (32 * D);
    for (let k = 1; k < walls.length; k++) {
      const expected = S(walls[0]!) / S(walls[k]!);
      expect(Math.abs(ratios[k]! / ratios[0]! - expected) / expected).toBeLessThan(0.01);
    }
  }, 60_000);
});
