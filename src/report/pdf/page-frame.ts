// Header and footer. Every page, the cover included, carries in its footer the structure,
// the revision, "page N of M", the short input hash and the analysis order (P-delta or first
// order), so a loose printed page can be matched to the input and the run that made it.
import type { Content } from 'pdfmake/interfaces.js';
import type { DocumentMeta } from '../document.ts';
import { COLOR, PAGE_MARGINS } from './theme.ts';
import { measureText } from '../charts/text-measure.ts';

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

const FRAME_SIZE = 7.5;

/** "project — structure id" in one line of the header: a long project name is cut with an ellipsis
 * (the cover prints it whole); the structure id is never cut. */
function headerName(meta: DocumentMeta, width_pt: number): string {
  const id = ` — ${meta.structureId}`;
  const fits = (t: string) => measureText({ fontSize: FRAME_SIZE }, t) <= width_pt;
  if (fits(`${meta.projectName}${id}`)) return `${meta.projectName}${id}`;
  let n = meta.projectName.length;
  while (n > 1 && !fits(`${meta.projectName.slice(0, n).trimEnd()}…${id}`)) n--;
  return `${meta.projectName.slice(0, n).trimEnd()}…${id}`;
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
            { width: '*', text: headerName(meta, pageSize.width - LEFT - RIGHT - measureText({ fontSize: FRAME_SIZE, fontWeight: 'bold' }, meta.status) - 12) },
            { width: 'auto', text: meta.status, bold: true, color: COLOR.accent, noWrap: true },
          ],
        },
        rule(pageSize.width - LEFT - RIGHT, [0, 3, 0, 0]),
      ],
    };
  };
}
