// Base plate bending at the pole face by an effective width per bolt: the most loaded bolt force
// acts at the lever arm a from the bolt centre to the pole face, the plate resisting over a
// width b_eff spread at 45 degrees from the bolt (2a), at most the share of the pole perimeter
// of one bolt (π D_p / n), with its plastic modulus b t²/4. From memory, verify.
import { qty, type StepCollector } from '../../calc/step.ts';
import type { AnchorBolts, BasePlate, Design } from '../../design/design.ts';

export const BASE_PLATE_SOURCE = 'effective-width method: M = F_b a at the pole face, φMn = φ Fy b_eff t²/4 with b_eff = min(2a, π D_p/n) (from memory, verify against the governing code)';

export interface PlateBending {
  readonly a_m: number;
  readonly b_m: number;
  readonly Mu_Nm: number;
  readonly phiMn_Nm: number;
}

export function basePlateBending(design: Design, b: AnchorBolts, plate: BasePlate, Fb_N: number, c?: StepCollector): PlateBending | { readonly cannot: string } {
  const sec = design.pole.section;
  const Dp = sec.rootDiameter_m;
  const a_m = (b.circleDiameter_m - Dp) / 2;
  const face = sec.shape === 'round' ? 'outside diameter' : 'diameter across the flats (a bolt opposite a flat has the longest lever arm)';
  if (!(a_m > 0)) return { cannot: 'the bolt circle is not outside the pole base: the effective-width method is for bolts outside the pole face' };
  const spread = 2 * a_m;
  const share = (Math.PI * Dp) / b.count;
  const b_m = Math.min(spread, share);
  const Mu_Nm = Fb_N * a_m;
  const phi = design.criteria.phi.flexure;
  const phiMn_Nm = (phi * plate.Fy_Pa * b_m * plate.thickness_m ** 2) / 4;
  if (c) {
    c.add({ description: `Lever arm from the bolt centre to the pole face, pole ${face} at the base`, symbol: 'a', formula: 'a = (D − D_p) / 2', substituted: ['(', qty(b.circleDiameter_m, 'section'), ' − ', qty(Dp, 'section'), ') / 2'], result: qty(a_m, 'section'), source: 'geometry' });
    c.add({ description: 'Effective width of plate per bolt: 45-degree spread, at most the pole perimeter per bolt', symbol: 'b_eff', formula: 'b_eff = min(2a, π D_p / n)', substituted: ['min(', qty(spread, 'section'), ', ', qty(share, 'section'), ')'], result: qty(b_m, 'section'), source: BASE_PLATE_SOURCE });
    c.add({ description: 'Plate moment at the pole face from the design bolt force', symbol: 'M_p', formula: 'M_p = F_b a', substituted: [qty(Fb_N, 'force'), ' × ', qty(a_m, 'section')], result: qty(Mu_Nm, 'moment'), source: BASE_PLATE_SOURCE });
    c.add({ description: 'Design flexural resistance of the plate strip', symbol: 'φMn', formula: 'φMn = φ Fy b_eff t² / 4', substituted: [`${phi} × `, qty(plate.Fy_Pa, 'stress'), ' × ', qty(b_m, 'section'), ' × (', qty(plate.thickness_m, 'section'), ')² / 4'], result: qty(phiMn_Nm, 'moment'), source: 'plastic modulus of a rectangle b t²/4; resistance factor criteria.resistanceFactors.flexure', status: Mu_Nm <= phiMn_Nm * (1 + 1e-9) ? 'ok' : 'fail' });
  }
  return { a_m, b_m, Mu_Nm, phiMn_Nm };
}
