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
  /** Sections from later stages, in print order; those marked `appendix` follow them, before the input echo. */
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
  // Geometry first (the input's, then the model's drawings), then the loads as entered beside the
  // loads as applied: the loads-as-entered section goes just before the analysis' loads section.
  const main = added.filter((s) => s.appendix !== true);
  const loadsAt = main.findIndex((s) => s.id === 'load-cases');
  const at = loadsAt < 0 ? 0 : loadsAt;
  const body: DocSection[] = [
    criteriaSection(loaded, secondOrder),
    geometrySection(loaded),
    ...main.slice(0, at),
    loadsSection(loaded),
    ...main.slice(at),
    // The appendices in the order given, the input echo last.
    ...added.filter((s) => s.appendix === true),
    inputEchoSection(loaded),
  ];
  // The scope lists every section, itself included, so it is built last and printed first.
  const placeholder: DocSection = { id: 'scope', title: SCOPE_TITLE, blocks: [] };
  const sections = [scopeSection(loaded, [placeholder, ...body], extra.checks ?? null), ...body];
  const front = [revisionSection(loaded), ...(extra.summary ? [extra.summary] : [])];
  return { meta: documentMeta(loaded, secondOrder), cover: coverBlocks(loaded), front: cleanRoundOff(front), sections: cleanRoundOff(sections) };
}
