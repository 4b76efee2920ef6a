// Page-flow rules of the renderer, on hand-made document models: long tables repeat their
// title and header rows on every page; a heading never sits alone at the foot of a page.
import { describe, expect, it } from 'vitest';
import type { Block, DocumentModel } from '../../src/report/document.ts';
import { renderPdf } from '../../src/report/pdf/render-pdf.ts';
import { readPdfText } from '../support/pdf-text.ts';

const META: DocumentModel['meta'] = {
  projectName: 'Layout test',
  structureId: 'LT-01',
  structureKind: 'Luminaire pole',
  location: 'nowhere',
  owner: 'nobody',
  revision: '0',
  revisionDate: '2026-01-02',
  status: 'DRAFT FOR REVIEW',
  date: '2026-01-02',
  inputHash: '0123456789ab',
  inputFile: 'layout.yaml',
  toolVersion: '0.0.0',
  analysisOrder: 'P-delta',
  units: 'si',
  revisions: [{ id: '0', date: '2026-01-02', description: 'layout test', by: '', issued: null }],
  issued: null,
};

const longTable: Block = {
  kind: 'table',
  title: 'Stations along the pole',
  header: ['Station', 'Height'],
  rows: Array.from({ length: 120 }, (_, i) => [`row ${i + 1}`, `${i} m`]),
};

function filler(n: number): Block[] {
  return Array.from({ length: n }, (_, i) => ({ kind: 'paragraph', text: `Filler paragraph ${i + 1} to push the heading down the page.` }) as Block);
}

function model(blocks: Block[]): DocumentModel {
  return { meta: META, cover: [], front: [], sections: [{ id: 's', title: 'Flow', blocks }] };
}

describe('page flow', () => {
  it('a table running over pages repeats its title and header row on each page, and loses no row', async () => {
    const r = await readPdfText(await renderPdf(model([{ kind: 'heading', level: 2, text: 'Stations' }, longTable])));
    const tablePages = r.pages.filter((p) => /row \d+/.test(p));
    expect(tablePages.length).toBeGreaterThan(1);
    for (const p of tablePages) {
      expect(p).toContain('Table 1.1 Stations along the pole');
      expect(p).toMatch(/Station\s+Height/);
    }
    const rows = tablePages.flatMap((p) => [...p.matchAll(/row (\d+)\b/g)].map((m) => Number(m[1])));
    expect(rows).toEqual(Array.from({ length: 120 }, (_, i) => i + 1));
  });

  it('a heading before a long table is never the last thing on a page, wherever it falls', async () => {
    // 10 pt body lines: stepping the filler moves the heading through the lower part of the page.
    for (let n = 24; n <= 44; n += 2) {
      const r = await readPdfText(await renderPdf(model([...filler(n), { kind: 'heading', level: 2, text: 'Station table' }, longTable])));
      const page = r.pages.find((p) => !p.includes('Contents') && p.includes('1.1 Station table'));
      expect(page, `filler ${n}`).toBeDefined();
      const after = page!.slice(page!.indexOf('1.1 Station table'));
      expect(after, `filler ${n}`).toMatch(/row 1\b/);
    }
  });

  it('a heading and a short block after it stay on one page', async () => {
    for (let n = 30; n <= 44; n += 2) {
      const blocks: Block[] = [...filler(n), { kind: 'heading', level: 2, text: 'Short list' }, { kind: 'bullets', items: ['first item', 'second item', 'third item'] }];
      const r = await readPdfText(await renderPdf(model(blocks)));
      const page = r.pages.find((p) => !p.includes('Contents') && p.includes('1.1 Short list'));
      expect(page, `filler ${n}`).toContain('third item');
    }
  });
});

describe('model errors', () => {
  it('a table row with the wrong number of cells is refused with the table named', async () => {
    const bad: Block = { kind: 'table', title: 'Broken', header: ['a', 'b'], rows: [['1', '2'], ['3']] };
    await expect(renderPdf(model([bad]))).rejects.toThrow(/table "Broken": row 2 has 1 cells, the header has 2/);
  });
});
