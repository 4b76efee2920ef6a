// Resistances of a regular multisided tube (8, 12 or 16 flats). The flats are treated as the
// stiffened walls of an HSS: flat width-to-thickness b/t classes, flexure by the compact /
// noncompact / slender pattern the support specification uses for multisided tubes, and the
// AISC 360-16 HSS-wall provisions for compression (E7.1 effective width), shear (G4 form) and
// torsion (H3.1(b) form) with the flat width in place of h. Constants as recalled, every one
// labelled; verify them against the governing specification before relying on them.
import { qty, type StepCollector } from '../../calc/step.ts';
import type { TubeProperties } from '../../model/tube-section.ts';
import { flexuralBucklingStress } from './column.ts';
import { AISC, invalid, type Resistance, type Steel, type WallClass } from './resistance.ts';

const LTS = 'AASHTO LRFD Specifications for Structural Supports for Highway Signs, Luminaires, and Traffic Signals, multisided tubes';
const FLAT_LIMITS_SOURCE = `${LTS} (b/t limits λp = 1.12 √(E/Fy), λr = 1.40 √(E/Fy), the AISC 360-16 Table B4.1b case 17 values for HSS walls; from memory, verify)`;
const SLENDER_SOURCE = `${AISC}, Eq. F7-4 effective width of a compression flat, applied as Mn = Fy S be/b (polebook simplification, conservative: every flat reduced; from memory, verify against ${LTS})`;

/** Multiples of √(E/Fy) for the flat width-to-thickness limits; applicability is polebook's own bound. */
export const FLAT_LIMITS = { compact: 1.12, noncompact: 1.4, applicabilityOfSlender: 2.8 } as const;

export interface FlatGeometry {
  /** Mid-wall flat width (no bend radius deducted: conservative). */
  readonly b_m: number;
  readonly bOverT: number;
}

export function flatGeometry(p: TubeProperties, c?: StepCollector): FlatGeometry {
  const n = p.sides!;
  const b = (p.D_m - p.t_m) * Math.tan(Math.PI / n);
  const r = b / p.t_m;
  c?.add({ description: `Flat width on the mid-wall line (${n} sides; the bend radius is not deducted, which is conservative)`, symbol: 'b', formula: 'b = (D − t) tan(π/n)', substituted: ['(', qty(p.D_m, 'section'), ' − ', qty(p.t_m, 'section'), `) × tan(π/${n})`], result: qty(b, 'section'), source: 'geometry of the regular polygon' });
  c?.add({ description: 'Flat width-to-thickness ratio', symbol: 'b/t', formula: 'b/t', substituted: [qty(b, 'section'), ' / ', qty(p.t_m, 'section')], result: qty(r, 'ratio'), source: FLAT_LIMITS_SOURCE });
  return { b_m: b, bOverT: r };
}

const root = (s: Steel) => Math.sqrt(s.E_Pa / s.Fy_Pa);

const beyond = (lambda: number, steel: Steel) =>
  `b/t = ${lambda.toFixed(1)} is beyond ${FLAT_LIMITS.applicabilityOfSlender} √(E/Fy) = ${(FLAT_LIMITS.applicabilityOfSlender * root(steel)).toFixed(1)}, twice the noncompact limit (polebook's bound of the slender-flat method; verify): the flats are too thin for the method`;

/** The flexural limit of b/t beyond which polebook gives no resistance. */
export const flatApplicability = (steel: Steel): number => FLAT_LIMITS.applicabilityOfSlender * root(steel);

