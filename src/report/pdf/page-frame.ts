// Header and footer. Every page, the cover included, carries in its footer the structure,
// the revision, "page N of M", the short input hash and the analysis order (P-delta or first
// order), so a loose printed page can be matched to the input and the run that made it.
import type { Content } from 'pdfmake/interfaces.js';
import type { DocumentMeta } from '../document.ts';
import { COLOR, PAGE_MARGINS } from './theme.ts';

const [LEFT, , RIGHT] = PAGE_MARGINS;

function rule(width_pt: number, margin: [number, number, number, number] = [0, 0, 0, 0]): Content {
  return { margin, canvas: [{ type: 'line', x1: 0, y1: 0, x2: width_pt, y2: 0, lineWidth: 0.5, lineColor: COLOR.hairline }] };
}

export function footerFor(meta: DocumentMeta) {
  return (currentPage: number, pageCount: number, pageSize: { width: number }): Content => ({
    margin: [LEFT, 18, RIGHT, 0],
    stack: [
      rule(pageSize.width - LEFT - RIGHT),
      {
        margin: [0, 4, 0, 0],
        style: 'frame',
        columns: [
          { width: '*', text: `${meta.structureId} · Rev. ${meta.revision}` },
          { width: 'auto', text: `input ${meta.inputHash} · ${meta.analysisOrder}` },
          { width: '*', text: `page ${currentPage} of ${pageCount}`, alignment: 'right' },
        ],
      },
    ],
  });
}

/** No header on the cover: its title block says the same, larger. */
export function headerFor(meta: DocumentMeta) {
  return (currentPage: number, _pageCount: number, pageSize: { width: number }): Content | null => {
    if (currentPage === 1) return null;
    return {
      margin: [LEFT, 26, RIGHT, 0],
      stack: [
        {
          style: 'frame',
          columns: [
            { width: '*', text: `${meta.projectName} — ${meta.structureId}` },
            { width: 'auto', text: meta.status, bold: true, color: COLOR.accent },
          ],
        },
        rule(pageSize.width - LEFT - RIGHT, [0, 3, 0, 0]),
      ],
    };
  };
}
