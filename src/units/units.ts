// The one internal unit system is SI base units: m, N, Pa, kg, rad, s.
// Conversion happens only here: when reading input and when printing.
// Exact factors from NIST Special Publication 811 (2008), Appendix B.
import { formatNumber } from './number-format.ts';

export { formatNumber, formatPercent, formatRatio, formatTolerance, powerOfTen } from './number-format.ts';

export type UnitSystem = 'us' | 'si';

/** Physical kinds of quantity. Two length kinds exist because structures are
 * dimensioned in ft / m while sections are dimensioned in in / mm. */
export type Dim =
  | 'length' // structure dimensions: ft | m
  | 'section' // diameters, walls, offsets of small parts: in | mm
  | 'area' // wind areas: ft2 | m2
  | 'force' // member forces, reactions: kip | kN
  | 'weight' // attachment weights: lb | N
  | 'moment' // kip*ft | kN*m
  | 'pressure' // wind pressure, weight per area: psf | kPa
  | 'stress' // ksi | MPa
  | 'density' // pcf | kg/m3 (mass per volume; input only in US units, where pcf is read as lb/ft3)
  | 'unitWeight' // lb/ft3 | kN/m3 (weight per volume, γ = ρ g: how a density prints in US units)
  | 'lineLoad' // lb/ft | kN/m
  | 'rotStiffness' // kip*ft/rad | kN*m/rad
  | 'angle' // deg (both systems)
  | 'taper' // in/ft | mm/m
  | 'speed' // mph | m/s
  | 'frequency' // Hz
  | 'sectionArea' // in2 | mm2
  | 'inertia' // in4 | mm4
  | 'modulus' // in3 | mm3 (section modulus)
  | 'mass' // lb (mass) | kg
  | 'ratio'; // dimensionless

export const FT_M = 0.3048;
export const IN_M = 0.0254;
export const LBF_N = 4.4482216152605;
export const KIP_N = 1000 * LBF_N;
export const PSF_PA = LBF_N / (FT_M * FT_M); // 47.880 26 Pa
export const PSI_PA = LBF_N / (IN_M * IN_M);
export const KSI_PA = 1000 * PSI_PA; // 6.894 757 MPa
export const LB_KG = 0.45359237;
export const PCF_KGM3 = LB_KG / FT_M ** 3; // 16.018 46 kg/m3
export const MPH_MS = 0.44704;
export const DEG_RAD = Math.PI / 180;

/** A unit symbol as the user may type it, and its factor to SI base. */
export interface UnitDef {
  readonly symbol: string;
  readonly aliases: readonly string[];
  readonly dim: Dim;
  readonly toSI: number;
}

const u = (symbol: string, dim: Dim, toSI: number, ...aliases: string[]): UnitDef => ({ symbol, dim, toSI, aliases });

// Lengths are listed under both length kinds so that "300 mm" is accepted for a
// pole height and "1.2 ft" for a wall: the dimension is what must match.
const LENGTH_UNITS = (dim: Dim): UnitDef[] => [
  u('ft', dim, FT_M, 'feet', 'foot'),
  u('in', dim, IN_M, 'inch', 'inches'),
  u('m', dim, 1),
  u('mm', dim, 1e-3),
  u('cm', dim, 1e-2),
];

