// The blocks on the cover under the title block: the caution, then the sign-off.
import { basename } from 'node:path';
import type { LoadedDesign } from '../../design/design.ts';
import type { Block } from '../document.ts';
import { templateBlocks } from './templates.ts';

export function cautionBlock(loaded: LoadedDesign): Block {
  const t = templateBlocks('caution', { inputFile: basename(loaded.file), inputHash: loaded.inputHash });
  const text = t.blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).filter((s) => s !== '').join('\n\n');
  return { kind: 'caution', title: t.title ?? 'Caution', text };
}

export function coverBlocks(loaded: LoadedDesign): Block[] {
  const p = loaded.design.project;
  return [
    cautionBlock(loaded),
    {
      kind: 'signoff',
      rows: [
        { role: 'Prepared by', name: p.preparedBy },
        { role: 'Checked by', name: p.checkedBy },
        { role: 'Engineer of record', name: p.engineerOfRecord },
      ],
      date: p.date,
    },
  ];
}
