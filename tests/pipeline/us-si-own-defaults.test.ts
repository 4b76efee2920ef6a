// One structure entered in each unit system with the material left to that system's own defaults:
// SI takes round SI values (E = 200 000 MPa, G = 77 000 MPa, 7850 kg/m3: EN 1993-1-1 and
// EN 1991-1-1, from memory), US takes its own round values (E = 29 000 ksi, G = 11 200 ksi,
// 490 pcf: AISC Steel Construction Manual, from memory). The defaults are not converted from one
// another, so the answers differ, but only by the round-off between those stated values
// (E 0.026 %, G 0.29 %, density 0.012 %), never by more.
import { afterAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadDesignFile } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';

const ROOT = join(import.meta.dirname, '../..');
const dir = mkdtempSync(join(tmpdir(), 'polebook-own-defaults-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The input with its material block reduced to the yield strength, so E, G and density default. */
function withDefaultMaterial(file: string, name: string): string {
  const text = readFileSync(join(ROOT, file), 'utf8');
  const out = text.replace(/  material:[^\n]*\n(    [^\n]*\n)+/, '  material:\n    yieldStrength: 355 MPa\n');
  expect(out).not.toBe(text);
  const path = join(dir, name);
  writeFileSync(path, out);
  return path;
}

const PSI_PA = 6894.757; // NIST SP 811, as printed (7 digits)
const PCF_KGM3 = 16.01846; // NIST SP 811, as printed (7 digits)

describe('SI and US input of one structure, each with its own material defaults', () => {
  const siDesign = loadDesignFile(withDefaultMaterial('examples/luminaire-twin.yaml', 'si.yaml')).design;
  const usDesign = loadDesignFile(withDefaultMaterial('tests/fixtures/luminaire-twin-us.yaml', 'us.yaml')).design;

  it('takes round SI values in SI and round US values in US', () => {
    expect(siDesign.material.E_Pa).toBe(200000e6);
    expect(siDesign.material.G_Pa).toBe(77000e6);
    expect(siDesign.material.density_kgm3).toBe(7850);
    // within the 7 printed digits of the conversion factors
    const rel = (x: number, expected: number) => Math.abs(x / expected - 1);
    expect(rel(usDesign.material.E_Pa, 29000e3 * PSI_PA)).toBeLessThan(1e-6);
    expect(rel(usDesign.material.G_Pa, 11200e3 * PSI_PA)).toBeLessThan(1e-6);
    expect(rel(usDesign.material.density_kgm3, 490 * PCF_KGM3)).toBeLessThan(1e-6);
  });

  it('gives reactions and displacements that differ only by the round-off between the stated defaults', () => {
    const si = analyseDesign(siDesign, {});
    const us = analyseDesign(usDesign, {});
    // Relative round-off of each default between the systems; a result moves by at most the
    // largest of them that reaches it (plus the 1e-6 of the hand-converted geometry).
    const dE = Math.abs(usDesign.material.E_Pa / siDesign.material.E_Pa - 1);
    const dG = Math.abs(usDesign.material.G_Pa / siDesign.material.G_Pa - 1);
    const dRho = Math.abs(usDesign.material.density_kgm3 / siDesign.material.density_kgm3 - 1);
    expect(dE).toBeGreaterThan(1e-4);
    const stiffnessTol = Math.max(dE, dG) * 1.05 + 1e-6;
    const forceTol = dRho * 1.05 + 1e-6;
    let largestDisplacementDifference = 0;
    for (const id of Object.keys(si.results)) {
      const a = si.results[id]!;
      const b = us.results[id]!;
      const R = a.reactions[0]!.force;
      const scaleF = Math.max(...R.slice(0, 3).map(Math.abs));
      const scaleM = Math.max(...R.slice(3).map(Math.abs));
      for (let c = 0; c < 6; c++) {
        // Second order couples the moments to the stiffness; forces follow the weight only.
        const tol = c < 3 ? forceTol : forceTol + stiffnessTol;
        expect(Math.abs(b.reactions[0]!.force[c]! - R[c]!)).toBeLessThanOrEqual(tol * (c < 3 ? scaleF : scaleM));
      }
      const scaleU = Math.max(...a.displacements.flatMap((d) => d.slice(0, 3).map(Math.abs)));
      a.displacements.forEach((d, n) => {
        for (let c = 0; c < 3; c++) {
          const diff = Math.abs(b.displacements[n]![c]! - d[c]!) / scaleU;
          largestDisplacementDifference = Math.max(largestDisplacementDifference, diff);
          expect(diff).toBeLessThanOrEqual(stiffnessTol + forceTol);
        }
      });
    }
    // The defaults do differ, so the answers are not identical: the test sees the round-off.
    expect(largestDisplacementDifference).toBeGreaterThan(1e-5);
  });
});
