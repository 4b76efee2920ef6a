// Expanding the combination specs of the design into the combinations to analyse: a spec
// with a 'wind' or 'ice-wind' factor becomes one combination per wind direction
// ('extreme-wind-max@wind-090'); the others are analysed once. Each fatigue load case becomes a
// combination of its own (category fatigue, factor 1).
import type { CombinationSpec, Design, LoadKind } from '../design/design.ts';
import { DEAD_CASE_ID, directionKey, ICE_CASE_ID, iceWindCaseId, windCaseId } from './case-ids.ts';
import type { Combination, LoadCase } from './load-types.ts';

const activeKinds = (spec: CombinationSpec): LoadKind[] =>
  (Object.entries(spec.factors) as [LoadKind, number | undefined][]).filter(([, f]) => f !== undefined && f !== 0).map(([k]) => k);

/**
 * One Combination per spec, or per spec and wind direction when it has a wind factor.
 * A spec whose factors name a case that was not built (ice or ice-wind when the design has
 * no ice) is left out: it has nothing to analyse. Factors of zero are dropped.
 */
export function expandCombinations(design: Design, cases: readonly LoadCase[]): Combination[] {
  const have = new Set(cases.map((c) => c.id));
  const out: Combination[] = [];
  for (const spec of design.combinations) {
    const kinds = activeKinds(spec);
    if (kinds.length === 0) continue;
    const directional = kinds.includes('wind') || kinds.includes('ice-wind');
    const angles = directional ? design.wind.directions.map((d) => d.angle_rad) : [null];
    for (const angle of angles) {
      const factors = kinds.map((k) => ({ caseId: caseIdFor(k, angle), factor: spec.factors[k] as number }));
      if (factors.some((f) => !have.has(f.caseId))) continue;
      out.push({
        id: angle === null ? spec.id : `${spec.id}@${directionKey(angle)}`,
        specId: spec.id,
        category: spec.category,
        description: angle === null ? spec.description : `${spec.description}, wind toward ${formatDeg(angle)}°`,
        factors,
        source: spec.source,
      });
    }
  }
  // Each fatigue case is analysed alone at factor 1: its results are stress ranges.
  for (const lc of cases) {
    if (lc.kind !== 'fatigue') continue;
    out.push({ id: lc.id, specId: lc.id, category: 'fatigue', description: lc.description, factors: [{ caseId: lc.id, factor: 1 }], source: FATIGUE_COMBINATION_SOURCE });
  }
  return out;
}

export const FATIGUE_COMBINATION_SOURCE =
  'each fatigue load alone at a load factor of 1.0 (fatigue limit state for infinite life, AASHTO LRFD-LTS from memory); verify against the governing code';

function caseIdFor(kind: LoadKind, angle: number | null): string {
  switch (kind) {
    case 'dead':
      return DEAD_CASE_ID;
    case 'ice':
      return ICE_CASE_ID;
    case 'wind':
      return windCaseId(angle as number);
    case 'ice-wind':
      return iceWindCaseId(angle as number);
  }
}

const formatDeg = (a: number) => ((a * 180) / Math.PI).toFixed(1).replace(/\.0$/, '');
