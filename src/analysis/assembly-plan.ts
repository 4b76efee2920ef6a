// The element stiffness entries that land in the band, stored contiguously in assembly order:
// one sequential pass per assembly instead of scattered 12x12 matrices, so assembly time stays
// linear in the model size (a model with thousands of elements no longer misses the cache).
import type { DofMap } from './dof-numbering.ts';

export interface AssemblyPlan {
  /** Entries of element e: start[e] .. start[e+1]-1. */
  readonly start: Int32Array;
  /** Index into BandedMatrix.data. */
  readonly pos: Int32Array;
  /** Elastic stiffness and geometric stiffness for N = 1 N, global. */
  readonly k: Float64Array;
  readonly kgUnit: Float64Array;
}

interface PlanElement {
  readonly kGlobal: Float64Array;
  readonly kgUnitGlobal: Float64Array;
  readonly eqs: Int32Array;
}

/** Entries (a, b) with eq(b) >= eq(a) of every element, in element then a then b order. */
export function assemblyPlan(elements: readonly PlanElement[], dofs: DofMap): AssemblyPlan {
  const w = dofs.bw + 1;
  const start = new Int32Array(elements.length + 1);
  const pos: number[] = [];
  const k: number[] = [];
  const kg: number[] = [];
  elements.forEach((pe, e) => {
    start[e] = pos.length;
    for (let a = 0; a < 12; a++) {
      const ea = pe.eqs[a];
      if (ea < 0) continue;
      for (let b = 0; b < 12; b++) {
        const eb = pe.eqs[b];
        if (eb < ea) continue;
        const ke = pe.kGlobal[a * 12 + b];
        const kge = pe.kgUnitGlobal[a * 12 + b];
        if (ke === 0 && kge === 0) continue;
        pos.push(ea * w + (eb - ea));
        k.push(ke);
        kg.push(kge);
      }
    }
  });
  start[elements.length] = pos.length;
  return { start, pos: Int32Array.from(pos), k: Float64Array.from(k), kgUnit: Float64Array.from(kg) };
}
