// Turns zod issues into plain-English problems: "what is wrong, what was expected".
import { z } from 'zod';
import { describeValue, isQuantityDescription } from './quantity.ts';
import { error, type InputPath, type Problem } from './problem.ts';
import { closest, suggestKey } from './suggest.ts';

type Issue = z.core.$ZodIssue;
type AnySchema = z.core.$ZodType;

function valueAt(data: unknown, path: InputPath): unknown {
  let v = data;
  for (const seg of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<string | number, unknown>)[seg];
  }
  return v;
}

/** Unwraps optional, default, pipe (input side) and similar wrappers. */
function unwrap(s: AnySchema): AnySchema {
  let cur = s;
  for (;;) {
    const def = cur._zod.def as unknown as { type: string; innerType?: AnySchema; in?: AnySchema };
    if ((def.type === 'optional' || def.type === 'nullable' || def.type === 'default' || def.type === 'readonly' || def.type === 'prefault') && def.innerType) cur = def.innerType;
    else if (def.type === 'pipe' && def.in) cur = def.in;
    else return cur;
  }
}

function objectShape(s: AnySchema): Record<string, AnySchema> | undefined {
  const def = s._zod.def as unknown as { type: string; shape?: Record<string, AnySchema> };
  return def.type === 'object' ? def.shape : undefined;
}

/** The union option that best fits the data: the object sharing most keys with it. */
function pickOption(options: readonly AnySchema[], data: unknown): AnySchema | undefined {
  let best: AnySchema | undefined;
  let bestScore = -1;
  for (const o of options) {
    const u = unwrap(o);
    const shape = objectShape(u);
    const isArray = (u._zod.def as { type: string }).type === 'array';
    let score = 0;
    if (shape && data && typeof data === 'object' && !Array.isArray(data)) {
      score = 1 + Object.keys(data).filter((k) => k in shape).length;
      const disc = Object.entries(shape).find(([, v]) => (unwrap(v)._zod.def as { type: string }).type === 'literal');
      if (disc) {
        const values = (unwrap(disc[1])._zod.def as unknown as { values: unknown[] }).values;
        if (values.includes((data as Record<string, unknown>)[disc[0]])) score += 100;
      }
    } else if (isArray && Array.isArray(data)) score = 1;
    if (score > bestScore) {
      best = u;
      bestScore = score;
    }
  }
  return best;
}

/** The schema that describes the value at a path, following the data through unions. */
export function schemaAt(root: AnySchema, data: unknown, path: InputPath): AnySchema | undefined {
  let s: AnySchema | undefined = unwrap(root);
  for (let i = 0; i <= path.length && s; i++) {
    const def = s._zod.def as unknown as { type: string; options?: AnySchema[]; element?: AnySchema };
    if (def.type === 'union' && def.options) {
      s = pickOption(def.options, valueAt(data, path.slice(0, i)));
      i--;
      continue;
    }
    if (i === path.length) break;
    const seg = path[i];
    if (def.type === 'array' && def.element) s = unwrap(def.element);
    else {
      const shape = objectShape(s);
      s = shape && typeof seg === 'string' && shape[seg] ? unwrap(shape[seg]) : undefined;
    }
  }
  return s;
}

/** Whether the key at `path` is a quantity (read by quantity() in quantity.ts), found by its description. */
function isQuantityAt(root: AnySchema, data: unknown, path: InputPath): boolean {
  if (path.length === 0) return false;
  const parent = schemaAt(root, data, path.slice(0, -1));
  if (!parent) return true;
  const last = path[path.length - 1];
  const def = parent._zod.def as unknown as { type: string; element?: AnySchema };
  let field: AnySchema | undefined = typeof last === 'number' ? def.element : objectShape(parent)?.[last];
  while (field) {
    if (isQuantityDescription(z.globalRegistry.get(field)?.description)) return true;
    const inner = field._zod.def as unknown as { type: string; innerType?: AnySchema };
    field = inner.type === 'optional' || inner.type === 'default' || inner.type === 'nullable' ? inner.innerType : undefined;
  }
  return false;
}

