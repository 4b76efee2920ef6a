// Placing a concentrated force that acts at an offset from a member axis: an element point
// force on the axis at the member position, plus the point moment r × F of the offset
// (statically equivalent to the force at the offset point, for a rigid attachment bracket).
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { locateOnMember } from '../model/locate.ts';
import { cross, norm, scale } from '../model/vec3.ts';
import type { AppliedLoad, LoadOrigin } from './load-types.ts';

/** Below this a force or moment component is zero (N, N*m): avoids direction vectors of round-off. */
const NEGLIGIBLE = 1e-9;

export function forceWithOffset(model: FrameModel, member: string, s_m: number, F_N: Vec3, r_m: Vec3, origin: LoadOrigin): AppliedLoad[] {
  const { element, a_m } = locateOnMember(model, member, s_m);
  const out: AppliedLoad[] = [];
  const f = norm(F_N);
  if (f > NEGLIGIBLE) {
    out.push({ kind: 'point-force', element, axes: 'global', direction: scale(F_N, 1 / f), value: f, a_m, origin });
  }
  const M = cross(r_m, F_N);
  const m = norm(M);
  if (m > NEGLIGIBLE) {
    out.push({ kind: 'point-moment', element, axes: 'global', direction: scale(M, 1 / m), value: m, a_m, origin: { source: `${origin.source} (offset moment r × F)` } });
  }
  return out;
}
