// Reading a rendered PDF with poppler-utils (pdftotext, pdfinfo, pdffonts): tools outside
// the project, so the tests see what a reader's viewer sees, not what the renderer meant.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface PdfReading {
  /** Text of each page, from `pdftotext -layout`, split at form feeds. */
  readonly pages: readonly string[];
  /** Page count reported by `pdfinfo`. */
  readonly pageCount: number;
  /** `pdfinfo -isodates` output. */
  readonly info: string;
  /** `pdffonts` output. */
  readonly fonts: string;
}

export function readPdf(pdf: Uint8Array): PdfReading {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-pdf-'));
  try {
    const file = join(dir, 'package.pdf');
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
    const info = execFileSync('pdfinfo', ['-isodates', file], { encoding: 'utf8' });
    const fonts = execFileSync('pdffonts', [file], { encoding: 'utf8' });
    const m = /^Pages:\s+(\d+)$/m.exec(info);
    if (!m) throw new Error(`pdfinfo gave no page count:\n${info}`);
    // pdftotext ends every page with a form feed, so the last piece is empty.
    const pages = text.split('\f');
    if (pages.at(-1)?.trim() === '') pages.pop();
    return { pages, pageCount: Number(m[1]), info, fonts };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Text with all white space removed, to find runs that the layout wrapped over lines. */
export function squeeze(text: string): string {
  return text.replace(/\s+/g, '');
}
