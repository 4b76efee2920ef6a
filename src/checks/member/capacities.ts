// Design resistances (φ × nominal) of one tube section, by shape: the five resistances the
// combined-forces check needs. Made once per station and reused for every combination.
import { qty, type StepCollector } from '../../calc/step.ts';
import type { Criteria } from '../../design/design.ts';
import type { TubeProperties } from '../../model/tube-section.ts';
import { multisidedCompression, multisidedFlexure, multisidedShear, multisidedTorsion } from './multisided.ts';
import type { Resistance, Steel } from './resistance.ts';
import { roundCompression, roundFlexure, roundShear, roundTorsion, tensionYield } from './round-hss.ts';

export interface MemberGeometry {
  /** Column length for flexural buckling: K × member length (a free-standing cantilever). */
  readonly Lc_m: number;
  /** Length for shear and torsion buckling: the member length (conservative: G5 and H3 use the
   * distance from the largest to zero shear, at most the member length). */
  readonly L_m: number;
}

export interface DesignResistances {
  readonly compression: Resistance;
  readonly tension: Resistance;
  readonly flexure: Resistance;
  readonly shear: Resistance;
  readonly torsion: Resistance;
  /** φ × nominal of each; NaN where the resistance is invalid. */
  readonly phiPc_N: number;
  readonly phiPt_N: number;
  readonly phiMn_Nm: number;
  readonly phiVn_N: number;
  readonly phiTn_Nm: number;
  /** The first invalid resistance's reason, or ''. */
  readonly invalidReason: string;
}

export function designResistances(p: TubeProperties, steel: Steel, g: MemberGeometry, phi: Criteria['phi'], c?: StepCollector): DesignResistances {
  const round = p.shape === 'round';
  const flexure = round ? roundFlexure(p, steel, c) : multisidedFlexure(p, steel, c);
  const compression = round ? roundCompression(p, steel, g.Lc_m, c) : multisidedCompression(p, steel, g.Lc_m, c);
  const tension = tensionYield(p, steel, c);
  const shear = round ? roundShear(p, steel, g.L_m, c) : multisidedShear(p, steel, c);
  const torsion = round ? roundTorsion(p, steel, g.L_m, c) : multisidedTorsion(p, steel, c);
  const designValue = (r: Resistance, f: number, sym: string, dim: 'force' | 'moment', what: string, key: string) => {
    const v = r.valid ? f * r.nominal : NaN;
    if (r.valid) c?.add({ description: `Design ${what} (resistance factor criteria.resistanceFactors.${key})`, symbol: sym, formula: `${sym} = φ × nominal`, substituted: [`${f} × `, qty(r.nominal, dim)], result: qty(v, dim), source: r.equation });
    return v;
  };
  const phiMn = designValue(flexure, phi.flexure, 'φMn', 'moment', 'flexural strength', 'flexure');
  const phiPc = designValue(compression, phi.axial, 'φPn,c', 'force', 'compressive strength', 'axial');
  const phiPt = designValue(tension, phi.tension, 'φPn,t', 'force', 'tensile strength', 'tension');
  const phiVn = designValue(shear, phi.shear, 'φVn', 'force', 'shear strength', 'shear');
  const phiTn = designValue(torsion, phi.torsion, 'φTn', 'moment', 'torsional strength', 'torsion');
  const bad = [flexure, compression, tension, shear, torsion].find((r) => !r.valid);
  return { compression, tension, flexure, shear, torsion, phiPc_N: phiPc, phiPt_N: phiPt, phiMn_Nm: phiMn, phiVn_N: phiVn, phiTn_Nm: phiTn, invalidReason: bad?.reason ?? '' };
}
