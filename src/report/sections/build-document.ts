// The document model of a package from the loaded design. Later stages (analysis, checks)
// hand in their own sections through `extra`; numbered sections go before the appendices.
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection, DocumentModel } from '../document.ts';
import { coverBlocks } from './cover-blocks.ts';
import { criteriaSection } from './criteria-section.ts';
import { documentMeta } from './document-meta.ts';
import { geometrySection } from './geometry-section.ts';
import { inputEchoSection } from './input-echo-section.ts';
import { loadsSection } from './loads-section.ts';
import { scopeSection, SCOPE_TITLE } from './scope-section.ts';

export interface ExtraSections {
  /** Sections from later stages, in print order; those marked `appendix` follow the input echo. */
  readonly sections?: readonly DocSection[];
}

export function buildDocument(loaded: LoadedDesign, extra: ExtraSections = {}): DocumentModel {
  const added = extra.sections ?? [];
  const body: DocSection[] = [
    criteriaSection(loaded),
    geometrySection(loaded),
    loadsSection(loaded),
    ...added.filter((s) => s.appendix !== true),
    inputEchoSection(loaded),
    ...added.filter((s) => s.appendix === true),
  ];
  // The scope lists every section, itself included, so it is built last and printed first.
  const placeholder: DocSection = { id: 'scope', title: SCOPE_TITLE, blocks: [] };
  const sections = [scopeSection(loaded, [placeholder, ...body]), ...body];
  return { meta: documentMeta(loaded), cover: coverBlocks(loaded), sections };
}
