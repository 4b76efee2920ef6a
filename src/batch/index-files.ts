// The index of a batch: one row per input (structure, verdict, governing ratio, file, input
// hash) as CSV, JSON (what `polebook index` merges) and a PDF printed by the package renderer.
// Rows are sorted by input file, so shards merged give the same index as one unsharded run.
import { createHash } from 'node:crypto';
import type { Block, DocumentModel } from '../report/document.ts';
import { PACKAGE_STATUS } from '../report/sections/document-meta.ts';
import { templateBlocks } from '../report/sections/templates.ts';
import { toolVersion } from '../version.ts';
import { formatNumber, formatRatio } from '../units/units.ts';
import type { BuildOutcome } from './build-one.ts';

export interface IndexRow {
  readonly file: string;
  readonly structure: string | null;
  readonly verdict: string;
  readonly exitCode: number;
  readonly governingRatio: number | null;
  readonly governingCheck: string | null;
  readonly inputHash: string | null;
  readonly package: string | null;
  readonly packageDate: string | null;
  readonly message: string | null;
}

export interface BatchIndex {
  readonly format: 'polebook-index';
  readonly formatVersion: 1;
  readonly rows: readonly IndexRow[];
}

export const INDEX_STEM = 'index';

const VERDICT: Readonly<Record<BuildOutcome['status'], string>> = { passes: 'passes', fails: 'FAILS', 'bad input': 'BAD INPUT', unstable: 'UNSTABLE', 'internal error': 'INTERNAL ERROR' };

export function indexRow(o: BuildOutcome): IndexRow {
  return {
    file: o.display,
    structure: o.structureId,
    verdict: VERDICT[o.status],
    exitCode: o.exitCode,
    governingRatio: o.governingRatio !== null && Number.isFinite(o.governingRatio) ? o.governingRatio : null,
    governingCheck: o.governingCheck,
    inputHash: o.inputHash,
    package: o.written[0] ?? null,
    packageDate: o.packageDate,
    message: o.message === null ? null : o.message.split('\n')[0]!,
  };
}

export function sortedIndex(rows: readonly IndexRow[]): BatchIndex {
  return { format: 'polebook-index', formatVersion: 1, rows: [...rows].sort((a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : 0)) };
}

/** The exit code of the whole batch: the worst of its runs (4 internal > 3 unstable > 2 bad input > 1 fails > 0). */
export const worstExit = (index: BatchIndex): number => index.rows.reduce((w, r) => Math.max(w, r.exitCode), 0);

function cell(s: string): string {
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

const ratioText = (r: number | null) => (r === null ? '' : formatNumber(r, 4));

export function indexCsv(index: BatchIndex): string {
  const header = ['file', 'structure', 'verdict', 'governing ratio', 'governing check', 'input hash', 'package', 'exit code', 'message'];
  const lines = index.rows.map((r) => [r.file, r.structure ?? '', r.verdict, ratioText(r.governingRatio), r.governingCheck ?? '', r.inputHash ?? '', r.package ?? '', String(r.exitCode), r.message ?? ''].map(cell).join(','));
  return `${[header.join(','), ...lines].join('\n')}\n`;
}

export function indexJson(index: BatchIndex): string {
  return `${JSON.stringify(index, null, 2)}\n`;
}

/** The index as a document. Its date is the newest package date of the batch (never the clock). */
export function indexDocument(index: BatchIndex, env: Readonly<Record<string, string | undefined>>): DocumentModel {
  const dates = index.rows.map((r) => r.packageDate).filter((d): d is string => d !== null).sort();
  const epoch = env.SOURCE_DATE_EPOCH;
  const date = dates.at(-1) ?? (epoch && /^\d+$/.test(epoch) ? new Date(Number(epoch) * 1000).toISOString().slice(0, 10) : '1970-01-01');
  const hash = createHash('sha256').update(indexCsv(index)).digest('hex').slice(0, 12);
  const counts = new Map<string, number>();
  for (const r of index.rows) counts.set(r.verdict, (counts.get(r.verdict) ?? 0) + 1);
  const caution = templateBlocks('caution', { inputFile: 'of each package listed', inputHash: 'in its row' });
  const cautionText = caution.blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).filter((t) => t !== '').join('\n\n');
  const blocks: Block[] = [
    { kind: 'paragraph', text: `${index.rows.length} input${index.rows.length === 1 ? '' : 's'}: ${[...counts.entries()].map(([v, n]) => `${v.toLowerCase()} ${n}`).join(', ')}. Each input that could be built has its own package beside this index; an input refused or unstable has none, and its row says why. Date of this index: the newest package date of the batch${dates.length === 0 ? ' (none was built: SOURCE_DATE_EPOCH or 1970-01-01)' : ''}.` },
    {
      kind: 'table',
      title: 'Inputs of the batch',
      header: ['file', 'structure', 'verdict', 'governing ratio', 'governing check', 'input hash'],
      // Ratios as every package and the terminal print them (three decimals); the CSV keeps four digits.
      rows: index.rows.map((r) => [r.file, r.structure ?? '-', r.verdict, r.governingRatio === null ? '-' : formatRatio(r.governingRatio), r.governingCheck ?? (r.message ?? ''), r.inputHash ?? '-']),
      widths: ['auto', 'auto', 'auto', 'auto', '*', 'auto'],
    },
  ];
  return {
    meta: {
      projectName: `Batch of ${index.rows.length} inputs`,
      structureId: 'Batch index',
      structureKind: 'Index of calculation packages',
      location: '-',
      owner: '-',
      revision: '-',
      revisionDate: '-',
      status: PACKAGE_STATUS,
      date,
      inputHash: hash,
      inputFile: 'index.csv',
      toolVersion: toolVersion(),
      analysisOrder: 'as each package',
      units: 'us',
      documentTitle: 'INDEX OF PACKAGES',
      revisions: [],
      issued: null,
    },
    cover: [{ kind: 'caution', title: caution.title ?? 'Caution', text: cautionText }],
    front: [],
    runOn: true,
    sections: [{ id: 'index', title: 'Inputs and verdicts', blocks }],
  };
}
