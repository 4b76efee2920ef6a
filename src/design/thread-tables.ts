// Standard coarse threads of anchor bolts and the tensile stress area of a thread. The stress
// area is the area the tensile strength of a threaded rod is tested on; anchor-bolt tension and
// fatigue stress ranges are computed on it.
import type { AnchorBolts } from './design.ts';

const INCH = 0.0254;
const MM = 0.001;

export const UNC_SOURCE = 'ASME B1.1 Unified inch screw threads, coarse series (UNC) threads per inch; tensile stress area At = π/4 (d − 0.9743/n)²';
export const ISO_SOURCE = 'ISO 261 coarse pitches (from memory, verify) and ISO 898-1 stress area As = π/4 (d − 0.9382 P)²';

/** UNC coarse series, nominal diameter (in) and threads per inch, 1/2 in to 4 in. */
const UNC_COARSE: ReadonlyArray<readonly [number, number]> = [
  [0.5, 13], [0.625, 11], [0.75, 10], [0.875, 9], [1, 8], [1.125, 7], [1.25, 7], [1.375, 6], [1.5, 6],
  [1.75, 5], [2, 4.5], [2.25, 4.5], [2.5, 4], [2.75, 4], [3, 4], [3.25, 4], [3.5, 4], [3.75, 4], [4, 4],
];

/** ISO metric coarse pitches, nominal diameter (mm) and pitch (mm), M12 to M72 (from memory, verify). */
const ISO_COARSE: ReadonlyArray<readonly [number, number]> = [
  [12, 1.75], [14, 2], [16, 2], [18, 2.5], [20, 2.5], [22, 2.5], [24, 3], [27, 3], [30, 3.5], [33, 3.5], [36, 4],
  [39, 4], [42, 4.5], [45, 4.5], [48, 5], [52, 5], [56, 5.5], [60, 5.5], [64, 6], [68, 6], [72, 6],
];

/** A diameter given in either unit system matches a table size to round-off of the conversion. */
const SAME_SIZE = 1e-6;

export interface BoltThread {
  readonly standard: 'UNC' | 'ISO metric';
  readonly pitch_m: number;
  /** 'table': the standard coarse thread of the nominal size; 'input': given by the user. */
  readonly from: 'table' | 'input';
}

/** UNC tensile stress area, ASME B1.1: At = π/4 (d − 0.9743 p)² with p = 1/n the pitch. */
export const uncStressArea = (d_m: number, pitch_m: number): number => (Math.PI / 4) * (d_m - 0.9743 * pitch_m) ** 2;

/** ISO metric stress area, ISO 898-1: As = π/4 ((d2 + d3)/2)² = π/4 (d − 0.9382 P)². */
export const isoStressArea = (d_m: number, pitch_m: number): number => (Math.PI / 4) * (d_m - 0.9382 * pitch_m) ** 2;

export const stressArea = (d_m: number, t: BoltThread): number => (t.standard === 'UNC' ? uncStressArea(d_m, t.pitch_m) : isoStressArea(d_m, t.pitch_m));

/** The diameter the stress area is taken on, d − 0.9743 p (UNC) or d − 0.9382 P (ISO); zero or
 * less when the pitch is too coarse for the diameter. */
export const stressDiameter = (d_m: number, t: BoltThread): number => d_m - (t.standard === 'UNC' ? 0.9743 : 0.9382) * t.pitch_m;

/** The thread of the bolts: as given, else the coarse thread of a standard size (UNC first for a
 * size that is an inch size, ISO for a millimetre size); null when the size is in neither table. */
export function boltThread(b: Pick<AnchorBolts, 'boltDiameter_m' | 'thread'>): BoltThread | null {
  if (b.thread !== null) return { ...b.thread, from: 'input' };
  const d = b.boltDiameter_m;
  const unc = UNC_COARSE.find(([inch]) => Math.abs(inch * INCH - d) <= SAME_SIZE * d);
  if (unc) return { standard: 'UNC', pitch_m: INCH / unc[1], from: 'table' };
  const iso = ISO_COARSE.find(([mm]) => Math.abs(mm * MM - d) <= SAME_SIZE * d);
  if (iso) return { standard: 'ISO metric', pitch_m: iso[1] * MM, from: 'table' };
  return null;
}

export const threadSource = (t: BoltThread): string => (t.standard === 'UNC' ? UNC_SOURCE : ISO_SOURCE);

/** The thread in its own unit, as thread tables name it: threads per inch, or the pitch in mm. */
export const threadName = (t: BoltThread): string =>
  t.standard === 'UNC' ? `UNC, ${Number((INCH / t.pitch_m).toFixed(2))} threads per inch` : `ISO metric, pitch ${Number((t.pitch_m / MM).toFixed(3))} mm`;
