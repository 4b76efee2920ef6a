// Dead load case: steel self-weight along the taper and attachment weights with the
// moments of their offsets.
import { qty, StepCollector, sumExpr, type Qty } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import { attachmentWeight_N } from '../model/build-frame.ts';
import type { FrameModel } from '../model/frame.ts';
import { STANDARD_GRAVITY_mps2, STANDARD_GRAVITY_SOURCE } from '../model/gravity.ts';
import { elementEnds } from '../model/locate.ts';
import { memberAxes } from '../model/member-axes.ts';
import { sectionAt } from '../model/taper.ts';
import { attachmentLoads, down } from './attachment-loads.ts';
import { DEAD_CASE_ID } from './case-ids.ts';
import type { AppliedLoad, LoadCase } from './load-types.ts';
import { RULES } from './load-rules.ts';
import { loadResultant } from './load-resultant.ts';

const memberName = (id: string) => (id === 'pole' ? 'pole' : `arm ${id}`);

export function deadLoadCase(design: Design, model: FrameModel): LoadCase {
  const steps = new StepCollector();
  const loads: AppliedLoad[] = [];
  const rho = design.material.density_kgm3;
  const g = STANDARD_GRAVITY_mps2;
  const weights: Qty[] = []; // the addends of the total

  for (const ax of memberAxes(design)) {
    const info = model.members.find((m) => m.id === ax.id);
    if (!info) throw new RangeError(`member ${ax.id} is missing from the frame model`);
    const origin = { source: `self-weight of ${memberName(ax.id)}` };
    for (const id of info.elements) {
      const el = model.elements[id];
      const wA = rho * g * sectionAt(ax.section, ax.length_m, el.sI_m).A_m2;
      const wB = rho * g * sectionAt(ax.section, ax.length_m, el.sJ_m).A_m2;
      loads.push({ kind: 'distributed', element: id, axes: 'global', direction: [0, 0, -1], wA_Npm: wA, wB_Npm: wB, a_m: 0, b_m: elementEnds(model, el).length_m, origin });
    }
    const Ar = sectionAt(ax.section, ax.length_m, 0).A_m2;
    const At = sectionAt(ax.section, ax.length_m, ax.length_m).A_m2;
    const src = `${RULES.selfWeight}; ${STANDARD_GRAVITY_SOURCE}`;
    steps.add({ description: `Self-weight per length of the ${memberName(ax.id)} at its root`, symbol: 'w_root', formula: 'w = γ A, γ = ρ g', substituted: [qty(rho * g, 'unitWeight'), ' × ', qty(Ar, 'sectionArea')], result: qty(rho * g * Ar, 'lineLoad'), source: src });
    steps.add({ description: `Self-weight per length of the ${memberName(ax.id)} at its tip`, symbol: 'w_tip', formula: 'w = γ A, γ = ρ g', substituted: [qty(rho * g, 'unitWeight'), ' × ', qty(At, 'sectionArea')], result: qty(rho * g * At, 'lineLoad'), source: src });
    weights.push(steps.add({
      description: `Self-weight of the ${memberName(ax.id)} (area linear along the taper)`,
      symbol: `W_${ax.id}`,
      formula: 'W = L (w_root + w_tip) / 2',
      substituted: [qty(ax.length_m, 'length'), ' × (', qty(rho * g * Ar, 'lineLoad'), ' + ', qty(rho * g * At, 'lineLoad'), ') / 2'],
      result: qty((ax.length_m * rho * g * (Ar + At)) / 2, 'weight'),
      source: 'integral of a linearly varying load',
    }));
  }

  for (const a of design.attachments) {
    const W = attachmentWeight_N(a);
    if (a.kind === 'panel') {
      weights.push(steps.add({ description: `Weight of panel ${a.id}`, symbol: `W_${a.id}`, formula: 'W = q × b × h', substituted: [qty(a.weightPerArea_Pa, 'pressure'), ' × ', qty(a.width_m, 'length'), ' × ', qty(a.height_m, 'length')], result: qty(W, 'weight'), source: 'panel weight per area (input)' }));
    } else {
      weights.push(steps.add({ description: `Weight of ${a.kind} ${a.id}`, symbol: `W_${a.id}`, formula: 'W (input)', substituted: [qty(W, 'weight')], result: qty(W, 'weight'), source: 'attachment weight (input)' }));
    }
    loads.push(...attachmentLoads(design, model, steps, a, down(W), `weight of ${a.kind}`));
  }

  const total = -loadResultant(model, loads).force_N[2];
  steps.add({ description: 'Total dead load (sum of the loads of this case)', symbol: 'ΣD', formula: 'ΣD = Σ W', substituted: sumExpr(weights), result: qty(total, 'force'), source: 'sum of the loads above' });
  return { id: DEAD_CASE_ID, kind: 'dead', description: 'Dead load: steel self-weight and attachment weights', windAngle_rad: null, loads, steps: steps.steps };
}
