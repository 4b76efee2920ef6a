// The frame model built from the design: the pole and each arm as chains of prismatic
// segments, rigid offsets from the pole axis to each arm root at the pole face, the base
// support, and the attachment masses.
//
// Conventions (printed in the package):
// - Nodes are numbered along members: pole base to top, then each arm root to tip, so the
//   stiffness matrix has a narrow band. An arm's root is the pole node at its attach
//   height; its first element reaches the pole face through a rigid offset (offsetI_m),
//   horizontal, of length equal to the pole's outside radius there (across flats / 2).
// - Local axes: pole elements take refVector = global X (local y = X, z = Y); arm
//   elements take the upward normal to the arm in its vertical plane (global Z for a
//   horizontal arm), so local y lies in the vertical plane of the arm and z is horizontal
//   for any rise short of vertical. Round and regular multisided tubes have Iy = Iz.
// - Segment properties: the section at the segment's mid-length (see segment-properties.ts;
//   it converged faster than the flexibility-equivalent element in the convergence study,
//   tests/model/segment-convergence.test.ts). The steel mass per length is the segment's
//   mean area times density (exact for a linear taper and constant wall).
// - Base: 'fixed' restrains all six dofs; 'spring' restrains the three translations, with
//   rotational springs on rx and ry (their own stiffnesses) and on rz when a torsional
//   stiffness is given (else rz is fixed).
import type { Attachment, Design } from '../design/design.ts';
import type { FrameElement, FrameModel, FrameNode, LumpedMass, MemberInfo, Support, Vec3 } from './frame.ts';
import { STANDARD_GRAVITY_mps2 } from './gravity.ts';
import { memberAxes, pointOnAxis, type MemberAxis } from './member-axes.ts';
import { segmentProperties, type SegmentRule } from './segment-properties.ts';
import { memberStations, type RequiredPoint, type Station } from './stations.ts';
import { diameterAt } from './taper.ts';
import { cross, norm, sub } from './vec3.ts';

export interface BuildFrameOptions {
  /** Regular segments per member (more nodes are added at attachments and arm roots). */
  readonly segmentsPerMember?: number;
  readonly segmentRule?: SegmentRule;
}

/**
 * Segments per member that keep the tip deflection of a tapered cantilever within 0.5 % of
 * the continuous taper for tapers up to a 4:1 diameter ratio (measured in
 * tests/model/segment-convergence.test.ts: worst case 0.36 % at 20 segments; 10 segments
 * give up to 1.3 % on a 4:1 arm and 0.64 % on a 2.4:1 arm). Second order: the base moment's
 * second-order increment and the tip movements within 0.2 % of 160 segments on the bundled
 * examples (tests/model/segment-convergence-second-order.test.ts).
 */
export const RECOMMENDED_SEGMENTS_PER_MEMBER = 20;

export const POLE_REF_VECTOR: Vec3 = [1, 0, 0];

/** Reference vector of an arm's elements: the upward normal to the arm axis in its vertical
 * plane. Global Z made square to the axis gives the same local y, but Z itself becomes parallel
 * to a steeply rising arm; this normal never does. */
export function armRefVector(ax: MemberAxis): Vec3 {
  const [dx, dy, dz] = ax.direction;
  const horizontal = Math.hypot(dx, dy);
  if (horizontal === 0) return [1, 0, 0];
  // + 0 turns a -0 into 0, so a horizontal arm has exactly global Z.
  return [(-dz * dx) / horizontal + 0, (-dz * dy) / horizontal + 0, horizontal];
}

/** Weight of an attachment (panel: weight per area times face area). */
export function attachmentWeight_N(a: Attachment): number {
  return a.kind === 'panel' ? a.weightPerArea_Pa * a.width_m * a.height_m : a.weight_N;
}

