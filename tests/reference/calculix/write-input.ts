// Turns a polebook FrameModel plus nodal loads into a CalculiX (ccx 2.20) input deck.
// Choices, each measured on closed forms in tests/reference/calculix-harness.test.ts:
// - B32R beams (ccx expands them into 20-node solids) with SECTION=PIPE fitted to A and I.
// - Orthotropic material, all Poisson ratios 0, true shear modulus G, material axis 1 along
//   each member: with an isotropic material the rigid ties that ccx puts at supports, joints,
//   section changes and nodal moments stiffen the frame by about 1 % (prismatic cantilever)
//   to 15 % (segmented taper) (measured on this machine with CalculiX 2.x from Debian).
// - The beam normal is given explicitly per element (ccx's default is parallel to a vertical pole).
// - Rigid offsets become short beams with the same tube and a 1e4 times stiffer material,
//   checked on offset cantilevers in closed form. (*RIGID BODY on beam nodes was tried and
//   stopped ccx 2.20 with "*ERROR in cascade", so it is not offered.)
// - Nodal moments become force couples on stiff stubs; rotations are read from load-free probe
//   stubs (both explained where they are written below).
// - Element loads (distributed, point force, point moment) are written as concentrated loads on ccx
//   nodes placed along the element (see lumpElementLoads below); ccx's own *DLOAD on beams takes
//   only a uniform load over a whole element in a section direction (P1, P2), no axial, linearly
//   varying or partial load.
// Frame node k is ccx node k + 1; generated nodes follow the frame nodes.
import type { FrameElement, FrameModel, Vec3 } from '../../../src/model/frame.ts';
import type { AppliedLoad, DistributedLoad, ElementPointLoad } from '../../../src/loads/load-types.ts';
import { pipeFromSection, pipeWithTorsionFactor } from './pipe-from-section.ts';
import type { PointForce } from './statics.ts';
import { add, cross, norm, perpendicularIn, anyPerpendicular, scale, sub, unit } from './vec3.ts';

export type MaterialModel = 'orthotropic-zero-poisson' | 'isotropic';

export interface CalculixDeckOptions {
  /** B32R elements per frame element (quadratic elements; the frame's exact field is cubic). With
   * element loads, the clear length is first cut at every load position and each part gets
   * ceil(subdivisions x its share of the length) elements. */
  readonly subdivisions?: number;
  /** Young's and shear moduli of offset stubs are this many times the member's. */
  readonly stubStiffnessFactor?: number;
  /** 'isotropic' (Poisson 0.3) exists only to measure the stiffening trap; never use it to compare. */
  readonly material?: MaterialModel;
  /** Length of the stiff stubs that turn a nodal moment into a force couple, and of rotation probes. */
  readonly coupleArm_m?: number;
  /** Frame nodes whose rotations are wanted (each gets two load-free stiff probe stubs). */
  readonly rotationProbes?: readonly number[];
  /**
   * 'refuse' (default): only round annuli (J = 2 I). 'scale-shear-modulus': a section with J != 2 I
   * (a multisided tube) gets the annulus of the same A and I, and its shear modulus is scaled by
   * J / (2 I) so the torsional stiffness G J matches (pipe-from-section.ts says what else that moves).
   */
  readonly torsion?: 'refuse' | 'scale-shear-modulus';
  /** Geometrically nonlinear step (*STEP, NLGEOM), loads keeping their global direction. */
  readonly nlgeom?: boolean;
  /** Print the translations of every ccx node (for statics in the deformed configuration). */
  readonly printAllNodes?: boolean;
}

export const DEFAULT_DECK_OPTIONS: Required<CalculixDeckOptions> = {
  subdivisions: 4,
  stubStiffnessFactor: 1e4,
  material: 'orthotropic-zero-poisson',
  coupleArm_m: 1,
  rotationProbes: [],
  torsion: 'refuse',
  nlgeom: false,
  printAllNodes: false,
};

/** Frame node id -> ccx node id. */
export const ccxNodeId = (frameNode: number): number => frameNode + 1;

/** ccx rejects numeric fields longer than 20 characters: 12 significant digits fit. */
export function field(x: number): string {
  if (!Number.isFinite(x)) throw new Error(`CalculiX harness: non-finite number ${x}`);
  if (x === 0) return '0';
  const s = x.toExponential(11);
  if (s.length > 20) throw new Error(`CalculiX harness: field too long: ${s}`);
  return s;
}

interface Beam {
  readonly a: number; // ccx node ids
  readonly b: number;
  readonly xyzA: Vec3;
  readonly xyzB: Vec3;
}

