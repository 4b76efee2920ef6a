// The same luminaire pole written in SI (examples/luminaire-twin.yaml) and in US units
// (tests/fixtures/luminaire-twin-us.yaml, converted by hand with the NIST SP 811 exact factors)
// must normalise to the same internal design, within 1e-9 relative on every number.
import { describe, expect, it } from 'vitest';
import { loadDesignFile } from '../../src/input/index.ts';

const REL_TOL = 1e-9;

/** Every difference between two values, numbers compared to a relative tolerance. */
function differences(a: unknown, b: unknown, path = ''): string[] {
  if (typeof a === 'number' && typeof b === 'number') {
    const scale = Math.max(Math.abs(a), Math.abs(b));
    return Math.abs(a - b) <= REL_TOL * scale + 1e-15 ? [] : [`${path}: ${a} vs ${b}`];
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return [`${path}: length ${a.length} vs ${b.length}`];
    return a.flatMap((x, i) => differences(x, b[i], `${path}[${i}]`));
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
    return keys.flatMap((k) => differences((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`));
  }
  return a === b ? [] : [`${path}: ${JSON.stringify(a)} vs ${JSON.stringify(b)}`];
}

describe('US and SI input give the same design', () => {
  it('luminaire-twin in SI and in US units normalise alike (1e-9 relative)', () => {
    const si = loadDesignFile('examples/luminaire-twin.yaml').design;
    const us = loadDesignFile('tests/fixtures/luminaire-twin-us.yaml').design;
    expect(si.units).toBe('si');
    expect(us.units).toBe('us');
    const { units: _a, ...siRest } = si;
    const { units: _b, ...usRest } = us;
    expect(differences(siRest, usRest)).toEqual([]);
  });

  it('the comparison can fail: a 1e-6 change in one input number is seen', () => {
    const si = loadDesignFile('examples/luminaire-twin.yaml').design;
    const changed = { ...si, pole: { ...si.pole, height_m: si.pole.height_m * (1 + 1e-6) } };
    expect(differences(si, changed)).toHaveLength(1);
  });
});
