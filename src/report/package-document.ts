// The document and PDF of a build's package from its analysis and checks: the summary page, the
// vega member charts (rendered asynchronously, so before the synchronous document), the sections
// and the layout. Loaded on demand by src/pipeline.ts.
import type { DesignAnalysis } from '../analyse-design.ts';
import type { CheckResults } from '../checks/check-types.ts';
import type { LoadedDesign } from '../design/design.ts';
import type { DocumentModel } from './document.ts';
import { renderPdf } from './pdf/render-pdf.ts';
import { analysisSections } from './sections/analysis-sections.ts';
import { buildDocument } from './sections/build-document.ts';
import { checkSections, CHECKS_TITLE } from './sections/check-sections.ts';
import { memberCharts } from './sections/member-charts.ts';
import { RESULTS_TITLE } from './sections/results-section.ts';
import { summarySection } from './sections/summary-section.ts';

export async function packageDocument(loaded: LoadedDesign, analysis: DesignAnalysis, checks: CheckResults): Promise<{ document: DocumentModel; pdf: Buffer }> {
  const summary = summarySection(loaded, analysis, checks, { checks: CHECKS_TITLE, results: RESULTS_TITLE });
  const charts = await memberCharts(loaded, analysis, checks);
  const document = buildDocument(loaded, { sections: analysisSections(loaded, analysis, checkSections(loaded, analysis, checks), checks, charts), secondOrder: analysis.options.secondOrder, checks, summary });
  return { document, pdf: await renderPdf(document) };
}