export function multisidedFlexure(p: TubeProperties, steel: Steel, c?: StepCollector): Resistance {
  const { E_Pa: E, Fy_Pa: Fy } = steel;
  const { bOverT: lambda } = flatGeometry(p, c);
  const lp = FLAT_LIMITS.compact * root(steel);
  const lr = FLAT_LIMITS.noncompact * root(steel);
  if (!(lambda <= flatApplicability(steel))) return invalid(`${LTS} (scope)`, beyond(lambda, steel));
  const cls: WallClass = lambda <= lp ? 'compact' : lambda <= lr ? 'noncompact' : 'slender';
  c?.add({ description: `Flat class in flexure: ${cls} (λp = 1.12 √(E/Fy) = ${lp.toFixed(1)}, λr = 1.40 √(E/Fy) = ${lr.toFixed(1)})`, symbol: 'λ', formula: 'λ = b/t', substituted: [lambda.toFixed(2)], result: qty(lambda, 'ratio'), source: FLAT_LIMITS_SOURCE });
  const Mp = Fy * p.Z_m3;
  c?.add({ description: 'Plastic moment (the smaller Z, toward a flat or a corner)', symbol: 'Mp', formula: 'Mp = Fy Z', substituted: [qty(Fy, 'stress'), ' × ', qty(p.Z_m3, 'modulus')], result: qty(Mp, 'moment'), source: `${AISC}, Eq. F7-1 form; ${LTS} (compact flats, from memory, verify)` });
  if (cls === 'compact') return { nominal: Mp, wallClass: cls, equation: `${LTS}: Mn = Fy Z (compact)`, valid: true, reason: '' };
  const My = Fy * p.S_m3;
  if (cls === 'noncompact') {
    const Mn = Mp - ((Mp - My) * (lambda - lp)) / (lr - lp);
    c?.add({ description: 'Noncompact flats: straight line from Mp at λp to My = Fy S (S at the corner) at λr', symbol: 'Mn', formula: 'Mn = Mp − (Mp − Fy S)(λ − λp)/(λr − λp)', substituted: [qty(Mp, 'moment'), ' − (', qty(Mp, 'moment'), ' − ', qty(My, 'moment'), `) × (${lambda.toFixed(2)} − ${lp.toFixed(2)}) / (${lr.toFixed(2)} − ${lp.toFixed(2)})`], result: qty(Mn, 'moment'), source: `${AISC}, Eq. F7-2 pattern (linear between the limits); ${LTS}; from memory, verify` });
    return { nominal: Mn, wallClass: cls, equation: `${LTS}: noncompact flats (F7-2 pattern)`, valid: true, reason: '' };
  }
  const k = root(steel);
  const be = Math.min(p.t_m * 1.92 * k * (1 - (0.38 / lambda) * k), lambda * p.t_m);
  const b = lambda * p.t_m;
  c?.add({ description: 'Effective width of a slender compression flat', symbol: 'be', formula: 'be = 1.92 t √(E/Fy) [1 − 0.38/(b/t) √(E/Fy)] ≤ b', substituted: ['1.92 × ', qty(p.t_m, 'section'), ` × ${k.toFixed(2)} × [1 − 0.38 / ${lambda.toFixed(2)} × ${k.toFixed(2)}]`], result: qty(be, 'section'), source: SLENDER_SOURCE });
  const Mn = (My * be) / b;
  c?.add({ description: 'Slender flats: first yield of the effective section, taken as Fy S be/b', symbol: 'Mn', formula: 'Mn = Fy S be / b', substituted: [qty(My, 'moment'), ' × ', qty(be, 'section'), ' / ', qty(b, 'section')], result: qty(Mn, 'moment'), source: SLENDER_SOURCE });
  return { nominal: Mn, wallClass: cls, equation: `${AISC}, Eq. F7-4 effective width (slender flats)`, valid: true, reason: '' };
}

export function multisidedCompression(p: TubeProperties, steel: Steel, Lc_m: number, c?: StepCollector): Resistance {
  const { Fy_Pa: Fy } = steel;
  const { b_m: b, bOverT: lambda } = flatGeometry(p, c);
  if (!(lambda <= flatApplicability(steel))) return invalid(`${LTS} (scope)`, beyond(lambda, steel));
  const { Fcr_Pa } = flexuralBucklingStress(p.r_m, Lc_m, steel, c);
  const lr = 1.4 * root(steel);
  const n = p.sides!;
  let Ae = p.A_m2;
  if (lambda > lr * Math.sqrt(Fy / Fcr_Pa)) {
    const Fel = ((1.38 * lr) / lambda) ** 2 * Fy;
    const f = Math.sqrt(Fel / Fcr_Pa);
    const be = b * (1 - 0.2 * f) * f;
    c?.add({ description: `Effective width of each flat in compression (b/t > λr √(Fy/Fcr); c1 = 0.20, c2 = 1.38, λr = 1.40 √(E/Fy) = ${lr.toFixed(1)})`, symbol: 'be', formula: 'be = b (1 − c1 √(Fel/Fcr)) √(Fel/Fcr), Fel = (c2 λr/λ)² Fy', substituted: [qty(b, 'section'), ' × (1 − 0.20 × ', f.toFixed(3), ') × ', f.toFixed(3)], result: qty(be, 'section'), source: `${AISC}, Eq. E7-3, E7-5, Table E7.1 case (b) (walls of HSS)` });
    Ae = p.A_m2 - n * (b - be) * p.t_m;
    c?.add({ description: 'Effective area', symbol: 'Ae', formula: 'Ae = A − n (b − be) t', substituted: [qty(p.A_m2, 'sectionArea'), ` − ${n} × (`, qty(b, 'section'), ' − ', qty(be, 'section'), ') × ', qty(p.t_m, 'section')], result: qty(Ae, 'sectionArea'), source: `${AISC}, Section E7.1` });
  } else {
    c?.add({ description: 'Effective area: the flats are fully effective at Fcr', symbol: 'Ae', formula: 'Ae = Ag', substituted: [qty(p.A_m2, 'sectionArea')], result: qty(Ae, 'sectionArea'), source: `${AISC}, Section E7.1 (b/t ≤ λr √(Fy/Fcr))` });
  }
  const Pn = Fcr_Pa * Ae;
  c?.add({ description: 'Nominal compressive strength', symbol: 'Pn', formula: 'Pn = Fcr Ae', substituted: [qty(Fcr_Pa, 'stress'), ' × ', qty(Ae, 'sectionArea')], result: qty(Pn, 'force'), source: `${AISC}, Eq. E7-1` });
  return { nominal: Pn, wallClass: Ae < p.A_m2 ? 'slender' : 'compact', equation: `${AISC}, Eq. E7-1`, valid: true, reason: '' };
}

