// One cold build of a package in a fresh process, for bench/cold-build.ts, with the command's heap
// setting: the time of each phase
// (module imports, input, analysis, checks, vega member charts, document model with its figures, PDF layout and
// rendering, writing) and the peak memory, printed as one JSON line on stdout.
import { performance } from 'node:perf_hooks';
import { growHeapInSmallSteps } from '../src/heap-growth.ts';

// As a single build does (src/cli/commands/build.ts).
growHeapInSmallSteps();

const file = process.argv[2];
const out = process.argv[3];
if (!file || !out) throw new Error('usage: cold-build-child <input> <output.pdf>');
const t0 = performance.now();
const { loadForBuild, analyseAndCheck } = await import('../src/pipeline.ts');
const { analyseDesign } = await import('../src/analyse-design.ts');
const { runChecks } = await import('../src/checks/run-checks.ts');
const { buildDocument } = await import('../src/report/sections/build-document.ts');
const { analysisSections } = await import('../src/report/sections/analysis-sections.ts');
const { checkSections, CHECKS_TITLE } = await import('../src/report/sections/check-sections.ts');
const { summarySection } = await import('../src/report/sections/summary-section.ts');
const { RESULTS_TITLE } = await import('../src/report/sections/results-section.ts');
const { memberCharts } = await import('../src/report/sections/member-charts.ts');
const { renderPdf } = await import('../src/report/pdf/render-pdf.ts');
const { writeFileAtomic } = await import('../src/output/write-atomic.ts');
void analyseAndCheck;
const t1 = performance.now();
const loaded = loadForBuild(file);
const t2 = performance.now();
const analysis = analyseDesign(loaded.design, {});
const t3 = performance.now();
const checks = runChecks(loaded.design, analysis);
const t4 = performance.now();
// The same document the build makes (pipeline.ts packageOf), timed apart from its rendering.
const charts = await memberCharts(loaded, analysis, checks);
const t4c = performance.now();
const summary = summarySection(loaded, analysis, checks, { checks: CHECKS_TITLE, results: RESULTS_TITLE });
const document = buildDocument(loaded, { sections: analysisSections(loaded, analysis, checkSections(loaded, analysis, checks), checks, charts), secondOrder: analysis.options.secondOrder, checks, summary });
const t5 = performance.now();
const pdf = await renderPdf(document);
const t6 = performance.now();
writeFileAtomic(out, pdf);
const t7 = performance.now();
process.stdout.write(
  `${JSON.stringify({ imports: t1 - t0, input: t2 - t1, analysis: t3 - t2, checks: t4 - t3, charts: t4c - t4, document: t5 - t4c, layout: t6 - t5, write: t7 - t6, total: t7 - t0, maxRSS_kB: process.resourceUsage().maxRSS, pages: (pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length })}\n`,
);
