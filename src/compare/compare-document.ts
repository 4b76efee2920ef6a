// The comparison as a document model, printed by the package's own PDF renderer: the cover with
// the caution, what was varied and what to pick, the tables of every alternative, the charts.
import { basename } from 'node:path';
import type { Block, DocSection, DocumentModel } from '../report/document.ts';
import { cautionBlock } from '../report/sections/cover-blocks.ts';
import { PACKAGE_STATUS, documentMeta } from '../report/sections/document-meta.ts';
import { templateBlocks } from '../report/sections/templates.ts';
import { memberName } from '../design/member-names.ts';
import { formatNumber, formatQuantity, type UnitSystem } from '../units/units.ts';
import { COLUMNS, inUnits, titleWithUnit } from './columns.ts';
import type { ChartFigure } from './compare-charts.ts';
import type { Comparison, CompareRow } from './run-compare.ts';
import { statusText } from './status-text.ts';
import { formatPath } from '../input/problem.ts';

export const COMPARISON_TITLE = 'COMPARISON OF ALTERNATIVES';

function placeOf(r: CompareRow, system: UnitSystem): string {
  const g = r.result.metrics?.governing;
  if (!g) return '';
  const at = g.s_m !== null ? ` at ${formatQuantity(g.s_m, 'length', system)}` : '';
  return `${memberName(g.member)}${at}${g.combination ? `, ${g.combination}` : ''}`;
}

function picksBlocks(c: Comparison): Block[] {
  const system = c.base.design.units;
  const { lightest, longestArm, variedArms } = c.picks;
  const items: string[] = [];
  items.push(lightest ? `Lightest alternative that passes every check: no. ${lightest.index}, ${lightest.label}, steel weight ${formatQuantity(lightest.result.metrics!.steelWeight_N, 'weight', system)}, governing ratio ${formatNumber(lightest.result.metrics!.governing.ratio, 3)}.` : 'No alternative passes every check: there is no lightest passing alternative.');
  if (variedArms.length > 0) {
    items.push(longestArm ? `Longest arm that passes: arm ${longestArm.arm} of ${formatQuantity(longestArm.length_m, 'length', system)} (from the pole face), alternative no. ${longestArm.row.index}, ${longestArm.row.label}.` : `No alternative passes every check: there is no longest passing arm ${variedArms.join(', ')}.`);
  } else {
    items.push('No arm length is varied, so no longest passing arm is named.');
  }
  const counts = (['passes', 'fails', 'unstable', 'refused'] as const).map((s) => [s, c.rows.filter((r) => r.result.status === s).length] as const).filter(([, n]) => n > 0);
  items.push(`${c.rows.length} alternative${c.rows.length === 1 ? '' : 's'}: ${counts.map(([s, n]) => `${n} ${s === 'passes' ? 'pass' : s === 'fails' ? 'fail' : s === 'unstable' ? 'unstable' : 'refused by the input checks'}`).join(', ')}.`);
  return [{ kind: 'heading', level: 2, text: 'What to pick' }, { kind: 'bullets', items }];
}

function variedSection(c: Comparison): DocSection {
  const system = c.base.design.units;
  const rows = c.specs.map((s) => [s.text, s.paths.map((p) => formatPath(p.path)).join(' and '), s.values.map((v) => v.label).join(', '), (s.resolved.description ?? '').split('. ')[0] ?? '']);
  const blocks: Block[] = [
    { kind: 'paragraph', text: `The input ${basename(c.base.file)} (input hash ${c.base.inputHash}, structure ${c.base.design.project.structureId}) was analysed once per alternative with the varied values below put in and everything else as in the input. The values come from the ${c.source === 'options' ? '--vary options of the command line' : 'compare block of the input'}; ${c.specs.length > 1 ? 'every combination of them is an alternative (the first key varies slowest).' : 'each value is one alternative.'}` },
    { kind: 'table', title: 'Varied keys', header: ['key', 'place in the input', 'values', 'what it is'], rows, widths: ['auto', 'auto', '*', '*'] },
    ...picksBlocks(c),
    { kind: 'paragraph', text: `Every alternative is analysed (${c.rows[0]?.result.metrics ? (c.secondOrder ? 'second order, P-delta' : 'first order') : 'as the input asks'}) and checked in full; its row is what polebook build gives for the input file named in the table, which polebook compare --packages writes with its package. Quantities print in ${system === 'us' ? 'US customary' : 'SI'} units.` },
  ];
  return { id: 'varied', title: 'What was compared', blocks };
}

