// Internal forces and displacements at stations along every member, and their exact extremes.
//
// On an element, the internal resultant at x comes from the statics of the segment [0, x]:
//   forces  S(x) = -f_i - (loads on [0, x])
//   moments M(x) = -(M_i + (r_i - r_x) x f_i + moments of the loads about the cut)
// where f_i is the end force on the element at end i. In a second-order analysis the lever
// arm of the axial force includes the displaced shape, r_i - r_x = (-x, -(v(x)-v_i), -(w(x)-w_i)),
// with v, w the Hermite cubics and the axial force N of the geometric stiffness; this is the
// P-delta moment N (v(x) - v_i) that the consistent geometric stiffness carries, so the
// statics at x = L reproduce the end forces at end j exactly.
// Displacements at a station: Hermite cubic (transverse) and linear (axial) interpolation of the
// end displacements, plus the particular solution of the element's own loads with both ends held
// (first order; in a second-order analysis that small in-element part is not amplified).
import type { FrameModel, MemberInfo } from '../model/frame.ts';
import type { EnvelopeComponent, Extreme, MemberStations, Station, StationSide } from './analysis-types.ts';
import { toGlobal3 } from './element-geometry.ts';
import { intensityAt, SNAP_M, type LocalLoad } from './element-loads.ts';
import type { LoadSet, PreparedElement, PreparedModel } from './frame-system.ts';
import { addPoly, cubicThrough, CHEB4, evalPoly, extremaOn, multiply, type Poly } from './polynomial.ts';
import { GAUSS3, localDisplacementAt } from './shape-functions.ts';

export interface ElementState {
  readonly pe: PreparedElement;
  /** Local end displacements. */
  readonly d: Float64Array;
  /** Local end forces on the element. */
  readonly f: Float64Array;
  /** Axial force used in the geometric stiffness (0 for first order). */
  readonly N: number;
  readonly loads: readonly LocalLoad[];
  /** Fixed-end forces of the element loads (local), null when unloaded. */
  readonly fixedEnd: Float64Array | null;
}

type Six = [number, number, number, number, number, number];

/** [N, Vy, Vz, T, My, Mz] at x; point loads at x count only on the 'right' side. */
export function internalForcesAt(st: ElementState, x: number, side: StationSide): Six {
  const { d, f, N, loads, pe } = st;
  const L = pe.geo.L;
  const F = [-f[0], -f[1], -f[2]];
  const disp = N !== 0 ? localDisplacementAt(d, x, L) : null;
  const dv = disp ? disp[1] - d[1] : 0;
  const dw = disp ? disp[2] - d[2] : 0;
  // M(x) = -(M_i + c_i + load moments), c_i = (r_i - r_x) x f_i with the axial force N of Kg
  const M = [-f[3], -(f[4] + x * f[2] + dw * N), -(f[5] - x * f[1] - dv * N)];
  for (const l of loads) {
    if (l.kind === 'distributed') {
      const c = Math.min(l.b, x);
      if (c <= l.a) continue;
      // 2-point Gauss: exact for the linear load and for (xi - x) times it
      const h = (c - l.a) / 2;
      for (const t of [-1 / Math.sqrt(3), 1 / Math.sqrt(3)]) {
        const xi = l.a + h * (1 + t);
        const q = intensityAt(l, xi);
        const lever = xi - x;
        F[0] -= h * q[0];
        F[1] -= h * q[1];
        F[2] -= h * q[2];
        M[1] -= h * -lever * q[2];
        M[2] -= h * lever * q[1];
      }
      continue;
    }
    const inside = l.a < x - SNAP_M || (Math.abs(l.a - x) <= SNAP_M && side === 'right');
    if (!inside) continue;
    if (l.kind === 'force') {
      const lever = l.a - x;
      F[0] -= l.F[0];
      F[1] -= l.F[1];
      F[2] -= l.F[2];
      M[1] -= -lever * l.F[2];
      M[2] -= lever * l.F[1];
    } else {
      M[0] -= l.M[0];
      M[1] -= l.M[1];
      M[2] -= l.M[2];
    }
  }
  return [F[0], F[1], F[2], M[0], M[1], M[2]];
}

/**
 * Displacement inside the element from its loads with both ends held (the particular solution):
 * EIz v'' = Mz, EIy w'' = -My, EA u' = N of the fixed-fixed element, zero value and slope at end i
 * (and so at end j). The fixed-fixed forces are cubic on each piece between load breakpoints
 * (fitted once per element), so 3-point Gauss integrates (x - t) M(t) exactly.
 */
