// Structural mutations of a parsed input file, for the mutated-input fuzz test and the bug hunt
// (hunt.ts). A mutation is plain data (what to do, and integers that pick where and which value),
// so fast-check can generate, print and replay it; applying it to a parsed input is deterministic.
import fc from 'fast-check';

export type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Path = readonly (string | number)[];

/** Odd values a number or quantity may be replaced with: zero, negative, huge, tiny, NaN-like text,
 * a unit of the wrong dimension, a bool, null, empty list and map. */
export const ODD_VALUES: readonly Json[] = [
  0, -1, -12.5, 1e9, 1e-9, 1e300, 900, 5000, '999 m', '9.9 m', -1e-300, 'NaN', 'nan', '.nan', 'Infinity', '-Infinity', '1e999', '1e-999 ft',
  '5 psf', '3 kip', '2 deg', '12 in/ft', '0 ft', '-0', '', ' ', 'ten', true, false, null, [], {}, '12.5 ft', '300 mm', '1e9 in',
];

/** Angles that are valid numbers but large or at the limit (deg). */
export const ODD_ANGLES: readonly Json[] = [89, -89, 89.999999, 90, -90, 360, 720, -359.9, 1e6, 1e-12, 45, 180, '89 deg', '1.5707963 rad', 3600, 45.0002, 0.0004, 359.9996, 90.0005];

export type Mutation =
  | { readonly op: 'delete'; readonly at: number }
  | { readonly op: 'duplicate'; readonly at: number; readonly item: number }
  | { readonly op: 'odd-value'; readonly at: number; readonly value: number }
  | { readonly op: 'scale'; readonly at: number; readonly factor: number }
  | { readonly op: 'swap-units' }
  | { readonly op: 'move-attachment'; readonly at: number; readonly fraction: number; readonly member: number }
  | { readonly op: 'change-ref'; readonly at: number; readonly to: number }
  | { readonly op: 'sides'; readonly at: number; readonly sides: number }
  | { readonly op: 'angle'; readonly at: number; readonly value: number }
  | { readonly op: 'rise-89'; readonly at: number }
  | { readonly op: 'wall-near-radius'; readonly at: number; readonly fraction: number }
  | { readonly op: 'empty'; readonly at: number; readonly list: boolean }
  | { readonly op: 'clone'; readonly at: number }
  | { readonly op: 'spring-base'; readonly stiffness: number }
  | { readonly op: 'analysis'; readonly key: string; readonly value: Json }
  | { readonly op: 'material'; readonly key: string; readonly value: Json };

const idx = fc.nat({ max: 10_000 });
export const mutationArb: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ op: fc.constant('delete' as const), at: idx }),
  fc.record({ op: fc.constant('duplicate' as const), at: idx, item: idx }),
  { weight: 3, arbitrary: fc.record({ op: fc.constant('odd-value' as const), at: idx, value: fc.nat({ max: ODD_VALUES.length - 1 }) }) },
  fc.record({ op: fc.constant('scale' as const), at: idx, factor: fc.constantFrom(0.5, 2, 10, 0.1, 100, -1, 1e-4) }),
  fc.record({ op: fc.constant('swap-units' as const) }),
  { weight: 2, arbitrary: fc.record({ op: fc.constant('move-attachment' as const), at: idx, fraction: fc.constantFrom(0, 0.5, 1, 1.0000001, 0.999999, 1.5, 0.01), member: idx }) },
  fc.record({ op: fc.constant('change-ref' as const), at: idx, to: idx }),
  fc.record({ op: fc.constant('sides' as const), at: idx, sides: fc.constantFrom(8, 12, 16, 7, 4, 0) }),
  fc.record({ op: fc.constant('angle' as const), at: idx, value: fc.nat({ max: ODD_ANGLES.length - 1 }) }),
  fc.record({ op: fc.constant('rise-89' as const), at: idx }),
  fc.record({ op: fc.constant('wall-near-radius' as const), at: idx, fraction: fc.constantFrom(0.999999, 0.9, 0.5, 1, 0.99999999999) }),
  fc.record({ op: fc.constant('empty' as const), at: idx, list: fc.boolean() }),
);

