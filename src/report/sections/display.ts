// Printing helpers for the section builders: every number leaves here with its unit,
// in the user's system (units.ts does the conversion and the digits).
import { memberName } from '../../design/member-names.ts';
import type { Assumption, Attachment, Offset, StructureKind, TubeSection } from '../../design/design.ts';
import { STANDARD_GRAVITY_mps2 } from '../../model/gravity.ts';
import { formatNumber, formatQuantity, formatTolerance, type Dim, type UnitSystem } from '../../units/units.ts';

export interface Display {
  readonly units: UnitSystem;
  q(si: number, dim: Dim): string;
  angle(rad: number): string;
}

/**
 * US practice states the steel's weight per volume, the unit weight γ = ρ g in lb/ft³ (pcf), not a
 * mass density (lbm/ft³ or slug/ft³): a density prints in US units as the unit weight it gives.
 */
function quantityText(si: number, dim: Dim, units: UnitSystem): string {
  if (dim === 'density' && units === 'us') return formatQuantity(si * STANDARD_GRAVITY_mps2, 'unitWeight', units);
  return formatQuantity(si, dim, units);
}

/** The name of the material's density row: the unit weight γ in US units, the density ρ in SI. */
export function densityLabel(units: UnitSystem): string {
  return units === 'us' ? 'Unit weight, γ = ρ g' : 'Density, ρ';
}

export function display(units: UnitSystem): Display {
  return {
    units,
    q: (si, dim) => quantityText(si, dim, units),
    angle: (rad) => formatQuantity(rad, 'angle', units),
  };
}

export const KIND_LABEL: Readonly<Record<StructureKind, string>> = {
  'cantilever-sign': 'Cantilevered sign support',
  'luminaire-pole': 'Luminaire pole',
  'signal-support': 'Traffic-signal support',
};

export function shapeText(s: TubeSection): string {
  return s.shape === 'round' ? 'round' : `${s.sides}-sided`;
}

/** The diameter's name says how it is measured. */
export function diameterText(si: number, s: TubeSection, d: Display): string {
  return s.shape === 'round' ? d.q(si, 'section') : `${d.q(si, 'section')} across flats`;
}

/** A limit given as a fraction of a length, e.g. 0.01 of the length L -> "L/100". */
export function fractionText(ratio: number, of: string): string {
  if (ratio <= 0) return formatNumber(ratio);
  return `${of}/${formatNumber(1 / ratio, 4)}`;
}

export const memberText = memberName;

export function positionText(a: Attachment, d: Display): string {
  return a.member === 'pole' ? `${d.q(a.position_m, 'length')} above base` : `${d.q(a.position_m, 'length')} from arm root`;
}

export function offsetText(a: Attachment, d: Display): string {
  const o: Offset = a.offset;
  if (a.member === 'pole') {
    const side = o.lateral_m === 0 ? 'on the pole axis' : `${d.q(o.lateral_m, 'length')} toward ${d.angle(o.direction_rad)}`;
    return o.vertical_m === 0 ? side : `${side}, vertical ${d.q(o.vertical_m, 'length')}`;
  }
  return `vertical ${d.q(o.vertical_m, 'length')}, lateral ${d.q(o.lateral_m, 'length')}`;
}

/** An assumption's value as printed: quantities in the user's units, text as given. */
export function assumptionValue(a: Assumption, d: Display): string {
  if (typeof a.value === 'boolean') return a.value ? 'yes' : 'no';
  if (typeof a.value === 'string') return a.value;
  if (a.dim === 'ratio') return ratioText(a.value);
  // a density in US units prints as its unit weight, and says so beside a label that names the density
  if (a.dim === 'density' && d.units === 'us') return `${d.q(a.value, a.dim)} (unit weight γ = ρ g)`;
  if (a.dim !== undefined) return d.q(a.value, a.dim);
  return formatNumber(a.value, 6);
}

/** A dimensionless fraction; a limit such as 0.01 also shows as 1/100, the way it is usually given. */
export function ratioText(v: number): string {
  // a tolerance (1e-6) reads as a power of ten; an ordinary fraction to six digits
  if (v !== 0 && Math.abs(v) < 1e-3) return formatTolerance(v);
  const text = formatNumber(v, 6);
  if (!(v > 0 && v < 1)) return text;
  const inverse = 1 / v;
  return Math.abs(inverse - Math.round(inverse)) < 1e-6 * inverse ? `${text} (1/${Math.round(inverse)})` : text;
}

/** The six degrees of freedom of a node, in the solver's order. */
export const DOF_NAMES = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz'] as const;

/** The restrained degrees of freedom of a support: 'all six (fixed)', 'ux, uy, uz' or 'none'. */
export function restrainedText(fixed: readonly boolean[]): string {
  const names = DOF_NAMES.filter((_, k) => fixed[k]);
  return names.length === 6 ? 'all six (fixed)' : names.join(', ') || 'none';
}
