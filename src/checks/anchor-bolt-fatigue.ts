// Fatigue of the anchor bolts (infinite life): under each fatigue load case, analysed alone, the
// largest bolt force on the elastic bolt circle over the tensile stress area is the stress range,
// against the constant-amplitude threshold of the bolt detail.
import { qty, type CalcStep } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import { isFatigue } from '../design/combination-use.ts';
import { THRESHOLD_SOURCE } from '../design/fatigue-tables.ts';
import { threadSource } from '../design/thread-tables.ts';
import { makeRecord, type CheckedRecords } from './check-record.ts';
import { baseActions } from './anchor/bolt-group.ts';
import { baseReaction } from './anchor/base-reaction.ts';
import { BOLT_GROUP_SOURCE, boltGeometry } from './anchorage-checks.ts';

const EQUATION = 'Δf = (4M/(nD) + |P|/n) / At ≤ (ΔF)_TH (AASHTO LRFD-LTS fatigue design for infinite life, anchor bolts in axial tension, from memory; verify)';

export function anchorBoltFatigue(design: Design, analysis: DesignAnalysis): CheckedRecords {
  const out: CheckedRecords = { records: [], steps: new Map() };
  const bolts = design.criteria.anchorBolts;
  const f = design.fatigue;
  if (bolts === null || f === null) return out;
  const g = boltGeometry(bolts);
  const detail = f.anchorBolts;
  const cat = detail.category !== null ? `category ${detail.category}` : 'threshold given';
  const label = `Stress range in the anchor bolts (${cat})`;
  if ('cannot' in g) {
    out.records.push(makeRecord({ type: 'fatigue', label, member: 'anchor-bolts', s_m: null, combination: null, demand: qty(bolts.boltDiameter_m, 'section'), capacity: qty(bolts.boltDiameter_m, 'section'), equation: EQUATION, cannot: g.cannot }));
    return out;
  }
  const n = bolts.count;
  const D = bolts.circleDiameter_m;
  for (const comb of analysis.combinations) {
    if (!isFatigue(comb.category) || !analysis.results[comb.id]) continue;
    const r = baseReaction(analysis, comb.id);
    const a = baseActions(r);
    const force = (4 * a.M_Nm) / (n * D) + Math.abs(a.P_N) / n;
    const range = force / g.areas.At_m2;
    const rec = makeRecord({ type: 'fatigue', label, member: 'anchor-bolts', s_m: null, combination: comb.id, demand: qty(range, 'stress'), capacity: qty(detail.threshold_Pa, 'stress'), equation: EQUATION });
    out.records.push(rec);
    out.steps.set(rec, (): CalcStep[] => [
      { description: `Overturning moment at the base under ${comb.id} (the fatigue load alone)`, symbol: 'M', formula: 'M = √(Mx² + My²)', substituted: ['√((', qty(r[3], 'moment'), ')² + (', qty(r[4], 'moment'), ')²)'], result: qty(a.M_Nm, 'moment'), source: 'base reaction of the fatigue load case', status: 'info' },
      { description: 'Vertical force at the base', symbol: 'P', formula: 'P = Fz', substituted: [qty(r[2], 'force')], result: qty(a.P_N, 'force'), source: 'base reaction of the fatigue load case', status: 'info' },
      { description: `Largest bolt force range, ${n} bolts on the bolt circle`, symbol: 'ΔF_b', formula: 'ΔF_b = 4M/(nD) + |P|/n', substituted: ['4 × ', qty(a.M_Nm, 'moment'), ` / (${n} × `, qty(D, 'section'), ') + ', qty(Math.abs(a.P_N), 'force'), ` / ${n}`], result: qty(force, 'force'), source: BOLT_GROUP_SOURCE, status: 'info' },
      { description: 'Tensile stress area of the bolt', symbol: 'At', formula: 'At', substituted: [qty(g.areas.At_m2, 'sectionArea')], result: qty(g.areas.At_m2, 'sectionArea'), source: threadSource(g.thread), status: 'info' },
      { description: 'Stress range in the bolt', symbol: 'Δf', formula: 'Δf = ΔF_b / At', substituted: [qty(force, 'force'), ' / ', qty(g.areas.At_m2, 'sectionArea')], result: qty(range, 'stress'), source: EQUATION, status: 'info' },
      { description: `Constant-amplitude fatigue threshold of the bolt detail (${cat})`, symbol: '(ΔF)_TH', formula: '(ΔF)_TH', substituted: [qty(detail.threshold_Pa, 'stress')], result: qty(detail.threshold_Pa, 'stress'), source: detail.category !== null ? THRESHOLD_SOURCE : 'input', status: range <= detail.threshold_Pa ? 'ok' : 'fail' },
    ]);
  }
  return out;
}
