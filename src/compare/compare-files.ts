// Names and files of a comparison that need no renderer: the stem of its outputs and, with
// --packages, each alternative's input, package PDF and JSON results.
import { basename, extname } from 'node:path';
import type { Comparison } from './run-compare.ts';

export interface OutputFile {
  readonly name: string;
  readonly data: string | Uint8Array;
}

export function comparisonStem(input: string): string {
  return `${basename(input, extname(input))}.comparison`;
}

export function alternativeFiles(c: Comparison): OutputFile[] {
  const files: OutputFile[] = [];
  for (const r of c.rows) {
    const altStem = basename(r.file, extname(r.file));
    files.push({ name: r.file, data: r.text });
    if (r.result.pdf) files.push({ name: `${altStem}.pdf`, data: r.result.pdf });
    if (r.result.json) files.push({ name: `${altStem}.results.json`, data: r.result.json });
  }
  return files;
}
