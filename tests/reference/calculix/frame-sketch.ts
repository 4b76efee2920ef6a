// Builds FrameModels by hand for the reference tests (independent of src/model/build-frame.ts).
import type { FrameElement, FrameModel, FrameNode, MemberInfo, Vec3 } from '../../../src/model/frame.ts';
import type { NodalLoad } from '../../../src/loads/load-types.ts';
import { add, norm, scale, sub } from './vec3.ts';

export interface TubeProps {
  readonly E_Pa: number;
  readonly G_Pa: number;
  readonly A_m2: number;
  readonly I_m4: number;
  readonly J_m4: number;
  readonly diameter_m: number;
}

export class FrameSketch {
  private readonly nodes: FrameNode[] = [];
  private readonly elements: FrameElement[] = [];
  private readonly memberElements = new Map<string, number[]>();

  node(xyz_m: Vec3, tag = 'node'): number {
    const id = this.nodes.length;
    this.nodes.push({ id, xyz_m, tag });
    return id;
  }

  xyz(node: number): Vec3 {
    return this.nodes[node]!.xyz_m;
  }

  element(
    member: string,
    i: number,
    j: number,
    tube: TubeProps,
    refVector: Vec3,
    offsetI_m: Vec3 = [0, 0, 0],
    offsetJ_m: Vec3 = [0, 0, 0],
  ): number {
    const id = this.elements.length;
    const list = this.memberElements.get(member) ?? [];
    const sI_m = list.reduce((s, e) => s + this.clearLength(this.elements[e]!), 0);
    const el: FrameElement = {
      id,
      member,
      i,
      j,
      E_Pa: tube.E_Pa,
      G_Pa: tube.G_Pa,
      A_m2: tube.A_m2,
      Iy_m4: tube.I_m4,
      Iz_m4: tube.I_m4,
      J_m4: tube.J_m4,
      refVector,
      offsetI_m,
      offsetJ_m,
      massPerLength_kgm: 7850 * tube.A_m2, // steel density 7850 kg/m3, typical value (unused by these tests)
      sI_m,
      sJ_m: 0,
      diameterI_m: tube.diameter_m,
      diameterJ_m: tube.diameter_m,
    };
    const withLength = { ...el, sJ_m: sI_m + this.clearLength(el) };
    this.elements.push(withLength);
    list.push(id);
    this.memberElements.set(member, list);
    return id;
  }

  /** A straight member from node `from` to point `to`, in `tubes.length` prismatic segments. */
  chain(member: string, from: number, to: Vec3, tubes: readonly TubeProps[], refVector: Vec3, offsetFirst: Vec3 = [0, 0, 0]): number {
    const start = add(this.xyz(from), offsetFirst);
    let prev = from;
    tubes.forEach((tube, k) => {
      const p = add(start, scale(sub(to, start), (k + 1) / tubes.length));
      const next = this.node(p, k === tubes.length - 1 ? `${member}-end` : 'segment');
      this.element(member, prev, next, tube, refVector, k === 0 ? offsetFirst : [0, 0, 0]);
      prev = next;
    });
    return prev;
  }

  private clearLength(el: FrameElement): number {
    return norm(sub(add(this.xyz(el.j), el.offsetJ_m), add(this.xyz(el.i), el.offsetI_m)));
  }

  build(fixedNode: number): FrameModel {
    const members: MemberInfo[] = [...this.memberElements.entries()].map(([id, elements]) => ({
      id,
      kind: id === 'pole' ? 'pole' : 'arm',
      elements,
      length_m: this.elements[elements[elements.length - 1]!]!.sJ_m,
      discontinuities_m: [],
    }));
    return {
      nodes: [...this.nodes],
      elements: [...this.elements],
      supports: [{ node: fixedNode, fixed: [true, true, true, true, true, true], springs: [0, 0, 0, 0, 0, 0] }],
      members,
      masses: [],
    };
  }
}

export function nodalLoad(node: number, F_N: Vec3, M_Nm: Vec3 = [0, 0, 0], source = 'reference test load'): NodalLoad {
  return { kind: 'nodal', node, F_N, M_Nm, origin: { source } };
}