const materialArb = fc.record({
  op: fc.constant('material' as const),
  key: fc.constantFrom('E', 'G', 'density', 'poissonRatio', 'yieldStrength'),
  value: fc.constantFrom<Json>(0.3, 0.5, '1 ksi', '1e-6 ksi', '200000 MPa', '62.5 pcf', '1000 kg/m3', '20000 kg/m3', 490, 7850, 1e-9),
});

/** Mutations that mostly keep the input valid but odd: the analysis side of the promise. */
export const oddButValidArb: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ op: fc.constant('scale' as const), at: idx, factor: fc.constantFrom(0.5, 2, 10, 0.1, 3, 0.01) }),
  fc.record({ op: fc.constant('move-attachment' as const), at: idx, fraction: fc.constantFrom(0, 0.5, 1, 0.999999, 0.01, 1e-9), member: idx }),
  fc.record({ op: fc.constant('angle' as const), at: idx, value: fc.nat({ max: ODD_ANGLES.length - 1 }) }),
  fc.record({ op: fc.constant('rise-89' as const), at: idx }),
  fc.record({ op: fc.constant('wall-near-radius' as const), at: idx, fraction: fc.constantFrom(0.999999, 0.9, 0.01, 1e-6) }),
  fc.record({ op: fc.constant('sides' as const), at: idx, sides: fc.constantFrom(8, 12, 16) }),
  fc.record({ op: fc.constant('clone' as const), at: idx }),
  fc.record({ op: fc.constant('spring-base' as const), stiffness: fc.constantFrom(1e-9, 1, 1000, 1e6, 1e9) }),
  fc.record({
    op: fc.constant('analysis' as const),
    key: fc.constantFrom('segmentsPerMember', 'pDeltaMaxIterations', 'pDeltaTolerance', 'secondOrder', 'stationSpacing'),
    value: fc.constantFrom<Json>(1, 2, 200, 1e-12, 0.01, false, '0.01 ft', '100 ft'),
  }),
  materialArb,
);

/** One to three mutations per case. */
export const mutationsArb = fc.array(mutationArb, { minLength: 1, maxLength: 3 });
export const oddButValidMutationsArb = fc.array(oddButValidArb, { minLength: 1, maxLength: 4 });

const isMap = (v: unknown): v is { [k: string]: Json } => v !== null && typeof v === 'object' && !Array.isArray(v);

/** Every path in the tree (containers and leaves), in a stable order, excluding the root. */
function allPaths(root: Json): Path[] {
  const out: Path[] = [];
  const walk = (v: Json, p: Path) => {
    if (p.length > 0) out.push(p);
    if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...p, i]));
    else if (isMap(v)) for (const k of Object.keys(v)) walk(v[k]!, [...p, k]);
  };
  walk(root, []);
  return out;
}

function get(root: Json, p: Path): Json | undefined {
  let v: Json | undefined = root;
  for (const k of p) {
    if (Array.isArray(v) && typeof k === 'number') v = v[k];
    else if (isMap(v) && typeof k === 'string') v = v[k];
    else return undefined;
  }
  return v;
}

function set(root: Json, p: Path, value: Json): void {
  const parent = get(root, p.slice(0, -1));
  const k = p[p.length - 1]!;
  if (Array.isArray(parent) && typeof k === 'number') parent[k] = value;
  else if (isMap(parent) && typeof k === 'string') parent[k] = value;
}

function remove(root: Json, p: Path): void {
  const parent = get(root, p.slice(0, -1));
  const k = p[p.length - 1]!;
  if (Array.isArray(parent) && typeof k === 'number') parent.splice(k, 1);
  else if (isMap(parent) && typeof k === 'string') delete parent[k];
}

const pick = <T>(xs: readonly T[], n: number): T | undefined => (xs.length === 0 ? undefined : xs[n % xs.length]);
const lastKey = (p: Path) => p[p.length - 1];

