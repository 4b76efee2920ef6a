// Document-model blocks to pdfmake content. Pure layout: numbers arrive as text or as
// quantities that units.ts formats; nothing here computes engineering.
import type { Content, TableCell } from 'pdfmake/interfaces.js';
import type { Block } from '../document.ts';
import type { UnitSystem } from '../../units/units.ts';
import { stepContent } from './step-block.ts';
import { COLOR } from './theme.ts';
import { FONT_MONO, FONT_SANS } from './fonts.ts';

/** Running numbers inside one section ("2.3", "Table 2.1", "Figure 2.1"). */
export interface SectionCounter {
  readonly label: string; // "2" or "A"
  readonly units: UnitSystem;
  /** The id of the section's heading: its sub-headings are its children in the PDF outline. */
  readonly outlineParent: string | null;
  sub: number;
  tables: number;
  figures: number;
  listings: number;
}

export function newCounter(label: string, units: UnitSystem, outlineParent: string | null = null): SectionCounter {
  return { label, units, outlineParent, sub: 0, tables: 0, figures: 0, listings: 0 };
}

/** A heading is kept with what follows it; content that may run past a page cannot be
 * held in an unbreakable stack (pdfmake drops what overflows), so those get a page-break rule instead. */
function fitsWithHeading(next: Block): boolean {
  switch (next.kind) {
    case 'table':
      return next.rows.length <= 16;
    case 'code':
      return next.text.split('\n').length <= 20;
    case 'bullets':
      return next.items.length <= 12;
    case 'heading':
    case 'pagebreak':
      return false;
    default:
      return true;
  }
}

/** Labels of the front pages (revision history, summary): their sub-headings stay in the contents. */
const FRONT_LABELS = new Set(['R', 'S']);

/** Marks a heading so the page-break rule moves it to the next page when it would sit at a page foot. */
export const KEEP_WITH_NEXT_LEVEL = 1;

export function blocksContent(blocks: readonly Block[], counter: SectionCounter): Content[] {
  const out: Content[] = [];
  // Whether the last item out ends with a calculation step.
  let afterStep = false;
  for (let i = 0; i < blocks.length; i++) {
    const block = blocks[i];
    if (block.kind === 'heading') {
      const heading = headingContent(block.text, block.level, counter);
      const next = blocks[i + 1];
      if (next !== undefined && fitsWithHeading(next)) {
        out.push({ stack: [heading, blockContent(next, counter)], unbreakable: true });
        afterStep = next.kind === 'step';
        i++;
      } else {
        out.push({ stack: [heading], headlineLevel: KEEP_WITH_NEXT_LEVEL } as Content);
        afterStep = false;
      }
      continue;
    }
    const following = blocks[i + 1];
    if (block.kind === 'figure' && block.withNext === true && following !== undefined && following.kind !== 'heading') {
      out.push({ stack: [blockContent(block, counter), blockContent(following, counter)], unbreakable: true });
      afterStep = following.kind === 'step';
      i++;
      continue;
    }
    const content = blockContent(block, counter);
    // The last step of a run goes with the one before it, so a page never holds one step alone.
    const endsRun = block.kind === 'step' && blocks[i + 1]?.kind !== 'step';
    if (endsRun && afterStep) out.push({ stack: [out.pop()!, content], unbreakable: true });
    else out.push(content);
    afterStep = block.kind === 'step';
  }
  return out;
}

function headingContent(text: string, level: 2 | 3, counter: SectionCounter): Content {
  if (level === 3) return { text, style: 'h3' };
  counter.sub += 1;
  const number = `${counter.label}.${counter.sub}`;
  return {
    text: `${number}  ${text}`,
    style: 'h2',
    // Appendix sub-headings (one per load case) are in the outline, not the contents: they would
    // lengthen the contents by a page for what the appendix's own title already says.
    tocItem: !/^[A-Z]$/.test(counter.label) || FRONT_LABELS.has(counter.label),
    tocMargin: [16, 0, 0, 0],
    tocStyle: { fontSize: 9 },
    ...(counter.outlineParent !== null ? { outline: true, outlineParentId: counter.outlineParent } : {}),
  } as Content;
}

export function blockContent(block: Block, counter: SectionCounter): Content {
  switch (block.kind) {
    case 'heading':
      return headingContent(block.text, block.level, counter);
    case 'paragraph':
      return { text: block.text, style: 'paragraph', bold: block.emphasis === true };
    case 'bullets':
      return { ul: [...block.items], margin: [6, 0, 0, 6], lineHeight: 1.2 } as Content;
    case 'caution':
      return cautionContent(block.title, block.text);
    case 'step':
      return stepContent(block.step, counter.units);
    case 'table':
      return tableContent(block, counter);
    case 'figure':
      return figureContent(block, counter);
    case 'code':
      return codeContent(block.title, block.text, counter);
    case 'signoff':
      return signoffContent(block.rows, block.date, block.issued);
    case 'pagebreak':
      return { text: '', pageBreak: 'after' };
  }
}