function knownKeys(root: AnySchema, data: unknown, path: InputPath): string[] {
  const s = schemaAt(root, data, path);
  return s ? Object.keys(objectShape(s) ?? {}) : [];
}

function expectedText(expected: string): string {
  if (expected === 'object') return 'a block of keys';
  if (expected === 'array') return 'a list (lines starting with "- ")';
  if (expected === 'int') return 'a whole number';
  return `a ${expected}`;
}

function joinOr(xs: readonly string[]): string {
  return xs.length <= 1 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} or ${xs[xs.length - 1]}`;
}

const fmt = (v: unknown) => (typeof v === 'string' ? `'${v}'` : String(v));

/** One zod issue (with the parsed data and the schema) as located problems. */
export function issueToProblems(issue: Issue, data: unknown, root: AnySchema, prefix: InputPath = []): Problem[] {
  const path: InputPath = [...prefix, ...(issue.path as (string | number)[])];
  const value = valueAt(data, path);
  const missing = value === undefined;
  switch (issue.code) {
    case 'unrecognized_keys': {
      const known = knownKeys(root, data, path);
      return issue.keys.map((k) => {
        const guess = suggestKey(k, known);
        const hint = guess ? `did you mean '${guess}'? ` : '';
        return error([...path, k], `unknown key '${k}'; ${hint}expected one of: ${known.join(', ')}`, 'key');
      });
    }
    case 'invalid_union': {
      if (missing) return [error(path, 'required key is missing')];
      const disc = (issue as { discriminator?: string }).discriminator;
      if (disc !== undefined) {
        const options = ((issue as { options?: unknown[] }).options ?? []).map(String);
        const guess = typeof value === 'string' ? closest(value, options) : undefined;
        return [error(path, `${describeValue(value)} is not a valid ${disc}; ${guess ? `did you mean '${guess}'? ` : ''}expected ${joinOr(options.map(fmt))}`)];
      }
      // Keep the branch that got furthest: the one with no complaint about the value itself.
      const branches = issue.errors.filter((b) => b.every((sub) => sub.path.length > 0));
      if (branches.length === 1) return branches[0].flatMap((sub) => issueToProblems(sub, data, root, path));
      const kinds = issue.errors.flatMap((b) => b.filter((sub) => sub.path.length === 0).map((sub) => (sub.code === 'invalid_type' ? sub.expected : sub.code === 'invalid_value' ? sub.values.map(fmt).join(' or ') : '')));
      const set = new Set(kinds);
      if (set.has('number') && set.has('string') && set.size === 2) {
        // Quantities and plain text (names, ids) both take a string or a number.
        if (!isQuantityAt(root, data, path)) return [error(path, `expected text or a number, got ${describeValue(value)}`)];
        return [error(path, `expected a number or a number with a unit (e.g. "12.5 ft"), got ${describeValue(value)}`)];
      }
      return [error(path, `expected ${joinOr([...set].filter((k) => k !== '').map((k) => (k.startsWith("'") ? k : expectedText(k))))}, got ${describeValue(value)}`)];
    }
    case 'invalid_type':
      if (missing) return [error(path, 'required key is missing')];
      if (issue.expected === 'boolean' && typeof value === 'string' && /^(yes|no|on|off|y|n)$/i.test(value)) {
        return [error(path, `expected true or false, got the text '${value}' (in YAML 1.2, yes/no/on/off are text)`)];
      }
      return [error(path, `expected ${expectedText(issue.expected)}, got ${describeValue(value)}`)];
    case 'invalid_value': {
      if (missing) return [error(path, `required key is missing; expected ${joinOr(issue.values.map(fmt))}`)];
      const options = issue.values.map(String);
      const guess = typeof value === 'string' ? closest(value, options) : undefined;
      const custom = issue.message.startsWith('Invalid') ? undefined : issue.message;
      return [error(path, custom ?? `${describeValue(value)} is not allowed; ${guess ? `did you mean '${guess}'? ` : ''}expected ${joinOr(options.map((o, i) => fmt(issue.values[i] ?? o)))}`)];
    }
    default:
      if (missing) return [error(path, 'required key is missing')];
      return [error(path, issue.message)];
  }
}