export const UNITS: readonly UnitDef[] = [
  ...LENGTH_UNITS('length'),
  ...LENGTH_UNITS('section'),
  u('ft2', 'area', FT_M * FT_M, 'ft^2', 'sq ft', 'sf'),
  u('in2', 'area', IN_M * IN_M, 'in^2'),
  u('m2', 'area', 1, 'm^2'),
  u('mm2', 'area', 1e-6, 'mm^2'),
  u('kip', 'force', KIP_N, 'kips'),
  u('lb', 'force', LBF_N, 'lbf', 'lbs'),
  u('kN', 'force', 1e3),
  u('N', 'force', 1),
  u('lb', 'weight', LBF_N, 'lbf', 'lbs'),
  u('kip', 'weight', KIP_N, 'kips'),
  u('N', 'weight', 1),
  u('kN', 'weight', 1e3),
  u('kip*ft', 'moment', KIP_N * FT_M, 'kip-ft', 'kip ft', 'k-ft'),
  u('lb*ft', 'moment', LBF_N * FT_M, 'lb-ft', 'ft-lb'),
  u('kip*in', 'moment', KIP_N * IN_M, 'kip-in'),
  u('kN*m', 'moment', 1e3, 'kN-m', 'kNm'),
  u('N*m', 'moment', 1, 'N-m', 'Nm'),
  u('psf', 'pressure', PSF_PA, 'lb/ft2', 'lb/ft^2'),
  u('psi', 'pressure', PSI_PA),
  u('ksf', 'pressure', 1000 * PSF_PA),
  u('Pa', 'pressure', 1, 'N/m2'),
  u('kPa', 'pressure', 1e3, 'kN/m2'),
  u('ksi', 'stress', KSI_PA),
  u('psi', 'stress', PSI_PA),
  u('MPa', 'stress', 1e6, 'N/mm2'),
  u('GPa', 'stress', 1e9),
  u('kPa', 'stress', 1e3),
  u('pcf', 'density', PCF_KGM3, 'lb/ft3', 'lb/ft^3'),
  u('kg/m3', 'density', 1, 'kg/m^3'),
  u('lb/ft3', 'unitWeight', LBF_N / FT_M ** 3, 'pcf', 'lb/ft^3'),
  u('kN/m3', 'unitWeight', 1e3, 'kN/m^3'),
  u('N/m3', 'unitWeight', 1, 'N/m^3'),
  u('lb/ft', 'lineLoad', LBF_N / FT_M, 'plf'),
  u('kip/ft', 'lineLoad', KIP_N / FT_M, 'klf'),
  u('N/m', 'lineLoad', 1),
  u('kN/m', 'lineLoad', 1e3),
  u('kip*ft/rad', 'rotStiffness', KIP_N * FT_M, 'kip-ft/rad'),
  u('kip*in/rad', 'rotStiffness', KIP_N * IN_M, 'kip-in/rad'),
  u('kN*m/rad', 'rotStiffness', 1e3, 'kN-m/rad'),
  u('MN*m/rad', 'rotStiffness', 1e6, 'MN-m/rad'),
  u('deg', 'angle', DEG_RAD, 'degrees', 'degree', '°'),
  u('rad', 'angle', 1),
  u('in/ft', 'taper', IN_M / FT_M),
  u('mm/m', 'taper', 1e-3),
  u('mph', 'speed', MPH_MS),
  u('m/s', 'speed', 1),
  u('km/h', 'speed', 1000 / 3600),
  u('Hz', 'frequency', 1),
  u('in2', 'sectionArea', IN_M ** 2),
  u('mm2', 'sectionArea', 1e-6),
  u('in4', 'inertia', IN_M ** 4),
  u('mm4', 'inertia', 1e-12),
  u('in3', 'modulus', IN_M ** 3),
  u('mm3', 'modulus', 1e-9),
  u('lbm', 'mass', LB_KG),
  u('kg', 'mass', 1),
  u('', 'ratio', 1),
];

/** The unit a bare number takes on input, and the unit used for printing. */
export const SYSTEM_UNIT: Readonly<Record<UnitSystem, Readonly<Record<Dim, string>>>> = {
  us: {
    length: 'ft', section: 'in', area: 'ft2', force: 'kip', weight: 'lb', moment: 'kip*ft',
    pressure: 'psf', stress: 'ksi', density: 'pcf', unitWeight: 'lb/ft3', lineLoad: 'lb/ft', rotStiffness: 'kip*ft/rad',
    angle: 'deg', taper: 'in/ft', speed: 'mph', frequency: 'Hz', sectionArea: 'in2', inertia: 'in4',
    modulus: 'in3', mass: 'lbm', ratio: '',
  },
  si: {
    length: 'm', section: 'mm', area: 'm2', force: 'kN', weight: 'N', moment: 'kN*m',
    pressure: 'kPa', stress: 'MPa', density: 'kg/m3', unitWeight: 'kN/m3', lineLoad: 'kN/m', rotStiffness: 'kN*m/rad',
    angle: 'deg', taper: 'mm/m', speed: 'm/s', frequency: 'Hz', sectionArea: 'mm2', inertia: 'mm4',
    modulus: 'mm3', mass: 'kg', ratio: '',
  },
};