function tablesSection(c: Comparison): DocSection {
  const system = c.base.design.units;
  const mark = (r: CompareRow) => `${r.index}${r.result.status === 'passes' ? '' : ' ✗'}${c.picks.lightest === r ? ' ★' : ''}`;
  const verdictRows = c.rows.map((r) => [mark(r), ...r.values.map((v) => v.label), statusText(r.result.status), r.result.metrics ? formatNumber(r.result.metrics.governing.ratio, 3) : '-', r.result.metrics?.governing.title ?? (r.result.message ?? ''), placeOf(r, system)]);
  const numberCols = COLUMNS.filter((col) => col.key !== 'governingRatio');
  // A value checked against a limit prints with its limit: "174 / 1500".
  const valueRows = c.rows.map((r) => [
    mark(r),
    ...numberCols.map((col) => {
      const m = r.result.metrics;
      const v = m ? col.value(m) : null;
      if (v === null) return '-';
      const l = col.limit && m ? col.limit(m) : null;
      const text = formatNumber(inUnits(v, col.dim, system), 4);
      return l === null ? text : `${text} / ${formatNumber(inUnits(l, col.dim, system), 4)}`;
    }),
  ]);
  const notes = c.rows.filter((r) => r.result.message !== null).map((r) => `No. ${r.index} (${r.label}), ${statusText(r.result.status).toLowerCase()}: ${r.result.message}`);
  const blocks: Block[] = [
    { kind: 'paragraph', text: 'Marks: ✗ the alternative fails at least one check, is unstable or its input is refused; ★ the lightest alternative that passes every check.' },
    { kind: 'table', title: 'Verdict of each alternative', header: ['no.', ...c.specs.map((s) => s.text), 'status', 'governing ratio', 'governing check', 'where, under'], rows: verdictRows, widths: ['auto', ...c.specs.map(() => 'auto' as const), 'auto', 'auto', '*', '*'], note: 'The governing ratio is the largest demand/capacity ratio of the pass/fail checks; a warning (vortex shedding) is not counted in it.' },
    { kind: 'table', title: 'Forces, movements and weight of each alternative', header: ['no.', ...numberCols.map((col) => (col.limit ? titleWithUnit({ ...col, title: `${col.title} / ${col.limitTitle}` }, system) : titleWithUnit(col, system)))], rows: valueRows, note: 'Base moment, shear and torque: largest over the factored combinations. Pole top sway: service combinations, with its limit. Arm tip deflection: unfactored dead load, the arm nearest its limit, with that limit. Bolt force: the most loaded anchor bolt, tension or compression as checked, with its design strength. Steel weight: pole and arm tubes only. "-": not made for this structure or alternative.' },
    ...(notes.length > 0 ? [{ kind: 'heading', level: 2, text: 'Alternatives without results' } as Block, { kind: 'bullets', items: notes } as Block] : []),
  ];
  return { id: 'alternatives', title: 'Alternatives', blocks };
}

function chartsSection(figures: readonly ChartFigure[]): DocSection {
  const blocks: Block[] = figures.map((f) => ({ kind: 'figure', title: f.title, svg: f.svg, width_pt: f.width_pt, caption: f.caption }));
  return { id: 'charts', title: 'Charts', blocks: blocks.length > 0 ? blocks : [{ kind: 'paragraph', text: 'No alternative has results to chart.' }] };
}

export function comparisonDocument(c: Comparison, figures: readonly ChartFigure[]): DocumentModel {
  // A comparison is a study, never a submittal: it keeps the draft status whatever the base's revision.
  const meta = { ...documentMeta(c.base, c.secondOrder), documentTitle: COMPARISON_TITLE, status: PACKAGE_STATUS, issued: null };
  const notes = templateBlocks('compare-notes', {});
  const noteText = notes.blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).filter((t) => t !== '').join('\n\n');
  return {
    meta,
    cover: [
      { kind: 'heading', level: 3, text: 'Compared' },
      { kind: 'bullets', items: c.specs.map((s) => `${s.text}: ${s.values.map((v) => v.label).join(', ')}${c.specs.length > 1 ? ' (every combination with the other keys)' : ''}`) },
      ...picksBlocks(c).slice(1),
      cautionBlock(c.base),
      { kind: 'caution', title: notes.title ?? 'About this comparison', text: noteText },
    ],
    front: [],
    runOn: true,
    sections: [variedSection(c), tablesSection(c), chartsSection(figures)],
  };
}
