// Fatigue (infinite life): the stress range each fatigue load case causes at the pole base and
// at each arm root (the welded connections), against the constant-amplitude fatigue threshold of
// the detail. The stress range is the largest normal stress of the case at the section,
// |N|/A + M c/I (c at the corner of a multisided tube), the case being analysed alone.
import { qty, type CalcStep } from '../calc/step.ts';
import type { Design, FatigueDetail } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import type { Station } from '../analysis/analysis-types.ts';
import { memberSectionAt } from '../model/member-section.ts';
import { THRESHOLD_SOURCE } from '../design/fatigue-tables.ts';
import { isFatigue } from '../design/combination-use.ts';
import { makeRecord, type CheckedRecords } from './check-record.ts';

const EQUATION = 'Δf = |N|/A + M c/I ≤ (ΔF)_TH (AASHTO LRFD-LTS fatigue design for infinite life, from memory; verify)';

const rootStation = (stations: readonly Station[]): Station => stations.reduce((a, b) => (b.s_m < a.s_m ? b : a));

export function fatigueChecks(design: Design, analysis: DesignAnalysis): CheckedRecords {
  const out: CheckedRecords = { records: [], steps: new Map() };
  const f = design.fatigue;
  if (!f) return out;
  const places: { member: string; detail: FatigueDetail; what: string }[] = [
    { member: 'pole', detail: f.poleBase, what: 'the pole base' },
    ...design.arms.map((a) => ({ member: a.id, detail: f.armRoot, what: `the root of arm ${a.id}` })),
  ];
  for (const comb of analysis.combinations) {
    if (!isFatigue(comb.category)) continue;
    const r = analysis.results[comb.id];
    if (!r) continue;
    for (const p of places) {
      const st = rootStation(r.members[p.member]!.stations);
      const sec = memberSectionAt(design, p.member, st.s_m);
      const M = Math.hypot(st.My_Nm, st.Mz_Nm);
      const fa = Math.abs(st.N_N) / sec.A_m2;
      const fb = (M * sec.c_m) / sec.I_m4;
      const range = fa + fb;
      const cat = p.detail.category !== null ? `category ${p.detail.category}` : 'threshold given';
      const rec = makeRecord({
        type: 'fatigue', label: `Stress range at ${p.what} (${cat})`, member: p.member, s_m: st.s_m, combination: comb.id,
        demand: qty(range, 'stress'), capacity: qty(p.detail.threshold_Pa, 'stress'), equation: EQUATION,
      });
      out.records.push(rec);
      out.steps.set(rec, (): CalcStep[] => [
        ...sec.steps.filter((s) => ['A', 'I', 'c'].includes(s.symbol)),
        { description: `Resultant bending moment at ${p.what} under ${comb.id} (the fatigue load alone)`, symbol: 'M', formula: 'M = √(My² + Mz²)', substituted: ['√((', qty(st.My_Nm, 'moment'), ')² + (', qty(st.Mz_Nm, 'moment'), ')²)'], result: qty(M, 'moment'), source: 'analysis results of the fatigue load case', status: 'info' },
        { description: 'Axial stress range', symbol: 'f_a', formula: 'f_a = |N| / A', substituted: [qty(Math.abs(st.N_N), 'force'), ' / ', qty(sec.A_m2, 'sectionArea')], result: qty(fa, 'stress'), source: 'elastic section', status: 'info' },
        { description: 'Bending stress range at the extreme fibre', symbol: 'f_b', formula: 'f_b = M c / I', substituted: [qty(M, 'moment'), ' × ', qty(sec.c_m, 'section'), ' / ', qty(sec.I_m4, 'inertia')], result: qty(fb, 'stress'), source: 'elastic section', status: 'info' },
        { description: 'Stress range', symbol: 'Δf', formula: 'Δf = f_a + f_b', substituted: [qty(fa, 'stress'), ' + ', qty(fb, 'stress')], result: qty(range, 'stress'), source: EQUATION, status: 'info' },
        { description: `Constant-amplitude fatigue threshold of the detail (${cat})`, symbol: '(ΔF)_TH', formula: '(ΔF)_TH', substituted: [qty(p.detail.threshold_Pa, 'stress')], result: qty(p.detail.threshold_Pa, 'stress'), source: p.detail.category !== null ? THRESHOLD_SOURCE : 'input', status: 'info' },
      ]);
    }
  }
  return out;
}
