// What a comparison varies, from `--vary path=values` options or from the input's compare block,
// each resolved against the input, with a positioned error for a bad path or value: for an
// option, the option with a caret under the place; for the block, file:line:column.
import { isMap, isScalar, isSeq, type Document, type LineCounter, type Node } from 'yaml';
import { EXIT, InputError, PolebookError, type Diagnostic } from '../errors.ts';
import { formatPath, type InputPath } from '../input/problem.ts';
import { designJsonSchema } from '../input/index.ts';
import { keyUnit, resolveInputPath, VaryPathError, type ResolvedPath } from './input-path.ts';
import { parseVaryValues, varyValuesFromList, VaryValueError, type VaryValue } from './vary-values.ts';

/** Where a vary came from, to point at a place in it. */
export type VaryOrigin =
  | { readonly kind: 'option'; readonly text: string; readonly valuesAt: number }
  | { readonly kind: 'block'; readonly file: string; readonly index: number; readonly pathPos: Pos; readonly valuePos: readonly Pos[]; readonly valueQuoted: boolean };

interface Pos {
  readonly line: number;
  readonly col: number;
}

export interface VarySpec {
  /** The path as written, e.g. "A1.length". */
  readonly text: string;
  /** The (first) key varied: its description and unit label the charts. */
  readonly resolved: ResolvedPath;
  /** Every key set to the value: the first, then those linked with '+' (A1.length+L1.position). */
  readonly paths: readonly ResolvedPath[];
  readonly values: readonly VaryValue[];
  readonly origin: VaryOrigin;
}

/** A bad --vary option: what is wrong, then the option with a caret under the place. Exit 2. */
export class VaryOptionError extends PolebookError {
  constructor(option: string, col: number, message: string) {
    super(`${message}\n  --vary ${option}\n  ${' '.repeat('--vary '.length + col)}^`, EXIT.badInput);
  }
}

/** Error at a path (where = 'path', col in the path) or a value (index of the value). */
export function varyProblem(spec: Pick<VarySpec, 'origin'>, at: { readonly path?: number; readonly value?: number; readonly col?: number }, message: string, path = ''): PolebookError {
  const o = spec.origin;
  if (o.kind === 'option') {
    const col = at.path !== undefined ? at.path : o.valuesAt + (at.col ?? 0);
    return new VaryOptionError(o.text, col, message);
  }
  const base = at.path !== undefined ? o.pathPos : (o.valuePos[at.value ?? 0] ?? o.valuePos[0]!);
  const shift = at.path !== undefined ? at.path : o.valuePos.length === 1 ? (at.col ?? 0) + (o.valueQuoted ? 1 : 0) : 0;
  const field = at.path !== undefined ? 'path' : 'values';
  const d: Diagnostic = { file: o.file, line: base.line, col: base.col + shift, path: path || `compare.vary[${o.index}].${field}`, message, severity: 'error' };
  return new InputError([d]);
}

/** "A1.length+L1.position": keys linked with '+' take the same value (a tip attachment that
 * moves with the tip). */
function resolveOrThrow(origin: VaryOrigin, pathText: string, data: unknown): ResolvedPath[] {
  const out: ResolvedPath[] = [];
  let at = 0;
  for (const part of pathText.split('+')) {
    const lead = part.length - part.trimStart().length;
    try {
      out.push(resolveInputPath(part.trim(), data, designJsonSchema() as never));
    } catch (err) {
      if (err instanceof VaryPathError) throw varyProblem({ origin }, { path: at + lead + err.col }, err.message);
      throw err;
    }
    at += part.length + 1;
  }
  return out;
}

/** A number typed without a unit is in the key's own unit: its label says which ("4 mm"). */
function labelled(values: readonly VaryValue[], resolved: ResolvedPath, data: unknown): VaryValue[] {
  const system = (data as { units?: unknown }).units === 'si' ? 'si' : 'us';
  const unit = keyUnit(resolved.description, system);
  return values.map((v) => (v.number !== null && v.unit === null && unit ? { ...v, label: `${v.label} ${unit}` } : v));
}

