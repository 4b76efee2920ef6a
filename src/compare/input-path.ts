// A varied key addressed by ids, resolved to its place in the input:
//   A1.length                  the length of the arm (or panel, point...) with id A1
//   S1.position                a panel's position, by the panel id
//   pole.section.wall          the pole (short for structure.pole)
//   structure.arms[A1].length  the full path, a list item by its id or its index [0]
// The result is the key path of the input (["structure", "arms", 0, "length"]), the same path
// a diagnostic of that key carries, so an error of a varied value is reported at the value.
import type { InputPath } from '../input/problem.ts';

export class VaryPathError extends Error {
  constructor(
    message: string,
    /** 0-based column in the path text. */
    readonly col: number,
  ) {
    super(message);
  }
}

interface Segment {
  readonly name: string;
  readonly col: number;
}

/** "structure.arms[A1].length" -> structure, arms, A1, length (with their columns). */
export function pathSegments(text: string): Segment[] {
  const out: Segment[] = [];
  const re = /([^.[\]]+)|\[([^\]]*)\]|(\.)/g;
  let expectName = true;
  let m: RegExpExecArray | null;
  let last = 0;
  while ((m = re.exec(text)) !== null) {
    if (m.index !== last) throw new VaryPathError(`cannot read the path here; expected keys and ids separated by dots, e.g. A1.length`, last);
    last = re.lastIndex;
    if (m[3] !== undefined) {
      if (expectName) throw new VaryPathError('an empty key in the path (two dots, or a dot at the start)', m.index);
      expectName = true;
      continue;
    }
    const name = (m[1] ?? m[2] ?? '').trim();
    if (name === '') throw new VaryPathError('an empty key in the path', m.index);
    if (m[1] !== undefined && !expectName) throw new VaryPathError('expected a dot before the key', m.index);
    out.push({ name, col: m.index + (m[2] !== undefined ? 1 : 0) });
    expectName = false;
  }
  if (last !== text.length) throw new VaryPathError('cannot read the path here; expected a closing ]', last);
  if (out.length === 0) throw new VaryPathError('no path; expected e.g. A1.length', 0);
  if (expectName) throw new VaryPathError('the path ends with a dot', text.length - 1);
  return out;
}

type Data = unknown;
type JsonSchema = { properties?: Record<string, JsonSchema>; items?: JsonSchema; oneOf?: JsonSchema[]; anyOf?: JsonSchema[]; description?: string; type?: unknown };

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The keys a mapping may have per the schema (every form of a union). */
function schemaKeys(s: JsonSchema | undefined): string[] {
  if (!s) return [];
  const own = Object.keys(s.properties ?? {});
  const alts = [...(s.oneOf ?? []), ...(s.anyOf ?? [])].flatMap(schemaKeys);
  return [...new Set([...own, ...alts])];
}

function schemaChild(s: JsonSchema | undefined, key: string | number): JsonSchema | undefined {
  if (!s) return undefined;
  if (typeof key === 'number') return s.items ?? [...(s.oneOf ?? []), ...(s.anyOf ?? [])].map((a) => a.items).find((x) => x);
  return s.properties?.[key] ?? [...(s.oneOf ?? []), ...(s.anyOf ?? [])].map((a) => schemaChild(a, key)).find((x) => x);
}

/** Where in the input each list item with an id sits, for `A1.length`. */
function idPlaces(data: Data, at: InputPath = [], out: Map<string, InputPath[]> = new Map()): Map<string, InputPath[]> {
  if (Array.isArray(data)) {
    data.forEach((item, k) => {
      if (isRecord(item) && (typeof item.id === 'string' || typeof item.id === 'number')) {
        const id = String(item.id);
        out.set(id, [...(out.get(id) ?? []), [...at, k]]);
      }
      idPlaces(item, [...at, k], out);
    });
  } else if (isRecord(data)) {
    for (const [k, v] of Object.entries(data)) if (k !== 'compare') idPlaces(v, [...at, k], out);
  }
  return out;
}

const SHORT_ROOTS: Readonly<Record<string, InputPath>> = {
  pole: ['structure', 'pole'],
  arms: ['structure', 'arms'],
  panels: ['attachments', 'panels'],
  points: ['attachments', 'points'],
};

function getAt(data: Data, path: InputPath): Data {
  let node: Data = data;
  for (const k of path) node = (node as Record<string | number, unknown>)[k];
  return node;
}