/** Paths whose value is a number or a string that may be a quantity. */
const scalarPaths = (root: Json) => allPaths(root).filter((p) => { const v = get(root, p); return typeof v === 'number' || typeof v === 'string'; });
const keyPaths = (root: Json, keys: readonly string[]) => allPaths(root).filter((p) => keys.includes(String(lastKey(p))));
const attachmentPaths = (root: Json) => allPaths(root).filter((p) => p.length === 3 && p[0] === 'attachments' && typeof p[2] === 'number');
const sectionPaths = (root: Json) => allPaths(root).filter((p) => lastKey(p) === 'section' && isMap(get(root, p)));
const armPaths = (root: Json) => allPaths(root).filter((p) => p.length === 3 && p[0] === 'structure' && p[1] === 'arms' && typeof p[2] === 'number');

function numberOf(v: Json | undefined): number | undefined {
  if (typeof v === 'number') return v;
  if (typeof v === 'string' && /^\s*[-+]?\d/.test(v)) return parseFloat(v);
  return undefined;
}

/** Applies one mutation in place; returns a short description for the failure report. */
export function applyMutation(root: Json, m: Mutation): string {
  switch (m.op) {
    case 'delete': {
      const p = pick(allPaths(root), m.at);
      if (!p) return 'delete: nothing';
      remove(root, p);
      return `delete ${p.join('.')}`;
    }
    case 'duplicate': {
      const lists = allPaths(root).filter((p) => Array.isArray(get(root, p)) && (get(root, p) as Json[]).length > 0);
      const p = pick(lists, m.at);
      if (!p) return 'duplicate: no list';
      const list = get(root, p) as Json[];
      const i = m.item % list.length;
      list.splice(i + 1, 0, structuredClone(list[i]!));
      return `duplicate ${p.join('.')}[${i}]`;
    }
    case 'odd-value': {
      const p = pick(scalarPaths(root), m.at);
      if (!p) return 'odd-value: nothing';
      set(root, p, structuredClone(ODD_VALUES[m.value]!));
      return `${p.join('.')} = ${JSON.stringify(ODD_VALUES[m.value])}`;
    }
    case 'scale': {
      const nums = scalarPaths(root).filter((p) => numberOf(get(root, p)) !== undefined);
      const p = pick(nums, m.at);
      if (!p) return 'scale: nothing';
      const v = get(root, p)!;
      const n = numberOf(v)!;
      const unit = typeof v === 'string' ? v.replace(/^\s*[-+]?[\d.]+(?:[eE][-+]?\d+)?\s*/, '') : '';
      set(root, p, unit === '' ? n * m.factor : `${n * m.factor} ${unit}`);
      return `${p.join('.')} x ${m.factor}`;
    }
    case 'swap-units': {
      if (!isMap(root)) return 'swap-units: no root';
      root.units = root.units === 'si' ? 'us' : 'si';
      return `units = ${String(root.units)}`;
    }
    case 'move-attachment': {
      const p = pick(attachmentPaths(root), m.at);
      if (!p) return 'move-attachment: none';
      const a = get(root, p);
      if (!isMap(a)) return 'move-attachment: not a map';
      const arms = (get(root, ['structure', 'arms']) ?? []) as Json[];
      const members: { on: string; length: Json | undefined }[] = [{ on: 'pole', length: get(root, ['structure', 'pole', 'height']) }];
      if (Array.isArray(arms)) for (const arm of arms) if (isMap(arm)) members.push({ on: String(arm.id), length: arm.length });
      const target = pick(members, m.member)!;
      const L = numberOf(target.length ?? null) ?? 10;
      a.on = target.on;
      a.position = L * m.fraction;
      return `${p.join('.')} -> ${target.on} at ${m.fraction} of its length`;
    }
    case 'change-ref': {
      const p = pick(keyPaths(root, ['id', 'on']), m.at);
      if (!p) return 'change-ref: none';
      const ids = keyPaths(root, ['id']).map((q) => get(root, q));
      const choices: Json[] = [...ids.filter((x): x is Json => x !== undefined), 'pole', 'A9', 'Pole', '', 0, 'x@wind-000', 'wind-045'];
      const to = pick(choices, m.to)!;
      set(root, p, to);
      return `${p.join('.')} = ${JSON.stringify(to)}`;
    }
    case 'sides': {
      const p = pick(sectionPaths(root), m.at);
      if (!p) return 'sides: none';
      const s = get(root, p) as { [k: string]: Json };
      // Turn a round tube into a multisided one (and keep a multisided one so), same sizes.
      const rename = (from: string, to: string) => { if (from in s) { s[to] = s[from]!; delete s[from]; } };
      rename('rootDiameter', 'rootAcrossFlats');
      rename('tipDiameter', 'tipAcrossFlats');
      s.shape = 'multisided';
      s.sides = m.sides;
      return `${p.join('.')}: multisided, ${m.sides} sides`;
    }
    case 'angle': {
      // Angles also go into the list of added wind directions, where near-duplicates matter.
      const added = get(root, ['loads', 'wind', 'directions', 'add']);
      const addPaths: Path[] = Array.isArray(added) ? [...added.keys()].map((k) => ['loads', 'wind', 'directions', 'add', k]) : [];
      const p = pick([...keyPaths(root, ['direction', 'rise', 'faceDirection']).filter((q) => typeof get(root, q) !== 'object'), ...addPaths], m.at);
      if (!p) return 'angle: none';
      set(root, p, ODD_ANGLES[m.value]!);
      return `${p.join('.')} = ${JSON.stringify(ODD_ANGLES[m.value])}`;
    }
    case 'rise-89': {
      const p = pick(armPaths(root), m.at);
      if (!p) return 'rise-89: no arm';
      const arm = get(root, p) as { [k: string]: Json };
      arm.rise = '89 deg';
      return `${p.join('.')}.rise = 89 deg`;
    }
    case 'wall-near-radius': {
      const p = pick(sectionPaths(root), m.at);
      if (!p) return 'wall: none';
      const s = get(root, p) as { [k: string]: Json };
      const root_ = numberOf(s.rootDiameter ?? s.rootAcrossFlats ?? null);
      const tip = numberOf(s.tipDiameter ?? s.tipAcrossFlats ?? null);
      const taper = numberOf(s.taper ?? null);
      // Bare numbers are in consistent units (in, in/ft and ft; or mm, mm/m and m), so the tip follows.
      const member = get(root, p.slice(0, -1)) as { [k: string]: Json };
      const length = numberOf(member.length ?? member.height ?? null);
      let smallest = tip ?? root_;
      if (tip === undefined && root_ !== undefined && taper !== undefined && length !== undefined) smallest = root_ - taper * length;
      if (smallest === undefined || !(smallest > 0)) return 'wall: no size';
      s.wall = (smallest / 2) * m.fraction;
      return `${p.join('.')}.wall = ${m.fraction} of the radius`;
    }
    case 'clone': {
      // A copy of an arm or an attachment under a new id: two members or loads at one place.
      const p = pick([...armPaths(root), ...attachmentPaths(root)], m.at);
      if (!p) return 'clone: none';
      const list = get(root, p.slice(0, -1)) as Json[];
      const copy = structuredClone(get(root, p)) as { [k: string]: Json };
      copy.id = `${String(copy.id)}-copy`;
      list.push(copy);
      return `clone ${p.join('.')}`;
    }
    case 'spring-base': {
      const pole = get(root, ['structure', 'pole']);
      if (!isMap(pole)) return 'spring-base: no pole';
      pole.base = { fixity: 'rotational-spring', rotationalStiffness: m.stiffness };
      return `rotational-spring base, ${m.stiffness}`;
    }
    case 'analysis': {
      if (!isMap(root)) return 'analysis: no root';
      const a = isMap(root.analysis) ? root.analysis : (root.analysis = {});
      a[m.key] = structuredClone(m.value);
      return `analysis.${m.key} = ${JSON.stringify(m.value)}`;
    }
    case 'material': {
      const st = get(root, ['structure']);
      if (!isMap(st)) return 'material: no structure';
      const mat = isMap(st.material) ? st.material : (st.material = {});
      mat[m.key] = structuredClone(m.value);
      return `structure.material.${m.key} = ${JSON.stringify(m.value)}`;
    }
    case 'empty': {
      const containers = allPaths(root).filter((p) => typeof get(root, p) === 'object' && get(root, p) !== null);
      const p = pick(containers, m.at);
      if (!p) return 'empty: none';
      set(root, p, m.list ? [] : {});
      return `${p.join('.')} = ${m.list ? '[]' : '{}'}`;
    }
  }
}
