// The analysis part of the package, in print order: what a checker needs to follow the
// analysis by hand. Each section has its own builder file; this one only orders them.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection } from '../document.ts';
import { printedIds, withUnbrokenIds } from '../format/unbroken-ids.ts';
import { combinationsSection } from './combinations-section.ts';
import { diagramsSection } from './diagrams-section.ts';
import { elevationPlanSection } from './elevation-plan-section.ts';
import { handCheckSection } from './hand-check-section.ts';
import { loadCasesSection } from './load-cases-section.ts';
import { resultsSection } from './results-section.ts';
import { structuralModelSection } from './structural-model-section.ts';

export function analysisSections(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection[] {
  const sections = [
    structuralModelSection(loaded, analysis),
    elevationPlanSection(loaded, analysis),
    loadCasesSection(loaded, analysis),
    combinationsSection(loaded, analysis),
    resultsSection(loaded, analysis),
    handCheckSection(loaded, analysis),
    diagramsSection(loaded, analysis),
  ];
  return withUnbrokenIds(sections, printedIds(analysis));
}
