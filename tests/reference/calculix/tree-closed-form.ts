// Closed-form displacements of a frame that is a tree of straight prismatic members fixed at
// one root, loaded by nodal forces and moments, by superposition of cantilever cases
// (beam-formula tables such as Roark's Formulas for Stress and Strain: end force P gives
// deflection P L^3/(3EI) and rotation P L^2/(2EI); end moment M gives M L^2/(2EI) and M L/(EI);
// axial N L/(EA); uniform torsion of a circular tube T L/(GJ)) and rigid-body motion
// (small rotations): each member bends as a cantilever from its root end under the loads
// beyond it, moved to its free end; every point beyond it then moves with that free end.
// Rigid offsets are rigid, so they only shape the geometry.
import type { FrameModel, Vec3 } from '../../../src/model/frame.ts';
import type { NodalLoad } from '../../../src/loads/load-types.ts';
import { add, cross, dot, scale, sub, unit, norm } from './vec3.ts';

export interface EndMotion {
  readonly u: Vec3;
  readonly theta: Vec3;
}

/** Free-end translation and rotation of a cantilever under an end force and moment (tables above). */
export function cantileverEnd(
  axis: Vec3,
  L: number,
  p: { E_Pa: number; G_Pa: number; A_m2: number; I_m4: number; J_m4: number },
  F: Vec3,
  M: Vec3,
): EndMotion {
  const x = unit(axis);
  const EI = p.E_Pa * p.I_m4;
  const Fax = dot(F, x);
  const Fperp = sub(F, scale(x, Fax));
  const Tax = dot(M, x);
  const Mperp = sub(M, scale(x, Tax));
  const u = add(add(scale(x, (Fax * L) / (p.E_Pa * p.A_m2)), scale(Fperp, L ** 3 / (3 * EI))), scale(cross(Mperp, x), L ** 2 / (2 * EI)));
  const theta = add(add(scale(cross(x, Fperp), L ** 2 / (2 * EI)), scale(Mperp, L / EI)), scale(x, (Tax * L) / (p.G_Pa * p.J_m4)));
  return { u, theta };
}

export function treeTranslations(model: FrameModel, loads: readonly NodalLoad[]): Vec3[] {
  return treeMotions(model, loads).map((m) => m.u);
}

/**
 * Translations and rotations of every node of a tree-shaped FrameModel with one fully fixed support.
 * Each element must be oriented from the root outward (end i nearer the support) and have
 * Iy = Iz (round tube): the tables above are for a section with one I.
 */
export function treeMotions(model: FrameModel, loads: readonly NodalLoad[]): EndMotion[] {
  if (model.supports.length !== 1) throw new Error('tree closed form: one support expected');
  const root = model.supports[0]!.node;
  const parentElement = new Map<number, number>(); // node -> element reaching it from the root side
  const children = new Map<number, number[]>();
  for (const el of model.elements) {
    if (el.j === root || parentElement.has(el.j)) throw new Error('tree closed form: elements must point away from the root, one parent each');
    if (Math.abs(el.Iy_m4 - el.Iz_m4) > 1e-12 * el.Iy_m4) throw new Error('tree closed form: Iy must equal Iz');
    parentElement.set(el.j, el.id);
    children.set(el.i, [...(children.get(el.i) ?? []), el.j]);
  }
  // Path from the root to each node, as element ids.
  const path = new Map<number, number[]>([[root, []]]);
  const stack = [root];
  while (stack.length > 0) {
    const n = stack.pop()!;
    for (const c of children.get(n) ?? []) {
      path.set(c, [...path.get(n)!, parentElement.get(c)!]);
      stack.push(c);
    }
  }
  if (path.size !== model.nodes.length) throw new Error('tree closed form: every node must hang from the support');
  const xyz = (n: number): Vec3 => model.nodes[n]!.xyz_m;
  const result: EndMotion[] = model.nodes.map(() => ({ u: [0, 0, 0], theta: [0, 0, 0] }));
  for (const load of loads) {
    const loadPath = path.get(load.node)!;
    for (const q of model.nodes) {
      const qPath = new Set(path.get(q.id)!);
      let u: Vec3 = [0, 0, 0];
      let theta: Vec3 = [0, 0, 0];
      for (const e of loadPath) {
        if (!qPath.has(e)) continue; // the element carries the load but does not carry q
        const el = model.elements[e]!;
        const start = add(xyz(el.i), el.offsetI_m);
        const end = add(xyz(el.j), el.offsetJ_m);
        const M = add(load.M_Nm, cross(sub(xyz(load.node), end), load.F_N));
        const motion = cantileverEnd(sub(end, start), norm(sub(end, start)), { ...el, I_m4: el.Iy_m4 }, load.F_N, M);
        u = add(u, add(motion.u, cross(motion.theta, sub(q.xyz_m, end))));
        theta = add(theta, motion.theta);
      }
      const prev = result[q.id]!;
      result[q.id] = { u: add(prev.u, u), theta: add(prev.theta, theta) };
    }
  }
  return result;
}
