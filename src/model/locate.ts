// Finding things on the frame model: the clear ends of an element (node plus rigid
// offset) and the element and distance along it for a position along a member.
import type { FrameElement, FrameModel, Vec3 } from './frame.ts';
import { add, norm, scale, sub } from './vec3.ts';

export interface ElementEnds {
  readonly endI_m: Vec3;
  readonly endJ_m: Vec3;
  /** Clear length between the ends after rigid offsets. */
  readonly length_m: number;
  /** Unit vector from end i to end j (local x). */
  readonly axis: Vec3;
}

export function elementEnds(model: FrameModel, el: FrameElement): ElementEnds {
  const endI_m = add(model.nodes[el.i].xyz_m, el.offsetI_m);
  const endJ_m = add(model.nodes[el.j].xyz_m, el.offsetJ_m);
  const d = sub(endJ_m, endI_m);
  const length_m = norm(d);
  return { endI_m, endJ_m, length_m, axis: scale(d, 1 / length_m) };
}

export interface MemberPosition {
  readonly element: number;
  /** Distance from the element's end i along its clear length. */
  readonly a_m: number;
}

/** The element holding position s_m along a member (the first one when s is on a node). */
export function locateOnMember(model: FrameModel, member: string, s_m: number): MemberPosition {
  const info = model.members.find((m) => m.id === member);
  if (!info) throw new RangeError(`no member '${member}' in the frame model`);
  const tol = 1e-9 * Math.max(1, info.length_m);
  for (const id of info.elements) {
    const el = model.elements[id];
    if (s_m >= el.sI_m - tol && s_m <= el.sJ_m + tol) {
      const L = elementEnds(model, el).length_m;
      const u = (s_m - el.sI_m) / (el.sJ_m - el.sI_m);
      return { element: id, a_m: Math.min(Math.max(u, 0), 1) * L };
    }
  }
  throw new RangeError(`position ${s_m} m is outside member ${member} (length ${info.length_m} m)`);
}
