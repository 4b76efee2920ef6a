// Random small pole-and-arm frames for property tests (built by hand, not by build-frame.ts).
import fc from 'fast-check';
import type { AppliedLoad } from '../../src/loads/load-types.ts';
import type { FrameModel, Vec3 } from '../../src/model/frame.ts';
import { FrameBuilder, roundTube } from './frame-helpers.ts';

export interface ArmSpec {
  height: number; // fraction of the pole height
  angle: number; // plan direction, rad
  rise: number; // rad
  length: number;
  n: number;
}

export interface FrameSpec {
  poleHeight: number;
  arms: ArmSpec[];
}

export interface RandomFrame {
  model: FrameModel;
  base: number;
  /** For each arm: the pole node it hangs from, its tip node, its root offset. */
  arms: { root: number; tip: number; offset: Vec3; id: string }[];
}

const range = (lo: number, hi: number) => fc.integer({ min: 0, max: 1000 }).map((k) => lo + ((hi - lo) * k) / 1000);

export const armSpec = fc.record({
  height: range(0.4, 1),
  angle: range(0, 2 * Math.PI),
  rise: range(0, 0.3),
  length: range(2, 12),
  n: fc.integer({ min: 2, max: 5 }),
});

export const frameSpec = fc.record({
  poleHeight: range(5, 15),
  arms: fc.array(armSpec, { minLength: 1, maxLength: 3 }),
});

export function buildRandomFrame(spec: FrameSpec): RandomFrame {
  const b = new FrameBuilder();
  const base = b.node([0, 0, 0], 'base');
  b.fix(base);
  const H = spec.poleHeight;
  const poleSec = (sMid: number) => roundTube(0.4 - (0.15 * sMid) / H, 0.0064);
  // pole nodes at every arm height (heights closer than 5 cm share a node)
  const heights = [...new Set(spec.arms.map((a) => Math.round(a.height * H * 20) / 20))].sort((x, y) => x - y);
  const levels = heights.filter((z) => z > 0.1 && z < H - 0.05);
  levels.push(H);
  const nodeAt = new Map<number, number>();
  let from = base;
  let z0 = 0;
  const poleNodes: number[] = [base];
  const poleElements: number[] = [];
  for (const z of levels) {
    const before = b.elements.length;
    const ids = b.member(`pole-${z}`, 'pole', from, [0, 0, z], 2, (_k, s) => poleSec(z0 + s), { tipTag: `pole@${z}` });
    for (let e = before; e < b.elements.length; e++) poleElements.push(e);
    poleNodes.push(...ids.slice(1));
    from = ids[ids.length - 1];
    nodeAt.set(z, from);
    z0 = z;
  }
  // merge the pole pieces into one member 'pole' with s measured from the base
  b.members.splice(0, b.members.length);
  let s = 0;
  for (const e of poleElements) {
    const el = b.elements[e];
    const len = b.nodes[el.j].xyz_m[2] - b.nodes[el.i].xyz_m[2];
    b.elements[e] = { ...el, member: 'pole', sI_m: s, sJ_m: s + len };
    s += len;
  }
  b.members.push({ id: 'pole', kind: 'pole', elements: poleElements, length_m: H, discontinuities_m: levels.slice(0, -1) });
  const arms = spec.arms.map((a, k) => {
    const z = Math.max(Math.round(a.height * H * 20) / 20, levels[0]);
    const root = nodeAt.get(z) ?? nodeAt.get(levels[levels.length - 1])!;
    const rootZ = b.nodes[root].xyz_m[2];
    const dir: Vec3 = [Math.cos(a.angle) * Math.cos(a.rise), Math.sin(a.angle) * Math.cos(a.rise), Math.sin(a.rise)];
    const r = 0.15; // rigid offset to the pole face
    const offset: Vec3 = [Math.cos(a.angle) * r, Math.sin(a.angle) * r, 0];
    const tipXYZ: Vec3 = [offset[0] + dir[0] * a.length, offset[1] + dir[1] * a.length, rootZ + dir[2] * a.length];
    const id = `A${k + 1}`;
    const ids = b.member(id, 'arm', root, tipXYZ, a.n, (_e, sm) => roundTube(0.22 - (0.08 * sm) / a.length, 0.0048), {
      offsetRoot: offset,
      refVector: [0, 0, 1],
      tipTag: `arm-tip:${id}`,
    });
    return { root, tip: ids[ids.length - 1], offset, id };
  });
  return { model: b.build(), base, arms };
}

/** A value in [-m, m] on a grid of m/1000 (no denormal or vanishing magnitudes). */
const num = (m: number) => fc.integer({ min: -1000, max: 1000 }).map((k) => (k * m) / 1000);
/** A fraction in [0, 1]. */
const frac = fc.integer({ min: 0, max: 1000 }).map((k) => k / 1000);
const vec = (m: number) => fc.tuple(num(m), num(m), num(m));

/** Random loads on a frame: nodal forces/moments, partial trapezoidal loads, point forces and moments. */
export function loadsArb(model: FrameModel, horizontalOnly = false): fc.Arbitrary<AppliedLoad[]> {
  const nn = model.nodes.length;
  const ne = model.elements.length;
  const flat = (v: [number, number, number]): Vec3 => (horizontalOnly ? [v[0], v[1], 0] : v);
  const unit = (v: [number, number, number]): Vec3 => {
    const w = flat(v);
    const n = Math.hypot(...w);
    return n < 1e-6 ? [1, 0, 0] : [w[0] / n, w[1] / n, w[2] / n];
  };
  const nodalL = fc.record({ node: fc.integer({ min: 1, max: nn - 1 }), F: vec(5e3), M: vec(2e3) }).map(
    (x): AppliedLoad => ({ kind: 'nodal', node: x.node, F_N: flat(x.F), M_Nm: horizontalOnly ? [0, 0, 0] : x.M, origin: { source: 'random' } }),
  );
  const dist = fc
    .record({ e: fc.integer({ min: 0, max: ne - 1 }), t0: frac, t1: frac, d: vec(1), wA: num(2e3), wB: num(2e3), local: fc.boolean() })
    .map((x): AppliedLoad => {
      const L = clearLength(model, x.e);
      const [a, b] = [Math.min(x.t0, x.t1) * L, Math.max(x.t0, x.t1) * L];
      return { kind: 'distributed', element: x.e, axes: x.local && !horizontalOnly ? 'local' : 'global', direction: unit(x.d), wA_Npm: x.wA, wB_Npm: x.wB, a_m: a, b_m: b, origin: { source: 'random' } };
    });
  const point = fc
    .record({ e: fc.integer({ min: 0, max: ne - 1 }), t: frac, d: vec(1), v: num(4e3), moment: fc.boolean() })
    .map((x): AppliedLoad => ({
      kind: x.moment && !horizontalOnly ? 'point-moment' : 'point-force', element: x.e, axes: 'global', direction: unit(x.d), value: x.v, a_m: x.t * clearLength(model, x.e), origin: { source: 'random' },
    }));
  return fc.array(fc.oneof(nodalL, dist, point), { minLength: 1, maxLength: 6 });
}

export function clearLength(model: FrameModel, e: number): number {
  const el = model.elements[e];
  const pi = model.nodes[el.i].xyz_m;
  const pj = model.nodes[el.j].xyz_m;
  return Math.hypot(
    pj[0] + el.offsetJ_m[0] - pi[0] - el.offsetI_m[0],
    pj[1] + el.offsetJ_m[1] - pi[1] - el.offsetI_m[1],
    pj[2] + el.offsetJ_m[2] - pi[2] - el.offsetI_m[2],
  );
}
