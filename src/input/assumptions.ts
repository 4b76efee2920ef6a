// Records every value that has a default: the default taken, or the user's value, so the
// package can state each assumption with its source.
import type { Assumption } from '../design/design.ts';
import { parseQuantity } from '../units/units.ts';
import { DEFAULTS, defaultFor, type DefaultDef, type DefaultName } from './defaults.ts';

/** A default's value in SI: quantities are written with their unit, limits as "L/n". */
export function defaultValueSI(def: DefaultDef): number | string | boolean {
  if (typeof def.value !== 'string' || def.dim === undefined) return def.value;
  const limit = /^L\/(\d+(?:\.\d+)?)$/.exec(def.value);
  if (limit) return 1 / Number(limit[1]);
  const q = parseQuantity(def.value, def.dim, 'si');
  if (!q.ok) throw new Error(`default ${def.key} '${def.value}' does not parse`);
  return q.si;
}

export class AssumptionLog {
  readonly list: Assumption[] = [];

  /** The unit system of the input: an SI input takes the round SI defaults where there are some. */
  constructor(private readonly system: 'us' | 'si' = 'us') {}

  /** The user's value if given, else the default; recorded either way. */
  take<T extends number | string | boolean>(name: DefaultName, given: T | undefined, override: { key?: string; label?: string } = {}): T {
    const def: DefaultDef = defaultFor(DEFAULTS[name], this.system);
    const defaulted = given === undefined;
    const value = (defaulted ? defaultValueSI(def) : given) as T;
    this.list.push({
      key: override.key ?? def.key,
      label: override.label ?? def.label,
      value,
      ...(def.dim !== undefined ? { dim: def.dim } : {}),
      source: defaulted ? def.source : 'input',
      defaulted,
    });
    return value;
  }

  /** A value that is not a default of ours but is derived or stated, e.g. G from the Poisson ratio. */
  note(a: Assumption): void {
    this.list.push(a);
  }
}