function particularDisplacement(st: ElementState, x: number): [number, number, number] {
  if (!st.fixedEnd || x <= 0) return [0, 0, 0];
  const { el } = st.pe;
  let u = 0;
  let v = 0;
  let w = 0;
  for (const pc of heldPieces(st)) {
    if (pc.x0 >= x - SNAP_M) break;
    const b = Math.min(pc.x1, x);
    const h = (b - pc.x0) / 2;
    for (let g = 0; g < 3; g++) {
      const t = pc.x0 + h * (1 + GAUSS3.t[g]);
      const tau = (2 * t - pc.x0 - pc.x1) / (pc.x1 - pc.x0);
      const wt = h * GAUSS3.w[g];
      u += (wt * evalPoly(pc.N, tau)) / (el.E_Pa * el.A_m2);
      v += (wt * (x - t) * evalPoly(pc.Mz, tau)) / (el.E_Pa * el.Iz_m4);
      w -= (wt * (x - t) * evalPoly(pc.My, tau)) / (el.E_Pa * el.Iy_m4);
    }
  }
  return [u, v, w];
}

interface HeldPiece {
  readonly x0: number;
  readonly x1: number;
  readonly N: Poly;
  readonly My: Poly;
  readonly Mz: Poly;
}

const heldCache = new WeakMap<ElementState, HeldPiece[]>();

/** Internal forces of the element with both ends held, as cubics on each piece. */
function heldPieces(st: ElementState): HeldPiece[] {
  const cached = heldCache.get(st);
  if (cached) return cached;
  const held: ElementState = { pe: st.pe, d: ZERO12, f: st.fixedEnd ?? ZERO12, N: 0, loads: st.loads, fixedEnd: null };
  const breaks = pieceBreaks(st);
  const out: HeldPiece[] = [];
  for (let k = 0; k + 1 < breaks.length; k++) {
    const x0 = breaks[k];
    const x1 = breaks[k + 1];
    const samples = CHEB4.map((t) => internalForcesAt(held, x0 + ((t + 1) * (x1 - x0)) / 2, 'both'));
    out.push({ x0, x1, N: cubicThrough(samples.map((q) => q[0])), My: cubicThrough(samples.map((q) => q[4])), Mz: cubicThrough(samples.map((q) => q[5])) });
  }
  heldCache.set(st, out);
  return out;
}

const ZERO12 = new Float64Array(12);

function stationAt(st: ElementState, x: number, side: StationSide, s: number): Station {
  const [N, Vy, Vz, T, My, Mz] = internalForcesAt(st, x, side);
  const local = localDisplacementAt(st.d, x, st.pe.geo.L);
  const part = particularDisplacement(st, x);
  const [ux, uy, uz] = toGlobal3(st.pe.geo.R, [local[0] + part[0], local[1] + part[1], local[2] + part[2]]);
  return {
    s_m: s, element: st.pe.el.id, x_m: x, side,
    N_N: N, Vy_N: Vy, Vz_N: Vz, T_Nm: T, My_Nm: My, Mz_Nm: Mz, ux_m: ux, uy_m: uy, uz_m: uz,
  };
}

const isPoint = (l: LocalLoad): boolean => l.kind !== 'distributed';

/** Interior positions of an element: [x, isJump] sorted and snapped. */
function interiorPositions(st: ElementState, member: MemberInfo, spacing_m: number | null): [number, boolean][] {
  const L = st.pe.geo.L;
  const { sI_m, sJ_m } = st.pe.el;
  const toX = (s: number): number => ((s - sI_m) * L) / (sJ_m - sI_m);
  const cands: [number, boolean][] = [];
  for (const l of st.loads) {
    if (isPoint(l)) cands.push([l.a, true]);
    else if (l.kind === 'distributed') cands.push([l.a, false], [l.b, false]);
  }
  for (const s of member.discontinuities_m) cands.push([toX(s), false]);
  if (spacing_m && spacing_m > 0) {
    const first = Math.ceil((sI_m + SNAP_M) / spacing_m);
    for (let k = first; k * spacing_m < sJ_m - SNAP_M; k++) cands.push([toX(k * spacing_m), false]);
  }
  const inside = cands.filter(([x]) => x > SNAP_M && x < L - SNAP_M).sort((a, b) => a[0] - b[0] || Number(b[1]) - Number(a[1]));
  const out: [number, boolean][] = [];
  for (const [x, jump] of inside) {
    const last = out[out.length - 1];
    if (last && x - last[0] <= SNAP_M) {
      // keep the first position (a load position sorts before a spacing point at the same place)
      last[1] = last[1] || jump;
    } else out.push([x, jump]);
  }
  return out;
}

function pointLoadNear(st: ElementState, x: number): boolean {
  return st.loads.some((l) => isPoint(l) && Math.abs(l.a - x) <= SNAP_M);
}

const nonZero = (v: readonly number[]): boolean => v.some((c) => c !== 0);

const breaksCache = new WeakMap<ElementState, number[]>();

/** Breakpoints where the internal-force polynomials change (cached per element state). */
function pieceBreaks(st: ElementState): number[] {
  const cached = breaksCache.get(st);
  if (cached) return cached;
  const out = computeBreaks(st);
  breaksCache.set(st, out);
  return out;
}

