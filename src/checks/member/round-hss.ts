// Resistances of a round tube by the round-HSS provisions of AISC 360-16: flexure (F8),
// compression (E3 with the effective area of E7 for round HSS), shear (G5), torsion (H3.1(a)),
// tension (D2). Nominal values; the resistance factors are applied by the caller.
import { qty, type StepCollector } from '../../calc/step.ts';
import type { TubeProperties } from '../../model/tube-section.ts';
import { flexuralBucklingStress } from './column.ts';
import { AISC, invalid, type Resistance, type Steel, type WallClass } from './resistance.ts';

/** Table B4.1b case 20 (flexure) and Table B4.1a case 9 (compression), and the applicability limit of F8 and E7. */
export const ROUND_LIMITS = { flexureCompact: 0.07, flexureNoncompact: 0.31, compressionNonslender: 0.11, applicability: 0.45 } as const;

function dOverT(p: TubeProperties, c?: StepCollector): number {
  const r = p.D_m / p.t_m;
  c?.add({ description: 'Wall slenderness', symbol: 'D/t', formula: 'D/t', substituted: [qty(p.D_m, 'section'), ' / ', qty(p.t_m, 'section')], result: qty(r, 'ratio'), source: `${AISC}, Table B4.1 (round HSS: D/t)` });
  return r;
}

const beyond = (lambda: number, steel: Steel) =>
  `D/t = ${lambda.toFixed(1)} is beyond 0.45 E/Fy = ${(ROUND_LIMITS.applicability * steel.E_Pa / steel.Fy_Pa).toFixed(1)}, the limit of the round-HSS provisions (AISC 360-16 F8 and E7): the specification gives no resistance for so thin a wall`;

export function roundFlexure(p: TubeProperties, steel: Steel, c?: StepCollector): Resistance {
  const { E_Pa: E, Fy_Pa: Fy } = steel;
  const lambda = dOverT(p, c);
  const lp = (ROUND_LIMITS.flexureCompact * E) / Fy;
  const lr = (ROUND_LIMITS.flexureNoncompact * E) / Fy;
  const lmax = (ROUND_LIMITS.applicability * E) / Fy;
  if (!(lambda < lmax)) return invalid(`${AISC}, Section F8 (scope)`, beyond(lambda, steel));
  const cls: WallClass = lambda <= lp ? 'compact' : lambda <= lr ? 'noncompact' : 'slender';
  c?.add({ description: `Wall class in flexure: ${cls} (λp = 0.07 E/Fy = ${lp.toFixed(1)}, λr = 0.31 E/Fy = ${lr.toFixed(1)})`, symbol: 'λ', formula: 'λ = D/t', substituted: [lambda.toFixed(2)], result: qty(lambda, 'ratio'), source: `${AISC}, Table B4.1b case 20` });
  const Mp = Fy * p.Z_m3;
  c?.add({ description: 'Plastic moment (yielding)', symbol: 'Mp', formula: 'Mn = Mp = Fy Z', substituted: [qty(Fy, 'stress'), ' × ', qty(p.Z_m3, 'modulus')], result: qty(Mp, 'moment'), source: `${AISC}, Eq. F8-1` });
  if (cls === 'compact') return { nominal: Mp, wallClass: cls, equation: `${AISC}, Eq. F8-1`, valid: true, reason: '' };
  if (cls === 'noncompact') {
    const Mlb = ((0.021 * E) / lambda + Fy) * p.S_m3;
    c?.add({ description: 'Local buckling, noncompact wall', symbol: 'Mn,lb', formula: 'Mn = (0.021 E / (D/t) + Fy) S', substituted: ['(0.021 × ', qty(E, 'stress'), ` / ${lambda.toFixed(2)} + `, qty(Fy, 'stress'), ') × ', qty(p.S_m3, 'modulus')], result: qty(Mlb, 'moment'), source: `${AISC}, Eq. F8-2` });
    const Mn = Math.min(Mp, Mlb);
    c?.add({ description: 'Nominal flexural strength: the lower of yielding and local buckling', symbol: 'Mn', formula: 'Mn = min(Mp, Mn,lb)', substituted: ['min(', qty(Mp, 'moment'), ', ', qty(Mlb, 'moment'), ')'], result: qty(Mn, 'moment'), source: `${AISC}, Section F8` });
    return { nominal: Mn, wallClass: cls, equation: Mn === Mp ? `${AISC}, Eq. F8-1` : `${AISC}, Eq. F8-2`, valid: true, reason: '' };
  }
  const Fcr = (0.33 * E) / lambda;
  c?.add({ description: 'Local buckling stress, slender wall', symbol: 'Fcr', formula: 'Fcr = 0.33 E / (D/t)', substituted: ['0.33 × ', qty(E, 'stress'), ` / ${lambda.toFixed(2)}`], result: qty(Fcr, 'stress'), source: `${AISC}, Eq. F8-4` });
  const Mlb = Fcr * p.S_m3;
  c?.add({ description: 'Local buckling, slender wall', symbol: 'Mn', formula: 'Mn = Fcr S', substituted: [qty(Fcr, 'stress'), ' × ', qty(p.S_m3, 'modulus')], result: qty(Mlb, 'moment'), source: `${AISC}, Eq. F8-3` });
  return { nominal: Math.min(Mp, Mlb), wallClass: cls, equation: `${AISC}, Eq. F8-3`, valid: true, reason: '' };
}

