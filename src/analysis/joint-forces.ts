// The free body of a pole-arm joint: the forces and moments each member end exerts on the joint
// node (the arm's at its root at the pole face, carried to the node through the rigid offset; the
// pole's just below and just above), and the loads applied at the node itself. In equilibrium
// they sum to zero; the package prints them with that sum.
import type { AppliedLoad } from '../loads/load-types.ts';
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { localAxes } from '../loads/load-resultant.ts';
import { add, cross, scale } from '../model/vec3.ts';
import type { CombinationResult } from './analysis-types.ts';

export interface JointPart {
  /** 'arm A1 at its root', 'pole below the joint', 'pole above the joint', 'loads at the joint'. */
  readonly what: string;
  /** On the joint node, global, N. */
  readonly force_N: Vec3;
  /** On the joint node about the node, global, N m. */
  readonly moment_Nm: Vec3;
  /** The member end force in the member's local axes (on the member, N and N m, at the clear end); null for the loads. */
  readonly local: readonly number[] | null;
}

export interface JointFreeBody {
  readonly arm: string;
  readonly node: number;
  readonly parts: readonly JointPart[];
  readonly sumForce_N: Vec3;
  readonly sumMoment_Nm: Vec3;
}

function toGlobal(model: FrameModel, element: number, v: readonly number[], off: number): Vec3 {
  const { x, y, z } = localAxes(model, element);
  return add(add(scale(x, v[off]!), scale(y, v[off + 1]!)), scale(z, v[off + 2]!));
}

/** The joint where `arm` meets the pole, under one combination (its factored loads in `loads`). */
export function jointFreeBody(model: FrameModel, result: CombinationResult, arm: string, loads: readonly { readonly load: AppliedLoad; readonly factor: number }[]): JointFreeBody {
  const member = model.members.find((m) => m.id === arm);
  if (!member) throw new Error(`no member ${arm}`);
  const first = model.elements[member.elements[0]!]!;
  const node = first.i;
  const parts: JointPart[] = [];
  const endOn = (element: number, end: 'i' | 'j', what: string, offset: Vec3) => {
    const f = result.elementEndForces[element]!;
    const v = end === 'i' ? f.i : f.j;
    // On the node: the opposite of what the node exerts on the element.
    const F = scale(toGlobal(model, element, v, 0), -1);
    const M = add(scale(toGlobal(model, element, v, 3), -1), cross(offset, F));
    parts.push({ what, force_N: F, moment_Nm: M, local: [...v] });
  };
  endOn(first.id, 'i', `arm ${arm} at its root`, first.offsetI_m);
  for (const e of model.elements) {
    if (e.member !== 'pole') continue;
    if (e.j === node) endOn(e.id, 'j', 'pole below the joint', e.offsetJ_m);
    if (e.i === node) endOn(e.id, 'i', 'pole above the joint', e.offsetI_m);
  }
  // Other arms framing into the same node.
  for (const m of model.members) {
    if (m.kind !== 'arm' || m.id === arm) continue;
    const el = model.elements[m.elements[0]!]!;
    if (el.i === node) endOn(el.id, 'i', `arm ${m.id} at its root`, el.offsetI_m);
  }
  let F: Vec3 = [0, 0, 0];
  let M: Vec3 = [0, 0, 0];
  for (const { load, factor } of loads) {
    if (load.kind !== 'nodal' || load.node !== node) continue;
    F = add(F, scale(load.F_N, factor));
    M = add(M, scale(load.M_Nm, factor));
  }
  if (Math.hypot(...F) + Math.hypot(...M) > 0) parts.push({ what: 'loads applied at the joint', force_N: F, moment_Nm: M, local: null });
  const sumForce_N = parts.reduce<Vec3>((s, p) => add(s, p.force_N), [0, 0, 0]);
  const sumMoment_Nm = parts.reduce<Vec3>((s, p) => add(s, p.moment_Nm), [0, 0, 0]);
  return { arm, node, parts, sumForce_N, sumMoment_Nm };
}
