// How every number in the package is written: one formatter, so the same value reads the same
// everywhere (tables, steps, narrative, figures).
//
// - Significant digits, trailing zeros dropped ("1.1", not "1.100"); an ASCII minus.
// - Everyday magnitudes plain: 0.001 <= |v| < 100 000 ("0.00122", "48390", "29000").
// - Outside that range, engineering notation: a mantissa from 1 to below 1000 times a power of
//   ten that is a multiple of 3, written with the multiplication sign and a superscript
//   exponent, "23.39 × 10⁶", "75.05 × 10⁻⁶" (the SI Brochure, 9th ed., 5.4.3-5.4.4: a space on
//   either side of ×; from memory). Never "2.339e7", never "3145350". The spaces are no-break
//   spaces (U+00A0) so the layout cannot split "23.39 ×" from "10⁶". DejaVu Sans, the embedded
//   font, draws ×, the superscript digits and the superscript minus.
// - Tolerances and relative residuals (dimensionless, meaningful only by their order of
//   magnitude) one way: a power of ten with two significant digits, "1 × 10⁻⁶", "2.6 × 10⁻⁴".

/** The no-break space between the parts of "23.39 × 10⁶" (and between a number and its unit). */
export const NBSP = '\u00a0';

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
};

/** "10⁶", "10⁻¹²". */
export function powerOfTen(exponent: number): string {
  return `10${[...String(exponent)].map((c) => SUPERSCRIPT[c] ?? c).join('')}`;
}

/** Plain range: at or above this the number is written in engineering notation. */
export const PLAIN_BELOW = 1e5;
/** Plain range: below this (and not zero) the number is written in engineering notation. */
export const PLAIN_FROM = 1e-3;

/** Rounds to `digits` significant digits and writes the result without an exponent. */
function plain(v: number, digits: number): string {
  const mag = Math.floor(Math.log10(Math.abs(v)));
  const decimals = Math.max(0, digits - 1 - mag);
  let text: string;
  if (decimals > 0) {
    text = v.toFixed(Math.min(decimals, 20));
    text = text.replace(/0+$/, '').replace(/\.$/, '');
  } else {
    // round to significant digits left of the point: 187124 with 4 digits is 187100
    const step = 10 ** (mag - digits + 1);
    text = String(Math.round(v / step) * step);
  }
  return text === '-0' ? '0' : text;
}

/** Mantissa and exponent (a multiple of `every`) of v rounded to `digits` significant digits. */
function split(v: number, digits: number, every: number): { mantissa: number; exponent: number } {
  const rounded = Number(v.toPrecision(digits)); // rounding first: 999.96e3 becomes 1e6, not 1000 × 10³
  const mag = Math.floor(Math.log10(Math.abs(rounded)));
  const exponent = Math.floor(mag / every) * every;
  return { mantissa: rounded / 10 ** exponent, exponent };
}

/** Significant-figure formatting, engineering notation outside everyday magnitudes (see the top). */
export function formatNumber(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return String(v);
  if (v === 0) return '0';
  const rounded = Number(v.toPrecision(digits));
  const a = Math.abs(rounded);
  if (a >= PLAIN_FROM && a < PLAIN_BELOW) return plain(rounded, digits);
  const { mantissa, exponent } = split(v, digits, 3);
  return `${plain(mantissa, digits)}${NBSP}×${NBSP}${powerOfTen(exponent)}`;
}

/** A tolerance or relative residual: "1 × 10⁻⁶", "2.6 × 10⁻⁴"; 0 as "0"; ordinary fractions (0.05) plain. */
export function formatTolerance(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  if (v === 0) return '0';
  if (Math.abs(v) >= PLAIN_FROM && Math.abs(v) < PLAIN_BELOW) return plain(v, 2);
  const { mantissa, exponent } = split(v, 2, 1);
  const m = plain(mantissa, 2);
  return m === '1' ? `1${NBSP}×${NBSP}${powerOfTen(exponent)}` : `${m}${NBSP}×${NBSP}${powerOfTen(exponent)}`;
}

/** A fraction as a percentage: 0.0177 -> "1.77 %" (3 significant digits unless told). */
export function formatPercent(fraction: number, digits = 3): string {
  return `${formatNumber(100 * fraction, digits)}${NBSP}%`;
}

/** A demand/capacity ratio: three decimals, the way check ratios are compared with 1 ("0.277", "1.135"). */
export function formatRatio(ratio: number): string {
  return Number.isFinite(ratio) ? ratio.toFixed(3) : String(ratio);
}
