// Equation numbering: nodes ordered breadth-first from the supports (Cuthill-McKee, not reversed)
// so the band stays narrow and elimination runs from the supports outward, which keeps every
// pivot of a sound frame a stiffness "with the rest held" rather than a long-chain flexibility.
import type { FrameModel } from '../model/frame.ts';

export const DOF_NAMES = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz'] as const;

export interface DofMap {
  /** eq[node*6 + c]: equation number, or -1 for a fixed dof. */
  readonly eq: Int32Array;
  readonly nEq: number;
  /** Half bandwidth of the assembled matrix. */
  readonly bw: number;
  /** node*6 + c for each equation. */
  readonly dofOfEq: Int32Array;
}

function nodeOrder(model: FrameModel): number[] {
  const nn = model.nodes.length;
  const adj: number[][] = Array.from({ length: nn }, () => []);
  for (const el of model.elements) {
    if (el.i === el.j) continue;
    adj[el.i].push(el.j);
    adj[el.j].push(el.i);
  }
  for (const a of adj) a.sort((p, q) => adj[p].length - adj[q].length || p - q);
  const seen = new Uint8Array(nn);
  const order: number[] = [];
  const starts = [...new Set(model.supports.map((s) => s.node))].sort((a, b) => a - b);
  for (let n = 0; n < nn; n++) starts.push(n);
  for (const s of starts) {
    if (seen[s]) continue;
    seen[s] = 1;
    const queue = [s];
    for (let h = 0; h < queue.length; h++) {
      const v = queue[h];
      order.push(v);
      for (const w of adj[v]) {
        if (!seen[w]) {
          seen[w] = 1;
          queue.push(w);
        }
      }
    }
  }
  return order;
}

export function numberDofs(model: FrameModel): DofMap {
  const nn = model.nodes.length;
  const fixed = new Uint8Array(nn * 6);
  for (const s of model.supports) {
    for (let c = 0; c < 6; c++) if (s.fixed[c]) fixed[s.node * 6 + c] = 1;
  }
  const eq = new Int32Array(nn * 6).fill(-1);
  const dofOfEq: number[] = [];
  for (const node of nodeOrder(model)) {
    for (let c = 0; c < 6; c++) {
      const dof = node * 6 + c;
      if (fixed[dof]) continue;
      eq[dof] = dofOfEq.length;
      dofOfEq.push(dof);
    }
  }
  let bw = 0;
  for (const el of model.elements) {
    let lo = Infinity;
    let hi = -Infinity;
    for (const node of [el.i, el.j]) {
      for (let c = 0; c < 6; c++) {
        const e = eq[node * 6 + c];
        if (e < 0) continue;
        lo = Math.min(lo, e);
        hi = Math.max(hi, e);
      }
    }
    if (hi > lo) bw = Math.max(bw, hi - lo);
  }
  // A node's own six dofs are always coupled (springs, offsets).
  bw = Math.max(bw, 5);
  return { eq, nEq: dofOfEq.length, bw, dofOfEq: Int32Array.from(dofOfEq) };
}

/** "node 12 (arm-tip:A1) rz" */
export function dofLabel(model: FrameModel, dof: number): string {
  const node = Math.floor(dof / 6);
  return `node ${node} (${model.nodes[node].tag}) ${DOF_NAMES[dof % 6]}`;
}
