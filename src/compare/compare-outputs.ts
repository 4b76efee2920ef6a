// Everything a comparison writes, as files in memory: the comparison PDF, CSV and JSON, and with
// --packages each alternative's input, package PDF and JSON results. Written all at once by the CLI.
import { basename, extname } from 'node:path';
import { renderPdf } from '../report/pdf/render-pdf.ts';
import { comparisonCharts } from './compare-charts.ts';
import { compareCsv } from './compare-csv.ts';
import { comparisonDocument } from './compare-document.ts';
import { compareJson } from './compare-json.ts';
import type { Comparison } from './run-compare.ts';

export interface OutputFile {
  readonly name: string;
  readonly data: string | Uint8Array;
}

export function comparisonStem(input: string): string {
  return `${basename(input, extname(input))}.comparison`;
}

export async function comparisonOutputs(c: Comparison, opts: { readonly packages: boolean }): Promise<OutputFile[]> {
  const stem = comparisonStem(c.base.file);
  const figures = await comparisonCharts(c);
  const pdf = await renderPdf(comparisonDocument(c, figures));
  const files: OutputFile[] = [
    { name: `${stem}.pdf`, data: pdf },
    { name: `${stem}.csv`, data: compareCsv(c) },
    { name: `${stem}.json`, data: compareJson(c) },
  ];
  if (opts.packages) {
    for (const r of c.rows) {
      const altStem = basename(r.file, extname(r.file));
      files.push({ name: r.file, data: r.text });
      if (r.result.pdf) files.push({ name: `${altStem}.pdf`, data: r.result.pdf });
      if (r.result.json) files.push({ name: `${altStem}.results.json`, data: r.result.json });
    }
  }
  return files;
}
