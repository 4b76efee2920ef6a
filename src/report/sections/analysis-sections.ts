// The analysis part of the package, in print order: the model and the loads, the results, the
// design checks (handed in by the caller), the hand check, then the long tables as appendices, so
// the checker meets the design before the derivation. Each section has its own builder file; this
// one only orders them.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection } from '../document.ts';
import { printedIds, withUnbrokenIds } from '../format/unbroken-ids.ts';
import { combinationsSection } from './combinations-section.ts';
import { diagramsSection } from './diagrams-section.ts';
import { elevationPlanSection } from './elevation-plan-section.ts';
import { handCheckSection } from './hand-check-section.ts';
import { loadCasesSections } from './load-cases-section.ts';
import { resultsSection, staticsTablesSection } from './results-section.ts';
import { structuralModelSection } from './structural-model-section.ts';
import { freeBodySection } from './free-body-section.ts';
import { modelTablesSection } from './model-tables-section.ts';
import type { CheckResults } from '../../checks/check-types.ts';
import type { MemberChart } from './member-charts.ts';

/** With the checks, the free-body diagrams of the combinations that govern them follow the results. */
export function analysisSections(loaded: LoadedDesign, analysis: DesignAnalysis, checkSections: readonly DocSection[] = [], checks: CheckResults | null = null, charts: readonly MemberChart[] | null = null): DocSection[] {
  const loads = loadCasesSections(loaded, analysis);
  const sections = [
    structuralModelSection(loaded, analysis),
    elevationPlanSection(loaded, analysis),
    loads.main,
    combinationsSection(loaded, analysis),
    resultsSection(loaded, analysis),
    ...(checks ? [freeBodySection(loaded, analysis, checks)] : []),
    diagramsSection(loaded, analysis, charts),
    ...checkSections,
    ...[handCheckSection(loaded, analysis)].filter((s) => s !== null),
    loads.steps,
    modelTablesSection(loaded, analysis),
    staticsTablesSection(loaded, analysis),
  ];
  return withUnbrokenIds(sections, printedIds(analysis));
}
