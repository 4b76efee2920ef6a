// Resultant force and moment (about the global origin) of a list of applied loads: for
// statics checks, tests and the load summary in the package.
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { elementEnds } from '../model/locate.ts';
import { add, cross, dot, scale, sub, unit } from '../model/vec3.ts';
import { qty, type Expr } from '../calc/step.ts';
import type { AppliedLoad } from './load-types.ts';

export interface Resultant {
  readonly force_N: Vec3;
  readonly moment_Nm: Vec3;
}

/** Element local axes (see frame.ts): x along the element, y toward refVector, z = x × y. */
export function localAxes(model: FrameModel, element: number): { x: Vec3; y: Vec3; z: Vec3 } {
  const el = model.elements[element];
  const x = elementEnds(model, el).axis;
  const y = unit(sub(el.refVector, scale(x, dot(el.refVector, x))));
  return { x, y, z: cross(x, y) };
}

function toGlobal(model: FrameModel, element: number, axes: 'global' | 'local', d: Vec3): Vec3 {
  if (axes === 'global') return d;
  const { x, y, z } = localAxes(model, element);
  return add(add(scale(x, d[0]), scale(y, d[1])), scale(z, d[2]));
}

export function loadResultant(model: FrameModel, loads: readonly AppliedLoad[]): Resultant {
  let F: Vec3 = [0, 0, 0];
  let M: Vec3 = [0, 0, 0];
  for (const l of loads) {
    if (l.kind === 'nodal') {
      F = add(F, l.F_N);
      M = add(M, add(l.M_Nm, cross(model.nodes[l.node].xyz_m, l.F_N)));
      continue;
    }
    const ends = elementEnds(model, model.elements[l.element]);
    const dir = toGlobal(model, l.element, l.axes, l.direction);
    const at = (x: number): Vec3 => add(ends.endI_m, scale(ends.axis, x));
    if (l.kind === 'point-force') {
      const f = scale(dir, l.value);
      F = add(F, f);
      M = add(M, cross(at(l.a_m), f));
    } else if (l.kind === 'point-moment') {
      M = add(M, scale(dir, l.value));
    } else if (l.kind === 'distributed') {
      // Linear w(x) on [a, b]: ∫w dx = (b−a)(wA+wB)/2, ∫w x dx = (b−a)[wA(2a+b) + wB(a+2b)]/6.
      const { a_m: a, b_m: b, wA_Npm: wA, wB_Npm: wB } = l;
      const total = ((b - a) * (wA + wB)) / 2;
      const first = ((b - a) * (wA * (2 * a + b) + wB * (a + 2 * b))) / 6;
      const f = scale(dir, total);
      F = add(F, f);
      // ∫ (endI + x·axis) × dir w dx = endI × dir ∫w + axis × dir ∫w x
      M = add(M, add(cross(ends.endI_m, f), cross(ends.axis, scale(dir, first))));
    }
  }
  return { force_N: F, moment_Nm: M };
}

/**
 * A total printed with its addends: the loads grouped by their origin ("wind on pole", "wind on
 * panel N1"), each group's force component, labelled; groups that add no force (the moments of
 * offsets) are left out. The addends sum to the total exactly, so a checker can add them by hand.
 */
export function sumByOrigin(model: FrameModel, loads: readonly AppliedLoad[], component: (F: Vec3) => number): Expr {
  const groups = new Map<string, AppliedLoad[]>();
  for (const l of loads) {
    const g = groups.get(l.origin.source);
    if (g) g.push(l);
    else groups.set(l.origin.source, [l]);
  }
  const parts = [...groups].map(([source, ls]) => ({ source, v: component(loadResultant(model, ls).force_N) }));
  const big = Math.max(0, ...parts.map((p) => Math.abs(p.v)));
  const kept = parts.filter((p) => Math.abs(p.v) > 1e-9 * big);
  if (kept.length === 0) return [qty(0, 'force')];
  return kept.flatMap((p, k) => [...(k === 0 ? [] : [' + ']), qty(p.v, 'force'), ` (${p.source})`]);
}