export function findUnit(symbol: string, dim: Dim): UnitDef | undefined {
  const s = symbol.trim();
  return UNITS.find((d) => d.dim === dim && (d.symbol === s || d.aliases.includes(s)));
}

/** Every unit symbol of a dimension, for "expected one of" messages. */
export function unitSymbols(dim: Dim): string[] {
  return UNITS.filter((d) => d.dim === dim).map((d) => d.symbol);
}

/** Converts a value in the named unit to SI base. */
export function toSI(value: number, symbol: string, dim: Dim): number {
  const def = findUnit(symbol, dim);
  if (!def) throw new Error(`unknown unit '${symbol}' for ${dim}`);
  return value * def.toSI;
}

/** Converts an SI value to the named unit. */
export function fromSI(valueSI: number, symbol: string, dim: Dim): number {
  const def = findUnit(symbol, dim);
  if (!def) throw new Error(`unknown unit '${symbol}' for ${dim}`);
  return valueSI / def.toSI;
}

/** The display unit of a dimension in a unit system. */
export function displayUnit(system: UnitSystem, dim: Dim): string {
  return SYSTEM_UNIT[system][dim];
}

export type QuantityParse =
  | { ok: true; si: number; unit: string }
  | { ok: false; reason: 'syntax' | 'unit' | 'dimension'; unit?: string; dimOf?: Dim[] };

/** Reads a number (taking the system's unit for dim) or a string "28 ft", "3.5 psf". */
export function parseQuantity(raw: number | string, dim: Dim, system: UnitSystem): QuantityParse {
  if (typeof raw === 'number') {
    if (!Number.isFinite(raw)) return { ok: false, reason: 'syntax' };
    const unit = SYSTEM_UNIT[system][dim];
    return { ok: true, si: toSI(raw, unit, dim), unit };
  }
  const m = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/.exec(raw);
  if (!m) return { ok: false, reason: 'syntax' };
  const value = Number(m[1]);
  const symbol = m[2] ?? '';
  if (symbol === '') {
    const unit = SYSTEM_UNIT[system][dim];
    return { ok: true, si: toSI(value, unit, dim), unit };
  }
  const def = findUnit(symbol, dim);
  if (def) return { ok: true, si: value * def.toSI, unit: def.symbol };
  const other = UNITS.filter((d) => d.symbol === symbol || d.aliases.includes(symbol)).map((d) => d.dim);
  if (other.length > 0) return { ok: false, reason: 'dimension', unit: symbol, dimOf: [...new Set(other)] };
  return { ok: false, reason: 'unit', unit: symbol };
}

/** Human text for a unit symbol: "kip*ft" prints as "kip·ft", "ft2" as "ft²". */
export function prettyUnit(symbol: string): string {
  return symbol
    .replace(/\*/g, '·')
    .replace(/([a-zA-Z])2\b/g, '$1²')
    .replace(/([a-zA-Z])3\b/g, '$1³')
    .replace(/([a-zA-Z])4\b/g, '$1⁴');
}

/**
 * Significant digits a quantity prints with, by kind. Four for what a checker reworks by hand
 * (dimensions, forces, moments, stresses, section properties: the last digit moves by at most
 * 0.05 %, well inside what the input is known to); three for natural frequencies, which the
 * lumped-mass model gives no better (common practice).
 */
export const DIGITS: Readonly<Record<Dim, number>> = {
  length: 4, section: 4, area: 4, force: 4, weight: 4, moment: 4, pressure: 4, stress: 4, density: 4, unitWeight: 4,
  lineLoad: 4, rotStiffness: 4, angle: 4, taper: 4, speed: 4, frequency: 3, sectionArea: 4, inertia: 4, modulus: 4,
  mass: 4, ratio: 4,
};

/** Formats an SI value in the display unit of the system, with the unit, to the digits of its kind. */
export function formatQuantity(valueSI: number, dim: Dim, system: UnitSystem, digits = DIGITS[dim]): string {
  const unit = displayUnit(system, dim);
  const v = fromSI(valueSI, unit, dim);
  const text = formatNumber(v, digits);
  return unit === '' ? text : `${text} ${prettyUnit(unit)}`;
}

