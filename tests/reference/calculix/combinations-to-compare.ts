// Which combinations of an example are compared with CalculiX (tests) and timed against it (bench):
// the one with dead load alone, and the first extreme-wind combination of each wind direction.
import type { Combination, LoadCase } from '../../../src/loads/load-types.ts';

export function combinationsToCompare(cases: readonly LoadCase[], combos: readonly Combination[]): Combination[] {
  const kindOf = (caseId: string): string | undefined => cases.find((c) => c.id === caseId)?.kind;
  const deadOnly = combos.filter((c) => c.factors.every((f) => kindOf(f.caseId) === 'dead'));
  const seen = new Set<string>();
  const wind = combos.filter((c) => {
    if (c.category !== 'extreme-wind') return false;
    const windCase = c.factors.map((f) => f.caseId).find((id) => kindOf(id) === 'wind');
    if (windCase === undefined || seen.has(windCase)) return false;
    seen.add(windCase);
    return true;
  });
  return [...deadOnly.slice(0, 1), ...wind];
}
