// Element loads resolved into element local axes, and their fixed-end forces.
import type { AppliedLoad, DistributedLoad, ElementPointLoad } from '../loads/load-types.ts';
import type { Vec3 } from '../model/frame.ts';
import { toLocal3 } from './element-geometry.ts';
import { GAUSS3, hermiteInto, hermiteSlope } from './shape-functions.ts';

/** Positions closer than this are the same point (m). */
export const SNAP_M = 1e-6;

/**
 * An element load in element axes, with its combination factor applied. One shape for every kind,
 * so the hot loops that read loads see a single object layout (mixed layouts cost allocations).
 * - distributed: intensity vA at a and vB at b (N/m), linear between;
 * - force: the force vA (N) at a;  moment: the moment vA (N*m) at a. For these b = a and vB = vA.
 */
export interface LocalLoad {
  readonly kind: 'distributed' | 'force' | 'moment';
  readonly a: number;
  readonly b: number;
  readonly vA: Vec3;
  readonly vB: Vec3;
}

function unitDirection(v: Vec3, what: string): Vec3 {
  const n = Math.hypot(v[0], v[1], v[2]);
  if (!(Math.abs(n - 1) < 1e-6)) throw new Error(`${what}: direction is not a unit vector (length ${n})`);
  return v;
}

function position(a: number, L: number, what: string): number {
  if (a < -SNAP_M || a > L + SNAP_M || !Number.isFinite(a)) {
    throw new Error(`${what}: position ${a} m lies outside the element's clear length ${L} m`);
  }
  return Math.min(Math.max(a, 0), L);
}

/** An element load checked and turned into element axes, before any factor. */
export interface ResolvedLoad {
  readonly load: DistributedLoad | ElementPointLoad;
  /** Unit direction in local axes. */
  readonly local: Vec3;
  readonly a: number;
  readonly b: number;
  /** Scaled loads already made, by factor (a combination factor recurs across combinations). */
  readonly byFactor: Map<number, LocalLoad>;
}

/** Checks one element load and resolves its direction into local axes (once per load and model). */
export function resolveDirection(load: DistributedLoad | ElementPointLoad, R: Float64Array, L: number): ResolvedLoad {
  const what = `load '${load.origin.source}' on element ${load.element}`;
  const dir = unitDirection(load.direction, what);
  const values = load.kind === 'distributed' ? [load.wA_Npm, load.wB_Npm] : [load.value];
  if (!values.every(Number.isFinite)) throw new Error(`${what}: magnitude is not a number`);
  const local = load.axes === 'local' ? ([dir[0], dir[1], dir[2]] as Vec3) : toLocal3(R, dir);
  if (load.kind === 'distributed') {
    const a = position(load.a_m, L, what);
    const b = position(load.b_m, L, what);
    if (b < a) throw new Error(`${what}: end b_m before start a_m`);
    return { load, local, a, b, byFactor: new Map() };
  }
  const a = position(load.a_m, L, what);
  return { load, local, a, b: a, byFactor: new Map() };
}

/** A resolved load times its combination factor (made once per factor; LocalLoad is immutable). */
export function scaleResolved(r: ResolvedLoad, factor: number): LocalLoad {
  let out = r.byFactor.get(factor);
  if (!out) {
    out = scaleOnce(r, factor);
    r.byFactor.set(factor, out);
  }
  return out;
}

function scaleOnce(r: ResolvedLoad, factor: number): LocalLoad {
  const { load, local } = r;
  const scaled = (w: number): Vec3 => [local[0] * w * factor, local[1] * w * factor, local[2] * w * factor];
  if (load.kind === 'distributed') return { kind: 'distributed', a: r.a, b: r.b, vA: scaled(load.wA_Npm), vB: scaled(load.wB_Npm) };
  const v = scaled(load.value);
  return { kind: load.kind === 'point-force' ? 'force' : 'moment', a: r.a, b: r.a, vA: v, vB: v };
}

export function isElementLoad(l: AppliedLoad): l is DistributedLoad | ElementPointLoad {
  return l.kind !== 'nodal';
}

/** Intensity of a distributed load at x (inside [a, b]). */
export function intensityAt(l: LocalLoad, x: number): Vec3 {
  const q = new Float64Array(3);
  intensityInto(l, x, q);
  return [q[0], q[1], q[2]];
}

/** intensityAt() written into out[0..2] (no allocation: it runs for every sample of every load). */
export function intensityInto(l: LocalLoad, x: number, out: Float64Array): void {
  const t = l.b > l.a ? (x - l.a) / (l.b - l.a) : 0;
  out[0] = l.vA[0] + (l.vB[0] - l.vA[0]) * t;
  out[1] = l.vA[1] + (l.vB[1] - l.vA[1]) * t;
  out[2] = l.vA[2] + (l.vB[2] - l.vA[2]) * t;
}

const hn = new Float64Array(4);
const qx = new Float64Array(3);

/** Adds the work-equivalent end loads of a force (F0, F1, F2) at x. */
function addForce(eq: Float64Array, F0: number, F1: number, F2: number, x: number, L: number, w: number): void {
  const s = x / L;
  hermiteInto(x, L, hn);
  const n1 = hn[0];
  const n2 = hn[1];
  const n3 = hn[2];
  const n4 = hn[3];
  eq[0] += w * (1 - s) * F0;
  eq[6] += w * s * F0;
  eq[1] += w * n1 * F1;
  eq[5] += w * n2 * F1;
  eq[7] += w * n3 * F1;
  eq[11] += w * n4 * F1;
  eq[2] += w * n1 * F2;
  eq[4] -= w * n2 * F2;
  eq[8] += w * n3 * F2;
  eq[10] -= w * n4 * F2;
}

/**
 * Fixed-end forces in local axes: the forces on the element by fully restrained ends under the
 * element loads, = -(integral of N^T q). A linear load times a cubic shape function is a quartic,
 * which 3-point Gauss quadrature integrates exactly.
 */
export function fixedEndForces(loads: readonly LocalLoad[], L: number): Float64Array {
  const eq = new Float64Array(12);
  for (const l of loads) {
    if (l.kind === 'distributed') {
      const half = (l.b - l.a) / 2;
      if (half <= 0) continue;
      for (let g = 0; g < 3; g++) {
        const x = l.a + half * (1 + GAUSS3.t[g]);
        intensityInto(l, x, qx);
        addForce(eq, qx[0], qx[1], qx[2], x, L, GAUSS3.w[g] * half);
      }
    } else if (l.kind === 'force') {
      addForce(eq, l.vA[0], l.vA[1], l.vA[2], l.a, L, 1);
    } else {
      const s = l.a / L;
      const [d1, d2, d3, d4] = hermiteSlope(l.a, L);
      const [mx, my, mz] = l.vA;
      eq[3] += (1 - s) * mx;
      eq[9] += s * mx;
      eq[1] += d1 * mz;
      eq[5] += d2 * mz;
      eq[7] += d3 * mz;
      eq[11] += d4 * mz;
      // ry = -dw/dx, so a moment about y does work my * (-w')
      eq[2] -= d1 * my;
      eq[4] += d2 * my;
      eq[8] -= d3 * my;
      eq[10] += d4 * my;
    }
  }
  for (let k = 0; k < 12; k++) eq[k] = -eq[k];
  return eq;
}