export function roundCompression(p: TubeProperties, steel: Steel, Lc_m: number, c?: StepCollector): Resistance {
  const { E_Pa: E, Fy_Pa: Fy } = steel;
  const lambda = dOverT(p, c);
  const lr = (ROUND_LIMITS.compressionNonslender * E) / Fy;
  const lmax = (ROUND_LIMITS.applicability * E) / Fy;
  if (!(lambda < lmax)) return invalid(`${AISC}, Section E7 (scope)`, beyond(lambda, steel));
  let Ae = p.A_m2;
  if (lambda > lr) {
    const ratio = Math.min(1, (0.038 * E) / (Fy * lambda) + 2 / 3);
    Ae = ratio * p.A_m2;
    c?.add({ description: `Effective area, slender wall in compression (D/t > 0.11 E/Fy = ${lr.toFixed(1)}); not more than Ag`, symbol: 'Ae', formula: 'Ae = [0.038 E / (Fy D/t) + 2/3] Ag ≤ Ag', substituted: ['[0.038 × ', qty(E, 'stress'), ' / (', qty(Fy, 'stress'), ` × ${lambda.toFixed(2)}) + 2/3] × `, qty(p.A_m2, 'sectionArea')], result: qty(Ae, 'sectionArea'), source: `${AISC}, Eq. E7-7 (cap at Ag: polebook, conservative just above the limit, where E7-7 gives up to 1.2 % more)` });
  } else {
    c?.add({ description: `Effective area: the wall is not slender in compression (D/t ≤ 0.11 E/Fy = ${lr.toFixed(1)})`, symbol: 'Ae', formula: 'Ae = Ag', substituted: [qty(p.A_m2, 'sectionArea')], result: qty(Ae, 'sectionArea'), source: `${AISC}, Section E7 and Table B4.1a case 9` });
  }
  const { Fcr_Pa } = flexuralBucklingStress(p.r_m, Lc_m, steel, c);
  const Pn = Fcr_Pa * Ae;
  c?.add({ description: 'Nominal compressive strength', symbol: 'Pn', formula: 'Pn = Fcr Ae', substituted: [qty(Fcr_Pa, 'stress'), ' × ', qty(Ae, 'sectionArea')], result: qty(Pn, 'force'), source: `${AISC}, Eq. E7-1` });
  return { nominal: Pn, wallClass: lambda > lr ? 'slender' : 'compact', equation: `${AISC}, Eq. E7-1`, valid: true, reason: '' };
}

/** Shear (G5-2) and torsion (H3-2) share one form: the larger of a length-dependent and a
 * length-free buckling stress of the wall, not more than 0.6 Fy. */
function wallBucklingStress(p: TubeProperties, steel: Steel, L_m: number, kLong: number, kShort: number): { a: number; b: number; Fcr: number } {
  const lambda = p.D_m / p.t_m;
  const a = (kLong * steel.E_Pa) / (Math.sqrt(L_m / p.D_m) * lambda ** 1.25);
  const b = (kShort * steel.E_Pa) / lambda ** 1.5;
  return { a, b, Fcr: Math.min(Math.max(a, b), 0.6 * steel.Fy_Pa) };
}

