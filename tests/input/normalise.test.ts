// Behaviour of the input stage beyond single mistakes: all problems at once, the package
// date, wind directions, defaults with their sources, the JSON Schema, the input hash.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.ts';
import { DEFAULTS, designJsonSchema, inputHash, loadDesignFile, loadDesignText } from '../../src/input/index.ts';

const SIGN = readFileSync('examples/cantilever-sign.yaml', 'utf8');
const TWIN = readFileSync('examples/luminaire-twin.yaml', 'utf8');
const DEG = Math.PI / 180;

function swap(text: string, from: string, to: string): string {
  expect(text).toContain(from);
  return text.replace(from, to);
}

function errorsOf(text: string): InputError {
  try {
    loadDesignText(text, 'x.yaml', {});
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('no error');
}

describe('validation reports every problem at once', () => {
  it('three independent mistakes give three diagnostics in file order', () => {
    let text = swap(SIGN, 'height: 26              # ft', 'height: 26 psf          # ft');
    text = swap(text, 'attachHeight: 24', 'attachHieght: 24');
    text = swap(text, 'weightPerArea: 3.5    # psf', 'weightPerArea: lots   # psf');
    const err = errorsOf(text);
    expect(err.diagnostics.map((d) => d.path)).toEqual([
      'structure.pole.height',
      'structure.arms[0].attachHieght',
      'attachments.panels[0].weightPerArea',
    ]);
    const lines = err.diagnostics.map((d) => d.line);
    expect([...lines].sort((a, b) => a - b)).toEqual(lines);
  });

  it('geometry problems are all reported together', () => {
    let text = swap(SIGN, 'attachHeight: 24', 'attachHeight: 30');
    text = swap(text, 'position: 29', 'position: 40');
    const err = errorsOf(text);
    expect(err.diagnostics.map((d) => d.path)).toEqual(['structure.arms[0].attachHeight', 'attachments.panels[1].position']);
  });

  it('a missing file is bad input (exit 2) naming the file without a line and column, not a crash', () => {
    expect(() => loadDesignFile('examples/no-such-file.yaml')).toThrow(
      expect.objectContaining({ exitCode: 2, file: 'examples/no-such-file.yaml', message: 'cannot read the input file examples/no-such-file.yaml: there is no such file' }),
    );
  });
});

describe('package date', () => {
  const noDate = swap(SIGN, '  date: 2026-02-16                  # date printed on the package (else SOURCE_DATE_EPOCH)\n', '');
  it('comes from the input first', () => {
    expect(loadDesignText(SIGN, 'x.yaml', { SOURCE_DATE_EPOCH: '0' }).design.project.date).toBe('2026-02-16');
  });
  it('else from SOURCE_DATE_EPOCH as a UTC date', () => {
    // 1767225600 s after 1970-01-01T00:00Z is 2026-01-01T00:00Z (365 days after 1735689600 = 2025-01-01).
    expect(loadDesignText(noDate, 'x.yaml', { SOURCE_DATE_EPOCH: '1767225600' }).design.project.date).toBe('2026-01-01');
    expect(loadDesignText(noDate, 'x.yaml', { SOURCE_DATE_EPOCH: '1767225599' }).design.project.date).toBe('2025-12-31');
  });
  it('else from the newest revision', () => {
    expect(loadDesignText(noDate, 'x.yaml', {}).design.project.date).toBe('2026-02-16');
  });
});

describe('wind directions', () => {
  it('sign: along the arm, both normals (shared by the panels), plus the added 45 deg', () => {
    const d = loadDesignFile('examples/cantilever-sign.yaml').design;
    expect(d.wind.directions.map((w) => Math.round(w.angle_rad / DEG))).toEqual([0, 90, 270, 45]);
    expect(d.wind.directions[1].label).toContain('panel S1');
    expect(d.wind.directions[3].label).toBe('added in the input');
  });
  it('a panel on an arm faces square to the arm (arm direction + 90 deg)', () => {
    const text = swap(SIGN, 'direction: 0 deg      # plan direction', 'direction: 30 deg     # plan direction');
    const d = loadDesignText(text, 'x.yaml', {}).design;
    const panel = d.attachments.find((a) => a.kind === 'panel');
    expect(panel && panel.kind === 'panel' && panel.faceNormal_rad).toBeCloseTo(120 * DEG, 12);
    expect(d.wind.directions.map((w) => Math.round(w.angle_rad / DEG))).toEqual([30, 120, 300, 45]);
  });
  it('an added angle equal to an automatic one is not analysed twice', () => {
    const text = swap(SIGN, 'add: [45 deg]', 'add: [45 deg, 90, 45.0000001 deg]');
    const d = loadDesignText(text, 'x.yaml', {}).design;
    expect(d.wind.directions).toHaveLength(4);
  });
  it('an added angle outside 0 to 360 deg is refused, not wrapped around', () => {
    for (const bad of ['"-270 deg"', '405 deg', '360 deg']) {
      const text = swap(SIGN, 'add: [45 deg]', `add: [45 deg, ${bad}]`);
      expect(() => loadDesignText(text, 'x.yaml', {})).toThrow(/outside 0 to 360 deg/);
    }
  });
  it('a pole panel takes its own face direction', () => {
    const d = loadDesignFile('examples/luminaire-twin.yaml').design;
    const banner = d.attachments.find((a) => a.id === 'B1');
    expect(banner && banner.kind === 'panel' && banner.faceNormal_rad).toBe(0);
  });
});

describe('defaults and assumptions', () => {
  it('every default is recorded with a source, and values given are marked as input', () => {
    const d = loadDesignFile('examples/luminaire-twin.yaml').design;
    for (const a of d.assumptions) {
      if (a.defaulted) expect(a.source).toMatch(/verify|common practice|polebook default|from memory/);
      else expect(a.source).toMatch(/^(input|computed from)/);
    }
    // A US input without material takes the US defaults; an SI input the round SI values.
    const us = loadDesignText(readFileSync('tests/fixtures/luminaire-twin-us.yaml', 'utf8').replace(/  material:[^\n]*\n(    [^\n]*\n)+/, ''), 'us.yaml', {}).design;
    const E = us.assumptions.find((a) => a.key === 'structure.material.E');
    expect(E).toMatchObject({ defaulted: true, dim: 'stress', source: DEFAULTS.materialE.source });
    // 29000 ksi = 29000 x 6.894757 MPa (NIST SP 811), to the 7 printed digits.
    expect(Math.abs((E?.value as number) / 1e6 / 29000 - 6.894757)).toBeLessThan(0.5e-6);
    expect(us.material.E_Pa).toBe(E?.value);
    const density = us.assumptions.find((a) => a.key === 'structure.material.density');
    expect(Math.abs((density?.value as number) / 490 - 16.01846)).toBeLessThan(0.5e-5); // NIST: 1 pcf = 16.01846 kg/m3
    const si = loadDesignText(readFileSync('examples/luminaire-twin.yaml', 'utf8').replace(/  material:[^\n]*\n(    [^\n]*\n)+/, ''), 'si.yaml', {}).design;
    expect(si.material).toEqual({ E_Pa: 200e9, G_Pa: 77e9, Fy_Pa: 355e6, density_kgm3: 7850 });
    expect(si.assumptions.find((a) => a.key === 'structure.material.E')).toMatchObject({ defaulted: true, source: DEFAULTS.materialE.si!.source });
    const sign = loadDesignFile('examples/cantilever-sign.yaml').design;
    expect(sign.assumptions.find((a) => a.key === 'structure.material.yieldStrength')).toMatchObject({ defaulted: false, source: 'input' });
  });

  it('every default source says where it is from or asks for verification', () => {
    for (const def of Object.values(DEFAULTS)) {
      expect(def.source).toMatch(/verify|common practice|polebook default|from memory/);
    }
  });

  it('default combinations are labelled and gain an ice combination only with ice', () => {
    const sign = loadDesignFile('examples/cantilever-sign.yaml').design;
    expect(sign.combinations.map((c) => c.id)).toEqual(['strength-dead', 'extreme-wind-max', 'extreme-wind-min', 'service-wind', 'extreme-ice', 'service-dead']);
    for (const c of sign.combinations) expect(c.source).toMatch(/^default, verify against the governing code/);
    expect(sign.combinations[1].factors).toEqual({ dead: 1.1, wind: 1.0 });
    expect(sign.combinations[4].factors).toEqual({ dead: 1.1, ice: 1.0, 'ice-wind': 1.0 });
    const twin = loadDesignFile('examples/luminaire-twin.yaml').design;
    expect(twin.combinations.map((c) => c.id)).not.toContain('extreme-ice');
  });

  it('the service wind factor reaches the service combination', () => {
    const text = swap(TWIN, 'criteria:\n', 'criteria:\n  serviceWindFactor: 0.75\n');
    const d = loadDesignText(text, 'x.yaml', {}).design;
    expect(d.combinations.find((c) => c.id === 'service-wind')?.factors).toEqual({ dead: 1.0, wind: 0.75 });
  });

  it('G from the Poisson ratio: G = E / (2 (1 + nu))', () => {
    const text = TWIN.replace(/  material:[^\n]*\n(    [^\n]*\n)+/, '  material: { E: 200000, poissonRatio: 0.3 }\n');
    expect(text).toContain('poissonRatio');
    const d = loadDesignText(text, 'x.yaml', {}).design;
    expect(d.material.G_Pa).toBeCloseTo(200e9 / 2.6, 0);
  });

  it('tapered sections: root and taper give the tip', () => {
    const d = loadDesignFile('examples/luminaire-twin.yaml').design;
    // 250 mm - 12 mm/m x 10 m = 130 mm
    expect(d.pole.section.tipDiameter_m).toBeCloseTo(0.13, 12);
  });
});

describe('JSON Schema and hash', () => {
  it('the JSON Schema has our top-level keys and refuses unknown ones', () => {
    const s = designJsonSchema() as { properties: Record<string, unknown>; required: string[]; additionalProperties: boolean };
    expect(Object.keys(s.properties)).toEqual(['formatVersion', 'units', 'project', 'structure', 'attachments', 'loads', 'combinations', 'criteria', 'analysis', 'compare']);
    expect(s.required).toEqual(['formatVersion', 'units', 'project', 'structure', 'loads']);
    expect(s.additionalProperties).toBe(false);
    expect(JSON.stringify(s)).toContain('29000 ksi');
  });

  it('inputHash is the first 12 hex digits of SHA-256 (FIPS 180-2 test vector "abc")', () => {
    // FIPS 180-2 Appendix B.1: SHA-256("abc") = ba7816bf 8f01cfea ...
    expect(inputHash('abc')).toBe('ba7816bf8f01');
  });
});
