// Unit conversion on input against NIST Special Publication 811 (2008), Appendix B.
// Exact factors: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N, 1 lb = 0.45359237 kg,
// 1 mph = 0.44704 m/s. Factors printed by NIST to 7 digits: 1 psf = 47.88026 Pa,
// 1 ksi = 6.894757 MPa, 1 pcf = 16.01846 kg/m3; these are checked to half a unit of the last printed digit.
import { describe, expect, it } from 'vitest';
import { parseQuantity, type Dim, type UnitSystem } from '../../src/units/units.ts';

function si(raw: number | string, dim: Dim, system: UnitSystem = 'us'): number {
  const r = parseQuantity(raw, dim, system);
  if (!r.ok) throw new Error(`did not parse: ${String(raw)} (${r.reason})`);
  return r.si;
}

describe('input units (NIST SP 811 Appendix B)', () => {
  it('exact length factors', () => {
    expect(si(1, 'length')).toBe(0.3048); // NIST SP 811: 1 ft = 0.3048 m exactly
    expect(si('28 ft', 'length')).toBeCloseTo(8.5344, 12); // 28 x 0.3048
    expect(si('0.25 in', 'section')).toBeCloseTo(0.00635, 15); // 0.25 x 0.0254
    expect(si(1, 'section')).toBe(0.0254); // bare number in a section field: inches (us)
    expect(si('8.5 m', 'length')).toBe(8.5);
    expect(si(250, 'section', 'si')).toBeCloseTo(0.25, 15); // bare number: mm (si)
  });

  it('exact force factors', () => {
    expect(si('1 lb', 'weight')).toBe(4.4482216152605); // NIST SP 811: 1 lbf = 4.4482216152605 N exactly
    expect(si(1, 'force')).toBeCloseTo(4448.2216152605, 9); // 1 kip = 1000 lbf
    expect(si('2.5 kN', 'force', 'si')).toBe(2500);
  });

  it('psf, ksi and pcf to the digits NIST prints', () => {
    expect(Math.abs(si('1 psf', 'pressure') - 47.88026)).toBeLessThan(0.5e-5); // NIST: 47.88026 Pa
    expect(Math.abs(si('3.5 psf', 'pressure') / 3.5 - 47.88026)).toBeLessThan(0.5e-5);
    expect(Math.abs(si(1, 'stress') / 1e6 - 6.894757)).toBeLessThan(0.5e-6); // NIST: 6.894757 MPa
    expect(Math.abs(si('29000 ksi', 'stress') / 29000 / 1e6 - 6.894757)).toBeLessThan(0.5e-6);
    expect(Math.abs(si('1 pcf', 'density') - 16.01846)).toBeLessThan(0.5e-5); // NIST: 16.01846 kg/m3
    expect(si('7850 kg/m3', 'density', 'si')).toBe(7850);
    expect(si(1.2, 'pressure', 'si')).toBeCloseTo(1200, 9); // bare number: kPa (si)
  });

  it('angles and speeds', () => {
    expect(si(90, 'angle')).toBeCloseTo(Math.PI / 2, 15);
    expect(si('90 deg', 'angle', 'si')).toBeCloseTo(Math.PI / 2, 15);
    expect(si('115 mph', 'speed')).toBeCloseTo(115 * 0.44704, 12); // NIST: 1 mph = 0.44704 m/s exactly
  });

  it('taper: in/ft and mm/m', () => {
    expect(si('0.14 in/ft', 'taper')).toBeCloseTo((0.14 * 0.0254) / 0.3048, 15);
    expect(si('12 mm/m', 'taper', 'si')).toBeCloseTo(0.012, 15);
  });

  it('a unit of the wrong dimension is refused, naming its dimension', () => {
    const r = parseQuantity('24 psf', 'length', 'us');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.reason).toBe('dimension');
      expect(r.dimOf).toContain('pressure');
    }
    const u = parseQuantity('3 furlong', 'length', 'us');
    expect(u.ok === false && u.reason).toBe('unit');
  });
});
