// A very long project name and a 75 ft signal arm keep the layout (issue 9, tests without system
// tools): examples/signal-support.yaml with its name made 168 characters long and its arm SA 75 ft,
// read back in-process with pdfjs-dist: every page still carries the structure id and "page N of M",
// no text runs past the 56 pt side margins, and the running header stays one line.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseDocument } from 'yaml';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildPackage } from '../../src/pipeline.ts';
import { readPdfText, type PdfText } from '../support/pdf-text.ts';

const ROOT = join(import.meta.dirname, '..', '..');
const LONG_NAME = 'Quarry Road at Fenwick Avenue and the Northern Distributor Link, signal replacement under the corridor safety programme, stage 2 of 3, with pedestrian crossing upgrades';

let text: PdfText;
let structureId = '';

beforeAll(async () => {
  const doc = parseDocument(readFileSync(join(ROOT, 'examples', 'signal-support.yaml'), 'utf8'));
  doc.setIn(['project', 'name'], LONG_NAME);
  doc.setIn(['structure', 'arms', 0, 'length'], 75);
  structureId = String(doc.getIn(['project', 'structureId']));
  const dir = mkdtempSync(join(tmpdir(), 'polebook-long-'));
  try {
    writeFileSync(join(dir, 'long.yaml'), doc.toString());
    const built = await buildPackage(join(dir, 'long.yaml'), { env: { SOURCE_DATE_EPOCH: '1767225600' } });
    text = await readPdfText(built.pdf);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}, 120_000);

describe('a very long project name and a 75 ft arm', () => {
  it('the name is long enough to test the layout', () => {
    expect(LONG_NAME.length).toBeGreaterThanOrEqual(150);
  });

  it('every page carries the structure id and "page N of M"', () => {
    const m = text.pageCount;
    text.pages.forEach((page, k) => {
      expect(page, `page ${k + 1}`).toContain(structureId);
      expect(page, `page ${k + 1}`).toContain(`page ${k + 1} of ${m}`);
    });
  });

  it('no text runs past the 56 pt side margins', () => {
    const outside: string[] = [];
    text.words.forEach((words, k) => {
      const width = text.sizes[k]![0];
      for (const w of words) if (w.x < 56 - 2 || w.x + w.width > width - 56 + 2) outside.push(`page ${k + 1}: '${w.str}'`);
    });
    expect(outside).toEqual([]);
  });

  // The header cuts a long project name with an ellipsis so it and the status stay on one line.
  it('the running header of a body page stays on one line, above the body', () => {
    // the header is the page's first line; a wrapped header would put part of the name on the second
    for (const [k, page] of text.pages.entries()) {
      if (k === 0) continue; // the cover has a title block instead
      const lines = page.split('\n');
      expect(lines[0], `page ${k + 1}`).toMatch(/DRAFT FOR REVIEW|ISSUED/);
      expect(lines[1] ?? '', `page ${k + 1}`).not.toMatch(/^(?:pedestrian|crossing|upgrades)/);
    }
  });
});
