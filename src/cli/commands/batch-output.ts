// Writes the index of a batch (CSV, JSON, PDF) into the output folder and prints its rows.
import { join } from 'node:path';
import { mkdirSync } from 'node:fs';
import { FileLevelError } from '../../errors.ts';
import type { CliIO } from '../io.ts';
import { painter } from '../io.ts';
import { writeFilesAtomic } from '../../output/write-atomic.ts';
import { INDEX_STEM, indexCsv, indexDocument, indexJson, type BatchIndex } from '../../batch/index-files.ts';

export async function writeIndex(index: BatchIndex, outDir: string, io: CliIO, quiet: boolean): Promise<void> {
  // Loaded here: the command line starts without the renderer.
  const { renderPdf } = await import('../../report/pdf/render-pdf.ts');
  const pdf = await renderPdf(indexDocument(index, io.env));
  const files = [
    { path: join(outDir, `${INDEX_STEM}.csv`), data: indexCsv(index) },
    { path: join(outDir, `${INDEX_STEM}.json`), data: indexJson(index) },
    { path: join(outDir, `${INDEX_STEM}.pdf`), data: pdf },
  ];
  try {
    mkdirSync(outDir, { recursive: true });
    writeFilesAtomic(files);
  } catch (err) {
    if (typeof (err as NodeJS.ErrnoException).code !== 'string') throw err;
    throw new FileLevelError(outDir, `cannot write the index to ${outDir}: ${(err as Error).message}; give --out a folder you can write to`);
  }
  if (!quiet) for (const f of files) io.stderr(`${painter(io).good('wrote')} ${f.path}\n`);
}

/** One line per input on stdout: the answer of the batch. */
export function printIndex(index: BatchIndex, io: CliIO): void {
  for (const r of index.rows) {
    const ratio = r.governingRatio !== null ? `, governing ratio ${r.governingRatio.toFixed(3)} (${(r.governingCheck ?? '').toLowerCase()})` : '';
    const why = r.message !== null ? `: ${r.message}` : '';
    io.stdout(`${r.file}: ${r.verdict}${ratio}${why}\n`);
  }
}
