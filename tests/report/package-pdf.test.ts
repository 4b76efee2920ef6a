// The rendered package read back in-process with pdfjs-dist (a PDF reader outside the project):
// page texts, page sizes, the info dictionary and the embedded fonts.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { DocumentModel } from '../../src/report/document.ts';
import { renderPdf } from '../../src/report/pdf/render-pdf.ts';
import { buildDocument } from '../../src/report/sections/build-document.ts';
import { FIXTURE_HASH, FIXTURE_INPUT_TEXT, FIXTURE_LOADED, FIXTURE_LOADED_US } from './fixture-design.ts';
import { demoStepsSection } from './fixture-extra.ts';
import { pdfDate, readPdfText, squeeze, type PdfText } from '../support/pdf-text.ts';

const ROOT = join(import.meta.dirname, '..', '..');

let siDoc: DocumentModel;
let siPdf: Buffer;
let si: PdfText;
let us: PdfText;

beforeAll(async () => {
  siDoc = buildDocument(FIXTURE_LOADED, { sections: [demoStepsSection()] });
  siPdf = await renderPdf(siDoc);
  si = await readPdfText(siPdf);
  us = await readPdfText(await renderPdf(buildDocument(FIXTURE_LOADED_US, { sections: [demoStepsSection()] })));
});

describe('every page identifies the package', () => {
  it.each([
    ['SI', () => si],
    ['US', () => us],
  ])('%s: structure, revision, short input hash and "page N of M" with M the PDF\'s page count', (_name, get) => {
    const r = get();
    expect(r.pages.length).toBe(r.pageCount);
    expect(r.pageCount).toBeGreaterThan(5);
    r.pages.forEach((page, i) => {
      expect(page).toContain('QM-CS-07');
      expect(page).toContain('Rev. A');
      expect(page).toContain(`input ${FIXTURE_HASH}`);
      const marks = [...page.matchAll(/page (\d+) of (\d+)/g)];
      expect(marks).toHaveLength(1);
      expect(Number(marks[0][1])).toBe(i + 1);
      expect(Number(marks[0][2])).toBe(r.pageCount);
    });
  });
});

describe('cover', () => {
  it.each([
    ['SI', () => si],
    ['US', () => us],
  ])('%s: the title block, the caution and the sign-off all fit on page 1', (_name, get) => {
    const cover = get().pages[0];
    // Letter-spaced, so it reads with gaps between the letters.
    expect(squeeze(cover)).toContain('CALCULATIONPACKAGE');
    expect(squeeze(cover)).toContain('DRAFTFORREVIEW');
    for (const s of ['Cantilevered sign support', 'Quarry Mill Road widening', 'Larkspur Valley Transportation Authority', 'A, dated 2026-03-15', 'quarry-mill-qm-cs-07.yaml', 'polebook 0.1.0']) {
      expect(cover).toContain(s);
    }
    expect(cover).toContain('Caution: draft for review, not for construction');
    const flat = cover.replace(/\s+/g, ' ');
    expect(flat).toContain('licensed professional engineer');
    expect(flat).toContain('The user is responsible for the input');
    expect(flat).toContain('It does not replace the governing design code');
    for (const s of ['Sign-off', 'Prepared by', 'R. Okonkwo-Hale', 'Checked by', 'T. Vasquez-Lind', 'Engineer of record', 'Seal of the engineer of', 'Package date: 2026-03-15']) {
      expect(cover).toContain(s);
    }
  });

  it('page size: A4 for SI, US Letter for US customary', () => {
    // ISO 216 A4 is 210 mm x 297 mm = 595.28 pt x 841.89 pt (1 pt = 25.4/72 mm); US Letter 8.5 in x 11 in = 612 pt x 792 pt
    for (const [w, h] of si.sizes) {
      expect(w).toBeCloseTo(595.28, 1);
      expect(h).toBeCloseTo(841.89, 1);
    }
    for (const [w, h] of us.sizes) expect([w, h]).toEqual([612, 792]);
  });
});

