// The cover's title block, drawn from the document meta. The cover blocks of the model
// (caution, sign-off) follow it on the same page.
import type { Content, TableCell } from 'pdfmake/interfaces.js';
import type { DocumentMeta } from '../document.ts';
import { COLOR } from './theme.ts';

const UNIT_SYSTEM_NAME = { us: 'US customary (ft, in, kip, lb, psf, ksi)', si: 'SI (m, mm, kN, N, kPa, MPa)' } as const;

export function titleBlock(meta: DocumentMeta): Content[] {
  const fields: [string, string][] = [
    // The project, the structure id and its kind are printed large above the table.
    ['Location', meta.location],
    ['Owner', meta.owner],
    ['Revision', `${meta.revision}, dated ${meta.revisionDate}; package date ${meta.date}`],
    ['Units', UNIT_SYSTEM_NAME[meta.units]],
    ['Input file', meta.inputFile],
    ['Input hash', `${meta.inputHash} (SHA-256 of the input file, first 12 hex digits)`],
    ['Prepared with', `polebook ${meta.toolVersion}`],
  ];
  const body: TableCell[][] = fields.map(([k, v]) => [
    { text: k, color: COLOR.muted, fontSize: 8.5 },
    { text: v, fontSize: 9, bold: k === 'Structure' },
  ]);
  return [
    { text: meta.documentTitle ?? 'CALCULATION PACKAGE', color: COLOR.accent, bold: true, fontSize: 10, characterSpacing: 2, margin: [0, 0, 0, 4] },
    { text: meta.structureId, fontSize: 24, bold: true, margin: [0, 0, 0, 2] },
    { text: meta.structureKind, fontSize: 13, color: COLOR.text, margin: [0, 0, 0, 2] },
    { text: meta.projectName, fontSize: 11, color: COLOR.muted, margin: [0, 0, 0, 6] },
    {
      table: { widths: ['*'], body: [[{ text: meta.status, color: '#ffffff', bold: true, fontSize: 11, characterSpacing: 1.5, alignment: 'center' }]] },
      layout: { hLineWidth: () => 0, vLineWidth: () => 0, fillColor: () => COLOR.accent, paddingTop: () => 5, paddingBottom: () => 5 },
      margin: [0, 0, 0, 8],
    } as Content,
    {
      table: { widths: [100, '*'], body },
      layout: {
        hLineWidth: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === node.table.body.length ? 0.8 : 0.3),
        hLineColor: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === node.table.body.length ? COLOR.rule : COLOR.hairline),
        vLineWidth: () => 0,
        paddingLeft: () => 2,
        paddingTop: () => 1.2,
        paddingBottom: () => 1.2,
      },
      margin: [0, 0, 0, 6],
    } as Content,
  ];
}
