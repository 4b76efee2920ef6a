// Appendix "Input echo": the input text verbatim with line numbers, and its hash.
import { basename } from 'node:path';
import type { LoadedDesign } from '../../design/design.ts';
import type { Block, DocSection } from '../document.ts';
import { templateBlocks } from './templates.ts';

export const INPUT_ECHO_ID = 'input-echo';
export const INPUT_ECHO_TITLE = 'Input echo';

export function inputEchoSection(loaded: LoadedDesign): DocSection {
  const file = basename(loaded.file);
  const blocks: Block[] = [
    ...templateBlocks('input-echo', { inputFile: file, inputHash: loaded.inputHash }).blocks,
    { kind: 'code', title: file, text: loaded.text },
  ];
  return { id: INPUT_ECHO_ID, title: INPUT_ECHO_TITLE, blocks, appendix: true };
}
