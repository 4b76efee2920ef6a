// Member checks: at every station of the pole and each arm, for every factored combination, the
// combined axial force, bending, shear and torsion of the second-order member forces against the
// design resistances of the real (tapered) section there, by AISC 360-16 Eq. H3-6:
//   Pr/Pc + Mr/Mc + (Vr/Vc + Tr/Tc)² ≤ 1.
// H3-6 is used at every station, also where the torsion is small: its linear Pr/Pc + Mr/Mc is never
// less than the H1-1 terms (Pr/Pc + 8/9 Mr/Mc, or Pr/(2Pc) + Mr/Mc), so it bounds H1-1.
// The wall slenderness of each member is its own check (member-wall).
import { StepCollector, qty, type CalcStep } from '../calc/step.ts';
import type { Design } from '../design/design.ts';
import type { DesignAnalysis } from '../analyse-design.ts';
import type { Station } from '../analysis/analysis-types.ts';
import { findAxis } from '../model/member-axes.ts';
import { memberSectionAt } from '../model/member-section.ts';
import type { TubeProperties } from '../model/tube-section.ts';
import { isFactored } from '../design/combination-use.ts';
import { makeRecord, type CheckedRecords } from './check-record.ts';
import { designResistances, type DesignResistances, type MemberGeometry } from './member/capacities.ts';
import { AISC, type Steel } from './member/resistance.ts';
import { ROUND_LIMITS } from './member/round-hss.ts';
import { flatApplicability, flatGeometry } from './member/multisided.ts';

export const INTERACTION_EQUATION = `${AISC}, Eq. H3-6`;

export interface StationDemand {
  readonly N_N: number;
  readonly M_Nm: number;
  readonly V_N: number;
  readonly T_Nm: number;
}

export const demandAt = (st: Station): StationDemand => ({ N_N: st.N_N, M_Nm: Math.hypot(st.My_Nm, st.Mz_Nm), V_N: Math.hypot(st.Vy_N, st.Vz_N), T_Nm: Math.abs(st.T_Nm) });

/** The terms of H3-6 for one demand; the axial resistance is the compressive or the tensile one. */
export function interaction(d: StationDemand, r: DesignResistances): { axial: number; flexure: number; shearTorsion: number; ratio: number } {
  const Pc = d.N_N < 0 ? r.phiPc_N : r.phiPt_N;
  const axial = Math.abs(d.N_N) / Pc;
  const flexure = d.M_Nm / r.phiMn_Nm;
  const shearTorsion = (d.V_N / r.phiVn_N + d.T_Nm / r.phiTn_Nm) ** 2;
  return { axial, flexure, shearTorsion, ratio: axial + flexure + shearTorsion };
}

/** The buckling lengths of a member for its resistances. */
function memberGeometry(design: Design, member: string): MemberGeometry {
  const ax = findAxis(design, member);
  return { Lc_m: design.criteria.columnK * ax.length_m, L_m: ax.length_m };
}

/** The section and the design resistances of a member at a distance from its root, made once per
 * distance: the member check and the capacity lines of the report's charts read the same values. */
export function resistancesAlong(design: Design, member: string): (s_m: number) => { readonly p: TubeProperties; readonly r: DesignResistances } {
  const steel: Steel = { E_Pa: design.material.E_Pa, Fy_Pa: design.material.Fy_Pa };
  const geom = memberGeometry(design, member);
  const cache = new Map<number, { p: TubeProperties; r: DesignResistances }>();
  return (s) => {
    let e = cache.get(s);
    if (!e) {
      const p = memberSectionAt(design, member, s);
      e = { p, r: designResistances(p, steel, geom, design.criteria.phi) };
      cache.set(s, e);
    }
    return e;
  };
}

