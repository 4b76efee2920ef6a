// Turns a polebook FrameModel plus nodal loads into a CalculiX (ccx 2.20) input deck.
// Choices, each measured on closed forms in tests/reference/calculix-harness.test.ts:
// - B32R beams (ccx expands them into 20-node solids) with SECTION=PIPE fitted to A and I.
// - Orthotropic material, all Poisson ratios 0, true shear modulus G, material axis 1 along
//   each member: with an isotropic material the rigid ties that ccx puts at supports, joints,
//   section changes and nodal moments stiffen the frame by about 1 % (prismatic cantilever)
//   to 15 % (segmented taper) (measured on this machine, ../shared/STACK-NOTES.md).
// - The beam normal is given explicitly per element (ccx's default is parallel to a vertical pole).
// - Rigid offsets become short beams with the same tube and a 1e4 times stiffer material,
//   checked on offset cantilevers in closed form. (*RIGID BODY on beam nodes was tried and
//   stopped ccx 2.20 with "*ERROR in cascade", so it is not offered.)
// - Nodal moments become force couples on stiff stubs; rotations are read from load-free probe
//   stubs (both explained where they are written below).
// Frame node k is ccx node k + 1; generated nodes follow the frame nodes.
import type { FrameElement, FrameModel, Vec3 } from '../../../src/model/frame.ts';
import type { NodalLoad } from '../../../src/loads/load-types.ts';
import { pipeFromSection } from './pipe-from-section.ts';
import { add, cross, norm, perpendicularIn, anyPerpendicular, scale, sub, unit } from './vec3.ts';

export type MaterialModel = 'orthotropic-zero-poisson' | 'isotropic';

export interface CalculixDeckOptions {
  /** B32R elements per frame element (quadratic elements; the frame's exact field is cubic). */
  readonly subdivisions?: number;
  /** Young's and shear moduli of offset stubs are this many times the member's. */
  readonly stubStiffnessFactor?: number;
  /** 'isotropic' (Poisson 0.3) exists only to measure the stiffening trap; never use it to compare. */
  readonly material?: MaterialModel;
  /** Length of the stiff stubs that turn a nodal moment into a force couple, and of rotation probes. */
  readonly coupleArm_m?: number;
  /** Frame nodes whose rotations are wanted (each gets two load-free stiff probe stubs). */
  readonly rotationProbes?: readonly number[];
}

