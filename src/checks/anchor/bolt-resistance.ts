// Design resistances of one anchor bolt (a threaded rod) by AISC 360-16 Section J3, with the
// tensile stress area of the thread as the tested tensile area. All values SI.
import { AISC } from '../member/resistance.ts';

export const J3 = `${AISC}, Section J3`;

/** Table J3.2, threaded parts: Fnt = 0.75 Fu; Fnv = 0.450 Fu with threads not excluded from the shear plane. */
export const FNT_OF_FU = 0.75;
export const FNV_OF_FU = 0.45;
/** Eq. J3-3a: F'nt = 1.3 Fnt − Fnt/(φ Fnv) frv ≤ Fnt. */
export const J3_3A_FACTOR = 1.3;

export interface BoltSteel {
  readonly Fu_Pa: number;
  readonly Fy_Pa: number;
}

export interface BoltAreas {
  /** Nominal (unthreaded body) area π d²/4. */
  readonly Ab_m2: number;
  /** Tensile stress area of the thread. */
  readonly At_m2: number;
}

/**
 * Nominal tension: the smaller of Fu At (the strength of the threaded rod on its stress area)
 * and Fnt Ab (AISC Eq. J3-1 with Table J3.2; 0.75 approximates At/Ab, which is below 0.75 for
 * small rods).
 */
export const nominalTension = (s: BoltSteel, a: BoltAreas): number => Math.min(s.Fu_Pa * a.At_m2, FNT_OF_FU * s.Fu_Pa * a.Ab_m2);

/** Nominal shear, AISC Eq. J3-1 with Fnv of Table J3.2 (threads in the shear plane). */
export const nominalShear = (s: BoltSteel, a: BoltAreas): number => FNV_OF_FU * s.Fu_Pa * a.Ab_m2;

/**
 * The tensile stress reduced for the shear stress frv = Vb/Ab, AISC Eq. J3-3a (φv the shear
 * resistance factor), capped at Fnt. Zero or less: the shear leaves no tension resistance.
 */
export function reducedTensileStress(s: BoltSteel, frv_Pa: number, phiShear: number): number {
  const Fnt = FNT_OF_FU * s.Fu_Pa;
  const Fnv = FNV_OF_FU * s.Fu_Pa;
  return Math.min(J3_3A_FACTOR * Fnt - (Fnt / (phiShear * Fnv)) * frv_Pa, Fnt);
}

/** Nominal tension with shear: the smaller of Fu At and F'nt Ab (Eq. J3-2 with F'nt). */
export const nominalTensionWithShear = (s: BoltSteel, a: BoltAreas, FntPrime_Pa: number): number => Math.min(s.Fu_Pa * a.At_m2, FntPrime_Pa * a.Ab_m2);
