// Implausible magnitudes load with a warning that names the likely slip.
// Ranges (ours, common practice): design wind pressures are tens of psf (about 0.5-3 kPa) while
// basic wind speeds are about 90-180 mph (40-80 m/s); sign panels weigh a few psf; polebook's
// scope is poles up to 60 ft (18.3 m), a limit of ours; pole and arm tubes have D/t of about 10-200
// (common practice).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDesignText } from '../../src/input/index.ts';

const SIGN = readFileSync('examples/cantilever-sign.yaml', 'utf8');
const TWIN = readFileSync('examples/luminaire-twin.yaml', 'utf8');
const env = {};

function swap(text: string, from: string, to: string): string {
  expect(text).toContain(from);
  return text.replace(from, to);
}

describe('plausibility warnings', () => {
  it('the examples load without warnings', () => {
    expect(loadDesignText(SIGN, 'sign.yaml', env).warnings).toEqual([]);
    expect(loadDesignText(TWIN, 'twin.yaml', env).warnings).toEqual([]);
  });

  it('a wind speed typed as a pressure (US): 115 in a psf field', () => {
    const text = swap(SIGN, 'panels: 42 psf', 'panels: 115');
    const { warnings, design } = loadDesignText(text, 'sign.yaml', env);
    expect(design.wind.panelsPressure_Pa).toBeGreaterThan(0);
    expect(warnings).toHaveLength(1);
    const w = warnings[0];
    expect(w.severity).toBe('warning');
    expect(w.path).toBe('loads.wind.panels');
    expect(w.message).toContain('basic wind speed in mph');
    expect(text.split('\n')[w.line - 1].slice(w.col - 1)).toMatch(/^115/);
  });

  it('a wall typed in the wrong unit: 0.05 in on a 24 in pole (D/t 480) is warned at the wall', () => {
    const text = swap(SIGN, '      wall: 0.5             # in', '      wall: 0.05            # in');
    const { warnings } = loadDesignText(text, 'sign.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['structure.pole.section.wall']);
    expect(warnings[0].message).toContain('D/t = 480');
    expect(text.split('\n')[warnings[0].line - 1].slice(warnings[0].col - 1)).toMatch(/^0\.05/);
  });

  it('a wall thicker than a tenth of the diameter (D/t 8 on a 16 in arm) is warned at the arm wall', () => {
    const text = swap(SIGN, '        wall: 0.375         # in (3/8)', '        wall: 2             # in');
    const { warnings } = loadDesignText(text, 'sign.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['structure.arms[0].section.wall']);
    expect(warnings[0].message).toContain('D/t = 8 ');
  });

  it('a wind speed typed as a pressure (SI): 45 in a kPa field', () => {
    const text = swap(TWIN, 'pressure: 1.1 ', 'pressure: 45 ');
    const { warnings } = loadDesignText(text, 'twin.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['loads.wind.pressure']);
    expect(warnings[0].message).toContain('basic wind speed in m/s');
  });

  it('a normal pressure gives no warning, a kPa number in a psf field does', () => {
    expect(loadDesignText(swap(SIGN, 'panels: 42 psf', 'panels: 60'), 's.yaml', env).warnings).toEqual([]);
    const low = loadDesignText(swap(SIGN, 'panels: 42 psf', 'panels: 1.9'), 's.yaml', env).warnings;
    expect(low[0].message).toContain('kPa');
  });

  it('a pole taller than our scope', () => {
    const text = swap(SIGN, 'height: 26              # ft', 'height: 70              # ft');
    const { warnings } = loadDesignText(text, 'sign.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['structure.pole.height']);
    expect(warnings[0].message).toContain("polebook's scope of 60 ft");
    expect(warnings[0].message).toContain('a limit of ours');
  });

  it("a panel's whole weight typed as weight per area", () => {
    const text = swap(SIGN, 'weightPerArea: 3.5    # psf', 'weightPerArea: 290    # psf');
    const { warnings } = loadDesignText(text, 'sign.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['attachments.panels[0].weightPerArea']);
    expect(warnings[0].message).toContain("whole weight");
  });

  it('warnings ride along with errors in an InputError, after them', () => {
    const text = swap(swap(SIGN, 'panels: 42 psf', 'panels: 115'), 'attachHeight: 24', 'attachHeight: 30');
    try {
      loadDesignText(text, 'sign.yaml', env);
      expect.unreachable();
    } catch (e) {
      const ds = (e as { diagnostics: { severity: string; path: string }[] }).diagnostics;
      expect(ds.map((d) => [d.severity, d.path])).toEqual([
        ['error', 'structure.arms[0].attachHeight'],
        ['warning', 'loads.wind.panels'],
      ]);
    }
  });
});

describe('values that are likely mistakes load with a warning at their key', () => {
  // Mast arms rise 0 to 15 deg (common practice); above 60 deg an arm is nearly vertical.
  it('an arm rising 70 deg', () => {
    const { warnings } = loadDesignText(swap(SIGN, 'rise: 0 deg           # horizontal arm', 'rise: 70 deg'), 'sign.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['structure.arms[0].rise']);
    expect(warnings[0]!.message).toContain('nearly vertical');
  });
  it('two arms at one height and one plan direction', () => {
    const { warnings } = loadDesignText(swap(TWIN, 'direction: 270 deg', 'direction: 90 deg'), 'twin.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['structure.arms[1].direction']);
    expect(warnings[0]!.message).toContain('lie on one another');
  });
  it('an attachment offset larger than the structure (80 m below a 2.5 m arm on a 10 m pole)', () => {
    const { warnings } = loadDesignText(swap(TWIN, 'offset: { vertical: -0.08 }   # m', 'offset: { vertical: -80 }   # m'), 'twin.yaml', env);
    expect(warnings.map((w) => w.path)).toEqual(['attachments.points[0].offset.vertical']);
    expect(warnings[0]!.message).toContain('larger than the structure itself');
  });
});
