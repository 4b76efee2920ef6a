// npm run bench: analysis speed on each example, solve time against segment count, and (compare-batch.ts)
// the comparison and batch timings.
// Targets (issue): all combinations of an example analysed (P-delta, stations, extremes) in under
// 50 ms; solve time about linear in the number of segments (40 -> 640 segments, 16x, costing no
// more than about 25x). Measured and printed only; never asserted.
import { readdirSync } from 'node:fs';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { analyzeAll } from '../src/analysis/analyze.ts';
import { modalAnalysis } from '../src/analysis/modal.ts';
import type { AnalysisOptions } from '../src/analysis/analysis-types.ts';
import { MODES_REPORTED } from '../src/analyse-design.ts';
import { runChecks } from '../src/checks/run-checks.ts';
import { loadDesignFile } from '../src/input/index.ts';
import { buildLoadCases, expandCombinations } from '../src/loads/index.ts';
import { buildFrame } from '../src/model/build-frame.ts';
import { packageRoot } from '../src/package-root.ts';
import { scalingTable } from './scaling.ts';
import { fmtTiming, summarise, type Timing } from './timing.ts';
import { printCalculixComparison } from './calculix-compare.ts';
import { printRefusalTiming } from './refusal-timing.ts';
import { printCompareAndBatchBench } from './compare-batch.ts';
import { printColdBuilds } from './cold-build.ts';

const RUNS = 41;
const WARMUP = 5;
const TARGET_MS = 50;

interface StageTimes {
  readonly nodes: number;
  readonly elements: number;
  readonly combos: number;
  readonly frame: Timing;
  readonly loads: Timing;
  readonly analysis: Timing;
  readonly firstOrder: Timing;
  readonly modes: Timing;
  readonly checks: Timing;
  readonly total: Timing;
}

/** Each stage of analyseDesign timed on its own, in pipeline order, RUNS times after WARMUP runs. */
function stageTimes(file: string): StageTimes {
  const { design } = loadDesignFile(file);
  const options: AnalysisOptions = {
    secondOrder: design.analysis.secondOrder,
    tolerance: design.analysis.pDeltaTolerance,
    maxIterations: design.analysis.pDeltaMaxIterations,
    stationSpacing_m: design.analysis.stationSpacing_m,
  };
  const t = { frame: [] as number[], loads: [] as number[], analysis: [] as number[], firstOrder: [] as number[], modes: [] as number[], checks: [] as number[], total: [] as number[] };
  let info = { nodes: 0, elements: 0, combos: 0 };
  for (let k = 0; k < WARMUP + RUNS; k++) {
    const t0 = performance.now();
    const model = buildFrame(design, { segmentsPerMember: design.analysis.segmentsPerMember });
    const t1 = performance.now();
    const cases = buildLoadCases(design, model);
    const combos = expandCombinations(design, cases);
    const t2 = performance.now();
    const results = analyzeAll(model, cases, combos, options);
    const t3 = performance.now();
    const modes = modalAnalysis(model, MODES_REPORTED);
    const t4 = performance.now();
    runChecks(design, { model, cases, combinations: combos, options, results, modes });
    const t4c = performance.now();
    // first order alone, for comparison (not part of the pipeline total)
    analyzeAll(model, cases, combos, { ...options, secondOrder: false });
    const t5 = performance.now();
    if (k < WARMUP) continue;
    t.frame.push(t1 - t0);
    t.loads.push(t2 - t1);
    t.analysis.push(t3 - t2);
    t.modes.push(t4 - t3);
    t.checks.push(t4c - t4);
    t.total.push(t4c - t0);
    t.firstOrder.push(t5 - t4c);
    info = { nodes: model.nodes.length, elements: model.elements.length, combos: combos.length };
  }
  return {
    ...info,
    frame: summarise(t.frame),
    loads: summarise(t.loads),
    analysis: summarise(t.analysis),
    firstOrder: summarise(t.firstOrder),
    modes: summarise(t.modes),
    checks: summarise(t.checks),
    total: summarise(t.total),
  };
}

/** Load average over the last minute against the number of cores: other work competing for them. */
const load = (): string => `load average ${loadavg()[0]!.toFixed(2)}`;

// The scaling table first, while the heap holds nothing from the example runs.
const SEGMENTS = [10, 40, 160, 640];
const scale = scalingTable(SEGMENTS, 40);