/**
 * A load-free stiff stub from a frame node: it moves rigidly with the node, so its far end gives
 * the node's rotation (ccx prints no rotations for expanded beams): u_far - u_node = d theta x dir.
 */
export interface RotationProbe {
  readonly frameNode: number;
  readonly ccxNode: number;
  readonly direction: Vec3;
  readonly length_m: number;
}

/** Positions along an element's clear length closer than this are one ccx node (m). */
const SAME_POSITION_M = 1e-6;

export function writeCalculixInput(
  model: FrameModel,
  loads: readonly AppliedLoad[],
  options: CalculixDeckOptions = {},
): string {
  return buildCalculixDeck(model, loads, options).deck;
}

/** Element local axes as polebook defines them (src/model/frame.ts): x from end i to end j after
 * offsets, y in the plane of x and refVector, z = x cross y. */
function localAxes(axis: Vec3, refVector: Vec3): { x: Vec3; y: Vec3; z: Vec3 } {
  const x = unit(axis);
  const y = perpendicularIn(x, refVector);
  return { x, y, z: cross(x, y) };
}

/**
 * The positions along an element (0..L) where ccx must have a node: both ends, every point load and
 * both ends of every distributed load; each part between them cut into ceil(n x part / L) pieces.
 */
export function piecePositions(L: number, loadPositions: readonly number[], n: number): number[] {
  const must = [0, L, ...loadPositions.map((a) => Math.min(Math.max(a, 0), L))].sort((p, q) => p - q);
  const cuts: number[] = [];
  for (const p of must) if (cuts.length === 0 || p - cuts[cuts.length - 1]! > SAME_POSITION_M) cuts.push(p);
  cuts[cuts.length - 1] = L;
  const out = [0];
  for (let k = 1; k < cuts.length; k++) {
    const a = cuts[k - 1]!;
    const b = cuts[k]!;
    const pieces = Math.max(1, Math.ceil((n * (b - a)) / L - 1e-9));
    for (let p = 1; p <= pieces; p++) out.push(p === pieces ? b : a + ((b - a) * p) / pieces);
  }
  return out;
}

/**
 * Consistent nodal forces of a linearly varying line load on one quadratic (three-node) beam element
 * of length h with intensity w0 at its start and w1 at its end: integrals of the quadratic shape
 * functions N1 = (1-s)(1-2s), N2 = 4s(1-s), N3 = s(2s-1) times w: [w0 h/6, (w0 + w1) h/3, w1 h/6].
 * They are statically equivalent (sum (w0 + w1) h/2, moment about the start h^2 (w0/6 + w1/3), as the
 * trapezoid). The element's displacement field is then exact in the limit of fine subdivision only;
 * the residual discretisation error is measured in calculix-harness.test.ts.
 */
export function quadraticLineLoad(w0: number, w1: number, h: number): [number, number, number] {
  return [(w0 * h) / 6, ((w0 + w1) * h) / 3, (w1 * h) / 6];
}

