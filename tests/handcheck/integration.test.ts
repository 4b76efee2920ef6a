// The quadrature under the moment-area integrals.
import { describe, expect, it } from 'vitest';
import { gaussLegendre, integratePiecewise } from '../../src/handcheck/gauss-legendre.ts';
import { momentAreaCheck } from '../../src/handcheck/moment-area.ts';
import { makeDesign, polySection, roundSection, testArm, testPole } from '../model/design-factory.ts';

describe('Gauss-Legendre rules', () => {
  it('the 2-point rule has nodes ±1/√3 and weights 1 (textbook value, e.g. Abramowitz & Stegun, Table 25.4)', () => {
    const r = gaussLegendre(2);
    expect(r.nodes[0]).toBeCloseTo(-1 / Math.sqrt(3), 14);
    expect(r.nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 14);
    expect(r.weights[0]).toBeCloseTo(1, 14);
  });
  it('the 3-point rule has nodes 0, ±√(3/5) and weights 8/9, 5/9 (textbook value, as above)', () => {
    const r = gaussLegendre(3);
    expect(r.nodes[1]).toBe(0);
    expect(r.nodes[2]).toBeCloseTo(Math.sqrt(0.6), 14);
    expect(r.weights[1]).toBeCloseTo(8 / 9, 14);
    expect(r.weights[0]).toBeCloseTo(5 / 9, 14);
  });
  it.each([1, 2, 3, 5, 8, 12])('the %i-point rule integrates x^k over [-1, 1] exactly for k ≤ 2n − 1 (∫ x^k = 2/(k+1) for even k, 0 for odd; calculus)', (n) => {
    const r = gaussLegendre(n);
    for (let k = 0; k <= 2 * n - 1; k++) {
      const q = r.nodes.reduce((t, x, i) => t + r.weights[i] * x ** k, 0);
      expect(q).toBeCloseTo(k % 2 === 0 ? 2 / (k + 1) : 0, 12);
    }
  });
  it('piecewise: a kinked integrand |x − 0.3| over [0, 1] split at the kink is exact (calculus: 0.045 + 0.245 = 0.29)', () => {
    expect(integratePiecewise((x) => Math.abs(x - 0.3), 0, 1, [0.3], { points: 2, panels: 1 })).toBeCloseTo(0.29, 14);
    // Without the split the kink costs accuracy: the split matters.
    expect(Math.abs(integratePiecewise((x) => Math.abs(x - 0.3), 0, 1, [], { points: 2, panels: 1 }) - 0.29)).toBeGreaterThan(1e-3);
  });
  it('∫ dx/(1 + x)⁴ over [0, 1] = (1 − 1/8)/3 (calculus) to 1e-12 with 5 points in 8 panels', () => {
    expect(integratePiecewise((x) => 1 / (1 + x) ** 4, 0, 1, [], { points: 5, panels: 8 })).toBeCloseTo(7 / 24, 12);
  });
});

describe('tapered members: the moment-area integrals converge', () => {
  // A strongly tapered pole and arm (3:1 and 2.5:1 diameters) with attachments and self-weight.
  // A low order (3 points, 4 panels) is within 1e-5 of a high one (8 points, 16 panels); the
  // package's default (5 points, 16 panels after the doubling) within 1e-11, and the error
  // estimate it prints is below 1e-9: the integral converges as the order rises.
  const designs = [
    ['round', makeDesign({ pole: testPole({ section: roundSection(0.6, 0.2, 0.008) }), arms: [testArm({ section: roundSection(0.3, 0.12, 0.005) })] })],
    ['16-sided', makeDesign({ pole: testPole({ section: polySection(16, 0.5, 0.22, 0.008) }), arms: [testArm({ section: polySection(12, 0.3, 0.12, 0.005) })] })],
  ] as const;
  it.each(designs)('%s', (_name, d) => {
    const low = momentAreaCheck(d, { points: 3, panels: 4 });
    const high = momentAreaCheck(d, { points: 8, panels: 16 });
    const def = momentAreaCheck(d);
    if (!low || !high || !def) throw new Error('no arm');
    for (const key of ['jointRotation_rad', 'jointSway_m', 'tipDrop_m'] as const) {
      const lowErr = Math.abs(low[key] - high[key]) / Math.abs(high[key]);
      const defErr = Math.abs(def[key] - high[key]) / Math.abs(high[key]);
      expect(lowErr).toBeLessThan(1e-5);
      expect(defErr).toBeLessThan(1e-11);
      expect(defErr).toBeLessThanOrEqual(lowErr);
    }
    expect(def.integrationError).toBeLessThan(1e-9);
    // Simpson on the printed 10-interval table is a coarse hand check of the same integral
    // (kinks at the load points fall between table points): within 2 %.
    expect(Math.abs(def.poleTable.simpsonCurvature - def.poleRotationIntegral_rad) / def.poleRotationIntegral_rad).toBeLessThan(0.02);
    expect(Math.abs(def.armTable.simpsonLevered - def.armDrop_m) / def.armDrop_m).toBeLessThan(0.02);
  });
});