function computeBreaks(st: ElementState): number[] {
  const L = st.pe.geo.L;
  const xs = [0, L];
  for (const l of st.loads) {
    if (l.kind === 'distributed') xs.push(l.a, l.b);
    else xs.push(l.a);
  }
  xs.sort((a, b) => a - b);
  return xs.filter((x, k) => k === 0 || x - xs[k - 1] > SNAP_M);
}

const COMPONENTS: readonly EnvelopeComponent[] = ['N', 'Vy', 'Vz', 'T', 'My', 'Mz', 'Mres', 'Vres'];

type ExtremeAcc = Record<EnvelopeComponent, { max: Extreme; min: Extreme }>;

function updateExtremes(acc: ExtremeAcc, st: ElementState, toS: (x: number) => number): void {
  const breaks = pieceBreaks(st);
  for (let k = 0; k + 1 < breaks.length; k++) {
    const x0 = breaks[k];
    const x1 = breaks[k + 1];
    const samples = CHEB4.map((t) => internalForcesAt(st, x0 + ((t + 1) * (x1 - x0)) / 2, 'both'));
    const polys = [0, 1, 2, 3, 4, 5].map((c) => cubicThrough(samples.map((s) => s[c])));
    const res = (a: number[], b: number[]): number[] => addPoly(multiply(a, a), multiply(b, b));
    const squared = { Mres: res(polys[4], polys[5]), Vres: res(polys[1], polys[2]) };
    COMPONENTS.forEach((name, c) => {
      const p = c < 6 ? polys[c] : squared[name as 'Mres' | 'Vres'];
      const e = extremaOn(p);
      const root = c >= 6;
      const max = root ? Math.sqrt(Math.max(e.max, 0)) : e.max;
      const min = root ? Math.sqrt(Math.max(e.min, 0)) : e.min;
      const sMax = toS(x0 + ((e.tMax + 1) * (x1 - x0)) / 2);
      const sMin = toS(x0 + ((e.tMin + 1) * (x1 - x0)) / 2);
      if (max > acc[name].max.value) acc[name].max = { value: max, s_m: sMax };
      if (min < acc[name].min.value) acc[name].min = { value: min, s_m: sMin };
    });
  }
}

export function memberStations(
  prep: PreparedModel,
  states: readonly ElementState[],
  ls: LoadSet,
  member: MemberInfo,
  spacing_m: number | null,
): MemberStations {
  const model: FrameModel = prep.model;
  const supported = new Set(model.supports.map((s) => s.node));
  const stations: Station[] = [];
  const acc = Object.fromEntries(
    COMPONENTS.map((c) => [c, { max: { value: -Infinity, s_m: 0 }, min: { value: Infinity, s_m: 0 } }]),
  ) as ExtremeAcc;
  const ids = member.elements;
  if (ids.length === 0) throw new Error(`member '${member.id}' has no elements`);
  ids.forEach((id, k) => {
    const st = states[id];
    const { sI_m, sJ_m } = st.pe.el;
    const L = st.pe.geo.L;
    const toS = (x: number): number => sI_m + (x * (sJ_m - sI_m)) / L;
    if (k === 0) stations.push(stationAt(st, 0, 'right', sI_m));
    for (const [x, jump] of interiorPositions(st, member, spacing_m)) {
      if (jump) stations.push(stationAt(st, x, 'left', toS(x)), stationAt(st, x, 'right', toS(x)));
      else stations.push(stationAt(st, x, 'both', toS(x)));
    }
    if (k === ids.length - 1) {
      stations.push(stationAt(st, L, 'left', sJ_m));
    } else {
      const next = states[ids[k + 1]];
      const node = st.pe.el.j;
      const jumpy =
        node !== next.pe.el.i ||
        ls.nodesLoaded.has(node) ||
        prep.degree[node] > 2 ||
        supported.has(node) ||
        nonZero(st.pe.el.offsetJ_m) ||
        nonZero(next.pe.el.offsetI_m) ||
        pointLoadNear(st, L) ||
        pointLoadNear(next, 0);
      if (jumpy) stations.push(stationAt(st, L, 'left', sJ_m), stationAt(next, 0, 'right', next.pe.el.sI_m));
      else stations.push(stationAt(st, L, 'both', sJ_m));
    }
    updateExtremes(acc, st, toS);
  });
  return { member: member.id, stations, extremes: acc };
}

/** Evaluates a component of a station. */
export function stationValue(s: Station, c: EnvelopeComponent): number {
  switch (c) {
    case 'N': return s.N_N;
    case 'Vy': return s.Vy_N;
    case 'Vz': return s.Vz_N;
    case 'T': return s.T_Nm;
    case 'My': return s.My_Nm;
    case 'Mz': return s.Mz_Nm;
    case 'Mres': return Math.hypot(s.My_Nm, s.Mz_Nm);
    case 'Vres': return Math.hypot(s.Vy_N, s.Vz_N);
  }
}

