// Reference tables for the fatigue design: constant-amplitude fatigue thresholds by detail
// category, and importance factors by fatigue category and structure kind. Values in SI,
// converted from the published ksi values (NIST SP 811 factor in units.ts).
import type { FatigueCategory, FatigueLoadName, StructureKind } from './design.ts';
import { KSI_PA } from '../units/units.ts';

export const THRESHOLD_SOURCE =
  "AASHTO LRFD Bridge Design Specifications, Table 6.6.1.2.5-3, constant-amplitude fatigue thresholds (A 24, B 16, B' 12, C 10, C' 12, D 7, E 4.5, E' 2.6 ksi), from memory; ET 1.2 and K2 1.0 ksi from the fatigue provisions of AASHTO LRFD-LTS, from memory; verify against the governing code";

const KSI: Readonly<Record<string, number>> = { A: 24, B: 16, "B'": 12, C: 10, "C'": 12, D: 7, E: 4.5, "E'": 2.6, ET: 1.2, K2: 1.0 };

/** The threshold of a detail category, Pa; undefined for an unknown category. */
export function thresholdOfCategory(category: string): number | undefined {
  const ksi = KSI[category];
  return ksi === undefined ? undefined : ksi * KSI_PA;
}

export const DETAIL_CATEGORIES: readonly string[] = Object.keys(KSI);

export const IMPORTANCE_SOURCE =
  'AASHTO LRFD-LTS fatigue importance factors I_F by fatigue category and structure type (table of the fatigue provisions), from memory; verify against the governing code';

type Row = Readonly<Record<FatigueCategory, number>>;

/** I_F per kind and load; null: the load does not apply to that kind of structure. */
const IMPORTANCE: Readonly<Record<StructureKind, Readonly<Record<FatigueLoadName, Row | null>>>> = {
  'cantilever-sign': {
    galloping: { I: 1.0, II: 0.7, III: 0.4 },
    naturalGust: { I: 1.0, II: 0.85, III: 0.7 },
    truckGust: { I: 1.0, II: 0.9, III: 0.8 },
  },
  'signal-support': {
    galloping: { I: 1.0, II: 0.65, III: 0.31 },
    naturalGust: { I: 1.0, II: 0.8, III: 0.61 },
    truckGust: { I: 1.0, II: 0.77, III: 0.54 },
  },
  'luminaire-pole': {
    galloping: null,
    naturalGust: { I: 1.0, II: 0.86, III: 0.73 },
    truckGust: null,
  },
};

/** The table's importance factor, or null when the load is not one the table gives for this kind. */
export function importanceFactor(kind: StructureKind, load: FatigueLoadName, category: FatigueCategory): number | null {
  return IMPORTANCE[kind][load]?.[category] ?? null;
}