function cautionContent(title: string, text: string): Content {
  const paragraphs = text.split(/\n\s*\n/).map((p) => ({ text: p.replace(/\s*\n\s*/g, ' ').trim(), margin: [0, 3, 0, 0] }));
  return {
    unbreakable: true,
    margin: [0, 4, 0, 10],
    table: {
      widths: ['*'],
      body: [[{ stack: [{ text: title, bold: true, color: COLOR.accent, fontSize: 10.5, characterSpacing: 0.3 }, ...paragraphs] }]],
    },
    layout: {
      hLineWidth: () => 1.4,
      vLineWidth: () => 1.4,
      hLineColor: () => COLOR.accent,
      vLineColor: () => COLOR.accent,
      fillColor: () => COLOR.accentTint,
      paddingLeft: () => 10,
      paddingRight: () => 10,
      paddingTop: () => 6,
      paddingBottom: () => 7,
    },
  } as Content;
}

/** Rules above and below the header and at the foot; hairlines between body rows; no verticals. */
function ruledLayout(titleRows: number, headerRows: number) {
  return {
    hLineWidth: (i: number, node: { table: { body: unknown[] } }) => {
      if (i < titleRows) return 0;
      if (i === titleRows || i === titleRows + headerRows || i === node.table.body.length) return 0.8;
      return 0.3;
    },
    hLineColor: (i: number, node: { table: { body: unknown[] } }) =>
      i === titleRows || i === titleRows + headerRows || i === node.table.body.length ? COLOR.rule : COLOR.hairline,
    vLineWidth: () => 0,
    paddingLeft: (i: number) => (i === 0 ? 2 : 5),
    paddingRight: () => 5,
    paddingTop: () => 2.5,
    paddingBottom: () => 2.5,
  };
}

function tableContent(block: Extract<Block, { kind: 'table' }>, counter: SectionCounter): Content {
  counter.tables += 1;
  const n = block.header.length;
  // A ragged table would make pdfmake fail deep inside its layout; say which table instead.
  const ragged = block.rows.findIndex((r) => r.length !== n);
  if (ragged >= 0) throw new Error(`table "${block.title}": row ${ragged + 1} has ${block.rows[ragged].length} cells, the header has ${n}`);
  if (block.widths && block.widths.length !== n) throw new Error(`table "${block.title}": ${block.widths.length} widths for ${n} columns`);
  const titleRow: TableCell[] = [
    { text: `Table ${counter.label}.${counter.tables}  ${block.title}`, style: 'caption', colSpan: n, margin: [-2, 0, 0, 2] },
    ...Array.from({ length: n - 1 }, () => ({}) as TableCell),
  ];
  const headerRow: TableCell[] = block.header.map((h) => ({ text: h, style: 'tableHeader', fillColor: COLOR.fillHeader }));
  const body: TableCell[][] = block.rows.map((r) => r.map((c) => ({ text: c, style: 'tableCell' })));
  const widths = block.widths ? [...block.widths] : Array.from({ length: n }, () => '*' as const);
  const table: Content = {
    margin: [0, 4, 0, block.note ? 2 : 10],
    table: { headerRows: 2, keepWithHeaderRows: Math.min(3, body.length), dontBreakRows: true, widths, body: [titleRow, headerRow, ...body] },
    layout: ruledLayout(1, 1),
  } as Content;
  if (!block.note) return table;
  // A note alone at the top of a page reads as nothing: a short table (a dozen lines of cells at
  // most, well under a page) keeps its note with it; a longer one, which may break, prints its
  // note above it. (Unbreakable content taller than a page would be cut.)
  const lines = block.rows.reduce((sum, row) => sum + Math.max(1, ...row.map((c) => c.split('\n').length)), 0);
  const note: Content = { text: block.note, style: 'note', margin: [0, 0, 0, 10] };
  if (lines <= 12) return { stack: [table, note], unbreakable: true } as Content;
  return { stack: [{ ...(note as object), margin: [0, 2, 0, 0] } as Content, table] };
}