describe('contents', () => {
  it('lists every section and appendix with the page its heading is printed on', () => {
    const toc = si.pages[1];
    expect(toc).toContain('Contents');
    const expected = [
      '1 Scope and cautions',
      '2 Design criteria and assumptions',
      '3 Structure geometry',
      '4 Loads as entered',
      '5 Demonstration steps',
      'Appendix A Input echo',
    ];
    for (const title of expected) {
      const line = toc.split('\n').find((l) => l.replace(/\s+/g, ' ').trim().startsWith(title));
      expect(line, title).toBeDefined();
      const page = Number(/(\d+)\s*$/.exec(line!)![1]);
      // The heading sits at the top of the page the contents name (sections start a new page).
      const body = si.pages[page - 1].split('\n').filter((l) => l.trim() !== '');
      expect(body[1].replace(/\s+/g, ' ').trim()).toBe(title);
    }
    expect(toc.replace(/\s+/g, ' ')).toContain('5.1 Arm root');
  });
});

describe('quantities print with their units in the user system', () => {
  it('SI: geometry and loads in m, mm, kPa, MPa', () => {
    const all = si.pages.join('\n');
    for (const s of ['7.6 m', '406 mm across flats', '300 mm across flats', '7.9 mm', '273 mm', '6 m from arm', '3.6 m × 2.1 m', '0.15 kPa', '1.1 kPa', '1.35 kPa', '0.144 kPa', '200 × 10³ MPa', '7850 kg/m³', '560 mm', '724 MPa', '90 deg']) {
      expect(all, s).toContain(s);
    }
  });

  it('US: the same design converted with the NIST SP 811 factors', () => {
    const all = us.pages.join('\n');
    // NIST SP 811 (2008) App. B: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N.
    // 7.6 m / 0.3048 = 24.934 ft; 406 mm / 25.4 = 15.984 in; 1100 Pa / 47.880259 Pa/psf = 22.974 psf;
    // 345 MPa / 6.894757 MPa/ksi = 50.038 ksi; a density prints in US units as the unit weight it gives:
    // 7850 kg/m3 × 9.80665 m/s² (standard gravity) / 157.0875 N/m³ per lb/ft³ = 490.06 lb/ft³. Printed to 4 significant digits.
    for (const s of ['24.93 ft', '15.98 in across flats', '22.97 psf', '50.04 ksi', '490.1 lb/ft³']) {
      expect(all, s).toContain(s);
    }
  });

  it('a calculation step: symbol = formula, = substituted with units, = result with unit, source, status', () => {
    const all = si.pages.join('\n');
    expect(all).toContain('Moment at the arm root from the tip load');
    // the spaces beside the italic symbol may or may not come out as text; the rendered page shows them
    expect(squeeze(all)).toContain('M=P·a');
    expect(all).toContain('= 2 kN · 3 m');
    expect(all).toContain('= 6 kN·m');
    expect(all).toContain('Source: statics of a cantilever');
    expect(all).toContain('✓ OK');
    expect(all).toContain('✗ NOT OK');
    // The same steps in US units: 2000 N / 4448.2216 N per kip = 0.44962 kip; 3 m / 0.3048 = 9.8425 ft;
    // 6000 N·m / (4448.2216 N × 0.3048 m) = 4.4254 kip·ft (NIST SP 811 factors).
    const usText = us.pages.join('\n');
    expect(usText).toContain('= 0.4496 kip · 9.843 ft');
    expect(usText).toContain('= 4.425 kip·ft');
  });
});

