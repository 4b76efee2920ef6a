// Envelope over combinations: the governing value with the combination and place that give it.
import type { AnalysisResults, Envelope, EnvelopeComponent, EnvelopeEntry, Station } from './analysis-types.ts';

export function envelope(results: AnalysisResults, memberId: string, component: EnvelopeComponent): Envelope {
  let max: EnvelopeEntry | null = null;
  let min: EnvelopeEntry | null = null;
  for (const [combination, r] of Object.entries(results)) {
    const m = r.members[memberId];
    if (!m) throw new Error(`envelope: no member '${memberId}' in combination ${combination}`);
    const e = m.extremes[component];
    if (!max || e.max.value > max.value) max = { value: e.max.value, combination, s_m: e.max.s_m };
    if (!min || e.min.value < min.value) min = { value: e.min.value, combination, s_m: e.min.s_m };
  }
  if (!max || !min) throw new Error('envelope: no combinations analysed');
  return { member: memberId, component, max, min };
}

/** The results of the listed combinations only (e.g. the factored ones for strength envelopes). */
export function resultsOf(results: AnalysisResults, ids: readonly string[]): AnalysisResults {
  const out: Record<string, AnalysisResults[string]> = {};
  for (const id of ids) {
    const r = results[id];
    if (r) out[id] = r;
  }
  return out;
}

/** A component's value at a station (resultants as magnitudes). */
export function componentAt(st: Station, c: EnvelopeComponent): number {
  switch (c) {
    case 'N': return st.N_N;
    case 'Vy': return st.Vy_N;
    case 'Vz': return st.Vz_N;
    case 'T': return st.T_Nm;
    case 'My': return st.My_Nm;
    case 'Mz': return st.Mz_Nm;
    case 'Mres': return Math.hypot(st.My_Nm, st.Mz_Nm);
    case 'Vres': return Math.hypot(st.Vy_N, st.Vz_N);
  }
}

/**
 * Where along the member the extreme holds: the run of stations around s_m whose value stays
 * within tol of it. A torque constant over a length is reported over that length, not at one
 * arbitrary end of it.
 */
export function extremeExtent(stations: readonly Station[], c: EnvelopeComponent, entry: EnvelopeEntry, tol: number): { readonly from_m: number; readonly to_m: number } {
  const sorted = [...stations].sort((a, b) => a.s_m - b.s_m);
  const near = (st: Station) => Math.abs(componentAt(st, c) - entry.value) <= tol;
  const k = sorted.findIndex((st) => Math.abs(st.s_m - entry.s_m) <= 1e-9 * Math.max(1, Math.abs(entry.s_m)) && near(st));
  if (k < 0) return { from_m: entry.s_m, to_m: entry.s_m };
  let lo = k;
  let hi = k;
  while (lo > 0 && near(sorted[lo - 1]!)) lo--;
  while (hi < sorted.length - 1 && near(sorted[hi + 1]!)) hi++;
  return { from_m: Math.min(entry.s_m, sorted[lo]!.s_m), to_m: Math.max(entry.s_m, sorted[hi]!.s_m) };
}