export const DEFAULT_DECK_OPTIONS: Required<CalculixDeckOptions> = {
  subdivisions: 4,
  stubStiffnessFactor: 1e4,
  material: 'orthotropic-zero-poisson',
  coupleArm_m: 1,
  rotationProbes: [],
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

export function writeCalculixInput(
  model: FrameModel,
  loads: readonly NodalLoad[],
  options: CalculixDeckOptions = {},
): string {
  return buildCalculixDeck(model, loads, options).deck;
}

/** The deck and where its rotation probes are. */
export function buildCalculixDeck(
  model: FrameModel,
  loads: readonly NodalLoad[],
  options: CalculixDeckOptions = {},
): { deck: string; probes: RotationProbe[] } {
  const opt = { ...DEFAULT_DECK_OPTIONS, ...options };
  if (!Number.isInteger(opt.subdivisions) || opt.subdivisions < 1) {
    throw new Error('CalculiX harness: subdivisions must be a positive integer');
  }
  const nodeLines: string[] = [];
  let nextNode = model.nodes.length + 1;
  let nextElement = 1;
  const newNode = (p: Vec3): number => {
    const id = nextNode++;
    nodeLines.push(`${id}, ${field(p[0])}, ${field(p[1])}, ${field(p[2])}`);
    return id;
  };
  for (const n of model.nodes) nodeLines.push(`${ccxNodeId(n.id)}, ${field(n.xyz_m[0])}, ${field(n.xyz_m[1])}, ${field(n.xyz_m[2])}`);

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
  // One elset per straight run, with its own orientation (material axis 1 along the run) and normal.
  const writeRun = (
    beam: Beam,
    pieces: number,
    el: Pick<FrameElement, 'E_Pa' | 'G_Pa' | 'A_m2' | 'Iy_m4' | 'Iz_m4' | 'J_m4'>,
    normal: Vec3,
  ): void => {
    const setName = `EB${++setCount}`;
    const axis = unit(sub(beam.xyzB, beam.xyzA));
    const elementLines: string[] = [];
    let prev = beam.a;
    for (let k = 1; k <= pieces; k++) {
      const pEnd = add(beam.xyzA, scale(sub(beam.xyzB, beam.xyzA), k / pieces));
      const pMid = add(beam.xyzA, scale(sub(beam.xyzB, beam.xyzA), (k - 0.5) / pieces));
      const mid = newNode(pMid);
      const end = k === pieces ? beam.b : newNode(pEnd);
      elementLines.push(`${nextElement++}, ${prev}, ${mid}, ${end}`);
      prev = end;
    }
    out.push(`*ELEMENT, TYPE=B32R, ELSET=${setName}`, ...elementLines);
    const pipe = pipeFromSection(el.A_m2, el.Iy_m4, el.Iz_m4, el.J_m4);
    const mat = materialFor(el.E_Pa, el.G_Pa);
    const orient = `OR${setCount}`;
    sections.push(`*ORIENTATION, NAME=${orient}, SYSTEM=RECTANGULAR`);
    sections.push([...axis, ...normal].map(field).join(', '));
    sections.push(`*BEAM SECTION, ELSET=${setName}, MATERIAL=${mat}, SECTION=PIPE, ORIENTATION=${orient}`);
    sections.push(`${field(pipe.outerRadius_m)}, ${field(pipe.thickness_m)}`);
    sections.push(normal.map(field).join(', '));
  };

  for (const el of model.elements) {
    const ni = model.nodes[el.i];
    const nj = model.nodes[el.j];
    if (ni === undefined || nj === undefined) throw new Error(`CalculiX harness: element ${el.id} has a missing node`);
    const endI = add(ni.xyz_m, el.offsetI_m);
    const endJ = add(nj.xyz_m, el.offsetJ_m);
    const axis = sub(endJ, endI);
    const localY = perpendicularIn(axis, el.refVector);
    const endNode = (frameNode: number, nodeXyz: Vec3, offset: Vec3, end: Vec3): number => {
      if (norm(offset) === 0) return ccxNodeId(frameNode);
      const id = newNode(end);
      const stub: Beam = { a: ccxNodeId(frameNode), b: id, xyzA: nodeXyz, xyzB: end };
      const k = opt.stubStiffnessFactor;
      writeRun(stub, 1, { ...el, E_Pa: el.E_Pa * k, G_Pa: el.G_Pa * k }, anyPerpendicular(offset));
      return id;
    };
    const a = endNode(el.i, ni.xyz_m, el.offsetI_m, endI);
    const b = endNode(el.j, nj.xyz_m, el.offsetJ_m, endJ);
    writeRun({ a, b, xyzA: endI, xyzB: endJ }, opt.subdivisions, el, localY);
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
  const cload: string[] = [];
  const force = (node: number, F: Vec3): void =>
    F.forEach((v, d) => {
      if (v !== 0) cload.push(`${node}, ${d + 1}, ${field(v)}`);
    });
  for (const load of loads) {
    if (load.kind !== 'nodal') throw new Error('CalculiX harness: only nodal loads are compared');
    const node = model.nodes[load.node];
    if (node === undefined) throw new Error(`CalculiX harness: load on missing node ${load.node}`);
    force(ccxNodeId(load.node), load.F_N);
    if (norm(load.M_Nm) === 0) continue;
    // A nodal moment becomes a couple: a stiff stub of length d along a (a perpendicular to M)
    // carries F = (M x a)/d at its far end and -F at the node, so (d a) x F = M. ccx's own
    // nodal moments on beams not parallel to a global axis were measured 4-26 % wrong.
    const a = anyPerpendicular(load.M_Nm);
    const d = opt.coupleArm_m;
    const far = newNode(add(node.xyz_m, scale(a, d)));
    const el = model.elements.find((e) => e.i === load.node || e.j === load.node);
    if (el === undefined) throw new Error(`CalculiX harness: moment on node ${load.node} that no element reaches`);
    const k = opt.stubStiffnessFactor;
    writeRun({ a: ccxNodeId(load.node), b: far, xyzA: node.xyz_m, xyzB: add(node.xyz_m, scale(a, d)) }, 1,
      { ...el, E_Pa: el.E_Pa * k, G_Pa: el.G_Pa * k }, unit(load.M_Nm));
    const F = scale(cross(load.M_Nm, a), 1 / d);
    force(far, F);
    force(ccxNodeId(load.node), scale(F, -1));
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
      const k = opt.stubStiffnessFactor;
      writeRun({ a: ccxNodeId(frameNode), b: far, xyzA: node.xyz_m, xyzB: add(node.xyz_m, scale(direction, d)) }, 1,
        { ...el, E_Pa: el.E_Pa * k, G_Pa: el.G_Pa * k }, anyPerpendicular(direction));
      probes.push({ frameNode, ccxNode: far, direction, length_m: d });
    }
  }
  const frameIds = [...model.nodes.map((n) => ccxNodeId(n.id)), ...probes.map((p) => p.ccxNode)];
  const frameSet: string[] = [];
  for (let k = 0; k < frameIds.length; k += 12) frameSet.push(frameIds.slice(k, k + 12).join(', '));

  const deck = [
    '** Generated by polebook tests/reference/calculix/write-input.ts (SI units: m, N, Pa)',
    '*NODE, NSET=NALL',
    ...nodeLines,
    ...out,
    '*NSET, NSET=NPRINT',
    ...frameSet,
    ...sections,
    ...(boundary.length > 0 ? ['*BOUNDARY', ...boundary] : []),
    '*STEP',
    '*STATIC',
    ...(cload.length > 0 ? ['*CLOAD', ...cload] : []),
    '*NODE PRINT, NSET=NPRINT',
    'U',
    '*END STEP',
    '',
  ].join('\n');
  return { deck, probes };
}