const examples = join(packageRoot(), 'examples');
console.log(`polebook bench, Node ${process.version}: median (25th-75th percentile) of ${RUNS} runs after ${WARMUP} warm-up runs, ms`);
console.log(`Machine at start: ${load()}. A load near or above the number of cores means other work shares them:`);
console.log('medians and the upper percentiles then grow; the fastest run ("min") stays close to the cost of the code.');
console.log(`\nPer example and stage. The ${TARGET_MS} ms target applies to "analysis": analyzeAll, every combination`);
console.log('with P-delta as the example asks, stations and exact extremes. "first order" is the same without');
console.log('P-delta, for comparison only; "checks" = every design check of every station and combination;');
console.log('"pipeline" = frame + loads + analysis + modes + checks.');
const files = readdirSync(examples).filter((f) => /\.(ya?ml|json)$/.test(f)).sort();
const rows = files.map((f) => ({ file: f, s: stageTimes(join(examples, f)) }));
const col = (s: string, w: number): string => s.padStart(w);
console.log(
  '\n' + 'example'.padEnd(22) + col('nodes', 6) + col('combos', 7) + col('frame', 8) + col('loads', 8) +
    col('analysis', 22) + col('first order', 22) + col('modes', 20) + col('checks', 20) + col('pipeline', 22),
);
for (const { file, s } of rows) {
  console.log(
    file.padEnd(22) + col(String(s.nodes), 6) + col(String(s.combos), 7) +
      col(s.frame.median_ms.toFixed(2), 8) + col(s.loads.median_ms.toFixed(2), 8) +
      col(fmtTiming(s.analysis), 22) + col(fmtTiming(s.firstOrder), 22) + col(fmtTiming(s.modes), 20) + col(fmtTiming(s.checks), 20) + col(fmtTiming(s.total), 22),
  );
}
console.log(`\nAnalysis (all combinations, P-delta, stations, extremes) against the ${TARGET_MS} ms target:`);
for (const { file, s } of rows) {
  const perCombo = s.analysis.median_ms / s.combos;
  const verdict = s.analysis.p75_ms < TARGET_MS ? 'under target' : 'OVER TARGET';
  console.log(
    `  ${file.padEnd(22)} median ${s.analysis.median_ms.toFixed(2).padStart(6)} ms (75th pct ${s.analysis.p75_ms.toFixed(2)}, min ${s.analysis.min_ms.toFixed(2)}), ` +
      `${perCombo.toFixed(2)} ms per combination, ${(TARGET_MS / s.analysis.median_ms).toFixed(1)}x headroom at the median: ${verdict}`,
  );
}
console.log('\nChecks (every station of every combination) against the analysis itself; target: no more, at the median:');
for (const { file, s } of rows) {
  const ratio = s.checks.median_ms / s.analysis.median_ms;
  console.log(`  ${file.padEnd(22)} checks ${s.checks.median_ms.toFixed(2).padStart(6)} ms, analysis ${s.analysis.median_ms.toFixed(2).padStart(6)} ms: ${ratio.toFixed(2)}x, ${ratio <= 1 ? 'met' : 'NOT MET'}`);
}
console.log(`Machine after the example runs: ${load()}.`);

console.log('\nSolve time against segments per member (tapered pole with two arms, first order;');
console.log('assembly + banded LDL^T factorisation + one solve). Measured before the examples, on a fresh heap;');
console.log('rows sampled in turn; small models run in batches of about 4 ms per sample (time per run shown):');
console.log('segments'.padStart(9) + 'dof'.padStart(7) + 'band'.padStart(6) + 'batch'.padStart(7) + 'samples'.padStart(8) + 'solve ms (p25-p75)'.padStart(26) + 'x vs 40 (p25-p75)'.padStart(22));
scale.rows.forEach((r, k) => {
  const x = summarise(scale.ratios[k]!);
  console.log(
    String(r.segments).padStart(9) + String(r.dof).padStart(7) + String(r.bandwidth).padStart(6) + String(r.batch).padStart(7) + String(r.solve.runs).padStart(8) +
      fmtTiming(r.solve, 3).padStart(26) + `${x.median_ms.toFixed(1)} (${x.p25_ms.toFixed(1)}-${x.p75_ms.toFixed(1)})`.padStart(22),
  );
});
const top = summarise(scale.ratios[SEGMENTS.indexOf(640)]!);
console.log(
  `\n40 -> 640 segments (16x): solve time ${top.median_ms.toFixed(1)}x (median of ${top.runs} paired samples; quartiles ` +
    `${top.p25_ms.toFixed(1)}x-${top.p75_ms.toFixed(1)}x). Target: no more than about 25x: ` +
    `${top.p75_ms <= 25 ? 'met' : top.median_ms <= 25 ? 'met at the median' : 'NOT MET'}.`,
);

printRefusalTiming();

await printCalculixComparison();

await printCompareAndBatchBench();
printColdBuilds();
