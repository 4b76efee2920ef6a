// Section "Load combinations": every analysed combination with its category, its factors on
// the load cases and the source of the factors (printed once per distinct source).
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { LoadedDesign } from '../../design/design.ts';
import type { Block, DocSection } from '../document.ts';
import { CATEGORY_TEXT, factorsText } from './combination-labels.ts';
import { templateBlocks } from './templates.ts';

export const COMBINATIONS_TITLE = 'Load combinations';

export function combinationsSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  void loaded;
  const sources = [...new Set(analysis.combinations.map((c) => c.source))];
  const blocks: Block[] = [
    ...templateBlocks('combinations', {}).blocks,
    {
      kind: 'table',
      title: 'Combinations analysed',
      header: ['Id', 'Category', 'Factors on the load cases', 'Source'],
      widths: [118, 78, '*', 36],
      rows: analysis.combinations.map((c) => [c.id, CATEGORY_TEXT[c.category], factorsText(c), `[${sources.indexOf(c.source) + 1}]`]),
      note: 'Load factors are dimensionless. The load cases are those of the section "Loads".',
    },
    {
      kind: 'table',
      title: 'Sources of the load factors',
      header: ['Ref.', 'Source as stated in the input or by the program'],
      widths: [36, '*'],
      rows: sources.map((s, k) => [`[${k + 1}]`, s]),
    },
  ];
  return { id: 'combinations', title: COMBINATIONS_TITLE, blocks };
}