export function buildFrame(design: Design, opts: BuildFrameOptions = {}): FrameModel {
  const segments = opts.segmentsPerMember ?? design.analysis.segmentsPerMember;
  const rule = opts.segmentRule ?? 'mid-length';
  const axes = memberAxes(design);
  const ids = new Set<string>();
  for (const ax of axes) {
    if (ids.has(ax.id)) throw new RangeError(`member id '${ax.id}' is used twice`);
    ids.add(ax.id);
  }
  for (const a of design.attachments) {
    if (!ids.has(a.member)) throw new RangeError(`attachment ${a.id} is on member '${a.member}', which does not exist`);
  }

  const nodes: FrameNode[] = [];
  const elements: FrameElement[] = [];
  const members: MemberInfo[] = [];
  /** Node id at each station, per member, for masses and tests. */
  const stationNodes = new Map<string, { s_m: number; node: number }[]>();

  const attachmentPoints = (member: string): RequiredPoint[] =>
    design.attachments.filter((a) => a.member === member).map((a) => ({ s_m: a.position_m, tag: `attachment:${a.id}` }));

  const addMember = (ax: MemberAxis, stations: readonly Station[], rootNode: number | null, rootOffset: Vec3) => {
    const ref = ax.kind === 'pole' ? POLE_REF_VECTOR : armRefVector(ax);
    if (norm(cross(ax.direction, ref)) < 1e-3) throw new RangeError(`member ${ax.id} is parallel to its reference vector`);
    const at: { s_m: number; node: number }[] = [];
    stations.forEach((st, k) => {
      if (k === 0 && rootNode !== null) {
        at.push({ s_m: st.s_m, node: rootNode });
        return;
      }
      const id = nodes.length;
      nodes.push({ id, xyz_m: pointOnAxis(ax, st.s_m), tag: st.tags.length > 0 ? st.tags.join(',') : 'segment' });
      at.push({ s_m: st.s_m, node: id });
    });
    const elementIds: number[] = [];
    for (let k = 0; k + 1 < at.length; k++) {
      const s0 = at[k].s_m;
      const s1 = at[k + 1].s_m;
      const p = segmentProperties(ax.section, ax.length_m, s0, s1, rule);
      const id = elements.length;
      elements.push({
        id,
        member: ax.id,
        i: at[k].node,
        j: at[k + 1].node,
        E_Pa: design.material.E_Pa,
        G_Pa: design.material.G_Pa,
        A_m2: p.A_m2,
        Iy_m4: p.I_m4,
        Iz_m4: p.I_m4,
        J_m4: p.J_m4,
        refVector: ref,
        offsetI_m: k === 0 ? rootOffset : [0, 0, 0],
        offsetJ_m: [0, 0, 0],
        massPerLength_kgm: design.material.density_kgm3 * p.meanA_m2,
        sI_m: s0,
        sJ_m: s1,
        diameterI_m: diameterAt(ax.section, ax.length_m, s0),
        diameterJ_m: diameterAt(ax.section, ax.length_m, s1),
      });
      elementIds.push(id);
    }
    const disc = [...new Set([0, ax.length_m, ...stations.filter((s) => s.tags.length > 0).map((s) => s.s_m)])].sort((a, b) => a - b);
    members.push({ id: ax.id, kind: ax.kind, elements: elementIds, length_m: ax.length_m, discontinuities_m: disc });
    stationNodes.set(ax.id, at);
  };

  // Pole: base to top.
  const pole = axes[0];
  const poleRequired: RequiredPoint[] = [
    { s_m: 0, tag: 'base' },
    { s_m: pole.length_m, tag: 'pole-top' },
    ...design.arms.map((a) => ({ s_m: a.attachHeight_m, tag: `arm-root:${a.id}` })),
    ...attachmentPoints('pole'),
  ];
  addMember(pole, memberStations('pole', pole.length_m, poleRequired, segments), null, [0, 0, 0]);

  // Arms: root (a pole node, reached by a rigid offset) to tip.
  for (const ax of axes.slice(1)) {
    const rootNode = nodeAt(stationNodes, 'pole', ax.origin_m[2]);
    const offset = sub(ax.origin_m, nodes[rootNode].xyz_m);
    const required: RequiredPoint[] = [{ s_m: ax.length_m, tag: `arm-tip:${ax.id}` }, ...attachmentPoints(ax.id)];
    addMember(ax, memberStations(ax.id, ax.length_m, required, segments), rootNode, offset);
  }

  const supports: Support[] = [
    design.pole.base.kind === 'fixed'
      ? { node: 0, fixed: [true, true, true, true, true, true], springs: [0, 0, 0, 0, 0, 0] }
      : {
          node: 0,
          fixed: [true, true, true, false, false, design.pole.base.torsion_Nm_per_rad === undefined],
          springs: [0, 0, 0, design.pole.base.stiffness_Nm_per_rad, design.pole.base.stiffnessY_Nm_per_rad ?? design.pole.base.stiffness_Nm_per_rad, design.pole.base.torsion_Nm_per_rad ?? 0],
        },
  ];

  const masses: LumpedMass[] = design.attachments.map((a) => ({
    node: nodeAt(stationNodes, a.member, a.position_m),
    mass_kg: attachmentWeight_N(a) / STANDARD_GRAVITY_mps2,
    origin: `${a.kind} ${a.id}: weight / g`,
  }));

  return { nodes, elements, supports, members, masses };
}

function nodeAt(stationNodes: Map<string, { s_m: number; node: number }[]>, member: string, s_m: number): number {
  const list = stationNodes.get(member) ?? [];
  let best = -1;
  let dist = Infinity;
  for (const st of list) {
    const d = Math.abs(st.s_m - s_m);
    if (d < dist) {
      dist = d;
      best = st.node;
    }
  }
  if (best < 0) throw new RangeError(`no node on member ${member}`);
  return best;
}
