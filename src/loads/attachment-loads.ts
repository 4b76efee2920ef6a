// A force on an attachment, applied to the frame with its offset moment, and the step that
// prints the torque it puts on the member (force × lever arm about the member axis).
import { qty, type StepCollector } from '../calc/step.ts';
import type { Attachment, Design } from '../design/design.ts';
import type { FrameModel, Vec3 } from '../model/frame.ts';
import { findAxis, offsetVector } from '../model/member-axes.ts';
import { cross, dot, norm, scale } from '../model/vec3.ts';
import type { AppliedLoad } from './load-types.ts';
import { RULES } from './load-rules.ts';
import { forceWithOffset } from './place-load.ts';

/** Torques smaller than this (N*m) are not printed. */
const TINY_TORQUE_Nm = 1e-9;

export function attachmentLoads(design: Design, model: FrameModel, steps: StepCollector, a: Attachment, F_N: Vec3, what: string): AppliedLoad[] {
  const ax = findAxis(design, a.member);
  const r = offsetVector(ax, a.offset);
  const loads = forceWithOffset(model, a.member, a.position_m, F_N, r, { source: `${what} ${a.id}` });
  const f = norm(F_N);
  if (f > 0) {
    const T = dot(cross(r, F_N), ax.direction);
    if (Math.abs(T) > TINY_TORQUE_Nm) {
      const lever = T / f;
      const memberName = ax.kind === 'pole' ? 'the pole' : `arm ${ax.id}`;
      steps.add({
        description: `Torque on ${memberName} from ${what} ${a.id} (lever arm about the member axis)`,
        symbol: `T_${a.id}`,
        formula: 'T = F × e',
        substituted: [qty(f, 'force'), ' × ', qty(lever, 'section')],
        result: qty(T, 'moment'),
        source: RULES.offsetMoment,
      });
    }
  }
  return loads;
}

/** Unit vector helper for plan directions. */
export const planUnit = (angle_rad: number): Vec3 => [Math.cos(angle_rad), Math.sin(angle_rad), 0];
export const down = (W_N: number): Vec3 => scale([0, 0, -1], W_N);