export function memberChecks(design: Design, analysis: DesignAnalysis): CheckedRecords {
  const out: CheckedRecords = { records: [], steps: new Map() };
  const steel: Steel = { E_Pa: design.material.E_Pa, Fy_Pa: design.material.Fy_Pa };
  const phi = design.criteria.phi;
  const members = ['pole', ...design.arms.map((a) => a.id)];
  const factored = analysis.combinations.filter((c) => isFactored(c.category) && analysis.results[c.id]);
  for (const member of members) {
    const ax = findAxis(design, member);
    const geom = memberGeometry(design, member);
    wallCheck(design, member, ax.length_m, steel, out);
    const at = resistancesAlong(design, member);
    let cannotRecorded = false;
    for (const comb of factored) {
      for (const st of analysis.results[comb.id]!.members[member]!.stations) {
        const { p, r } = at(st.s_m);
        if (r.invalidReason) {
          if (cannotRecorded) continue;
          cannotRecorded = true;
          // The wall's slenderness and the method's limit are the finite numbers this record can show.
          const w = wallSlenderness(p, steel);
          out.records.push(makeRecord({ type: 'member-strength', label: `Combined forces (H3-6): cannot be made, ${w.name} beyond the method's limit`, member, s_m: st.s_m, combination: null, demand: qty(w.lambda, 'ratio'), capacity: qty(w.limit, 'ratio'), equation: INTERACTION_EQUATION, cannot: r.invalidReason }));
          continue;
        }
        const d = demandAt(st);
        const it = interaction(d, r);
        const rec = makeRecord({ type: 'member-strength', label: `Combined forces, ${p.shape === 'round' ? 'round' : `${p.sides}-sided`} tube (H3-6)`, member, s_m: st.s_m, combination: comb.id, demand: qty(it.ratio, 'ratio'), capacity: qty(1, 'ratio'), equation: INTERACTION_EQUATION });
        out.records.push(rec);
        out.steps.set(rec, () => memberSteps(member, comb.id, st, p, steel, geom, phi));
      }
    }
  }
  return out;
}

function memberSteps(member: string, comb: string, st: Station, p: TubeProperties, steel: Steel, geom: MemberGeometry, phi: Design['criteria']['phi']): CalcStep[] {
  const c = new StepCollector();
  // The station itself is printed, in the user's units, in the heading of the check.
  const where = `${member} at the governing station, ${comb}`;
  const keep = new Set(['d', 'Dm', 'A', 'I', 'c', 'S', 'Z', 'r']);
  for (const s of p.steps) if (keep.has(s.symbol)) c.add(s);
  const d = demandAt(st);
  const src = 'second-order member forces of the analysis at the station';
  c.add({ description: `Axial force (tension +), ${where}`, symbol: 'Pr', formula: 'Pr = N', substituted: [qty(d.N_N, 'force')], result: qty(d.N_N, 'force'), source: src });
  c.add({ description: 'Bending moment resultant', symbol: 'Mr', formula: 'Mr = √(My² + Mz²)', substituted: ['√((', qty(st.My_Nm, 'moment'), ')² + (', qty(st.Mz_Nm, 'moment'), ')²)'], result: qty(d.M_Nm, 'moment'), source: src });
  c.add({ description: 'Shear resultant', symbol: 'Vr', formula: 'Vr = √(Vy² + Vz²)', substituted: ['√((', qty(st.Vy_N, 'force'), ')² + (', qty(st.Vz_N, 'force'), ')²)'], result: qty(d.V_N, 'force'), source: src });
  c.add({ description: 'Torsion', symbol: 'Tr', formula: 'Tr = |T|', substituted: [qty(st.T_Nm, 'moment')], result: qty(d.T_Nm, 'moment'), source: src });
  const fa = d.N_N / p.A_m2;
  const fb = (d.M_Nm * p.c_m) / p.I_m4;
  c.add({ description: 'Normal stress at the extreme fibre on the tension side of the bending (c at the corner for a multisided tube)', symbol: 'σ+', formula: 'σ+ = N/A + M c/I', substituted: [qty(d.N_N, 'force'), ' / ', qty(p.A_m2, 'sectionArea'), ' + ', qty(d.M_Nm, 'moment'), ' × ', qty(p.c_m, 'section'), ' / ', qty(p.I_m4, 'inertia')], result: qty(fa + fb, 'stress'), source: 'elastic section' });
  c.add({ description: 'Normal stress at the opposite extreme fibre (compression side)', symbol: 'σ−', formula: 'σ− = N/A − M c/I', substituted: [qty(d.N_N, 'force'), ' / ', qty(p.A_m2, 'sectionArea'), ' − ', qty(d.M_Nm, 'moment'), ' × ', qty(p.c_m, 'section'), ' / ', qty(p.I_m4, 'inertia')], result: qty(fa - fb, 'stress'), source: 'elastic section' });
  const r = designResistances(p, steel, geom, phi, c);
  const it = interaction(d, r);
  const Pc = d.N_N < 0 ? r.phiPc_N : r.phiPt_N;
  c.add({
    description: `Combined forces (the ${d.N_N < 0 ? 'compressive' : 'tensile'} resistance for the axial term)`,
    symbol: 'ratio',
    formula: 'Pr/Pc + Mr/Mc + (Vr/Vc + Tr/Tc)² ≤ 1',
    substituted: [qty(Math.abs(d.N_N), 'force'), ' / ', qty(Pc, 'force'), ' + ', qty(d.M_Nm, 'moment'), ' / ', qty(r.phiMn_Nm, 'moment'), ' + (', qty(d.V_N, 'force'), ' / ', qty(r.phiVn_N, 'force'), ' + ', qty(d.T_Nm, 'moment'), ' / ', qty(r.phiTn_Nm, 'moment'), `)² = ${it.axial.toFixed(3)} + ${it.flexure.toFixed(3)} + ${it.shearTorsion.toFixed(4)}`],
    result: qty(it.ratio, 'ratio'),
    source: `${INTERACTION_EQUATION} (bounds Eq. H1-1 as well)`,
    status: it.ratio <= 1 + 1e-9 ? 'ok' : 'fail',
  });
  return [...c.steps];
}

