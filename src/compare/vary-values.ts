// The values of one varied key, as typed after `--vary path=` or in a compare block:
//   a list   "28, 32, 36 ft"   (a unit at the end applies to every number without its own)
//   a range  "20 ft..45 ft:5 ft" or "20..45:5 ft" (start..end:step, the end included)
//   words    "round, multisided" (for keys that take a word)
// Numbers are kept as typed (decimal text), so a range never prints 0.30000000000000004.
// Each value remembers its column in the text, for a positioned error.

export interface VaryValue {
  /** What goes into the input: a number (the key's own unit), a string with a unit, or a word. */
  readonly yaml: number | string | boolean;
  /** As printed: "32 ft", "0.375", "round". */
  readonly label: string;
  /** The number as typed (in `unit`, or the key's default unit when unit is null); null for a word. */
  readonly number: number | null;
  readonly unit: string | null;
  /** 0-based column of the value in the values text. */
  readonly col: number;
}

export class VaryValueError extends Error {
  constructor(
    message: string,
    /** 0-based column in the values text. */
    readonly col: number,
  ) {
    super(message);
  }
}

/** polebook's own limit on the values of one key (a typo in a step would otherwise make millions). */
export const MAX_VALUES_PER_KEY = 200;

const NUMBER = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*)$/;

interface Piece {
  readonly text: string;
  readonly col: number;
}

function splitAt(text: string, sep: RegExp, offset: number): Piece[] {
  const out: Piece[] = [];
  let start = 0;
  for (const m of text.matchAll(sep)) {
    out.push(trimPiece(text.slice(start, m.index), offset + start));
    start = m.index! + m[0].length;
  }
  out.push(trimPiece(text.slice(start), offset + start));
  return out;
}

function trimPiece(raw: string, col: number): Piece {
  const lead = raw.length - raw.trimStart().length;
  return { text: raw.trim(), col: col + lead };
}

interface Num {
  readonly digits: string;
  readonly value: number;
  readonly unit: string | null;
  readonly col: number;
}

function readNumber(p: Piece, what: string): Num | null {
  const m = NUMBER.exec(p.text);
  if (!m) return null;
  const value = Number(m[1]);
  if (!Number.isFinite(value)) throw new VaryValueError(`${what} '${p.text}' is too large to be a number`, p.col);
  const unit = m[2]!.trim();
  return { digits: m[1]!, value, unit: unit === '' ? null : unit, col: p.col };
}

/** Decimal places of a number as typed (exponent form counts its shift). */
function decimals(digits: string): number {
  const [mant, exp] = digits.toLowerCase().split('e') as [string, string | undefined];
  const frac = mant.includes('.') ? mant.split('.')[1]!.length : 0;
  return Math.max(0, frac - Number(exp ?? 0));
}

/** Plain decimal text with at most `places` decimals, trailing zeros dropped. */
function decimalText(v: number, places: number): string {
  const s = v.toFixed(Math.min(places, 12));
  const t = s.includes('.') ? s.replace(/0+$/, '').replace(/\.$/, '') : s;
  return t === '-0' ? '0' : t;
}

function numberValue(n: Num, digits: string, unit: string | null): VaryValue {
  const number = Number(digits);
  return { yaml: unit === null ? number : `${digits} ${unit}`, label: unit === null ? digits : `${digits} ${unit}`, number, unit, col: n.col };
}

