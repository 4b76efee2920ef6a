// Coefficients of the design wind pressure from a basic wind speed, P = 0.00256 Kz Kd G V² Cd
// (psf, V in mph), in SI 0.613 Kz Kd G V² Cd (Pa, V in m/s). All values as recalled from the
// AASHTO support specification and ASCE 7; every one is labelled so in the package.
import { FT_M, MPH_MS, PSF_PA } from '../units/units.ts';
import type { Exposure } from '../design/design.ts';

/** 0.00256 psf per mph² (half the air density at standard conditions) in Pa per (m/s)²: 0.6133. */
export const VELOCITY_PRESSURE_SI = (0.00256 * PSF_PA) / MPH_MS ** 2;

export const PRESSURE_SOURCE = 'P = 0.00256 Kz Kd G V² Cd (psf, mph), SI 0.613 Kz Kd G V² Cd (Pa, m/s): AASHTO LRFD-LTS velocity pressure, from memory; verify';

/** Power-law constants of Kz (ASCE 7-16 Table 26.11-1, from memory): alpha and the gradient height zg. */
export const EXPOSURE_CONSTANTS: Readonly<Record<Exposure, { readonly alpha: number; readonly zg_m: number }>> = {
  B: { alpha: 7.0, zg_m: 1200 * FT_M },
  C: { alpha: 9.5, zg_m: 900 * FT_M },
  D: { alpha: 11.5, zg_m: 700 * FT_M },
};
/** Kz is constant below this height (ASCE 7-16 Table 26.10-1 note, from memory). */
export const KZ_MIN_HEIGHT_M = 15 * FT_M;
export const KZ_SOURCE = 'Kz = 2.01 (z/zg)^(2/α), z at least 15 ft (ASCE 7-16 Tables 26.10-1 and 26.11-1: B α 7.0 zg 1200 ft, C α 9.5 zg 900 ft, D α 11.5 zg 700 ft; from memory, verify)';

export function kz(z_m: number, exposure: Exposure): number {
  const { alpha, zg_m } = EXPOSURE_CONSTANTS[exposure];
  return 2.01 * (Math.max(z_m, KZ_MIN_HEIGHT_M) / zg_m) ** (2 / alpha);
}

/** Round tubes: Cd by Cv V d (mph × ft), 1.10 subcritical, 129/(Cv V d)^1.3 between, 0.45
 * supercritical; the middle law is clamped to the two plateaus so Cd is continuous. */
export const ROUND_DRAG_SOURCE = 'round tube: Cd = 1.10 for Cv V d < 39, 129/(Cv V d)^1.3 from 39 to 78, 0.45 above (Cv V d in mph·ft), held between 0.45 and 1.10 so it is continuous (AASHTO LRFD-LTS drag of cylinders, from memory; verify)';

export function roundDrag(Cv: number, V_mps: number, d_m: number): { readonly CvVd: number; readonly Cd: number } {
  const CvVd = Cv * (V_mps / MPH_MS) * (d_m / FT_M);
  const Cd = CvVd <= 0 ? 1.1 : Math.min(1.1, Math.max(0.45, 129 / CvVd ** 1.3));
  return { CvVd, Cd };
}

/** Multisided tubes: the subcritical drag with no Reynolds-number reduction (conservative). */
export const MULTISIDED_DRAG: Readonly<Record<number, number>> = { 8: 1.2, 12: 1.15, 16: 1.1 };
export const MULTISIDED_DRAG_SOURCE = 'multisided tube: 8 sides 1.20, 12 sides 1.15, 16 sides 1.10, the subcritical drag with no supercritical reduction (polebook, conservative; from memory, verify against the governing code)';

/** Sign panels by aspect ratio (longer over shorter side), interpolated linearly (from memory). */
const PANEL_DRAG: ReadonlyArray<readonly [number, number]> = [[1, 1.12], [2, 1.19], [5, 1.2], [10, 1.23], [15, 1.3], [20, 1.38]];
export const PANEL_DRAG_SOURCE = 'sign panel by aspect ratio L/W: 1.12 (1), 1.19 (2), 1.20 (5), 1.23 (10), 1.30 (15), 1.38 (20 and over), linear between (AASHTO LRFD-LTS drag of sign panels, from memory; verify)';

export function panelDrag(width_m: number, height_m: number): { readonly aspect: number; readonly Cd: number } {
  const aspect = Math.max(width_m, height_m) / Math.min(width_m, height_m);
  const last = PANEL_DRAG[PANEL_DRAG.length - 1]!;
  if (aspect >= last[0]) return { aspect, Cd: last[1] };
  for (let k = 1; k < PANEL_DRAG.length; k++) {
    const [a1, c1] = PANEL_DRAG[k]!;
    const [a0, c0] = PANEL_DRAG[k - 1]!;
    if (aspect <= a1) return { aspect, Cd: c0 + ((c1 - c0) * (aspect - a0)) / (a1 - a0) };
  }
  return { aspect, Cd: last[1] };
}
