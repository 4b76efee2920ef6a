// A pole without an arm (a luminaire on the pole itself): the package has no hand-check section,
// which would be a page holding one sentence, and its scope says the hand check is not made and why.
import { describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { starterInput } from '../../src/input/index.ts';
import { loadTextForBuild, packageOf } from '../../src/pipeline.ts';
import { HAND_CHECK_TITLE } from '../../src/report/sections/hand-check-section.ts';
import { readPdfText } from '../support/pdf-text.ts';

describe('a pole without an arm', () => {
  it('leaves the hand check out and says so in the scope', async () => {
    const doc = parseDocument(starterInput('luminaire-pole', 'si'));
    doc.setIn(['structure', 'arms'], doc.createNode([]));
    doc.setIn(['attachments', 'points', 0, 'on'], 'pole');
    doc.setIn(['attachments', 'points', 0, 'position'], 8.5);
    const loaded = loadTextForBuild(doc.toString(), 'no-arm.yaml', { env: { SOURCE_DATE_EPOCH: '1767225600' } });
    expect(loaded.design.arms).toEqual([]);
    const built = await packageOf(loaded, { env: { SOURCE_DATE_EPOCH: '1767225600' } });
    expect(built.document.sections.map((s) => s.id)).not.toContain('hand-check');
    const text = (await readPdfText(built.pdf)).pages.join('\n').replace(/\s+/g, ' ');
    expect(text).toContain(`${HAND_CHECK_TITLE}: not made (the design has no arm`);
    expect(text).not.toContain('no in-plane arm case');
  }, 60_000);
});
