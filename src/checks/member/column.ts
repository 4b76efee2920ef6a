// Flexural buckling of a column (AISC 360-16 Section E3), shared by round and multisided tubes:
// Fe = π²E/(Lc/r)² (E3-4); Fcr = 0.658^(Fy/Fe) Fy when Lc/r ≤ 4.71√(E/Fy) (E3-2), else 0.877 Fe (E3-3).
import { qty, type StepCollector } from '../../calc/step.ts';
import { AISC, type Steel } from './resistance.ts';

export function flexuralBucklingStress(r_m: number, Lc_m: number, steel: Steel, c?: StepCollector): { Fcr_Pa: number; equation: string } {
  const { E_Pa: E, Fy_Pa: Fy } = steel;
  const slender = Lc_m / r_m;
  const Fe = slender > 0 ? (Math.PI ** 2 * E) / slender ** 2 : Infinity;
  const limit = 4.71 * Math.sqrt(E / Fy);
  const inelastic = slender <= limit;
  const Fcr = inelastic ? 0.658 ** (Fy / Fe) * Fy : 0.877 * Fe;
  const equation = inelastic ? `${AISC}, Eq. E3-2` : `${AISC}, Eq. E3-3`;
  c?.add({ description: 'Slenderness of the member as a column', symbol: 'Lc/r', formula: 'Lc/r', substituted: [qty(Lc_m, 'length'), ' / ', qty(r_m, 'section')], result: qty(slender, 'ratio'), source: `${AISC}, Section E2` });
  c?.add({ description: 'Elastic buckling stress', symbol: 'Fe', formula: 'Fe = π² E / (Lc/r)²', substituted: ['π² × ', qty(E, 'stress'), ` / ${slender.toFixed(2)}²`], result: qty(Fe, 'stress'), source: `${AISC}, Eq. E3-4` });
  c?.add({
    description: inelastic ? `Critical stress, inelastic buckling (Lc/r ≤ 4.71 √(E/Fy) = ${limit.toFixed(1)})` : `Critical stress, elastic buckling (Lc/r > 4.71 √(E/Fy) = ${limit.toFixed(1)})`,
    symbol: 'Fcr',
    formula: inelastic ? 'Fcr = 0.658^(Fy/Fe) Fy' : 'Fcr = 0.877 Fe',
    substituted: inelastic ? ['0.658^(', qty(Fy, 'stress'), ' / ', qty(Fe, 'stress'), ') × ', qty(Fy, 'stress')] : ['0.877 × ', qty(Fe, 'stress')],
    result: qty(Fcr, 'stress'),
    source: equation,
  });
  return { Fcr_Pa: Fcr, equation };
}
