// Everything a comparison writes, as files in memory: the comparison PDF, CSV and JSON, and with
// --packages each alternative's input, package PDF and JSON results. Written all at once by the CLI.
import { renderPdf } from '../report/pdf/render-pdf.ts';
import { comparisonCharts } from './compare-charts.ts';
import { compareCsv } from './compare-csv.ts';
import { comparisonDocument } from './compare-document.ts';
import { compareJson } from './compare-json.ts';
import type { Comparison } from './run-compare.ts';
import { alternativeFiles, comparisonStem, type OutputFile } from './compare-files.ts';

export async function comparisonOutputs(c: Comparison, opts: { readonly packages: boolean }): Promise<OutputFile[]> {
  const stem = comparisonStem(c.base.file);
  const figures = await comparisonCharts(c);
  const pdf = await renderPdf(comparisonDocument(c, figures));
  const files: OutputFile[] = [
    { name: `${stem}.pdf`, data: pdf },
    { name: `${stem}.csv`, data: compareCsv(c) },
    { name: `${stem}.json`, data: compareJson(c) },
  ];
  return opts.packages ? [...files, ...alternativeFiles(c)] : files;
}
