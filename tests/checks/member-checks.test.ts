// The member check end to end: an L-frame (prismatic pole, horizontal arm, one weight P at the arm
// tip) has the cantilever moment M = P L and shear V = P at the arm root (statics). With the
// compact 200 mm × 6 mm arm (D/t 33.3 ≤ 0.07 E/Fy = 40.6, AISC 360-16 Table B4.1b case 20) the
// root carries Mn = Fy Z (Eq. F8-1, Z = (D³ − d³)/6) and Vn = 0.6 Fy Ag / 2 (Eq. G5-1, both
// buckling stresses of G5-2 exceed 0.6 Fy here), and Eq. H3-6 gives M/φMn + (V/φVn)².
// First-order, nearly weightless steel: the hand value holds to round-off (1e-9 relative).
import { describe, expect, it } from 'vitest';
import { analyseDesign } from '../../src/analyse-design.ts';
import { runChecks } from '../../src/checks/run-checks.ts';
import type { CombinationSpec, Design } from '../../src/design/design.ts';
import { makeDesign, roundSection, testArm, testHead } from '../model/design-factory.ts';

const STRENGTH: CombinationSpec = { id: 'str-dead', category: 'strength', description: 'D', factors: { dead: 1 }, source: 'test' };
const Fy = 345e6;
const L = 5;

function lFrame(P_N: number): Design {
  return makeDesign({
    material: { E_Pa: 200e9, G_Pa: 77e9, Fy_Pa: Fy, density_kgm3: 1e-6 },
    pole: { height_m: 6, section: roundSection(0.3, 0.3, 0.008), base: { kind: 'fixed' } },
    arms: [testArm({ attachHeight_m: 6, rise_rad: 0, length_m: L, section: roundSection(0.2, 0.2, 0.006) })],
    attachments: [testHead({ position_m: L, weight_N: P_N, windArea_m2: 0, offset: { vertical_m: 0, lateral_m: 0, direction_rad: 0 } })],
    combinations: [STRENGTH],
    analysis: { segmentsPerMember: 8, secondOrder: false, pDeltaTolerance: 1e-6, pDeltaMaxIterations: 50, stationSpacing_m: 0.5 },
  });
}

function handRatio(P_N: number): number {
  const D = 0.2;
  const d = D - 2 * 0.006;
  const Z = (D ** 3 - d ** 3) / 6;
  const A = (Math.PI / 4) * (D ** 2 - d ** 2);
  const phiMn = 0.9 * Fy * Z;
  const phiVn = (0.9 * 0.6 * Fy * A) / 2;
  return (P_N * L) / phiMn + (P_N / phiVn) ** 2;
}

describe('member strength check (AISC 360-16 H3-6) on an L-frame', () => {
  it('governs at the arm root with the hand ratio, and passes below 1', () => {
    const design = lFrame(10e3);
    const checks = runChecks(design, analyseDesign(design, {}));
    const gov = checks.governing.find((g) => g.record.type === 'member-strength' && g.record.member === design.arms[0]!.id)!;
    expect(gov.record.s_m).toBe(0);
    expect(gov.record.combination).toBe('str-dead');
    expect(Math.abs(gov.record.ratio / handRatio(10e3) - 1)).toBeLessThan(1e-9);
    expect(gov.record.status).toBe('ok');
    expect(gov.steps.map((s) => s.source).join(' ')).toContain('H3-6');
  });

  it('an over-stressed arm (P 15 kN, ratio about 1.07) fails, and the checks fail', () => {
    const design = lFrame(15e3);
    const checks = runChecks(design, analyseDesign(design, {}));
    const gov = checks.governing.find((g) => g.record.type === 'member-strength' && g.record.member === design.arms[0]!.id)!;
    expect(handRatio(15e3)).toBeGreaterThan(1);
    expect(Math.abs(gov.record.ratio / handRatio(15e3) - 1)).toBeLessThan(1e-9);
    expect(gov.record.status).toBe('fail');
    expect(checks.fails).toBe(true);
  });
});
