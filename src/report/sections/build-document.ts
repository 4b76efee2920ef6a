// The document model of a package from the loaded design. Later stages (analysis, checks)
// hand in their own sections through `extra`; numbered sections go before the appendices.
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection, DocumentModel } from '../document.ts';
import { coverBlocks } from './cover-blocks.ts';
import { criteriaSection } from './criteria-section.ts';
import { documentMeta } from './document-meta.ts';
import { cleanRoundOff } from './round-off.ts';
import type { CheckResults } from '../../checks/check-types.ts';
import { geometrySection } from './geometry-section.ts';
import { inputEchoSection } from './input-echo-section.ts';
import { loadsSection } from './loads-section.ts';
import { scopeSection, SCOPE_TITLE } from './scope-section.ts';
import { revisionSection } from './revision-section.ts';

export interface ExtraSections {
  /** Sections from later stages, in print order; those marked `appendix` follow the input echo. */
  readonly sections?: readonly DocSection[];
  /** Whether the analysis of this package is second order (P-delta); default: what the input asks. */
  readonly secondOrder?: boolean;
  /** The design checks, for the scope's list of what is checked; null: none were made. */
  readonly checks?: CheckResults | null;
  /** The summary page (from the analysis and checks), printed after the revision history. */
  readonly summary?: DocSection;
}

export function buildDocument(loaded: LoadedDesign, extra: ExtraSections = {}): DocumentModel {
  const added = extra.sections ?? [];
  const secondOrder = extra.secondOrder ?? loaded.design.analysis.secondOrder;
  const body: DocSection[] = [
    criteriaSection(loaded, secondOrder),
    geometrySection(loaded),
    loadsSection(loaded),
    ...added.filter((s) => s.appendix !== true),
    inputEchoSection(loaded),
    ...added.filter((s) => s.appendix === true),
  ];
  // The scope lists every section, itself included, so it is built last and printed first.
  const placeholder: DocSection = { id: 'scope', title: SCOPE_TITLE, blocks: [] };
  const sections = [scopeSection(loaded, [placeholder, ...body], extra.checks ?? null), ...body];
  const front = [revisionSection(loaded), ...(extra.summary ? [extra.summary] : [])];
  return { meta: documentMeta(loaded, secondOrder), cover: coverBlocks(loaded), front: cleanRoundOff(front), sections: cleanRoundOff(sections) };
}
