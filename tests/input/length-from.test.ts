// An arm dimensioned from the pole axis (lengthFrom: axis) is the same structure as the arm
// dimensioned from the pole face, once the face radius r at the attachment height is added to its
// length, to the positions on it and to its truck-gust lane: every analysis result must agree to
// round-off (both become the same frame; 1e-9 relative to the largest value).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { loadDesignText } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';

const SIGN = readFileSync('examples/cantilever-sign.yaml', 'utf8');

describe('arm lengths from the pole axis', () => {
  it('give the same results as the lengths from the face plus the face radius', () => {
    const face = loadDesignText(SIGN, 'face.yaml', {});
    const pole = face.design.pole;
    const arm = face.design.arms[0]!;
    // Face radius at the attachment height, from the pole's own taper (inches, as the file is).
    const r_in = ((pole.section.rootDiameter_m + ((pole.section.tipDiameter_m - pole.section.rootDiameter_m) * arm.attachHeight_m) / pole.height_m) / 2) / 0.0254;
    const doc = parseDocument(SIGN);
    const plus = (ft: number) => `${ft * 12 + r_in} in`;
    doc.setIn(['structure', 'arms', 0, 'lengthFrom'], 'axis');
    doc.setIn(['structure', 'arms', 0, 'length'], plus(36));
    for (const kind of ['panels', 'points']) {
      const list = doc.getIn(['attachments', kind]) as { items: unknown[] } | undefined;
      (list?.items ?? []).forEach((_, i) => {
        if (doc.getIn(['attachments', kind, i, 'on']) === 'A1') doc.setIn(['attachments', kind, i, 'position'], plus(Number(doc.getIn(['attachments', kind, i, 'position']))));
      });
    }
    doc.setIn(['loads', 'fatigue', 'truckGust', 'lanes', 0, 'from'], plus(9));
    doc.setIn(['loads', 'fatigue', 'truckGust', 'lanes', 0, 'to'], plus(36));
    const axis = loadDesignText(doc.toString(), 'axis.yaml', {});
    expect(axis.design.arms[0]!.length_m).toBeCloseTo(arm.length_m, 9);
    const a = analyseDesign(face.design, {});
    const b = analyseDesign(axis.design, {});
    for (const c of a.combinations) {
      const ra = a.results[c.id]!.reactions[0]!.force;
      const rb = b.results[c.id]!.reactions[0]!.force;
      const scale = Math.max(...ra.map(Math.abs));
      for (let k = 0; k < 6; k++) expect(Math.abs(ra[k]! - rb[k]!)).toBeLessThanOrEqual(1e-9 * scale);
    }
  });

  it('an attachment inside the pole is refused at its position', () => {
    const doc = parseDocument(SIGN);
    doc.setIn(['structure', 'arms', 0, 'lengthFrom'], 'axis');
    const list = doc.getIn(['attachments', 'points']) as { items: unknown[] } | undefined;
    const kind = list && list.items.length > 0 ? 'points' : 'panels';
    doc.setIn(['attachments', kind, 0, 'position'], '2 in');
    expect(() => loadDesignText(doc.toString(), 'x.yaml', {})).toThrow(/inside the pole|reaches past the pole face/);
  });
});
