// Axial shortening of the pole from the base to the joint under the dead load: the one effect
// the moment-area check leaves out that shows in the arm-tip drop (the joint, and the arm with
// it, moves down by ∫ N/EA dz). Printed beside the hand check so the comparison can be read
// with and without it; it is not part of the moment-area result.
import type { Design } from '../design/design.ts';
import { attachmentWeight_N } from '../model/build-frame.ts';
import { STANDARD_GRAVITY_mps2 } from '../model/gravity.ts';
import { sectionAt } from '../model/taper.ts';
import { integratePiecewise, type QuadratureSettings } from './gauss-legendre.ts';

/** Weight entering the pole at a height: each arm (steel and attachments) at its attach height,
 * each pole attachment at its position. */
function entries(design: Design): { z_m: number; W_N: number }[] {
  const rhoG = design.material.density_kgm3 * STANDARD_GRAVITY_mps2;
  const out = design.arms.map((a) => {
    const steel = (a.length_m * rhoG * (sectionAt(a.section, a.length_m, 0).A_m2 + sectionAt(a.section, a.length_m, a.length_m).A_m2)) / 2;
    const attached = design.attachments.filter((x) => x.member === a.id).reduce((t, x) => t + attachmentWeight_N(x), 0);
    return { z_m: a.attachHeight_m, W_N: steel + attached };
  });
  for (const x of design.attachments) if (x.member === 'pole') out.push({ z_m: x.position_m, W_N: attachmentWeight_N(x) });
  return out;
}

export function poleShortening_m(design: Design, toHeight_m: number, q: QuadratureSettings): number {
  const pole = design.pole;
  const H = pole.height_m;
  const rhoG = design.material.density_kgm3 * STANDARD_GRAVITY_mps2;
  const A = (z: number) => sectionAt(pole.section, H, z).A_m2;
  const loads = entries(design);
  // Compression N(z): the pole's own steel above z (a linear load) plus every weight entering above z.
  const N = (z: number) => ((H - z) * rhoG * (A(z) + A(H))) / 2 + loads.reduce((t, l) => (l.z_m >= z ? t + l.W_N : t), 0);
  return integratePiecewise((z) => N(z) / (design.material.E_Pa * A(z)), 0, toHeight_m, loads.map((l) => l.z_m), q);
}
