// Appendix "Input echo": the input text verbatim with line numbers, and its hash.
import type { LoadedDesign } from '../../design/design.ts';
import type { Block, DocSection } from '../document.ts';
import { templateBlocks } from './templates.ts';

export const INPUT_ECHO_ID = 'input-echo';
export const INPUT_ECHO_TITLE = 'Input echo';

export function inputEchoSection(loaded: LoadedDesign): DocSection {
  const blocks: Block[] = [
    ...templateBlocks('input-echo', { inputFile: loaded.file, inputHash: loaded.inputHash }).blocks,
    { kind: 'code', title: loaded.file, text: loaded.text },
  ];
  return { id: INPUT_ECHO_ID, title: INPUT_ECHO_TITLE, blocks, appendix: true };
}
