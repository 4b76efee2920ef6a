// How numbers print: engineering notation outside everyday magnitudes (issue 9: "23.39 × 10⁶ mm⁴,
// never 2.339e7 or 3145350"), significant digits, tolerances one way, a unit weight for US densities,
// ids that do not break at their hyphens, round-off as 0.
import { describe, expect, it } from 'vitest';
import { qty, type CalcStep } from '../../src/calc/step.ts';
import { NON_BREAKING_HYPHEN, textWithUnbrokenIds, unbrokenId } from '../../src/report/format/unbroken-ids.ts';
import { display } from '../../src/report/sections/display.ts';
import { cleanSteps, roundOffShare, withoutRoundOff } from '../../src/report/sections/round-off.ts';
import { formatNumber, formatPercent, formatQuantity, formatRatio, formatTolerance, IN_M, LBF_N, FT_M } from '../../src/units/units.ts';

/** The printed text with its no-break spaces read as spaces. */
const read = (s: string) => s.replace(/\u00a0/g, ' ');

describe('engineering notation', () => {
  it('the issue\'s examples: 2.339e7 mm⁴ prints as 23.39 × 10⁶ mm⁴, 3145350 mm⁴ as 3.145 × 10⁶ mm⁴', () => {
    expect(read(formatNumber(2.339e7))).toBe('23.39 × 10⁶');
    expect(read(formatNumber(3145350))).toBe('3.145 × 10⁶');
    // an SI section property through formatQuantity: 2.339e7 mm⁴ = 2.339e-5 m⁴ (1 mm⁴ = 1e-12 m⁴)
    expect(read(formatQuantity(2.339e-5, 'inertia', 'si'))).toBe('23.39 × 10⁶ mm⁴');
  });

  it('the exponent is a multiple of 3 and the mantissa from 1 to below 1000 (engineering notation)', () => {
    expect(read(formatNumber(187124))).toBe('187.1 × 10³');
    expect(read(formatNumber(1.5e9))).toBe('1.5 × 10⁹');
    expect(read(formatNumber(7.505e-5))).toBe('75.05 × 10⁻⁶');
    expect(read(formatNumber(-4.2e-13))).toBe('-420 × 10⁻¹⁵');
    // rounding can carry into the next power: 999 960 to 4 digits is 1.000 × 10⁶, not "1000 × 10³"
    expect(read(formatNumber(999960))).toBe('1 × 10⁶');
  });

  it('everyday magnitudes stay plain, to the significant digits asked, trailing zeros dropped', () => {
    expect(formatNumber(48387)).toBe('48390');
    expect(formatNumber(29000)).toBe('29000');
    expect(formatNumber(0.0012204)).toBe('0.00122');
    expect(formatNumber(1.1)).toBe('1.1');
    expect(formatNumber(-0.06016)).toBe('-0.06016');
    expect(formatNumber(99.349, 3)).toBe('99.3');
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(-1e-30 * 0)).toBe('0');
  });

  it('the parts of "23.39 × 10⁶" are held together by no-break spaces', () => {
    expect(formatNumber(2.339e7)).toBe('23.39\u00a0×\u00a010⁶');
  });

  it('never an e-exponent and never a bare integer of 6 or more digits, over many magnitudes', () => {
    for (let e = -15; e <= 15; e += 0.37) {
      for (const sign of [1, -1]) {
        const text = formatNumber(sign * 1.234567 * 10 ** e);
        expect(text, text).not.toMatch(/e[-+]?\d/);
        expect(text, text).not.toMatch(/(?<![.\d])\d{6}/); // an integer part of six digits or more
      }
    }
  });
});

describe('digits by kind of quantity', () => {
  it('four significant digits for dimensions and forces, three for natural frequencies', () => {
    // NIST SP 811 (2008) App. B: 1 ft = 0.3048 m; 7.6 m / 0.3048 = 24.934 ft
    expect(formatQuantity(7.6, 'length', 'us')).toBe('24.93 ft');
    expect(formatQuantity(1.4927, 'frequency', 'si')).toBe('1.49 Hz');
  });
});