/** `--vary A1.length=28,32,36 ft` */
export function varyFromOption(option: string, data: unknown): VarySpec {
  const eq = option.indexOf('=');
  if (eq < 0) throw new VaryOptionError(option, option.length, 'expected path=values, e.g. --vary "A1.length=28,32,36 ft"');
  const text = option.slice(0, eq).trim();
  const origin: VaryOrigin = { kind: 'option', text: option, valuesAt: eq + 1 };
  if (text === '') throw new VaryOptionError(option, 0, 'no path before =; expected e.g. A1.length=28,32,36 ft');
  const paths = resolveOrThrow(origin, option.slice(0, eq), data);
  try {
    return { text, resolved: paths[0]!, paths, values: labelled(parseVaryValues(option.slice(eq + 1)), paths[0]!, data), origin };
  } catch (err) {
    if (err instanceof VaryValueError) throw varyProblem({ origin }, { col: err.col }, err.message);
    throw err;
  }
}

function posOf(node: Node | null | undefined, lines: LineCounter): Pos {
  const off = node?.range?.[0] ?? 0;
  return lines.linePos(off);
}

/** The input's compare block (already checked against the schema by the input stage). */
export function varyFromBlock(doc: Document, lines: LineCounter, file: string, data: unknown): VarySpec[] {
  const block = doc.getIn(['compare', 'vary'], true);
  if (!isSeq(block)) return [];
  return block.items.map((item, index) => {
    if (!isMap(item)) throw new Error('compare.vary item is not a mapping (the schema should have refused it)');
    const pathNode = item.get('path', true) as Node | undefined;
    const valuesNode = item.get('values', true) as Node | undefined;
    const valuePos = isSeq(valuesNode) ? valuesNode.items.map((n) => posOf(n as Node, lines)) : [posOf(valuesNode, lines)];
    const quoted = isScalar(valuesNode) && (valuesNode.type === 'QUOTE_DOUBLE' || valuesNode.type === 'QUOTE_SINGLE');
    const origin: VaryOrigin = { kind: 'block', file, index, pathPos: posOf(pathNode, lines), valuePos, valueQuoted: quoted };
    const text = String(isScalar(pathNode) ? pathNode.value : '');
    const paths = resolveOrThrow(origin, text, data);
    const raw = isScalar(valuesNode) ? valuesNode.value : isSeq(valuesNode) ? valuesNode.items.map((n) => (isScalar(n) ? n.value : '')) : '';
    try {
      const values = Array.isArray(raw) ? varyValuesFromList(raw as (number | string)[], raw.map(() => 0)) : typeof raw === 'number' ? varyValuesFromList([raw], [0]) : parseVaryValues(String(raw));
      return { text, resolved: paths[0]!, paths, values: labelled(values, paths[0]!, data), origin };
    } catch (err) {
      if (err instanceof VaryValueError) {
        const k = Array.isArray(raw) ? Math.max(0, raw.findIndex((x) => { try { varyValuesFromList([x as never], [0]); return false; } catch { return true; } })) : 0;
        throw varyProblem({ origin }, { value: k, col: Array.isArray(raw) ? 0 : err.col }, err.message);
      }
      throw err;
    }
  });
}

/** Two varies of one key would make contradictory alternatives. */
export function refuseRepeatedKeys(specs: readonly VarySpec[]): void {
  const seen = new Map<string, VarySpec>();
  for (const s of specs) {
    for (const p of s.paths) {
      const key = formatPath(p.path);
      if (seen.has(key)) throw varyProblem(s, { path: 0 }, `${key} is varied twice (also in ${seen.get(key)!.text}); give its values once`);
      seen.set(key, s);
    }
  }
}

export function pathKey(path: InputPath): string {
  return formatPath(path);
}
