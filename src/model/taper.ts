// A tapered member: outside diameter varies linearly from the root end to the tip end,
// wall constant. Properties at any position along the member.
import { qty, type CalcStep } from '../calc/step.ts';
import type { TubeSection } from '../design/design.ts';
import { STANDARD_GRAVITY_mps2, STANDARD_GRAVITY_SOURCE } from './gravity.ts';
import { tubeProperties, type TubeProperties } from './tube-section.ts';

/** Outside diameter (across flats) at distance s_m from the member root. */
export function diameterAt(section: TubeSection, length_m: number, s_m: number): number {
  if (!(length_m > 0)) throw new RangeError(`member length must be positive; got ${length_m} m`);
  const u = s_m / length_m;
  return section.rootDiameter_m + (section.tipDiameter_m - section.rootDiameter_m) * u;
}

/** Section properties at distance s_m from the member root. */
export function sectionAt(section: TubeSection, length_m: number, s_m: number): TubeProperties {
  return tubeProperties(section.shape, section.sides, diameterAt(section, length_m, s_m), section.wall_m);
}

export interface WeightPerLength {
  readonly massPerLength_kgm: number;
  readonly weightPerLength_Npm: number;
  readonly steps: readonly CalcStep[];
}

/** Steel mass and weight per metre of a section of area A. */
export function weightPerLength(A_m2: number, density_kgm3: number): WeightPerLength {
  const m = density_kgm3 * A_m2;
  const w = m * STANDARD_GRAVITY_mps2;
  return {
    massPerLength_kgm: m,
    weightPerLength_Npm: w,
    steps: [
      {
        description: 'Steel weight per length',
        symbol: 'w',
        // the unit weight γ = ρ g, as US practice states it (lb/ft³), not a mass density times g
        formula: 'w = γ A, γ = ρ g',
        substituted: [qty(density_kgm3 * STANDARD_GRAVITY_mps2, 'unitWeight'), ' × ', qty(A_m2, 'sectionArea')],
        result: qty(w, 'lineLoad'),
        source: STANDARD_GRAVITY_SOURCE,
        status: 'info',
      },
    ],
  };
}