/** The deck, where its rotation probes are, and every concentrated force it applies (for statics). */
export function buildCalculixDeck(
  model: FrameModel,
  loads: readonly AppliedLoad[],
  options: CalculixDeckOptions = {},
): { deck: string; probes: RotationProbe[]; pointForces: PointForce[] } {
  const opt = { ...DEFAULT_DECK_OPTIONS, ...options };
  if (!Number.isInteger(opt.subdivisions) || opt.subdivisions < 1) {
    throw new Error('CalculiX harness: subdivisions must be a positive integer');
  }
  const nodeLines: string[] = [];
  const nodeXyz = new Map<number, Vec3>();
  let nextNode = model.nodes.length + 1;
  let nextElement = 1;
  const newNode = (p: Vec3): number => {
    const id = nextNode++;
    nodeLines.push(`${id}, ${field(p[0])}, ${field(p[1])}, ${field(p[2])}`);
    nodeXyz.set(id, p);
    return id;
  };
  for (const n of model.nodes) {
    nodeLines.push(`${ccxNodeId(n.id)}, ${field(n.xyz_m[0])}, ${field(n.xyz_m[1])}, ${field(n.xyz_m[2])}`);
    nodeXyz.set(ccxNodeId(n.id), n.xyz_m);
  }

  const out: string[] = [];
  const sections: string[] = [];
  const materials = new Map<string, string>(); // key -> name
  const materialFor = (E: number, G: number): string => {
    const key = `${E}|${G}`;
    let name = materials.get(key);
    if (name === undefined) {
      name = `MAT${materials.size + 1}`;
      materials.set(key, name);
      sections.push(`*MATERIAL, NAME=${name}`);
      if (opt.material === 'isotropic') {
        sections.push('*ELASTIC', `${field(E)}, 0.3`);
      } else {
        // E1, E2, E3, nu12, nu13, nu23, G12, G13 / G23, temperature
        sections.push('*ELASTIC, TYPE=ENGINEERING CONSTANTS');
        sections.push(`${field(E)}, ${field(E)}, ${field(E)}, 0, 0, 0, ${field(G)}, ${field(G)}`);
        sections.push(`${field(G)}, 0`);
      }
    }
    return name;
  };
  let setCount = 0;
  type Section = Pick<FrameElement, 'E_Pa' | 'G_Pa' | 'A_m2' | 'Iy_m4' | 'Iz_m4' | 'J_m4'>;
  /** Each piece of a run: ccx nodes at its start, middle and end, and its length. */
  interface Piece {
    readonly start: number;
    readonly mid: number;
    readonly end: number;
    readonly s0: number;
    readonly s1: number;
  }
  // One elset per straight run, with its own orientation (material axis 1 along the run) and normal.
  // `positions` are distances from the run's start (first 0, last its length).
  const writeRun = (beam: Beam, positions: readonly number[], el: Section, normal: Vec3): Piece[] => {
    const setName = `EB${++setCount}`;
    const L = norm(sub(beam.xyzB, beam.xyzA));
    const axis = unit(sub(beam.xyzB, beam.xyzA));
    const at = (s: number): Vec3 => add(beam.xyzA, scale(axis, s));
    const elementLines: string[] = [];
    const pieces: Piece[] = [];
    let prev = beam.a;
    for (let k = 1; k < positions.length; k++) {
      const s0 = positions[k - 1]!;
      const s1 = k === positions.length - 1 ? L : positions[k]!;
      const mid = newNode(at((s0 + s1) / 2));
      const end = k === positions.length - 1 ? beam.b : newNode(at(s1));
      elementLines.push(`${nextElement++}, ${prev}, ${mid}, ${end}`);
      pieces.push({ start: prev, mid, end, s0, s1 });
      prev = end;
    }
    out.push(`*ELEMENT, TYPE=B32R, ELSET=${setName}`, ...elementLines);
    let pipe;
    let G = el.G_Pa;
    if (opt.torsion === 'scale-shear-modulus') {
      const fit = pipeWithTorsionFactor(el.A_m2, el.Iy_m4, el.Iz_m4, el.J_m4);
      pipe = fit.pipe;
      G *= fit.shearModulusFactor;
    } else {
      pipe = pipeFromSection(el.A_m2, el.Iy_m4, el.Iz_m4, el.J_m4);
    }
    const mat = materialFor(el.E_Pa, G);
    const orient = `OR${setCount}`;
    sections.push(`*ORIENTATION, NAME=${orient}, SYSTEM=RECTANGULAR`);
    sections.push([...axis, ...normal].map(field).join(', '));
    sections.push(`*BEAM SECTION, ELSET=${setName}, MATERIAL=${mat}, SECTION=PIPE, ORIENTATION=${orient}`);
    sections.push(`${field(pipe.outerRadius_m)}, ${field(pipe.thickness_m)}`);
    sections.push(normal.map(field).join(', '));
    return pieces;
  };
  const uniform = (L: number, n: number): number[] => Array.from({ length: n + 1 }, (_, k) => (k === n ? L : (L * k) / n));
  const stiff = (el: Section): Section => ({ ...el, E_Pa: el.E_Pa * opt.stubStiffnessFactor, G_Pa: el.G_Pa * opt.stubStiffnessFactor });

  // Concentrated forces per ccx node, written as *CLOAD and kept for the statics of the reactions.
  const forces = new Map<number, Vec3>();
  const force = (node: number, F: Vec3): void => {
    forces.set(node, add(forces.get(node) ?? [0, 0, 0], F));
  };
  // A moment becomes a couple: a stiff stub of length d along a (a perpendicular to M) carries
  // F = (M x a)/d at its far end and -F at the node, so (d a) x F = M. ccx's own nodal moments on
  // beams not parallel to a global axis were measured 4-26 % wrong.
  const couple = (node: number, M: Vec3, el: Section): void => {
    if (norm(M) === 0) return;
    const xyz = nodeXyz.get(node)!;
    const a = anyPerpendicular(M);
    const d = opt.coupleArm_m;
    const tip = add(xyz, scale(a, d));
    const far = newNode(tip);
    writeRun({ a: node, b: far, xyzA: xyz, xyzB: tip }, [0, d], stiff(el), unit(M));
    const F = scale(cross(M, a), 1 / d);
    force(far, F);
    force(node, scale(F, -1));
  };

  const elementLoads: (DistributedLoad | ElementPointLoad)[][] = model.elements.map(() => []);
  for (const load of loads) {
    if (load.kind === 'nodal') continue;
    const list = elementLoads[load.element];
    if (list === undefined) throw new Error(`CalculiX harness: load '${load.origin.source}' on missing element ${load.element}`);
    list.push(load);
  }

  for (const el of model.elements) {
    const ni = model.nodes[el.i];
    const nj = model.nodes[el.j];
    if (ni === undefined || nj === undefined) throw new Error(`CalculiX harness: element ${el.id} has a missing node`);
    const endI = add(ni.xyz_m, el.offsetI_m);
    const endJ = add(nj.xyz_m, el.offsetJ_m);
    const axis = sub(endJ, endI);
    const L = norm(axis);
    const ax = localAxes(axis, el.refVector);
    const endNode = (frameNode: number, nodeXyz: Vec3, offset: Vec3, end: Vec3): number => {
      if (norm(offset) === 0) return ccxNodeId(frameNode);
      const id = newNode(end);
      writeRun({ a: ccxNodeId(frameNode), b: id, xyzA: nodeXyz, xyzB: end }, [0, norm(offset)], stiff(el), anyPerpendicular(offset));
      return id;
    };
    const a = endNode(el.i, ni.xyz_m, el.offsetI_m, endI);
    const b = endNode(el.j, nj.xyz_m, el.offsetJ_m, endJ);
    const own = elementLoads[el.id]!;
    const positions = own.length === 0
      ? uniform(L, opt.subdivisions)
      : piecePositions(L, own.flatMap((l) => (l.kind === 'distributed' ? [l.a_m, l.b_m] : [l.a_m])), opt.subdivisions);
    const pieces = writeRun({ a, b, xyzA: endI, xyzB: endJ }, positions, el, ax.y);
    lumpElementLoads(el, L, ax, own, pieces, force, couple);
  }

  const boundary: string[] = [];
  for (const s of model.supports) {
    // Fixed rotations on a beam that is not parallel to a global axis stopped ccx 2.20
    // ("*ERROR in cascade: zero coefficient") or came out 16 % off in our trials: refuse.
    for (const el of model.elements.filter((e) => e.i === s.node || e.j === s.node)) {
      const axis = unit(sub(add(model.nodes[el.j]!.xyz_m, el.offsetJ_m), add(model.nodes[el.i]!.xyz_m, el.offsetI_m)));
      if (!axis.some((c) => Math.abs(Math.abs(c) - 1) < 1e-9)) {
        throw new Error(`CalculiX harness: element ${el.id} at support node ${s.node} is not parallel to a global axis`);
      }
    }
    if (s.springs.some((k, d) => k !== 0 && !s.fixed[d])) {
      throw new Error('CalculiX harness: support springs are not represented; compare fixed supports only');
    }
    s.fixed.forEach((isFixed, d) => {
      if (isFixed) boundary.push(`${ccxNodeId(s.node)}, ${d + 1}, ${d + 1}, 0`);
    });
  }
  for (const load of loads) {
    if (load.kind !== 'nodal') continue;
    if (model.nodes[load.node] === undefined) throw new Error(`CalculiX harness: load on missing node ${load.node}`);
    force(ccxNodeId(load.node), load.F_N);
    if (norm(load.M_Nm) === 0) continue;
    const el = model.elements.find((e) => e.i === load.node || e.j === load.node);
    if (el === undefined) throw new Error(`CalculiX harness: moment on node ${load.node} that no element reaches`);
    couple(ccxNodeId(load.node), load.M_Nm, el);
  }
  // Two probes per node, along two perpendicular directions that no member follows.
  const probes: RotationProbe[] = [];
  for (const frameNode of opt.rotationProbes) {
    const node = model.nodes[frameNode];
    const el = model.elements.find((e) => e.i === frameNode || e.j === frameNode);
    if (node === undefined || el === undefined) throw new Error(`CalculiX harness: no member at probe node ${frameNode}`);
    const a = unit([0.61, 0.37, 0.7]);
    const b = unit(cross(a, [0.2, -0.9, 0.35]));
    for (const direction of [a, b]) {
      const d = opt.coupleArm_m;
      const far = newNode(add(node.xyz_m, scale(direction, d)));
      writeRun({ a: ccxNodeId(frameNode), b: far, xyzA: node.xyz_m, xyzB: add(node.xyz_m, scale(direction, d)) }, [0, d], stiff(el), anyPerpendicular(direction));
      probes.push({ frameNode, ccxNode: far, direction, length_m: d });
    }
  }
  const frameIds = [...model.nodes.map((n) => ccxNodeId(n.id)), ...probes.map((p) => p.ccxNode)];
  const frameSet: string[] = [];
  for (let k = 0; k < frameIds.length; k += 12) frameSet.push(frameIds.slice(k, k + 12).join(', '));

  const cload: string[] = [];
  const pointForces: PointForce[] = [];
  for (const [node, F] of [...forces.entries()].sort((p, q) => p[0] - q[0])) {
    pointForces.push({ xyz_m: nodeXyz.get(node)!, F_N: F, ccxNode: node });
    F.forEach((v, d) => {
      if (v !== 0) cload.push(`${node}, ${d + 1}, ${field(v)}`);
    });
  }

  const deck = [
    '** Generated by polebook tests/reference/calculix/write-input.ts (SI units: m, N, Pa)',
    '*NODE, NSET=NALL',
    ...nodeLines,
    ...out,
    '*NSET, NSET=NPRINT',
    ...frameSet,
    ...sections,
    ...(boundary.length > 0 ? ['*BOUNDARY', ...boundary] : []),
    ...(opt.nlgeom ? ['*STEP, NLGEOM, INC=100', '*STATIC', '0.5, 1.'] : ['*STEP', '*STATIC']),
    ...(cload.length > 0 ? ['*CLOAD', ...cload] : []),
    `*NODE PRINT, NSET=${opt.printAllNodes ? 'NALL' : 'NPRINT'}`,
    'U',
    '*END STEP',
    '',
  ].join('\n');
  return { deck, probes, pointForces };
}