/** The wall slenderness of a section (D/t round, b/t of a flat) and the limit of the method. */
function wallSlenderness(p: ReturnType<typeof memberSectionAt>, steel: Steel): { name: string; lambda: number; limit: number } {
  const round = p.shape === 'round';
  return round
    ? { name: 'D/t', lambda: p.D_m / p.t_m, limit: (ROUND_LIMITS.applicability * steel.E_Pa) / steel.Fy_Pa }
    : { name: 'b/t', lambda: flatGeometry(p).bOverT, limit: flatApplicability(steel) };
}

/** D/t (round) or b/t (multisided) at the member's largest diameter against the limit of the method. */
function wallCheck(design: Design, member: string, length_m: number, steel: Steel, out: CheckedRecords): void {
  const p0 = memberSectionAt(design, member, 0);
  const p1 = memberSectionAt(design, member, length_m);
  const p = p1.D_m > p0.D_m ? p1 : p0;
  const s_m = p === p1 ? length_m : 0;
  const round = p.shape === 'round';
  const { lambda, limit } = wallSlenderness(p, steel);
  const equation = round ? `D/t < 0.45 E/Fy (${AISC}, Sections E7 and F8 scope)` : 'b/t ≤ 2.8 √(E/Fy) (polebook bound of the slender-flat method, twice λr = 1.40 √(E/Fy); verify)';
  const rec = makeRecord({ type: 'member-wall', label: round ? 'Wall slenderness D/t at the largest diameter' : `Flat slenderness b/t at the largest diameter (${p.sides} sides)`, member, s_m, combination: null, demand: qty(lambda, 'ratio'), capacity: qty(limit, 'ratio'), equation });
  const final = rec.status === 'fail' ? { ...rec, reason: `${round ? 'D/t' : 'b/t'} = ${lambda.toFixed(1)} is beyond the limit ${limit.toFixed(1)} of the method: no resistance can be given and the member checks cannot be made` } : rec;
  out.records.push(final);
  out.steps.set(final, () => {
    const c = new StepCollector();
    for (const s of p.steps) if (s.symbol === 'd' || s.symbol === 'Dm') c.add(s);
    if (round) c.add({ description: 'Wall slenderness at the largest diameter', symbol: 'D/t', formula: 'D/t', substituted: [qty(p.D_m, 'section'), ' / ', qty(p.t_m, 'section')], result: qty(lambda, 'ratio'), source: `${AISC}, Table B4.1` });
    else flatGeometry(p, c);
    c.add({ description: 'Limit of the method', symbol: 'λ_max', formula: round ? '0.45 E / Fy' : '2.8 √(E/Fy)', substituted: round ? ['0.45 × ', qty(steel.E_Pa, 'stress'), ' / ', qty(steel.Fy_Pa, 'stress')] : ['2.8 × √(', qty(steel.E_Pa, 'stress'), ' / ', qty(steel.Fy_Pa, 'stress'), ')'], result: qty(limit, 'ratio'), source: equation, status: final.status === 'ok' ? 'ok' : 'fail' });
    return [...c.steps];
  });
}
