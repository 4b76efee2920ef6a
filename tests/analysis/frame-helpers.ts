// Small frames built by hand for the analysis tests (independent of src/model/build-frame.ts).
import type { AppliedLoad } from '../../src/loads/load-types.ts';
import type { FrameElement, FrameModel, FrameNode, LumpedMass, MemberInfo, Support, Vec3 } from '../../src/model/frame.ts';

export interface Section {
  E_Pa: number;
  G_Pa: number;
  A_m2: number;
  Iy_m4: number;
  Iz_m4: number;
  J_m4: number;
  massPerLength_kgm: number;
  diameter_m: number;
}

/** A round steel tube, thin-walled formulas not used: exact annulus I = π(D⁴ − d⁴)/64 (any mechanics of materials text, e.g. Gere & Goodno). */
export function roundTube(D_m: number, t_m: number, E_Pa = 200e9, G_Pa = 77e9, density_kgm3 = 7850): Section {
  const d = D_m - 2 * t_m;
  const A = (Math.PI / 4) * (D_m ** 2 - d ** 2);
  const I = (Math.PI / 64) * (D_m ** 4 - d ** 4);
  return { E_Pa, G_Pa, A_m2: A, Iy_m4: I, Iz_m4: I, J_m4: 2 * I, massPerLength_kgm: A * density_kgm3, diameter_m: D_m };
}

export class FrameBuilder {
  readonly nodes: FrameNode[] = [];
  readonly elements: FrameElement[] = [];
  readonly supports: Support[] = [];
  readonly members: MemberInfo[] = [];
  readonly masses: LumpedMass[] = [];

  node(xyz: Vec3, tag = 'node'): number {
    this.nodes.push({ id: this.nodes.length, xyz_m: xyz, tag });
    return this.nodes.length - 1;
  }

  fix(node: number, springs: [number, number, number, number, number, number] = [0, 0, 0, 0, 0, 0]): void {
    const fixed = springs.map((k) => k === 0) as unknown as Support['fixed'];
    this.supports.push({ node, fixed, springs });
  }

  /**
   * A straight member of n prismatic elements from node `from` (plus offset) to a new tip at `to`.
   * section(k) gives element k's section (k = 0 at the root). Returns the node ids root..tip.
   */
  member(
    id: string,
    kind: 'pole' | 'arm',
    from: number,
    to: Vec3,
    n: number,
    section: (k: number, sMid_m: number) => Section,
    opts: { refVector?: Vec3; offsetRoot?: Vec3; tipTag?: string; discontinuities?: number[] } = {},
  ): number[] {
    const off = opts.offsetRoot ?? [0, 0, 0];
    const p0 = this.nodes[from].xyz_m;
    const start: Vec3 = [p0[0] + off[0], p0[1] + off[1], p0[2] + off[2]];
    const d: Vec3 = [to[0] - start[0], to[1] - start[1], to[2] - start[2]];
    const L = Math.hypot(...d);
    const ref = opts.refVector ?? defaultRef(d);
    const ids = [from];
    const elems: number[] = [];
    for (let k = 0; k < n; k++) {
      const t1 = (k + 1) / n;
      const j =
        k === n - 1
          ? this.node(to, opts.tipTag ?? `${id}-tip`)
          : this.node([start[0] + d[0] * t1, start[1] + d[1] * t1, start[2] + d[2] * t1], 'segment');
      const s = section(k, ((k + 0.5) * L) / n);
      this.elements.push({
        id: this.elements.length, member: id, i: ids[ids.length - 1], j,
        E_Pa: s.E_Pa, G_Pa: s.G_Pa, A_m2: s.A_m2, Iy_m4: s.Iy_m4, Iz_m4: s.Iz_m4, J_m4: s.J_m4,
        refVector: ref, offsetI_m: k === 0 ? off : [0, 0, 0], offsetJ_m: [0, 0, 0],
        massPerLength_kgm: s.massPerLength_kgm, sI_m: (k * L) / n, sJ_m: ((k + 1) * L) / n,
        diameterI_m: s.diameter_m, diameterJ_m: s.diameter_m,
      });
      elems.push(this.elements.length - 1);
      ids.push(j);
    }
    this.members.push({ id, kind, elements: elems, length_m: L, discontinuities_m: opts.discontinuities ?? [] });
    return ids;
  }

  build(): FrameModel {
    return { nodes: this.nodes, elements: this.elements, supports: this.supports, members: this.members, masses: this.masses };
  }
}

/** Global Z for horizontal members, global X for vertical ones. */
function defaultRef(d: Vec3): Vec3 {
  const horiz = Math.hypot(d[0], d[1]);
  return horiz < 1e-9 * Math.hypot(...d) ? [1, 0, 0] : [0, 0, 1];
}

export const nodal = (node: number, F: Vec3, M: Vec3 = [0, 0, 0]): AppliedLoad => ({
  kind: 'nodal', node, F_N: F, M_Nm: M, origin: { source: 'test' },
});

export const uniformOn = (element: number, L: number, dir: Vec3, w: number, axes: 'global' | 'local' = 'global'): AppliedLoad => ({
  kind: 'distributed', element, axes, direction: dir, wA_Npm: w, wB_Npm: w, a_m: 0, b_m: L, origin: { source: 'test' },
});

/** A straight cantilever of n elements fixed at the origin along direction dir. */
export function cantilever(L: number, n: number, dir: Vec3, sec: Section, refVector?: Vec3): { model: FrameModel; nodes: number[] } {
  const b = new FrameBuilder();
  const base = b.node([0, 0, 0], 'base');
  b.fix(base);
  const nodes = b.member('m', 'pole', base, [dir[0] * L, dir[1] * L, dir[2] * L], n, () => sec, { refVector });
  return { model: b.build(), nodes };
}
