// Envelope over combinations: the governing value with the combination and place that give it.
import type { AnalysisResults, Envelope, EnvelopeComponent, EnvelopeEntry } from './analysis-types.ts';

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