describe('tolerances, percentages and ratios, each written one way', () => {
  it('a tolerance or relative residual as a power of ten with two significant digits', () => {
    expect(read(formatTolerance(1e-6))).toBe('1 × 10⁻⁶');
    expect(read(formatTolerance(1e-9))).toBe('1 × 10⁻⁹');
    expect(read(formatTolerance(2.634e-4))).toBe('2.6 × 10⁻⁴');
    expect(read(formatTolerance(1.91e-11))).toBe('1.9 × 10⁻¹¹');
    expect(formatTolerance(0.05)).toBe('0.05');
    expect(formatTolerance(0)).toBe('0');
  });

  it('percentages and demand/capacity ratios', () => {
    expect(read(formatPercent(0.0177))).toBe('1.77 %');
    expect(formatRatio(1.1349)).toBe('1.135');
    expect(formatRatio(0.2771)).toBe('0.277');
  });
});

describe('unit weight in US units', () => {
  it('a density prints in US units as the unit weight it gives, in lb/ft³', () => {
    // 7850 kg/m³ × 9.80665 m/s² (standard gravity, NIST SP 330) = 76 982 N/m³;
    // 1 lb/ft³ = 4.4482216152605 N / 0.3048³ m³ = 157.0875 N/m³ (NIST SP 811 App. B): 490.06 lb/ft³
    expect(display('us').q(7850, 'density')).toBe('490.1 lb/ft³');
    expect(display('si').q(7850, 'density')).toBe('7850 kg/m³');
    expect(formatQuantity((490 * LBF_N) / FT_M ** 3, 'unitWeight', 'us')).toBe('490 lb/ft³');
    expect(formatQuantity(76.98e3, 'unitWeight', 'si')).toBe('76.98 kN/m³');
  });
});

describe('combination ids do not break at their hyphens', () => {
  it('hyphens of an id become U+2011 (DejaVu Sans draws it), a break is allowed after its @', () => {
    expect(unbrokenId('ext-1@wind-270')).toBe(`ext${NON_BREAKING_HYPHEN}1@\u200bwind${NON_BREAKING_HYPHEN}270`);
    const t = textWithUnbrokenIds(['ext-1@wind-270', 'wind-270', 'str-1']);
    expect(t('under ext-1@wind-270 and wind-270; str-10 and a well-known str-1.')).toBe(
      `under ${unbrokenId('ext-1@wind-270')} and ${unbrokenId('wind-270')}; str-10 and a well-known ${unbrokenId('str-1')}.`,
    );
  });
});

describe('round-off prints as 0, judged against the largest value of its kind', () => {
  it('a step quantity at or below 1e-9 of the largest of its kind becomes 0, others are kept', () => {
    const step = (F: number): CalcStep => ({ description: 'x', symbol: 'F', formula: 'F', substituted: [qty(F, 'force'), ' × ', qty(2 * IN_M, 'section')], result: qty(F, 'force'), source: 's', status: 'info' });
    const [a, b, c] = cleanSteps([step(4000), step(3.9e-14), step(0.05)]);
    expect(a!.result.si).toBe(4000);
    expect(b!.result.si).toBe(0);
    expect(c!.result.si).toBe(0.05);
  });

  it('in second order the iteration tolerance sets the share; in first order arithmetic round-off', () => {
    expect(roundOffShare({ secondOrder: false, tolerance: 1e-6 })).toBe(1e-9);
    expect(roundOffShare({ secondOrder: true, tolerance: 1e-6 })).toBe(1e-6);
    expect(withoutRoundOff(2.7e-5, 21.4, 1e-6)).toBe(2.7e-5);
    expect(withoutRoundOff(2.0e-5, 21.4, 1e-6)).toBe(0);
  });
});
