// Zod schemas for quantities as typed in the input: a bare number in the unit system's
// default unit, or a string with its unit ("28 ft", "3.5 psf"). The output is SI.
import { z } from 'zod';
import { SYSTEM_UNIT, UNITS, formatQuantity, parseQuantity, unitSymbols, type Dim, type UnitSystem } from '../units/units.ts';
import { PHYSICAL_FLOOR_SI, PHYSICAL_LIMIT_SI } from './physical-limits.ts';
import { escapeUnsafe } from './text-safety.ts';

export const DIM_NAMES: Readonly<Record<Dim, string>> = {
  length: 'length',
  section: 'length',
  area: 'area',
  force: 'force',
  weight: 'weight',
  moment: 'moment',
  pressure: 'pressure',
  stress: 'stress',
  density: 'density',
  unitWeight: 'unit weight',
  lineLoad: 'load per length',
  rotStiffness: 'rotational stiffness',
  angle: 'angle',
  taper: 'taper (diameter change per length)',
  speed: 'speed',
  frequency: 'frequency',
  sectionArea: 'area',
  inertia: 'second moment of area',
  modulus: 'section modulus',
  mass: 'mass',
  ratio: 'ratio',
};

/** "a length", "an angle". */
export function withArticle(noun: string): string {
  return /^[aeiou]/i.test(noun) ? `an ${noun}` : `a ${noun}`;
}

/** 'planAngle': a plan direction in [0, 360) deg, refused outside rather than wrapped (400 deg is a
 * mistake for something, not surely 40 deg). */
export type Bound = 'positive' | 'nonNegative' | 'any' | 'planAngle';

const FULL_TURN = 2 * Math.PI;

const uniq = (xs: string[]): string[] => [...new Set(xs)];

/** Explains a quantity that could not be read, for the diagnostic. */
export function quantityProblem(raw: number | string, dim: Dim, system: UnitSystem): string | undefined {
  const r = parseQuantity(raw, dim, system);
  if (r.ok && Number.isFinite(r.si)) return undefined;
  // "1e999" reads as a number but overflows to Infinity, which no quantity can be.
  if (r.ok) return `'${String(raw)}' is too large to be ${withArticle(DIM_NAMES[dim])}; expected a finite number, e.g. "${example(dim, system)}"`;
  const expected = uniq(unitSymbols(dim)).join(', ');
  const name = DIM_NAMES[dim];
  const comma = typeof raw === 'string' ? /^\s*([-+]?\d+),(\d+)(.*)$/.exec(raw) : null;
  if (comma) return `'${escapeUnsafe(raw as string)}' has a decimal comma; write ${comma[1]}.${comma[2]}${comma[3]} with a decimal point`;
  if (r.reason === 'syntax') {
    return `cannot read '${String(raw)}' as ${withArticle(name)}; expected a number (in ${SYSTEM_UNIT[system][dim]}) or a number with a unit, e.g. "${example(dim, system)}"`;
  }
  if (r.reason === 'dimension') {
    const of = uniq((r.dimOf ?? []).map((d) => DIM_NAMES[d])).join(' or ');
    return `'${r.unit}' is a unit of ${of}, but ${withArticle(name)} is expected here; expected one of: ${expected}`;
  }
  const sameLetters = UNITS.find((d) => d.dim === dim && d.symbol.toLowerCase() === (r.unit ?? '').toLowerCase());
  const hint = sameLetters ? `did you mean '${sameLetters.symbol}'? ` : '';
  return `unknown unit '${r.unit}'; ${hint}expected ${withArticle(name)} unit: ${expected}`;
}

function example(dim: Dim, system: UnitSystem): string {
  const unit = SYSTEM_UNIT[system][dim];
  return unit === '' ? '1.5' : `12.5 ${unit}`;
}

function boundText(bound: Bound): string {
  return bound === 'positive' ? 'greater than 0' : 'at least 0';
}

const QUANTITY_MARK = ', or a string with a unit, e.g. ';

/** Whether a schema description is one written by quantityDescription (a quantity key). */
export function isQuantityDescription(description: string | undefined): boolean {
  return description !== undefined && description.includes(QUANTITY_MARK);
}

