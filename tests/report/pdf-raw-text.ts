// The text of a PDF in content order (`pdftotext -raw`, poppler-utils): table cells come out
// one after the other, row by row, which lets a test read the cells of one row even when the
// layout wrapped them over several lines.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export function rawPdfText(pdf: Uint8Array): string {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-raw-'));
  try {
    const file = join(dir, 'package.pdf');
    writeFileSync(file, pdf);
    return execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * The numbers printed in one row of a titled table: the text from the row's id to the next
 * row's id (a line broken after a hyphen is joined again), every number in order.
 */
export function rowNumbers(raw: string, tableTitle: string, rowId: string, nextId: string): number[] {
  const t0 = raw.indexOf(tableTitle);
  if (t0 < 0) throw new Error(`no table "${tableTitle}"`);
  const end = raw.indexOf('\nTable ', t0 + tableTitle.length);
  const region = raw.slice(t0 + tableTitle.length, end > 0 ? end : undefined).replace(/-\n/g, '-');
  const a = region.indexOf(rowId);
  if (a < 0) throw new Error(`no row ${rowId} in table "${tableTitle}"`);
  const b = region.indexOf(nextId, a + rowId.length);
  const segment = region.slice(a + rowId.length, b > a ? b : undefined);
  return [...segment.matchAll(/-?\d+(?:\.\d+)?(?:e-?\d+)?/g)].map((m) => Number(m[0]));
}
