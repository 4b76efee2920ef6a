// The same structure entered in SI and in US customary units gives the same analysis: the
// unit system only changes reading and printing (the US twin's numbers were converted by hand
// with the NIST SP 811 factors; inputs carry 4 to 6 significant digits, so answers agree to
// the rounding of those inputs, 1e-6 relative to the largest value).
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';

const ROOT = join(import.meta.dirname, '../..');

describe('SI and US input of the same luminaire pole', () => {
  const si = analyseDesign(loadDesignFile(join(ROOT, 'examples/luminaire-twin.yaml')).design, {});
  const us = analyseDesign(loadDesignFile(join(ROOT, 'tests/fixtures/luminaire-twin-us.yaml')).design, {});

  it('builds the same model and the same combinations', () => {
    expect(us.model.nodes.length).toBe(si.model.nodes.length);
    expect(us.combinations.map((c) => c.id)).toEqual(si.combinations.map((c) => c.id));
  });

  it('gives the same reactions, displacements and base-moment amplification in every combination', () => {
    for (const id of Object.keys(si.results)) {
      const a = si.results[id]!;
      const b = us.results[id]!;
      const R = a.reactions[0]!.force;
      const scaleF = Math.max(...R.slice(0, 3).map(Math.abs));
      const scaleM = Math.max(...R.slice(3).map(Math.abs));
      for (let c = 0; c < 6; c++) expect(Math.abs(b.reactions[0]!.force[c]! - R[c]!)).toBeLessThan(1e-6 * (c < 3 ? scaleF : scaleM));
      const scaleU = Math.max(...a.displacements.flatMap((d) => d.slice(0, 3).map(Math.abs)));
      a.displacements.forEach((d, n) => {
        for (let c = 0; c < 3; c++) expect(Math.abs(b.displacements[n]![c]! - d[c]!)).toBeLessThan(1e-6 * scaleU);
      });
      expect(b.baseMoment?.amplification ?? 1).toBeCloseTo(a.baseMoment?.amplification ?? 1, 6);
    }
  });

  it('gives the same first natural frequency', () => {
    expect(Math.abs(us.modes[0]!.frequency_Hz / si.modes[0]!.frequency_Hz - 1)).toBeLessThan(1e-6);
  });
});