describe('symbols survive (embedded DejaVu)', () => {
  it('Greek letters, ≤ ≥, superscripts, middle dot and the figure text come out as text', () => {
    const all = si.pages.join('\n');
    for (const s of ['φ', 'σ', 'Δ', '≤', '≥', '³', '·', '×']) expect(all, s).toContain(s);
    // Text inside the SVG figure is real text, in the embedded font.
    expect(squeeze(all)).toContain(squeeze('σ ≤ φ·Fy'));
  });

  it('SVG text with a <tspan> prints without a space pdfmake would add ("Mroot", not "M root")', () => {
    const all = si.pages.join('\n');
    expect(all).toContain('Mroot=6 kN·m');
    expect(all).not.toContain('M root');
  });

  it('the fonts are DejaVu Sans and DejaVu Sans Mono, every font embedded', () => {
    const names = si.fonts.map((f) => f.name);
    // an embedded subset's name is six capital letters, '+', and the font's PostScript name (PDF 32000-1, 9.6.4)
    expect(names.some((n) => /^[A-Z]{6}\+DejaVuSans$/.test(n)), names.join(', ')).toBe(true);
    expect(names.some((n) => /^[A-Z]{6}\+DejaVuSansMono$/.test(n)), names.join(', ')).toBe(true);
    for (const f of si.fonts) expect(f.embedded, f.name).toBe(true);
  });
});

describe('input echo', () => {
  it('prints every input line with its number, long lines wrapped and complete', () => {
    const echoStart = si.pages.findIndex((p) => p.includes('Appendix A Input echo') && p.includes('Listing A.1'));
    expect(echoStart).toBeGreaterThan(0);
    const echo = si.pages.slice(echoStart).join('\n');
    const lines = FIXTURE_INPUT_TEXT.replace(/\n$/, '').split('\n');
    expect(echo).toMatch(/^\s*1\s+# Overhead guide sign, Quarry Mill Road eastbound/m);
    expect(echo).toMatch(new RegExp(`^\\s*${lines.length}\\s+tab-indented line`, 'm'));
    const flat = squeeze(echo);
    for (const line of lines) expect(flat, line).toContain(squeeze(line));
    expect(echo).toContain(FIXTURE_HASH);
  });
});

describe('metadata and determinism', () => {
  it('the info dictionary carries the package date (UTC midnight) and the input hash', () => {
    expect(pdfDate(si.info.CreationDate)).toBe('2026-03-15T00:00:00Z');
    expect(pdfDate(si.info.ModDate)).toBe('2026-03-15T00:00:00Z');
    expect(String(si.info.Keywords)).toContain(`input-hash ${FIXTURE_HASH}`);
  });

  it('two renders in this process give the same bytes', async () => {
    const again = await renderPdf(buildDocument(FIXTURE_LOADED, { sections: [demoStepsSection()] }));
    expect(Buffer.compare(again, siPdf)).toBe(0);
  });

  it('the folder the input was read from does not change the bytes (only the file name is printed)', async () => {
    const moved = { ...FIXTURE_LOADED, file: '/some/other/checkout/examples/quarry-mill-qm-cs-07.yaml' };
    const pdf = await renderPdf(buildDocument(moved, { sections: [demoStepsSection()] }));
    expect(Buffer.compare(pdf, siPdf)).toBe(0);
  });

  it('pdfmake prints no access-policy warnings', async () => {
    const warn = vi.spyOn(console, 'warn');
    try {
      await renderPdf(buildDocument(FIXTURE_LOADED));
      expect(warn).not.toHaveBeenCalled();
    } finally {
      warn.mockRestore();
    }
  });

  it('a render under TZ=Pacific/Auckland and another locale gives the same bytes', () => {
    const tsx = join(ROOT, 'node_modules', '.bin', 'tsx');
    const hash = execFileSync(tsx, [join(ROOT, 'tests', 'report', 'render-fixture-cli.ts')], {
      cwd: ROOT,
      encoding: 'utf8',
      env: { ...process.env, TZ: 'Pacific/Auckland', LANG: 'de_DE.UTF-8', LC_ALL: 'de_DE.UTF-8' },
    }).trim();
    expect(hash).toBe(createHash('sha256').update(siPdf).digest('hex'));
  });
});
