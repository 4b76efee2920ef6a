// Load combinations: the labelled default set, or the user's list.
import type { CombinationSpec, LoadKind } from '../design/design.ts';
import { formatNumber } from '../units/units.ts';
import { COMBINATION_SOURCE } from './defaults.ts';
import { error, type Problem } from './problem.ts';
import type { DesignInput } from './schema.ts';

const SYMBOL: Readonly<Record<LoadKind, string>> = { dead: 'D', wind: 'W', ice: 'I', 'ice-wind': 'Wi' };

/** "1.1D + 1.0W" from the factors. */
export function describeFactors(factors: Partial<Record<LoadKind, number>>): string {
  return (Object.keys(SYMBOL) as LoadKind[])
    .filter((k) => factors[k] !== undefined)
    .map((k) => `${factorText(factors[k] as number)}${SYMBOL[k]}`)
    .join(' + ')
    .replace(/\+ -/g, '- ');
}

/** 1 prints as "1.0", 1.25 as "1.25": the way load factors are written. */
function factorText(f: number): string {
  const t = formatNumber(f, 3);
  return t.includes('.') ? t : `${t}.0`;
}

function spec(id: string, category: CombinationSpec['category'], what: string, factors: Partial<Record<LoadKind, number>>, source = COMBINATION_SOURCE): CombinationSpec {
  return { id, category, description: `${what}: ${describeFactors(factors)}`, factors, source };
}

export function defaultCombinations(hasIce: boolean, serviceWindFactor: number): CombinationSpec[] {
  const list = [
    spec('strength-dead', 'strength', 'Strength, dead load only', { dead: 1.25 }),
    spec('extreme-wind-max', 'extreme-wind', 'Extreme wind, dead load at its upper factor', { dead: 1.1, wind: 1.0 }),
    spec('extreme-wind-min', 'extreme-wind', 'Extreme wind, dead load at its lower factor', { dead: 0.9, wind: 1.0 }),
    spec('service-wind', 'service', 'Service, for deflections', { dead: 1.0, wind: serviceWindFactor }),
  ];
  if (hasIce) list.push(spec('extreme-ice', 'extreme-ice', 'Extreme, ice with wind on the iced structure', { dead: 1.1, ice: 1.0, 'ice-wind': 1.0 }));
  list.push(deadServiceSpec(COMBINATION_SOURCE));
  return list;
}

/** The unfactored dead load alone, for the dead-load deflection of the arm tips. */
export const DEAD_SERVICE_ID = 'service-dead';

function deadServiceSpec(source: string): CombinationSpec {
  return spec(DEAD_SERVICE_ID, 'service', 'Service, dead load alone, for the dead-load deflection of the arm tips', { dead: 1.0 }, source);
}

/** Whether a combination is the unfactored dead load alone. */
export const isDeadOnly = (c: CombinationSpec): boolean => c.factors.dead === 1 && Object.entries(c.factors).every(([k, f]) => k === 'dead' || f === undefined || f === 0);

/** A user's list gets the dead-alone service combination when it has none (the deflection check needs it). */
export function withDeadService(list: CombinationSpec[]): CombinationSpec[] {
  if (list.some((c) => c.category === 'service' && isDeadOnly(c))) return list;
  const taken = new Set(list.map((c) => c.id));
  let id = DEAD_SERVICE_ID;
  for (let k = 2; taken.has(id); k++) id = `${DEAD_SERVICE_ID}-${k}`;
  return [...list, { ...deadServiceSpec('added by polebook: the list of combinations has no unfactored dead load alone, which the dead-load deflection check of the arm tips needs'), id }];
}

type CombinationInput = Exclude<NonNullable<DesignInput['combinations']>, 'default'>[number];

export function userCombinations(list: readonly CombinationInput[], hasIce: boolean, problems: Problem[]): CombinationSpec[] {
  const seen = new Set<string>();
  return list.map((c, i) => {
    if (seen.has(c.id)) problems.push(error(['combinations', i, 'id'], `duplicate combination id '${c.id}'; each combination needs its own id`));
    // polebook names each wind direction of a combination id@wind-045; a user id with '@' could take such a name.
    if (c.id.includes('@')) problems.push(error(['combinations', i, 'id'], `'@' is reserved in combination ids: polebook appends @ and the wind direction (${c.id.split('@')[0] || 'c1'}@wind-045); choose an id without '@'`));
    seen.add(c.id);
    const factors: Partial<Record<LoadKind, number>> = {};
    if (c.factors.dead !== undefined) factors.dead = c.factors.dead;
    if (c.factors.wind !== undefined) factors.wind = c.factors.wind;
    if (c.factors.ice !== undefined) factors.ice = c.factors.ice;
    if (c.factors.iceWind !== undefined) factors['ice-wind'] = c.factors.iceWind;
    if (!hasIce && (factors.ice !== undefined || factors['ice-wind'] !== undefined)) {
      const key = factors.ice !== undefined ? 'ice' : 'iceWind';
      problems.push(error(['combinations', i, 'factors', key], 'a factor on ice needs an ice block under loads (loads.ice)'));
    }
    if (Object.keys(factors).length === 0) problems.push(error(['combinations', i, 'factors'], 'give at least one factor (dead, wind, ice, iceWind)'));
    // All zero: the combination applies no load and would be left out unseen (found by tests/fuzz).
    else if (Object.values(factors).every((f) => f === 0)) {
      problems.push(error(['combinations', i, 'factors'], 'every factor is 0, so this combination applies no load; give a non-zero factor or remove the combination'));
    }
    return { id: c.id, category: c.category, description: c.description ?? describeFactors(factors), factors, source: 'input' };
  });
}
