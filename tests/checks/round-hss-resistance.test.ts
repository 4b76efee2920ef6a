// Round-HSS resistances against hand calculations with the published equations of AISC 360-16
// (Specification for Structural Steel Buildings): Table B4.1b case 20, Eq. F8-1 to F8-4, G5-1/G5-2,
// and the H3-6 interaction. The section properties are the closed forms of a thick-walled annulus
// (S = π(D⁴ − d⁴)/(32 D), Z = (D³ − d³)/6; any mechanics of materials text, e.g. Gere & Goodno).
// The hand values below were worked out by hand from those equations; 1e-4 relative covers the
// four to six digits printed.
import { describe, expect, it } from 'vitest';
import { roundTube } from '../../src/model/tube-section.ts';
import { roundFlexure, roundShear } from '../../src/checks/member/round-hss.ts';
import { interaction } from '../../src/checks/member-checks.ts';
import type { DesignResistances } from '../../src/checks/member/capacities.ts';

const IN = 0.0254;
const KSI = 6.894757293168361e6;
const KIP_IN = 4448.2216152605 * IN;
const STEEL = { E_Pa: 29000 * KSI, Fy_Pa: 50 * KSI };
const close = (got: number, want: number, rel = 1e-4) => expect(Math.abs(got - want) / Math.abs(want)).toBeLessThan(rel);

describe('round HSS flexure, AISC 360-16 Section F8 (E = 29,000 ksi, Fy = 50 ksi)', () => {
  it('compact wall (10 in × 0.5 in, D/t 20 ≤ 0.07 E/Fy = 40.6): Mn = Fy Z = 2258.3 kip-in (Eq. F8-1)', () => {
    const r = roundFlexure(roundTube(10 * IN, 0.5 * IN), STEEL);
    expect(r.wallClass).toBe('compact');
    expect(r.equation).toContain('F8-1');
    close(r.nominal / KIP_IN, 2258.33);
  });

  it('noncompact wall (16 in × 0.375 in, D/t 42.7): Mn = (0.021 E/(D/t) + Fy) S = 4515.9 kip-in, below Fy Z = 4578.5 (Eq. F8-2)', () => {
    const p = roundTube(16 * IN, 0.375 * IN);
    close(p.S_m3 / IN ** 3, 70.2605);
    close(p.Z_m3 / IN ** 3, 91.5703);
    const r = roundFlexure(p, STEEL);
    expect(r.wallClass).toBe('noncompact');
    expect(r.equation).toContain('F8-2');
    close(r.nominal / KIP_IN, 4515.88);
  });

  it('slender wall (20 in × 0.1 in, D/t 200 > 0.31 E/Fy = 179.8): Mn = 0.33 E/(D/t) S = 1480.9 kip-in (Eq. F8-3, F8-4)', () => {
    const r = roundFlexure(roundTube(20 * IN, 0.1 * IN), STEEL);
    expect(r.wallClass).toBe('slender');
    close(r.nominal / KIP_IN, 1480.85);
  });

  it('beyond 0.45 E/Fy = 261 (D/t 300): no resistance, with the reason (Section F8 scope)', () => {
    const r = roundFlexure(roundTube(30 * IN, 0.1 * IN), STEEL);
    expect(r.valid).toBe(false);
    expect(r.reason).toContain('0.45 E/Fy');
  });
});

describe('round HSS shear, AISC 360-16 Eq. G5-1', () => {
  it('16 in × 0.375 in: the buckling stresses exceed 0.6 Fy, so Vn = 0.6 Fy Ag / 2 = 276.12 kips', () => {
    const r = roundShear(roundTube(16 * IN, 0.375 * IN), STEEL, 120 * IN);
    close(r.nominal / 4448.2216152605, 276.117);
  });
});

describe('combined forces, AISC 360-16 Eq. H3-6', () => {
  it('Pr/Pc = 0.2, Mr/Mc = 0.5, Vr/Vc = 0.1, Tr/Tc = 0.2 gives 0.2 + 0.5 + (0.1 + 0.2)² = 0.79', () => {
    const r = { phiPc_N: 1000, phiPt_N: 2000, phiMn_Nm: 100, phiVn_N: 500, phiTn_Nm: 50 } as DesignResistances;
    const it = interaction({ N_N: -200, M_Nm: 50, V_N: 50, T_Nm: 10 }, r);
    close(it.ratio, 0.79, 1e-12);
    // In tension the tensile resistance carries the axial term: 400/2000 = 0.2.
    close(interaction({ N_N: 400, M_Nm: 50, V_N: 50, T_Nm: 10 }, r).ratio, 0.79, 1e-12);
  });
});
