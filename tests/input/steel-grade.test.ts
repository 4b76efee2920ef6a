// A named tube steel grade sets the minimum yield strength: EN 10025-2 S355, 355 MPa for
// thicknesses up to 16 mm, and ASTM A572 Grade 65, 65 ksi (both from memory of the standards'
// tables of mechanical properties). Naming a grade and a yield strength together is refused.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { loadDesignText } from '../../src/input/index.ts';
import { InputError } from '../../src/errors.ts';

const SIGN = readFileSync('examples/cantilever-sign.yaml', 'utf8');
const KSI = 6.894757e6; // NIST SP 811, Pa per ksi

function withMaterial(material: Record<string, string>): string {
  const doc = parseDocument(SIGN);
  doc.setIn(['structure', 'material'], material);
  return doc.toString();
}

describe('structure.material.grade', () => {
  it('sets Fy from the grade, printed as given with its source', () => {
    const s355 = loadDesignText(withMaterial({ grade: 'S355' }), 'g.yaml', {}).design;
    expect(s355.material.Fy_Pa).toBe(355e6);
    const a572 = loadDesignText(withMaterial({ grade: 'A572-65' }), 'g.yaml', {}).design;
    expect(Math.abs(a572.material.Fy_Pa / (65 * KSI) - 1)).toBeLessThan(1e-6);
    const note = a572.assumptions.find((a) => a.key === 'structure.material.grade');
    expect(note?.defaulted).toBe(false);
    expect(note?.source).toContain('ASTM A572');
  });

  it('refuses a grade with a yield strength, and a grade it does not know', () => {
    expect(() => loadDesignText(withMaterial({ grade: 'S355', yieldStrength: '50 ksi' }), 'g.yaml', {})).toThrow(InputError);
    try {
      loadDesignText(withMaterial({ grade: 'S355', yieldStrength: '50 ksi' }), 'g.yaml', {});
    } catch (e) {
      expect(String((e as Error).message)).toMatch(/grade or the yield strength, not both/);
    }
    expect(() => loadDesignText(withMaterial({ grade: 'S999' }), 'g.yaml', {})).toThrow(InputError);
  });
});
