// Vortex shedding: the critical wind speed V_c = f_n d / St of each member in the natural modes
// in which it moves, against the susceptibility threshold of the criteria. A member below the
// threshold is reported as a warning: polebook does not compute vortex-shedding fatigue loads.
// A member tapered at or above the exemption taper is taken as not susceptible.
import { qty, type CalcStep } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import { memberAxes } from '../model/member-axes.ts';
import { diameterAt } from '../model/taper.ts';
import { dot, norm, scale, sub } from '../model/vec3.ts';
import type { Vec3 } from '../model/frame.ts';
import type { CheckRecord } from './check-types.ts';
import { makeRecord, type CheckedRecords } from './check-record.ts';

/** A member takes part in a mode when its largest movement across its axis is at least this share of the mode's largest. */
export const MODE_PARTICIPATION = 0.25;

const STROUHAL_EQUATION = 'V_c = f_n d / St (Strouhal relation; Blevins, Flow-Induced Vibration, ch. 3)';

export function vortexChecks(design: Design, analysis: DesignAnalysis): CheckedRecords {
  const out: CheckedRecords = { records: [], steps: new Map() };
  const v = design.criteria.vortex;
  for (const ax of memberAxes(design)) {
    const info = analysis.model.members.find((m) => m.id === ax.id);
    if (!info) continue;
    const St = ax.section.shape === 'round' ? v.strouhalRound : v.strouhalMultisided;
    const nodes = [...new Set(info.elements.flatMap((e) => [analysis.model.elements[e]!.i, analysis.model.elements[e]!.j]))];
    // The lowest critical speed over the modes in which the member moves.
    let best: { Vc: number; f: number; d: number; mode: number; s: number } | null = null;
    for (const m of analysis.modes) {
      const across = (nd: number): number => {
        const u: Vec3 = [m.shape[nd]![0], m.shape[nd]![1], m.shape[nd]![2]];
        return norm(sub(u, scale(ax.direction, dot(u, ax.direction))));
      };
      let nodeMax = nodes[0]!;
      for (const nd of nodes) if (across(nd) > across(nodeMax)) nodeMax = nd;
      if (across(nodeMax) < MODE_PARTICIPATION) continue;
      const p = analysis.model.nodes[nodeMax]!.xyz_m;
      const s = Math.min(Math.max(dot(sub(p, ax.origin_m), ax.direction), 0), ax.length_m);
      const d = diameterAt(ax.section, ax.length_m, s);
      const Vc = (m.frequency_Hz * d) / St;
      if (!best || Vc < best.Vc) best = { Vc, f: m.frequency_Hz, d, mode: m.mode, s };
    }
    if (!best) continue;
    const b = best;
    const taper = (ax.section.rootDiameter_m - ax.section.tipDiameter_m) / ax.length_m;
    const name = ax.kind === 'pole' ? 'the pole' : `arm ${ax.id}`;
    const steps = (): CalcStep[] => [
      { description: `Natural frequency of mode ${b.mode}, the lowest-speed mode in which ${name} moves across its axis`, symbol: 'f_n', formula: 'f_n (modal analysis)', substituted: [qty(b.f, 'frequency')], result: qty(b.f, 'frequency'), source: 'natural modes of the structure (analysis)', status: 'info' },
      { description: `Outside diameter where ${name} moves most in that mode`, symbol: 'd', formula: 'd at the largest modal movement', substituted: [qty(b.s, 'length'), ' from the member root'], result: qty(b.d, 'section'), source: 'taper of the member', status: 'info' },
      { description: 'Critical vortex-shedding wind speed', symbol: 'V_c', formula: 'V_c = f_n d / St', substituted: [qty(b.f, 'frequency'), ' × ', qty(b.d, 'section'), ` / ${St}`], result: qty(b.Vc, 'speed'), source: `${STROUHAL_EQUATION}; St from criteria.vortex (input or labelled default)`, status: 'info' },
      { description: `Taper of ${name}`, symbol: 'taper', formula: '(D_root − D_tip) / L', substituted: ['(', qty(ax.section.rootDiameter_m, 'section'), ' − ', qty(ax.section.tipDiameter_m, 'section'), ') / ', qty(ax.length_m, 'length')], result: qty(taper, 'taper'), source: 'geometry of the member', status: 'info' },
    ];
    let rec: CheckRecord;
    if (taper >= v.exemptTaper * (1 - 1e-9)) {
      rec = makeRecord({
        type: 'vortex', label: 'Vortex shedding: exempt by its taper', member: ax.id, s_m: b.s, combination: null,
        demand: qty(v.exemptTaper, 'taper'), capacity: qty(taper, 'taper'), equation: 'taper ≥ exemption taper (criteria.vortex.exemptTaper; AASHTO LRFD-LTS from memory, verify)',
        note: 'tapered at least the exemption taper: taken as not susceptible (the critical speed is shown for information)',
      });
    } else {
      rec = makeRecord({
        type: 'vortex', label: 'Vortex shedding: critical speed against the threshold', member: ax.id, s_m: b.s, combination: null,
        demand: qty(v.speedThreshold_mps, 'speed'), capacity: qty(b.Vc, 'speed'), equation: `${STROUHAL_EQUATION}; susceptible when V_c < threshold`,
        warnOnly: true,
        note: 'susceptible to vortex shedding: the critical speed is below the threshold. polebook does not compute vortex-shedding fatigue loads; the engineer must check them, or provide damping, or change the member',
      });
    }
    out.records.push(rec);
    out.steps.set(rec, steps);
  }
  return out;
}
