// Base springs about the two horizontal axes and in torsion, from the input to the frame: a
// prismatic pole of height H with a force P at its top moves u = P H³/(3EI) + P H²/k, k the spring
// about the axis the force turns the base (force along X turns it about Y); a torque T at the top
// turns it T H/(GJ) + T/k_t (cantilever with a rotational end spring, any mechanics text, e.g.
// Timoshenko & Gere, Mechanics of Materials). First order; round-off only (1e-9).
import { describe, expect, it } from 'vitest';
import { solveLoads } from '../../src/analysis/analyze.ts';
import { buildFrame } from '../../src/model/build-frame.ts';
import { makeDesign, roundSection } from './design-factory.ts';
import { nodal } from '../analysis/frame-helpers.ts';

const H = 8;
const D = 0.3;
const t = 0.008;
const kx = 4e7;
const ky = 1.5e7;
const kt = 2e7;

describe('base springs about X, about Y and in torsion', () => {
  const design = makeDesign({
    pole: { height_m: H, section: roundSection(D, D, t), base: { kind: 'spring', stiffness_Nm_per_rad: kx, stiffnessY_Nm_per_rad: ky, torsion_Nm_per_rad: kt } },
    arms: [],
    attachments: [],
  });
  const model = buildFrame(design, { segmentsPerMember: 8 });
  const top = model.nodes.reduce((a, n, i) => (n.xyz_m[2] > model.nodes[a]!.xyz_m[2] ? i : a), 0);
  const E = design.material.E_Pa;
  const G = design.material.G_Pa;
  const I = (Math.PI / 64) * (D ** 4 - (D - 2 * t) ** 4);
  const J = 2 * I;
  const P = 1e4;

  it('the support carries the three springs', () => {
    expect(model.supports[0]!.springs).toEqual([0, 0, 0, kx, ky, kt]);
    expect(model.supports[0]!.fixed).toEqual([true, true, true, false, false, false]);
  });
  it('a force along X turns the base about Y', () => {
    const u = solveLoads(model, [nodal(top, [P, 0, 0])]).displacements[top]![0];
    const hand = (P * H ** 3) / (3 * E * I) + (P * H * H) / ky;
    expect(Math.abs(u / hand - 1)).toBeLessThan(1e-9);
  });
  it('a force along Y turns the base about X', () => {
    const u = solveLoads(model, [nodal(top, [0, P, 0])]).displacements[top]![1];
    const hand = (P * H ** 3) / (3 * E * I) + (P * H * H) / kx;
    expect(Math.abs(u / hand - 1)).toBeLessThan(1e-9);
  });
  it('a torque twists the pole and the base spring', () => {
    const r = solveLoads(model, [nodal(top, [0, 0, 0], [0, 0, P])]).displacements[top]![5];
    const hand = (P * H) / (G * J) + P / kt;
    expect(Math.abs(r / hand - 1)).toBeLessThan(1e-9);
  });
});

describe('base springs from the input', () => {
  it('rotationalStiffnessX, rotationalStiffnessY and torsionalStiffness reach the design', async () => {
    const { readFileSync } = await import('node:fs');
    const { loadDesignText } = await import('../../src/input/index.ts');
    const text = readFileSync('examples/cantilever-sign.yaml', 'utf8').replace(
      '      fixity: fixed         # or rotational-spring with rotationalStiffness',
      '      fixity: rotational-spring\n      rotationalStiffnessX: 40000\n      rotationalStiffnessY: 20000\n      torsionalStiffness: 30000',
    );
    const base = loadDesignText(text, 'x.yaml', {}).design.pole.base;
    const KIP_FT = 4448.2216152605 * 0.3048;
    expect(base.kind).toBe('spring');
    if (base.kind !== 'spring') return;
    expect(base.stiffness_Nm_per_rad / KIP_FT).toBeCloseTo(40000, 6);
    expect(base.stiffnessY_Nm_per_rad! / KIP_FT).toBeCloseTo(20000, 6);
    expect(base.torsion_Nm_per_rad! / KIP_FT).toBeCloseTo(30000, 6);
  });
});
