// The capacity line of the member charts: the design flexural strength φMn along a tapered round
// arm, against AISC 360-16 Section F8 worked by hand here from the section's dimensions.
import { describe, expect, it } from 'vitest';
import { analyseDesign } from '../../src/analyse-design.ts';
import { runChecks } from '../../src/checks/run-checks.ts';
import { resistancesAlong } from '../../src/checks/member-checks.ts';
import { memberCharts } from '../../src/report/sections/member-charts.ts';
import { FIXTURE_DESIGN, FIXTURE_LOADED } from './fixture-design.ts';

/** φMn of a round tube by AISC 360-16 F8: Mp = Fy Z (F8-1), for a noncompact wall
 * Mn = (0.021 E/(D/t) + Fy) S (F8-2), Table B4.1b case 20 for the limits; Z = (D³ − d³)/6 and
 * S = π (D⁴ − d⁴)/(32 D), the closed forms of a circular tube (any strength-of-materials text). */
function phiMnByHand(D: number, t: number, E: number, Fy: number, phi: number): number {
  const d = D - 2 * t;
  const Z = (D ** 3 - d ** 3) / 6;
  const S = (Math.PI * (D ** 4 - d ** 4)) / (32 * D);
  const lambda = D / t;
  const Mp = Fy * Z;
  if (lambda <= (0.07 * E) / Fy) return phi * Mp;
  expect(lambda).toBeLessThanOrEqual((0.31 * E) / Fy);
  return phi * Math.min(Mp, ((0.021 * E) / lambda + Fy) * S);
}

describe('capacity line of the member charts', () => {
  const { E_Pa, Fy_Pa } = FIXTURE_DESIGN.material;
  const phi = FIXTURE_DESIGN.criteria.phi.flexure;
  const arm = FIXTURE_DESIGN.arms[0]!;

  it('gives φMn of the arm at its root and its tip as F8 does (273 mm and 168 mm, 6.4 mm wall)', () => {
    const at = resistancesAlong(FIXTURE_DESIGN, arm.id);
    // The fixture's arm: round, 273 mm at the root tapering to 168 mm at the tip, 6.4 mm wall.
    // Round-off of the section properties only: 1e-9 relative.
    expect(at(0).r.phiMn_Nm).toBeCloseTo(phiMnByHand(0.273, 0.0064, E_Pa, Fy_Pa, phi), 3);
    expect(Math.abs(at(0).r.phiMn_Nm / phiMnByHand(0.273, 0.0064, E_Pa, Fy_Pa, phi) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(at(9.0).r.phiMn_Nm / phiMnByHand(0.168, 0.0064, E_Pa, Fy_Pa, phi) - 1)).toBeLessThan(1e-9);
  });

  it('draws φMn dashed in the bending panel of every member, named in the legend and the caption', async () => {
    const analysis = analyseDesign(FIXTURE_DESIGN, {});
    const checks = runChecks(FIXTURE_DESIGN, analysis);
    const charts = await memberCharts(FIXTURE_LOADED, analysis, checks);
    const forces = charts.filter((c) => c.title.startsWith('Internal forces'));
    expect(forces.map((c) => c.member).sort()).toEqual(['A1', 'pole']);
    for (const c of forces) {
      expect(c.svg).toContain('>φMn<');
      expect(c.svg).toMatch(/stroke-dasharray="5,3"/);
      expect(c.caption).toMatch(/φMn \(dashed\) is the design flexural strength/);
    }
  });
});