function figureContent(block: Extract<Block, { kind: 'figure' }>, counter: SectionCounter): Content {
  counter.figures += 1;
  if (block.beside) {
    return {
      unbreakable: true,
      margin: [0, 2, 0, 8],
      columnGap: 12,
      columns: [
        { width: '*', text: block.beside.text, style: 'paragraph', bold: block.beside.emphasis === true },
        {
          width: block.width_pt,
          stack: [
            { svg: block.svg, width: block.width_pt, font: FONT_SANS } as Content,
            { text: [{ text: `Figure ${counter.label}.${counter.figures}  ${block.title}. `, bold: true }, block.caption], style: 'note', color: COLOR.text, margin: [0, 2, 0, 0] },
          ],
        },
      ],
    } as Content;
  }
  return {
    unbreakable: true,
    margin: [0, 6, 0, 12],
    stack: [
      { svg: block.svg, width: block.width_pt, alignment: 'center', font: FONT_SANS } as Content,
      {
        text: [{ text: `Figure ${counter.label}.${counter.figures}  ${block.title}. `, bold: true }, block.caption],
        style: 'note',
        color: COLOR.text,
        alignment: 'center',
        margin: [0, 4, 0, 0],
      },
    ],
  };
}

/** Verbatim text with line numbers; long lines wrap inside their row. */
function codeContent(title: string, text: string, counter: SectionCounter): Content {
  counter.listings += 1;
  const lines = text.replace(/\r\n?/g, '\n').replace(/\n$/, '').split('\n');
  const body: TableCell[][] = [
    [{ text: `Listing ${counter.label}.${counter.listings}  ${title}`, style: 'caption', font: FONT_SANS, colSpan: 2, margin: [-2, 0, 0, 3] }, {}],
    ...lines.map((line, i): TableCell[] => [
      { text: String(i + 1), alignment: 'right', color: COLOR.muted, fillColor: COLOR.fillBand },
      // pdfmake wraps at spaces and splits a token longer than the column by itself.
      { text: line === '' ? ' ' : line.replace(/\t/g, '    '), preserveLeadingSpaces: true },
    ]),
  ];
  return {
    margin: [0, 4, 0, 10],
    style: 'code',
    font: FONT_MONO,
    table: { headerRows: 1, keepWithHeaderRows: 1, dontBreakRows: true, widths: [24, '*'], body },
    layout: {
      hLineWidth: (i: number, node: { table: { body: unknown[] } }) => (i === 1 || i === node.table.body.length ? 0.6 : 0),
      hLineColor: () => COLOR.rule,
      vLineWidth: () => 0,
      paddingLeft: (i: number) => (i === 0 ? 2 : 6),
      paddingRight: () => 4,
      paddingTop: () => 0.6,
      paddingBottom: () => 0.6,
    },
  } as Content;
}

function signoffContent(rows: readonly { role: string; name: string; date: string }[], date: string, issued: boolean): Content {
  const header: TableCell[] = ['Role', 'Name', 'Signature', 'Date'].map((h) => ({ text: h, style: 'tableHeader', fillColor: COLOR.fillHeader }));
  const body: TableCell[][] = rows.map((r) => [
    { text: r.role, bold: true, style: 'tableCell' },
    { text: r.name === '' ? ' ' : r.name, style: 'tableCell' },
    { text: ' ' },
    { text: r.date === '' ? ' ' : r.date, style: 'tableCell' },
  ]);
  const table: Content = {
    table: { widths: [92, '*', 90, 58], heights: (row: number) => (row === 0 ? 12 : 22), body: [header, ...body] },
    layout: {
      hLineWidth: () => 0.6,
      vLineWidth: () => 0.6,
      hLineColor: () => COLOR.rule,
      vLineColor: () => COLOR.rule,
      paddingTop: () => 4,
      paddingBottom: () => 4,
    },
  } as Content;
  const sealSize = 92;
  const seal: Content = {
    width: sealSize,
    stack: [
      {
        canvas: [{ type: 'rect', x: 0, y: 0, w: sealSize, h: sealSize, lineWidth: 0.6, lineColor: COLOR.rule, dash: { length: 3, space: 2 } }],
      },
      { text: issued ? 'Seal of the engineer of record (required: issued revision)' : 'Seal of the engineer of record', style: 'small', alignment: 'center', margin: [0, 3, 0, 0] },
    ],
  } as Content;
  return {
    unbreakable: true,
    margin: [0, 4, 0, 0],
    stack: [
      { text: 'Sign-off', style: 'h3', margin: [0, 0, 0, 4] },
      { columns: [{ width: '*', stack: [table, { text: `Package date: ${date}`, style: 'small', margin: [0, 3, 0, 0] }] }, seal], columnGap: 14 },
    ],
  };
}
