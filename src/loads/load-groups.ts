// The applied loads grouped by what made them (an attachment, the wind on a member, a member's
// self-weight), each group reduced to one force at one point: for the free-body diagrams. The
// force of a group is its exact sum; its point is where the group's parallel parts would act
// (the centroid of the parts weighted by their size), and the moment left about that point (from
// attachment offsets, or parts that are not parallel) is kept with it so nothing is dropped.
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { elementEnds } from '../model/locate.ts';
import { add, cross, scale, sub } from '../model/vec3.ts';
import { localAxes } from './load-resultant.ts';
import type { AppliedLoad } from './load-types.ts';

export interface LoadGroup {
  /** The loads' origin, e.g. 'panel S1', 'wind on pole'. */
  readonly source: string;
  readonly force_N: Vec3;
  /** Where the force is drawn. */
  readonly at_m: Vec3;
  /** Moment of the group about at_m (couples and offsets), global. */
  readonly moment_Nm: Vec3;
}

interface Part {
  readonly f: Vec3;
  readonly p: Vec3;
  readonly m: Vec3;
}

function globalDirection(model: FrameModel, element: number, axes: 'global' | 'local', d: Vec3): Vec3 {
  if (axes === 'global') return d;
  const { x, y, z } = localAxes(model, element);
  return add(add(scale(x, d[0]), scale(y, d[1])), scale(z, d[2]));
}

function partsOf(model: FrameModel, l: AppliedLoad): Part[] {
  if (l.kind === 'nodal') return [{ f: l.F_N, p: model.nodes[l.node].xyz_m, m: l.M_Nm }];
  const ends = elementEnds(model, model.elements[l.element]);
  const dir = globalDirection(model, l.element, l.axes, l.direction);
  const at = (x: number): Vec3 => add(ends.endI_m, scale(ends.axis, x));
  if (l.kind === 'point-force') return [{ f: scale(dir, l.value), p: at(l.a_m), m: [0, 0, 0] }];
  if (l.kind === 'point-moment') return [{ f: [0, 0, 0], p: at(l.a_m), m: scale(dir, l.value) }];
  if (l.kind !== 'distributed') return [];
  // Linear w on [a, b]: total (b - a)(wA + wB)/2 acting at its centroid.
  const { a_m: a, b_m: b, wA_Npm: wA, wB_Npm: wB } = l;
  const total = ((b - a) * (wA + wB)) / 2;
  if (total === 0) return [];
  const first = ((b - a) * (wA * (2 * a + b) + wB * (a + 2 * b))) / 6;
  return [{ f: scale(dir, total), p: at(first / total), m: [0, 0, 0] }];
}

const size = (v: Vec3): number => Math.hypot(v[0], v[1], v[2]);

/** The loads, each times its factor, grouped by origin in the order each origin first appears. */
export function loadGroups(model: FrameModel, loads: readonly { readonly load: AppliedLoad; readonly factor: number }[]): LoadGroup[] {
  const bySource = new Map<string, Part[]>();
  for (const { load, factor } of loads) {
    const list = bySource.get(load.origin.source) ?? [];
    for (const q of partsOf(model, load)) list.push({ f: scale(q.f, factor), p: q.p, m: scale(q.m, factor) });
    bySource.set(load.origin.source, list);
  }
  const out: LoadGroup[] = [];
  for (const [source, parts] of bySource) {
    // A source whose loads are all zero (no wind pressure, a weightless part) has nothing to draw.
    if (parts.length === 0) continue;
    const F = parts.reduce<Vec3>((s, q) => add(s, q.f), [0, 0, 0]);
    const weight = parts.reduce((s, q) => s + size(q.f), 0);
    const at: Vec3 = weight > 0 ? parts.reduce<Vec3>((s, q) => add(s, scale(q.p, size(q.f) / weight)), [0, 0, 0]) : parts[0]!.p;
    // Moment about `at`: each part's couple plus its force's moment arm from `at`.
    const M = parts.reduce<Vec3>((s, q) => add(s, add(q.m, cross(sub(q.p, at), q.f))), [0, 0, 0]);
    out.push({ source, force_N: F, at_m: at, moment_Nm: M });
  }
  return out;
}
