// The revision history, printed right after the cover: every revision of the package, oldest
// first, with who made it and, for the issued one, the engineer of record who issued it.
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection } from '../document.ts';

export const REVISIONS_ID = 'revisions';
export const REVISIONS_TITLE = 'Revision history';

export function revisionSection(loaded: LoadedDesign): DocSection {
  const { revisions } = loaded.design.project;
  const newest = revisions.at(-1);
  const rows = revisions.map((r) => [
    r.id,
    r.date,
    r.description,
    r.by === '' ? '—' : r.by,
    r.issued ? `issued by ${r.issued.engineer}${r === newest ? ' (this package)' : ''}` : r === newest ? 'this package (draft)' : 'earlier draft',
  ]);
  return {
    id: REVISIONS_ID,
    title: REVISIONS_TITLE,
    label: 'R',
    // On the cover, under the sign-off: a few lines that would leave a page nearly empty.
    continuous: true,
    blocks:
      rows.length === 0
        ? [{ kind: 'paragraph', text: 'No revision is listed in the input (project.revisions): this package has no revision id. Add a revision before the package is submitted.' }]
        : [
            {
              kind: 'table',
              title: 'Revisions',
              header: ['Rev.', 'Date', 'Description', 'By', 'Status'],
              widths: [32, 58, '*', 70, 110],
              rows,
            },
          ],
  };
}
