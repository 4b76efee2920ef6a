// Ice load case: a weight per surface area on members (all round) and attachments
// (panels: one face; point attachments: their projected wind area), with the offset
// moments of the attachment ice.
import { qty, StepCollector, sumExpr, type Qty } from '../calc/step.ts';
import type { Design, IceInput } from '../design/design.ts';
import type { FrameModel } from '../model/frame.ts';
import { elementEnds } from '../model/locate.ts';
import { memberAxes } from '../model/member-axes.ts';
import { sectionAt } from '../model/taper.ts';
import { attachmentLoads, down } from './attachment-loads.ts';
import { ICE_CASE_ID } from './case-ids.ts';
import type { AppliedLoad, LoadCase } from './load-types.ts';
import { RULES } from './load-rules.ts';
import { loadResultant } from './load-resultant.ts';

export function iceLoadCase(design: Design, model: FrameModel, ice: IceInput): LoadCase {
  const steps = new StepCollector();
  const loads: AppliedLoad[] = [];
  const q = ice.weightPerArea_Pa;
  const weights: Qty[] = []; // the addends of the total
  for (const ax of memberAxes(design)) {
    const info = model.members.find((m) => m.id === ax.id);
    if (!info) throw new RangeError(`member ${ax.id} is missing from the frame model`);
    const name = ax.kind === 'pole' ? 'pole' : `arm ${ax.id}`;
    const origin = { source: `ice on ${name}` };
    for (const id of info.elements) {
      const el = model.elements[id];
      const wA = q * sectionAt(ax.section, ax.length_m, el.sI_m).perimeter_m;
      const wB = q * sectionAt(ax.section, ax.length_m, el.sJ_m).perimeter_m;
      loads.push({ kind: 'distributed', element: id, axes: 'global', direction: [0, 0, -1], wA_Npm: wA, wB_Npm: wB, a_m: 0, b_m: elementEnds(model, el).length_m, origin });
    }
    const Pr = sectionAt(ax.section, ax.length_m, 0).perimeter_m;
    const Pt = sectionAt(ax.section, ax.length_m, ax.length_m).perimeter_m;
    const perimeterFormula = ax.section.shape === 'round' ? 'P = π D' : `P = n D tan(π/n), n = ${ax.section.sides}`;
    for (const [where, P] of [['root', Pr], ['tip', Pt]] as const) {
      steps.add({ description: `Ice per length on the ${name} at its ${where} (${perimeterFormula})`, symbol: `w_ice,${where}`, formula: 'w = q_ice × P', substituted: [qty(q, 'pressure'), ' × ', qty(P, 'section')], result: qty(q * P, 'lineLoad'), source: RULES.iceMembers });
    }
    weights.push(steps.add({ description: `Ice on the ${name}`, symbol: `W_ice,${ax.id}`, formula: 'W = L (w_root + w_tip) / 2', substituted: [qty(ax.length_m, 'length'), ' × (', qty(q * Pr, 'lineLoad'), ' + ', qty(q * Pt, 'lineLoad'), ') / 2'], result: qty((ax.length_m * q * (Pr + Pt)) / 2, 'weight'), source: 'integral of a linearly varying load' }));
  }
  for (const a of design.attachments) {
    const panel = a.kind === 'panel';
    const area = panel ? a.width_m * a.height_m : a.windArea_m2;
    const W = q * area;
    weights.push(steps.add({ description: `Ice on ${a.kind} ${a.id}`, symbol: `W_ice,${a.id}`, formula: panel ? 'W = q_ice × b × h (one face)' : 'W = q_ice × A', substituted: [qty(q, 'pressure'), ' × ', qty(area, 'area')], result: qty(W, 'weight'), source: panel ? RULES.icePanels : RULES.icePoints }));
    loads.push(...attachmentLoads(design, model, steps, a, down(W), `ice on ${a.kind}`));
  }
  const total = -loadResultant(model, loads).force_N[2];
  steps.add({ description: 'Total ice load (sum of the loads of this case)', symbol: 'ΣI', formula: 'ΣI = Σ W', substituted: sumExpr(weights), result: qty(total, 'force'), source: 'sum of the loads above' });
  return { id: ICE_CASE_ID, kind: 'ice', description: 'Ice: weight of ice on members and attachments', windAngle_rad: null, loads, steps: steps.steps };
}
