// The engineering chain from a design to analysis results: frame model, load cases,
// combinations, one analysis per combination, natural modes. No printing here.
import type { Design } from './design/design.ts';
import type { FrameModel } from './model/frame.ts';
import type { Combination, LoadCase } from './loads/load-types.ts';
import type { AnalysisOptions, AnalysisResults, Mode } from './analysis/analysis-types.ts';
import { buildFrame } from './model/build-frame.ts';
import { buildLoadCases, expandCombinations } from './loads/index.ts';
import { analyzeAll } from './analysis/analyze.ts';
import { modalAnalysis } from './analysis/modal.ts';
import { placeText } from './analysis/buckling-place.ts';
import { UnstableStructureError } from './errors.ts';

export interface DesignAnalysis {
  readonly model: FrameModel;
  readonly cases: readonly LoadCase[];
  readonly combinations: readonly Combination[];
  readonly options: AnalysisOptions;
  readonly results: AnalysisResults;
  readonly modes: readonly Mode[];
}

/** How many natural modes the package reports. */
export const MODES_REPORTED = 4;

export function analyseDesign(design: Design, opts: { readonly firstOrder?: boolean }): DesignAnalysis {
  const model = buildFrame(design, { segmentsPerMember: design.analysis.segmentsPerMember });
  const cases = buildLoadCases(design, model);
  const combinations = expandCombinations(design, cases);
  const options: AnalysisOptions = {
    secondOrder: design.analysis.secondOrder && !opts.firstOrder,
    tolerance: design.analysis.pDeltaTolerance,
    maxIterations: design.analysis.pDeltaMaxIterations,
    stationSpacing_m: design.analysis.stationSpacing_m,
  };
  const results = inUserUnits(design, () => analyzeAll(model, cases, combinations, options));
  const modes = modalAnalysis(model, MODES_REPORTED);
  return { model, cases, combinations, options, results, modes };
}

/** The analysis prints the place of a buckling mode in metres; the user reads it in the units of the input. */
function inUserUnits<T>(design: Design, run: () => T): T {
  try {
    return run();
  } catch (err) {
    const place = err instanceof UnstableStructureError ? err.detail.place : undefined;
    if (!place || design.units === 'si') throw err;
    const message = (err as Error).message.replace(placeText(place, 'si'), placeText(place, design.units));
    throw new UnstableStructureError(message, (err as UnstableStructureError).detail);
  }
}