export function roundShear(p: TubeProperties, steel: Steel, Lv_m: number, c?: StepCollector): Resistance {
  const Fy = steel.Fy_Pa;
  const { a, b, Fcr } = wallBucklingStress(p, steel, Lv_m, 1.6, 0.78);
  c?.add({ description: 'Shear buckling stress, the larger of G5-2a and G5-2b, not more than 0.6 Fy', symbol: 'Fcr,v', formula: 'Fcr = max(1.60 E / (√(Lv/D) (D/t)^1.25), 0.78 E / (D/t)^1.5) ≤ 0.6 Fy', substituted: ['max(', qty(a, 'stress'), ', ', qty(b, 'stress'), ') ≤ ', qty(0.6 * Fy, 'stress'), ' (Lv = ', qty(Lv_m, 'length'), ')'], result: qty(Fcr, 'stress'), source: `${AISC}, Eq. G5-2a, G5-2b` });
  const Vn = (Fcr * p.A_m2) / 2;
  c?.add({ description: 'Nominal shear strength', symbol: 'Vn', formula: 'Vn = Fcr Ag / 2', substituted: [qty(Fcr, 'stress'), ' × ', qty(p.A_m2, 'sectionArea'), ' / 2'], result: qty(Vn, 'force'), source: `${AISC}, Eq. G5-1` });
  return { nominal: Vn, equation: `${AISC}, Eq. G5-1`, valid: true, reason: '' };
}

export function roundTorsion(p: TubeProperties, steel: Steel, L_m: number, c?: StepCollector): Resistance {
  const Fy = steel.Fy_Pa;
  const { a, b, Fcr } = wallBucklingStress(p, steel, L_m, 1.23, 0.6);
  c?.add({ description: 'Torsional buckling stress, the larger of H3-2a and H3-2b, not more than 0.6 Fy', symbol: 'Fcr,t', formula: 'Fcr = max(1.23 E / (√(L/D) (D/t)^1.25), 0.60 E / (D/t)^1.5) ≤ 0.6 Fy', substituted: ['max(', qty(a, 'stress'), ', ', qty(b, 'stress'), ') ≤ ', qty(0.6 * Fy, 'stress'), ' (L = ', qty(L_m, 'length'), ')'], result: qty(Fcr, 'stress'), source: `${AISC}, Eq. H3-2a, H3-2b` });
  const C = (Math.PI * (p.D_m - p.t_m) ** 2 * p.t_m) / 2;
  c?.add({ description: 'Torsional constant of a round HSS', symbol: 'C', formula: 'C = π (D − t)² t / 2', substituted: ['π × (', qty(p.D_m, 'section'), ' − ', qty(p.t_m, 'section'), ')² × ', qty(p.t_m, 'section'), ' / 2'], result: qty(C, 'modulus'), source: `${AISC}, Section H3.1 (user note)` });
  const Tn = Fcr * C;
  c?.add({ description: 'Nominal torsional strength', symbol: 'Tn', formula: 'Tn = Fcr C', substituted: [qty(Fcr, 'stress'), ' × ', qty(C, 'modulus')], result: qty(Tn, 'moment'), source: `${AISC}, Eq. H3-1` });
  return { nominal: Tn, equation: `${AISC}, Eq. H3-1`, valid: true, reason: '' };
}

export function tensionYield(p: TubeProperties, steel: Steel, c?: StepCollector): Resistance {
  const Pn = steel.Fy_Pa * p.A_m2;
  c?.add({ description: 'Nominal tensile strength, yielding of the gross section', symbol: 'Pn,t', formula: 'Pn = Fy Ag', substituted: [qty(steel.Fy_Pa, 'stress'), ' × ', qty(p.A_m2, 'sectionArea')], result: qty(Pn, 'force'), source: `${AISC}, Eq. D2-1` });
  return { nominal: Pn, equation: `${AISC}, Eq. D2-1`, valid: true, reason: '' };
}
