// Stations along every member: ends, discontinuities, loads and a regular spacing (snapped), with
// the internal forces and displacements at each, and the member's exact extremes.
// The statics of a cut and the displacement interpolation are in internal-forces.ts.
import type { MemberInfo } from '../model/frame.ts';
import type { EnvelopeComponent, MemberStations, Station, StationSide } from './analysis-types.ts';
import { SNAP_M, type LocalLoad } from './element-loads.ts';
import type { LoadSet, PreparedModel } from './frame-system.ts';
import {
  addParticularDisplacement,
  heldPieces,
  internalForcesInto,
  pieceBreaks,
  type ElementState,
  type HeldPieces,
} from './internal-forces.ts';
import { emptyExtremes, extremesRecord, updateExtremes } from './member-extremes.ts';
import { localDisplacementInto } from './shape-functions.ts';

export type { ElementState } from './internal-forces.ts';

const forces = new Float64Array(6);
const local = new Float64Array(3);

function stationAt(st: ElementState, held: HeldPieces | null, x: number, side: StationSide, s: number): Station {
  internalForcesInto(st, x, side, forces);
  localDisplacementInto(st.d, x, st.pe.geo.L, local);
  addParticularDisplacement(st, held, x, local);
  const R = st.pe.geo.R;
  // global = R^T local (toGlobal3). Frozen here, so the final deepFreeze skips the many stations.
  return Object.freeze({
    s_m: s, element: st.pe.el.id, x_m: x, side,
    N_N: forces[0], Vy_N: forces[1], Vz_N: forces[2], T_Nm: forces[3], My_Nm: forces[4], Mz_Nm: forces[5],
    ux_m: R[0] * local[0] + R[3] * local[1] + R[6] * local[2],
    uy_m: R[1] * local[0] + R[4] * local[1] + R[7] * local[2],
    uz_m: R[2] * local[0] + R[5] * local[1] + R[8] * local[2],
  });
}

const isPoint = (l: LocalLoad): boolean => l.kind !== 'distributed';

/** Interior positions of the element being processed (reused scratch, read before the next call). */
const posX: number[] = [];
const posJump: boolean[] = [];

/** Interior positions of an element, sorted (a load position before a spacing point at the same x)
 * and snapped, into posX / posJump; returns how many. */
function interiorPositions(st: ElementState, member: MemberInfo, spacing_m: number | null): number {
  const L = st.pe.geo.L;
  const { sI_m, sJ_m } = st.pe.el;
  const toX = (s: number): number => ((s - sI_m) * L) / (sJ_m - sI_m);
  let n = 0;
  // insertion by (x ascending, jump first): a handful of candidates per element
  const insert = (x: number, jump: boolean): void => {
    if (!(x > SNAP_M && x < L - SNAP_M)) return;
    let j = n - 1;
    while (j >= 0 && (posX[j] > x || (posX[j] === x && jump && !posJump[j]))) {
      posX[j + 1] = posX[j];
      posJump[j + 1] = posJump[j];
      j--;
    }
    posX[j + 1] = x;
    posJump[j + 1] = jump;
    n++;
  };
  for (const l of st.loads) {
    if (isPoint(l)) insert(l.a, true);
    else if (l.kind === 'distributed') {
      insert(l.a, false);
      insert(l.b, false);
    }
  }
  for (const s of member.discontinuities_m) insert(toX(s), false);
  if (spacing_m && spacing_m > 0) {
    const first = Math.ceil((sI_m + SNAP_M) / spacing_m);
    for (let k = first; k * spacing_m < sJ_m - SNAP_M; k++) insert(toX(k * spacing_m), false);
  }
  // snap: keep the first position of a cluster, a jump if any member of it jumps
  let m = 0;
  for (let k = 0; k < n; k++) {
    if (m > 0 && posX[k] - posX[m - 1] <= SNAP_M) {
      posJump[m - 1] = posJump[m - 1] || posJump[k];
    } else {
      posX[m] = posX[k];
      posJump[m] = posJump[k];
      m++;
    }
  }
  return m;
}

function pointLoadNear(st: ElementState, x: number): boolean {
  return st.loads.some((l) => isPoint(l) && Math.abs(l.a - x) <= SNAP_M);
}

const nonZero = (v: readonly number[]): boolean => v[0] !== 0 || v[1] !== 0 || v[2] !== 0;

export function memberStations(
  prep: PreparedModel,
  states: readonly ElementState[],
  ls: LoadSet,
  member: MemberInfo,
  spacing_m: number | null,
): MemberStations {
  const stations: Station[] = [];
  const acc = emptyExtremes();
  const ids = member.elements;
  if (ids.length === 0) throw new Error(`member '${member.id}' has no elements`);
  let nextHeld: HeldPieces | null | undefined;
  for (let k = 0; k < ids.length; k++) {
    const st = states[ids[k]];
    const { sI_m, sJ_m } = st.pe.el;
    const L = st.pe.geo.L;
    const toS = (x: number): number => sI_m + (x * (sJ_m - sI_m)) / L;
    const breaks = pieceBreaks(st);
    const held = nextHeld !== undefined ? nextHeld : heldPieces(st, breaks);
    nextHeld = undefined;
    if (k === 0) stations.push(stationAt(st, held, 0, 'right', sI_m));
    const count = interiorPositions(st, member, spacing_m);
    for (let p = 0; p < count; p++) {
      const x = posX[p];
      if (posJump[p]) stations.push(stationAt(st, held, x, 'left', toS(x)), stationAt(st, held, x, 'right', toS(x)));
      else stations.push(stationAt(st, held, x, 'both', toS(x)));
    }
    if (k === ids.length - 1) {
      stations.push(stationAt(st, held, L, 'left', sJ_m));
    } else {
      const next = states[ids[k + 1]];
      const node = st.pe.el.j;
      const jumpy =
        node !== next.pe.el.i ||
        ls.nodesLoaded.has(node) ||
        prep.degree[node] > 2 ||
        prep.supported[node] === 1 ||
        nonZero(st.pe.el.offsetJ_m) ||
        nonZero(next.pe.el.offsetI_m) ||
        pointLoadNear(st, L) ||
        pointLoadNear(next, 0);
      if (jumpy) {
        nextHeld = heldPieces(next, pieceBreaks(next));
        stations.push(stationAt(st, held, L, 'left', sJ_m), stationAt(next, nextHeld, 0, 'right', next.pe.el.sI_m));
      } else stations.push(stationAt(st, held, L, 'both', sJ_m));
    }
    updateExtremes(acc, st, breaks);
  }
  return { member: member.id, stations, extremes: extremesRecord(acc) };
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