/** What the JSON Schema says about a quantity key. */
export function quantityDescription(dim: Dim, text: string): string {
  const us = SYSTEM_UNIT.us[dim];
  const si = SYSTEM_UNIT.si[dim];
  const units = us === si ? (us === '' ? 'a number' : `a number in ${us}`) : `a number in ${us} (units: us) or ${si} (units: si)`;
  return `${text}. ${DIM_NAMES[dim][0].toUpperCase()}${DIM_NAMES[dim].slice(1)}: ${units}${QUANTITY_MARK}"${example(dim, 'us')}"`;
}

/** A quantity key: number | "number unit" in, SI number out. */
export function quantity(dim: Dim, system: UnitSystem, bound: Bound, text: string) {
  return z
    .union([z.number(), z.string()])
    .transform((raw, ctx) => {
      const problem = quantityProblem(raw, dim, system);
      if (problem !== undefined) {
        ctx.addIssue({ code: 'custom', message: problem });
        return z.NEVER;
      }
      const r = parseQuantity(raw, dim, system);
      const si = r.ok ? r.si : NaN;
      if (bound === 'planAngle' && !(si >= 0 && si < FULL_TURN)) {
        const turned = ((si % FULL_TURN) + FULL_TURN) % FULL_TURN;
        ctx.addIssue({ code: 'custom', message: `${String(raw)} is outside 0 to 360 deg: a plan direction is measured from +X toward +Y, at least 0 and below 360 deg; polebook does not wrap it around, so write ${formatQuantity(turned, 'angle', system)} if that is the direction meant` });
        return z.NEVER;
      }
      if ((bound === 'positive' && !(si > 0)) || (bound === 'nonNegative' && !(si >= 0))) {
        // Say what the value is (the first sentence of its description), so the limit explains itself.
        const what = text.split('. ')[0]!.replace(/\.$/, '');
        ctx.addIssue({ code: 'custom', message: `must be ${boundText(bound)}, got ${String(raw)}: this is the ${what[0]!.toLowerCase()}${what.slice(1)}, which ${bound === 'positive' ? 'is a size or amount above zero' : 'cannot be negative'}` });
        return z.NEVER;
      }
      if (Math.abs(si) > PHYSICAL_LIMIT_SI[dim]) {
        const limit = formatQuantity(PHYSICAL_LIMIT_SI[dim], dim, system);
        ctx.addIssue({ code: 'custom', message: `${String(raw)} is beyond any pole-and-arm support (at most ${limit} in magnitude, a limit of ours); check the value and its unit` });
        return z.NEVER;
      }
      const floor = PHYSICAL_FLOOR_SI[dim];
      if (floor !== undefined && si !== 0 && Math.abs(si) < floor) {
        ctx.addIssue({ code: 'custom', message: `${String(raw)} is below any tube material (at least ${formatQuantity(floor, dim, system)}, a limit of ours); check the value and its unit` });
        return z.NEVER;
      }
      return si;
    })
    .meta({ description: quantityDescription(dim, text) });
}

/**
 * A plain number (factor, ratio, count) with bounds. `meaning` says in words what the number is and
 * what a plausible value looks like; it goes into the message when a value is out of range, so the
 * user learns why the limit exists, not only where it is.
 */
export function factor(text: string, min: number, max: number, meaning: string, minInclusive = true) {
  const base = z.number({ error: (iss) => (iss.input === undefined ? undefined : `expected a number, got ${describeValue(iss.input)}`) });
  const bounded = minInclusive ? base.min(min, { error: (iss) => `${String(iss.input)} is below ${min}: ${meaning}` }) : base.gt(min, { error: (iss) => `${String(iss.input)} is not above ${min}: ${meaning}` });
  return bounded.max(max, { error: (iss) => `${String(iss.input)} is above ${max}: ${meaning}` }).meta({ description: text });
}

export function describeValue(v: unknown): string {
  if (v === null) return 'nothing (null)';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'a block of keys';
  if (typeof v === 'string') return `the text '${escapeUnsafe(v.length > 40 ? `${v.slice(0, 40)}...` : v)}'`;
  return `${typeof v} ${String(v)}`;
}