function wordValue(p: Piece): VaryValue {
  if (!/^[A-Za-z][A-Za-z0-9_'’-]*$/.test(p.text)) throw new VaryValueError(`cannot read '${p.text}' as a value; expected a number, a number with a unit (e.g. 32 ft) or a word`, p.col);
  const yaml = p.text === 'true' ? true : p.text === 'false' ? false : p.text;
  return { yaml, label: p.text, number: null, unit: null, col: p.col };
}

/** One unit for the whole: the unit of every number that has one must be the same. */
function sharedUnit(nums: readonly Num[]): string | null {
  const withUnit = nums.filter((n) => n.unit !== null);
  const first = withUnit[0];
  if (!first) return null;
  const other = withUnit.find((n) => n.unit !== first.unit);
  if (other) throw new VaryValueError(`'${other.unit}' differs from the unit '${first.unit}' given before it; give every value of a range in one unit`, other.col);
  return first.unit;
}

function parseRange(text: string, offset: number, dots: number): VaryValue[] {
  const [startP, rest] = [trimPiece(text.slice(0, dots), offset), text.slice(dots + 2)];
  const colon = rest.lastIndexOf(':');
  if (colon < 0) throw new VaryValueError(`a range needs a step: start..end:step, e.g. 20 ft..45 ft:5 ft`, offset + dots + 2 + rest.length);
  const endP = trimPiece(rest.slice(0, colon), offset + dots + 2);
  const stepP = trimPiece(rest.slice(colon + 1), offset + dots + 2 + colon + 1);
  const parts = [
    [startP, 'the start of the range'],
    [endP, 'the end of the range'],
    [stepP, 'the step of the range'],
  ] as const;
  const nums = parts.map(([p, what]) => {
    if (p.text === '') throw new VaryValueError(`${what} is missing; expected start..end:step, e.g. 20 ft..45 ft:5 ft`, p.col);
    const n = readNumber(p, what);
    if (!n) throw new VaryValueError(`cannot read ${what} '${p.text}' as a number; expected start..end:step, e.g. 20 ft..45 ft:5 ft`, p.col);
    return n;
  }) as [Num, Num, Num];
  const unit = sharedUnit(nums);
  const [a, b, s] = nums;
  if (s.value <= 0) throw new VaryValueError(`the step must be larger than zero; the range runs from start up to end`, s.col);
  if (b.value < a.value) throw new VaryValueError(`the end ${b.digits} is below the start ${a.digits}; write the smaller value first`, b.col);
  const steps = (b.value - a.value) / s.value;
  const count = Math.round(steps);
  if (Math.abs(steps - count) > 1e-9 * Math.max(1, count)) {
    throw new VaryValueError(`the range does not land on its end: ${a.digits} + k × ${s.digits} never gives ${b.digits}; give an end a whole number of steps from the start`, b.col);
  }
  if (count + 1 > MAX_VALUES_PER_KEY) throw new VaryValueError(`the range gives ${count + 1} values, more than the ${MAX_VALUES_PER_KEY} polebook takes for one key (a limit of ours); give a larger step`, s.col);
  const places = Math.max(decimals(a.digits), decimals(s.digits), decimals(b.digits));
  const out: VaryValue[] = [];
  for (let k = 0; k <= count; k++) {
    const digits = k === count ? b.digits : decimalText(a.value + k * s.value, places);
    out.push(numberValue(a, digits, unit));
  }
  return out;
}

function parseList(text: string, offset: number): VaryValue[] {
  const pieces = splitAt(text, /,/g, offset);
  const empty = pieces.find((p) => p.text === '');
  if (empty) throw new VaryValueError(`an empty value in the list; expected values separated by commas, e.g. 28, 32, 36 ft`, empty.col);
  const nums = pieces.map((p) => readNumber(p, 'the value'));
  const anyNumber = nums.some((n) => n !== null);
  if (!anyNumber) return pieces.map(wordValue);
  const word = pieces.find((_, k) => nums[k] === null);
  if (word) throw new VaryValueError(`cannot read '${word.text}' as a number; the other values of this list are numbers`, word.col);
  const list = nums as Num[];
  // A unit written once at the end applies to the numbers before it that have none.
  const last = list[list.length - 1]!;
  const trailing = last.unit !== null && list.slice(0, -1).every((n) => n.unit === null) ? last.unit : null;
  if (list.length > MAX_VALUES_PER_KEY) throw new VaryValueError(`the list has ${list.length} values, more than the ${MAX_VALUES_PER_KEY} polebook takes for one key (a limit of ours)`, list[MAX_VALUES_PER_KEY]!.col);
  return list.map((n) => numberValue(n, n.digits, n.unit ?? trailing));
}

/** Reads the values text; `offset` is its column in the text it came from (for errors). */
export function parseVaryValues(text: string, offset = 0): VaryValue[] {
  if (text.trim() === '') throw new VaryValueError('no values; expected a list (28, 32, 36 ft) or a range (20 ft..45 ft:5 ft)', offset);
  const dots = text.indexOf('..');
  const values = dots >= 0 ? parseRange(text, offset, dots) : parseList(text, offset);
  const seen = new Map<string, VaryValue>();
  for (const v of values) {
    const key = v.number !== null ? `${v.number} ${v.unit ?? ''}` : v.label;
    if (seen.has(key)) throw new VaryValueError(`${v.label} is given twice; each alternative once`, v.col);
    seen.set(key, v);
  }
  return values;
}

/** Values given as a YAML list in a compare block: each item is one value. */
export function varyValuesFromList(items: readonly (number | string)[], cols: readonly number[]): VaryValue[] {
  return items.flatMap((item, k) => {
    if (typeof item === 'number') return [{ yaml: item, label: String(item), number: item, unit: null, col: cols[k] ?? 0 }];
    const vs = parseVaryValues(item, cols[k] ?? 0);
    if (vs.length !== 1) throw new VaryValueError(`one value per list item; '${item}' holds ${vs.length}`, cols[k] ?? 0);
    return vs;
  });
}