/**
 * Element loads of one element as concentrated loads on its ccx nodes. Directions in 'local' axes
 * are turned into global ones with the element's axes; positions are along the clear length from
 * end i (src/loads/load-types.ts). A distributed load spans whole pieces (its ends are piece ends,
 * piecePositions) and is lumped per piece by quadraticLineLoad; a point force or moment sits on the
 * piece end at its position.
 */
function lumpElementLoads(
  el: FrameElement,
  L: number,
  ax: { x: Vec3; y: Vec3; z: Vec3 },
  loads: readonly (DistributedLoad | ElementPointLoad)[],
  pieces: readonly { start: number; mid: number; end: number; s0: number; s1: number }[],
  force: (node: number, F: Vec3) => void,
  couple: (node: number, M: Vec3, el: FrameElement) => void,
): void {
  const toGlobal = (load: DistributedLoad | ElementPointLoad): Vec3 => {
    const d = load.direction;
    return load.axes === 'global' ? d : add(add(scale(ax.x, d[0]), scale(ax.y, d[1])), scale(ax.z, d[2]));
  };
  const checkPosition = (a: number, load: DistributedLoad | ElementPointLoad): number => {
    if (!(a >= -SAME_POSITION_M && a <= L + SAME_POSITION_M)) {
      throw new Error(`CalculiX harness: load '${load.origin.source}' at ${a} m outside element ${el.id} (length ${L} m)`);
    }
    return Math.min(Math.max(a, 0), L);
  };
  const nodeAt = (s: number): number => {
    for (const p of pieces) {
      if (Math.abs(p.s0 - s) <= SAME_POSITION_M) return p.start;
      if (Math.abs(p.s1 - s) <= SAME_POSITION_M) return p.end;
    }
    throw new Error(`CalculiX harness: no ccx node at ${s} m on element ${el.id}`);
  };
  for (const load of loads) {
    const dir = toGlobal(load);
    if (load.kind === 'distributed') {
      const a = checkPosition(load.a_m, load);
      const b = checkPosition(load.b_m, load);
      if (b < a) throw new Error(`CalculiX harness: load '${load.origin.source}' ends before it starts`);
      const w = (s: number): number => (b - a > 0 ? load.wA_Npm + ((load.wB_Npm - load.wA_Npm) * (s - a)) / (b - a) : 0);
      for (const p of pieces) {
        if (p.s0 < a - SAME_POSITION_M || p.s1 > b + SAME_POSITION_M) continue;
        const [f0, fm, f1] = quadraticLineLoad(w(p.s0), w(p.s1), p.s1 - p.s0);
        force(p.start, scale(dir, f0));
        force(p.mid, scale(dir, fm));
        force(p.end, scale(dir, f1));
      }
    } else if (load.kind === 'point-force') {
      force(nodeAt(checkPosition(load.a_m, load)), scale(dir, load.value));
    } else {
      couple(nodeAt(checkPosition(load.a_m, load)), scale(dir, load.value), el);
    }
  }
}
