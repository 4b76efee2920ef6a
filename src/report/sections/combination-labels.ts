// Words for combination categories and factor lists, as the analysis sections print them.
import type { CombinationCategory } from '../../design/design.ts';
import type { Combination } from '../../loads/load-types.ts';
import { formatNumber } from '../../units/units.ts';

export const CATEGORY_TEXT: Readonly<Record<CombinationCategory, string>> = {
  strength: 'strength (factored)',
  'extreme-wind': 'extreme wind (factored)',
  'extreme-ice': 'extreme wind with ice (factored)',
  service: 'service',
  fatigue: 'fatigue',
};

/** "1.1 × dead + 1 × wind-090" (factors are dimensionless). */
export function factorsText(c: Combination): string {
  return c.factors.map((f) => `${formatNumber(f.factor)} × ${f.caseId}`).join(' + ');
}
