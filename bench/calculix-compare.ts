// Bench section: polebook's first-order solve of one combination against CalculiX (ccx, Debian
// package calculix-ccx) on the same model and loads, per example. The ccx time is the wall time of
// the ccx process from spawn to exit (reading the deck, expanding the beams into solids, solving,
// writing its output files), median of CCX_RUNS; writing the deck and reading the results are not
// in it. polebook's times are in-process medians of many runs. Printed only; never asserted.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { analyseDesign } from '../src/analyse-design.ts';
import { analyzeCombination, combinedLoads, solveLoads } from '../src/analysis/analyze.ts';
import type { AnalysisOptions } from '../src/analysis/analysis-types.ts';
import { loadDesignFile } from '../src/input/index.ts';
import { packageRoot } from '../src/package-root.ts';
import { hasCcx, CCX_ABSENT_MESSAGE } from '../tests/reference/calculix/has-ccx.ts';
import { runCalculix } from '../tests/reference/calculix/run-calculix.ts';
import { applyFactors } from '../tests/reference/calculix/factored-loads.ts';
import { combinationsToCompare } from '../tests/reference/calculix/combinations-to-compare.ts';
import { fmtTiming, summarise, timeBatched, type Timing } from './timing.ts';

const CCX_RUNS = 5;
const POLEBOOK_SAMPLES = 41;

export interface CalculixTimingRow {
  readonly file: string;
  readonly combination: string;
  readonly frameElements: number;
  readonly ccxElements: number;
  /** polebook analyzeCombination, first order: model preparation, assembly, factorisation, solve, stations and exact extremes. */
  readonly polebookCombination: Timing;
  /** polebook solveLoads: the same solve with stations only at element ends, loads and discontinuities. */
  readonly polebookSolve: Timing;
  readonly ccx: Timing;
}

/** null when ccx is not installed. */
export async function calculixTimings(): Promise<CalculixTimingRow[] | null> {
  if (!hasCcx()) return null;
  const dir = join(packageRoot(), 'examples');
  const files = readdirSync(dir).filter((f) => /\.ya?ml$/.test(f)).sort();
  const rows: CalculixTimingRow[] = [];
  for (const file of files) {
    const { design } = loadDesignFile(join(dir, file));
    const { model, cases, combinations } = analyseDesign(design, { firstOrder: true });
    const combo = combinationsToCompare(cases, combinations).find((c) => c.category === 'extreme-wind') ?? combinations[0]!;
    const opts: AnalysisOptions = {
      secondOrder: false,
      tolerance: design.analysis.pDeltaTolerance,
      maxIterations: design.analysis.pDeltaMaxIterations,
      stationSpacing_m: design.analysis.stationSpacing_m,
    };
    const loads = applyFactors(combinedLoads(cases, combo));
    const polebookCombination = timeBatched(() => analyzeCombination(model, cases, combo, opts), POLEBOOK_SAMPLES, 10, 10);
    const polebookSolve = timeBatched(() => solveLoads(model, loads), POLEBOOK_SAMPLES, 10, 10);
    const ccxTimes: number[] = [];
    let ccxElements = 0;
    await runCalculix(model, loads, { torsion: 'scale-shear-modulus' }); // warm the file cache
    for (let k = 0; k < CCX_RUNS; k++) {
      const r = await runCalculix(model, loads, { torsion: 'scale-shear-modulus' });
      ccxTimes.push(r.ccxWall_ms);
      ccxElements = r.deck.split('\n').filter((l) => /^\d+, \d+, \d+, \d+$/.test(l)).length;
    }
    rows.push({ file, combination: combo.id, frameElements: model.elements.length, ccxElements, polebookCombination, polebookSolve, ccx: summarise(ccxTimes) });
  }
  return rows;
}

export async function printCalculixComparison(): Promise<void> {
  console.log('\npolebook against CalculiX, one combination per example, first order (ms; median (25th-75th percentile)).');
  const rows = await calculixTimings();
  if (rows === null) {
    console.log(`  skipped: ${CCX_ABSENT_MESSAGE}`);
    return;
  }
  console.log(`polebook: ${POLEBOOK_SAMPLES} samples of 10 runs each, in process. ccx: wall time of the process (spawn to exit,`);
  console.log(`incl. its file input and output; deck written and results read outside the timing), median of ${CCX_RUNS} runs, one thread.`);
  console.log('"combination" = analyzeCombination (with stations and exact extremes); "solve" = solveLoads (displacements, end forces).');
  console.log('ccx solves more: each frame element is 4 or more B32R beams, which ccx expands into 20-node solids.');
  const col = (s: string, w: number): string => s.padStart(w);
  console.log(
    'example'.padEnd(22) + 'combination'.padEnd(28) + col('elements', 9) + col('ccx B32R', 9) +
      col('polebook combination', 22) + col('polebook solve', 20) + col('ccx', 22) + col('ccx / combination', 19),
  );
  for (const r of rows) {
    console.log(
      r.file.padEnd(22) + r.combination.padEnd(28) + col(String(r.frameElements), 9) + col(String(r.ccxElements), 9) +
        col(fmtTiming(r.polebookCombination, 3), 22) + col(fmtTiming(r.polebookSolve, 3), 20) + col(fmtTiming(r.ccx, 1), 22) +
        col(`${(r.ccx.median_ms / r.polebookCombination.median_ms).toFixed(0)}x`, 19),
    );
  }
}
