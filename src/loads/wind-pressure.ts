// The design wind pressure at a place: the pressure the user typed for the class, or, without one,
// P = 0.00256 Kz Kd G V² Cd from the wind speed at that height (wind-coefficients.ts). Each
// function can print its steps: coefficient, formula, substituted values, result, source.
import { qty, type StepCollector } from '../calc/step.ts';
import type { Attachment, Design, PanelAttachment, TubeSection } from '../design/design.ts';
import { findAxis, offsetVector } from '../model/member-axes.ts';
import { add, scale } from '../model/vec3.ts';
import { KZ_SOURCE, MULTISIDED_DRAG, MULTISIDED_DRAG_SOURCE, PANEL_DRAG_SOURCE, PRESSURE_SOURCE, ROUND_DRAG_SOURCE, VELOCITY_PRESSURE_SI, kz, panelDrag, roundDrag } from './wind-coefficients.ts';

export interface PressureSteps {
  readonly steps: StepCollector;
  /** Where, in words, e.g. "pole root" or "panel S1". */
  readonly where: string;
}

/** Height of an attachment's centroid above the pole base. */
export function attachmentHeight(design: Design, a: Attachment): number {
  const ax = findAxis(design, a.member);
  return add(add(ax.origin_m, scale(ax.direction, a.position_m)), offsetVector(ax, a.offset))[2];
}

function velocityPressure(design: Design, z_m: number, out?: PressureSteps): { readonly q: number; readonly Kz: number } {
  const s = design.wind.speed!;
  const Kz = kz(z_m, s.exposure);
  const q = VELOCITY_PRESSURE_SI * Kz * s.Kd * s.G * s.V_mps ** 2;
  if (out) {
    out.steps.add({ description: `Height factor at the ${out.where} (height z above the base), exposure ${s.exposure}`, symbol: 'Kz', formula: 'Kz = 2.01 (z/zg)^(2/α)', substituted: ['z = ', qty(z_m, 'length')], result: qty(Kz, 'ratio'), source: KZ_SOURCE });
  }
  return { q, Kz };
}

function pressureStep(design: Design, out: PressureSteps, Kz: number, Cd: number, p: number): void {
  const s = design.wind.speed!;
  out.steps.add({
    description: `Design wind pressure at the ${out.where}`,
    symbol: 'P',
    formula: 'P = 0.00256 Kz Kd G V² Cd (psf, mph)',
    substituted: [`0.00256 × ${Kz.toFixed(3)} × ${s.Kd} × ${s.G} × (`, qty(s.V_mps, 'speed'), `)² × ${Cd.toFixed(3)}`],
    result: qty(p, 'pressure'),
    source: PRESSURE_SOURCE,
  });
}

/** Pressure on a member at height z where its outside diameter (across flats) is D: the member's
 * own pressure, else the class pressure, else from the wind speed (with the member's own drag if given). */
const ownWind = (design: Design, member: string) => (member === 'pole' ? design.pole.wind : design.arms.find((a) => a.id === member)?.wind);

/** The member's own pressure or the class pressure, when one is typed; null: from the wind speed. */
function typedMemberPressure(design: Design, member: string): number | null {
  return ownWind(design, member)?.pressure_Pa ?? design.wind.membersPressure_Pa;
}

/** Whether a member's pressure is typed (the same at every height). */
export const memberPressureIsTyped = (design: Design, member: string): boolean => typedMemberPressure(design, member) !== null;

export function memberPressure(design: Design, member: string, section: TubeSection, z_m: number, D_m: number, out?: PressureSteps): number {
  const typed = typedMemberPressure(design, member);
  if (typed !== null) return typed;
  const own = ownWind(design, member);
  const { q, Kz } = velocityPressure(design, z_m, out);
  let Cd: number;
  if (own?.drag != null) {
    Cd = own.drag;
    out?.steps.add({ description: `Drag coefficient of the ${out.where.replace(/ (root|tip)$/, '')}, as given`, symbol: 'Cd', formula: 'Cd (input)', substituted: [String(Cd)], result: qty(Cd, 'ratio'), source: 'input' });
  } else if (section.shape === 'round') {
    const r = roundDrag(design.wind.speed!.Cv, design.wind.speed!.V_mps, D_m);
    Cd = r.Cd;
    out?.steps.add({ description: `Drag coefficient of the round tube at the ${out.where} (Cv V d = ${r.CvVd.toFixed(1)} mph·ft)`, symbol: 'Cd', formula: 'Cd(Cv V d)', substituted: [`Cv V d = ${r.CvVd.toFixed(1)} mph·ft, D = `, qty(D_m, 'section')], result: qty(Cd, 'ratio'), source: ROUND_DRAG_SOURCE });
  } else {
    Cd = MULTISIDED_DRAG[section.sides ?? 16] ?? 1.2;
    out?.steps.add({ description: `Drag coefficient of the ${section.sides}-sided tube`, symbol: 'Cd', formula: 'Cd (table)', substituted: [`${section.sides} sides`], result: qty(Cd, 'ratio'), source: MULTISIDED_DRAG_SOURCE });
  }
  const p = q * Cd;
  if (out) pressureStep(design, out, Kz, Cd, p);
  return p;
}

export function panelPressure(design: Design, a: PanelAttachment, out?: PressureSteps): number {
  const typed = design.wind.panelsPressure_Pa;
  if (typed !== null) return typed;
  const { q, Kz } = velocityPressure(design, attachmentHeight(design, a), out);
  const { aspect, Cd } = panelDrag(a.width_m, a.height_m);
  out?.steps.add({ description: `Drag coefficient of panel ${a.id} (aspect ratio ${aspect.toFixed(2)})`, symbol: 'Cd', formula: 'Cd(L/W)', substituted: [qty(a.width_m, 'length'), ' × ', qty(a.height_m, 'length')], result: qty(Cd, 'ratio'), source: PANEL_DRAG_SOURCE });
  const p = q * Cd;
  if (out) pressureStep(design, out, Kz, Cd, p);
  return p;
}

/** Pressure on a point attachment's effective projected area: its EPA includes the drag (Cd = 1). */
export function pointPressure(design: Design, a: Attachment, out?: PressureSteps): number {
  const typed = design.wind.pointsPressure_Pa;
  if (typed !== null) return typed;
  const { q, Kz } = velocityPressure(design, attachmentHeight(design, a), out);
  if (out) pressureStep(design, out, Kz, 1, q);
  return q;
}
