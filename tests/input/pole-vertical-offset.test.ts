// A vertical offset of an attachment on the pole (a bracket holding it above its position) is the
// same, for the base reactions, as the attachment moved up by that offset: by statics the loads
// and their moments about the base are the same (the frame between the two heights differs, the
// reactions do not). Round-off only: 1e-9 of the largest reaction.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDesignText } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';

const TWIN = readFileSync('examples/luminaire-twin.yaml', 'utf8');

describe('vertical offset on the pole', () => {
  it('moves the loads of the banner as raising its position does', () => {
    const from = 'position: 4.5         # m: height of the banner centre';
    expect(TWIN).toContain(from);
    const offset = TWIN.replace('offset: { lateral: 0.2, direction: 0 deg }', 'offset: { lateral: 0.2, direction: 0 deg, vertical: 0.5 }');
    const raised = TWIN.replace(from, 'position: 5.0');
    const a = analyseDesign(loadDesignText(offset, 'a.yaml', {}).design, { firstOrder: true });
    const b = analyseDesign(loadDesignText(raised, 'b.yaml', {}).design, { firstOrder: true });
    for (const c of a.combinations) {
      const ra = a.results[c.id]!.reactions[0]!.force;
      const rb = b.results[c.id]!.reactions[0]!.force;
      const scale = Math.max(...ra.map(Math.abs));
      for (let k = 0; k < 6; k++) expect(Math.abs(ra[k]! - rb[k]!), `${c.id} component ${k}`).toBeLessThanOrEqual(1e-9 * scale);
    }
  });
});