function describe(path: InputPath): string {
  return path.length === 0 ? 'the input' : path.map((k, i) => (typeof k === 'number' ? `[${k}]` : i === 0 ? k : `.${k}`)).join('');
}

function itemName(list: readonly unknown[]): string {
  const ids = list.filter(isRecord).map((x) => x.id).filter((x) => x !== undefined);
  return ids.length > 0 ? `ids ${ids.map(String).join(', ')} or an index [0] to [${list.length - 1}]` : `an index [0] to [${list.length - 1}]`;
}

export interface ResolvedPath {
  /** Key path in the input, e.g. ["structure", "arms", 0, "length"]. */
  readonly path: InputPath;
  /** The key's description from the schema (what it is, its unit), when known. */
  readonly description: string | null;
  /** The value the input has there now; undefined when the key is absent (its default applies). */
  readonly current: unknown;
}

/** Resolves `text` in the input data against the input schema. */
export function resolveInputPath(text: string, data: Data, schema: JsonSchema): ResolvedPath {
  const segs = pathSegments(text);
  const first = segs[0]!;
  let path: InputPath;
  let rest: Segment[];
  if (isRecord(data) && first.name in data && first.name !== 'compare') {
    path = [first.name];
    rest = segs.slice(1);
  } else if (SHORT_ROOTS[first.name]) {
    path = SHORT_ROOTS[first.name]!;
    rest = segs.slice(1);
  } else {
    const places = idPlaces(data).get(first.name) ?? [];
    if (places.length > 1) throw new VaryPathError(`the id '${first.name}' is used ${places.length} times (${places.map(describe).join(', ')}); give the full path, e.g. ${describe(places[0]!)}`, first.col);
    if (places.length === 0) {
      const ids = [...idPlaces(data).keys()];
      const tops = isRecord(data) ? Object.keys(data).filter((k) => k !== 'compare') : [];
      throw new VaryPathError(`'${first.name}' is neither an id in the input (${ids.length > 0 ? ids.join(', ') : 'none'}) nor a top-level key (${tops.join(', ')}, or pole)`, first.col);
    }
    path = places[0]!;
    rest = segs.slice(1);
  }
  let s: JsonSchema | undefined = schema;
  for (const k of path) s = schemaChild(s, k);
  for (const [k, seg] of rest.entries()) {
    const node = getAt(data, path);
    const isLast = k === rest.length - 1;
    if (Array.isArray(node)) {
      const index = /^\d+$/.test(seg.name) ? Number(seg.name) : node.findIndex((x) => isRecord(x) && String(x.id) === seg.name);
      if (index < 0 || index >= node.length) throw new VaryPathError(`no item '${seg.name}' in ${describe(path)}; expected ${itemName(node)}`, seg.col);
      path = [...path, index];
      s = schemaChild(s, index);
    } else if (isRecord(node)) {
      const allowed = schemaKeys(s);
      if (!(seg.name in node)) {
        const known = allowed.includes(seg.name);
        if (!known || !isLast) {
          const choices = [...new Set([...Object.keys(node), ...allowed])];
          throw new VaryPathError(known ? `${describe([...path, seg.name])} is not in the input; only a key at the end of the path may be added` : `no key '${seg.name}' in ${describe(path)}; expected one of: ${choices.join(', ')}`, seg.col);
        }
      }
      path = [...path, seg.name];
      s = schemaChild(s, seg.name);
    } else {
      throw new VaryPathError(`${describe(path)} is a single value; it has no key '${seg.name}'`, seg.col);
    }
  }
  const current = getAt(data, path);
  const last = segs[segs.length - 1]!;
  if (Array.isArray(current)) throw new VaryPathError(`${describe(path)} is a list; vary one value in it, e.g. ${text}[0]...`, last.col);
  if (isRecord(current)) throw new VaryPathError(`${describe(path)} is a group of keys; vary one of them: ${Object.keys(current).join(', ')}`, last.col);
  if (path[path.length - 1] === 'id') throw new VaryPathError('an id names a part; it cannot be varied', last.col);
  return { path, description: s?.description ?? null, current };
}

/** The unit a bare number of this key takes in the unit system, read from its schema description. */
export function keyUnit(description: string | null, system: 'us' | 'si'): string | null {
  if (!description) return null;
  const both = /a number in (\S+) \(units: us\) or (\S+) \(units: si\)/.exec(description);
  if (both) return system === 'us' ? both[1]! : both[2]!;
  const one = /a number in (\S+?),/.exec(description);
  return one ? one[1]! : null;
}