export function multisidedShear(p: TubeProperties, steel: Steel, c?: StepCollector): Resistance {
  const { E_Pa: E, Fy_Pa: Fy } = steel;
  const lambda = flatGeometry(p).bOverT;
  const kv = 5;
  const a = Math.sqrt((kv * E) / Fy);
  const Cv2 = lambda <= 1.1 * a ? 1 : lambda <= 1.37 * a ? (1.1 * a) / lambda : (1.51 * kv * E) / (lambda ** 2 * Fy);
  c?.add({ description: `Web shear buckling coefficient of the flats (kv = 5; limits 1.10 and 1.37 √(kv E/Fy) = ${(1.1 * a).toFixed(1)}, ${(1.37 * a).toFixed(1)})`, symbol: 'Cv2', formula: 'Cv2 = 1; 1.10 √(kv E/Fy)/(b/t); 1.51 kv E/((b/t)² Fy)', substituted: [`b/t = ${lambda.toFixed(2)}`], result: qty(Cv2, 'ratio'), source: `${AISC}, Eq. G2-9 to G2-11 (Section G4 for HSS walls, flat width for h)` });
  const Aw = p.A_m2 / 2;
  const Vn = 0.6 * Fy * Aw * Cv2;
  c?.add({ description: 'Nominal shear strength (half the flats act as webs in any direction)', symbol: 'Vn', formula: 'Vn = 0.6 Fy (A/2) Cv2', substituted: ['0.6 × ', qty(Fy, 'stress'), ' × ', qty(Aw, 'sectionArea'), ` × ${Cv2.toFixed(3)}`], result: qty(Vn, 'force'), source: `${AISC}, Eq. G4-1 form with Aw = A/2 (polebook, for a regular polygon; verify)` });
  return { nominal: Vn, equation: `${AISC}, Eq. G4-1 form`, valid: true, reason: '' };
}

export function multisidedTorsion(p: TubeProperties, steel: Steel, c?: StepCollector): Resistance {
  const { E_Pa: E, Fy_Pa: Fy } = steel;
  const lambda = flatGeometry(p).bOverT;
  const k = root(steel);
  const Fcr = lambda <= 2.45 * k ? 0.6 * Fy : lambda <= 3.07 * k ? (0.6 * Fy * 2.45 * k) / lambda : (0.458 * Math.PI ** 2 * E) / lambda ** 2;
  c?.add({ description: `Torsional critical stress of the flats (limits 2.45 and 3.07 √(E/Fy) = ${(2.45 * k).toFixed(1)}, ${(3.07 * k).toFixed(1)})`, symbol: 'Fcr,t', formula: 'Fcr = 0.6 Fy; 0.6 Fy (2.45 √(E/Fy))/(b/t); 0.458 π² E/(b/t)²', substituted: [`b/t = ${lambda.toFixed(2)}`], result: qty(Fcr, 'stress'), source: `${AISC}, Eq. H3-3 to H3-5 (rectangular HSS walls, flat width for h)` });
  const Dm = p.D_m - p.t_m;
  const A0 = (p.sides! * Dm * Dm * Math.tan(Math.PI / p.sides!)) / 4;
  const C = 2 * A0 * p.t_m;
  c?.add({ description: 'Torsional constant of the closed polygon (twice the enclosed mid-wall area times t)', symbol: 'C', formula: 'C = 2 A0 t, A0 = n Dm² tan(π/n) / 4', substituted: ['2 × ', qty(A0, 'sectionArea'), ' × ', qty(p.t_m, 'section')], result: qty(C, 'modulus'), source: 'Bredt thin-walled closed section (τ = T / (2 A0 t)); the AISC 360-16 H3.1 user note uses the same form for rectangular HSS' });
  const Tn = Fcr * C;
  c?.add({ description: 'Nominal torsional strength', symbol: 'Tn', formula: 'Tn = Fcr C', substituted: [qty(Fcr, 'stress'), ' × ', qty(C, 'modulus')], result: qty(Tn, 'moment'), source: `${AISC}, Eq. H3-1` });
  return { nominal: Tn, equation: `${AISC}, Eq. H3-1`, valid: true, reason: '' };
}
