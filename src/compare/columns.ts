// The quantities of a comparison, defined once: the CSV, the PDF table and the charts all read
// these, so they cannot disagree. Values are SI; each prints in the input's unit system.
import type { Dim, UnitSystem } from '../units/units.ts';
import { displayUnit, fromSI, prettyUnit } from '../units/units.ts';
import type { AlternativeMetrics } from './metrics.ts';

export interface Column {
  readonly key: string;
  /** Title without the unit. */
  readonly title: string;
  readonly dim: Dim;
  readonly value: (m: AlternativeMetrics) => number | null;
  /** The limit the value is checked against, when it has one (drawn as a line on its chart). */
  readonly limit?: (m: AlternativeMetrics) => number | null;
  readonly limitTitle?: string;
  /** What the value is, for the chart caption. */
  readonly meaning: string;
}

export const COLUMNS: readonly Column[] = [
  { key: 'governingRatio', title: 'Governing ratio', dim: 'ratio', value: (m) => (Number.isFinite(m.governing.ratio) ? m.governing.ratio : null), limit: () => 1, limitTitle: 'ratio 1.0', meaning: 'the largest demand/capacity ratio of every pass/fail check (warnings excluded); above 1.0 the alternative fails' },
  { key: 'baseMoment', title: 'Base moment', dim: 'moment', value: (m) => m.baseMoment?.value ?? null, meaning: 'the largest resultant bending moment at the pole base over the factored combinations' },
  { key: 'baseShear', title: 'Base shear', dim: 'force', value: (m) => m.baseShear?.value ?? null, meaning: 'the largest horizontal reaction at the pole base over the factored combinations' },
  { key: 'baseTorque', title: 'Base torque', dim: 'moment', value: (m) => m.baseTorque?.value ?? null, meaning: 'the largest reaction moment about the vertical at the pole base over the factored combinations' },
  { key: 'poleTopSway', title: 'Pole top sway', dim: 'section', value: (m) => m.poleTopSway?.value ?? null, limit: (m) => m.poleTopSway?.limit ?? null, limitTitle: 'service limit', meaning: 'the largest horizontal movement of the pole top under the service combinations, with its limit' },
  { key: 'armTipDeflection', title: 'Arm tip deflection', dim: 'section', value: (m) => m.armTipDeflection?.value ?? null, limit: (m) => m.armTipDeflection?.limit ?? null, limitTitle: 'dead-load limit', meaning: 'the vertical movement of the arm tip under the unfactored dead load (the arm nearest its limit), with its limit' },
  { key: 'boltForce', title: 'Largest bolt force', dim: 'force', value: (m) => m.boltForce?.value ?? null, limit: (m) => m.boltForce?.limit ?? null, limitTitle: 'design strength', meaning: 'the largest axial force of one anchor bolt (tension or compression, as checked) over the factored combinations, with its design strength' },
  { key: 'steelWeight', title: 'Steel weight', dim: 'weight', value: (m) => m.steelWeight_N, meaning: 'the weight of the steel tubes of the pole and the arms (attachments and plates not included)' },
];

export const unitOf = (dim: Dim, system: UnitSystem): string => prettyUnit(displayUnit(system, dim));

/** The value in the display unit of the system. */
export function inUnits(si: number, dim: Dim, system: UnitSystem): number {
  return fromSI(si, displayUnit(system, dim), dim);
}

export function titleWithUnit(c: Column, system: UnitSystem): string {
  const u = unitOf(c.dim, system);
  return u === '' ? c.title : `${c.title} (${u})`;
}
