// The blocks on the cover under the title block: the caution, then the sign-off. An issued
// revision has its own caution (no draft marks) and a filled sign-off.
import { basename } from 'node:path';
import type { LoadedDesign } from '../../design/design.ts';
import type { Block } from '../document.ts';
import { templateBlocks } from './templates.ts';

export function cautionBlock(loaded: LoadedDesign): Block {
  const latest = loaded.design.project.revisions.at(-1);
  const name = latest?.issued ? 'caution-issued' : 'caution';
  const vars: Record<string, string> = { inputFile: basename(loaded.file), inputHash: loaded.inputHash };
  if (latest?.issued) vars.revision = latest.id;
  const t = templateBlocks(name, vars);
  const text = t.blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).filter((s) => s !== '').join('\n\n');
  return { kind: 'caution', title: t.title ?? 'Caution', text };
}

export function coverBlocks(loaded: LoadedDesign): Block[] {
  const p = loaded.design.project;
  const issued = p.revisions.at(-1)?.issued ?? null;
  const issueDate = issued ? p.revisions.at(-1)!.date : '';
  const licence = issued ? `${issued.engineer}, licence ${issued.licence}${issued.jurisdiction !== '' ? ` (${issued.jurisdiction})` : ''}` : '';
  return [
    cautionBlock(loaded),
    {
      kind: 'signoff',
      rows: [
        { role: 'Prepared by', name: p.preparedBy, date: issueDate },
        { role: 'Checked by', name: p.checkedBy, date: issueDate },
        { role: 'Engineer of record', name: issued ? licence : p.engineerOfRecord, date: issueDate },
      ],
      date: p.date,
      issued: issued !== null,
    },
  ];
}
