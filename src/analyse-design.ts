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
  const results = analyzeAll(model, cases, combinations, options);
  const modes = modalAnalysis(model, MODES_REPORTED);
  return { model, cases, combinations, options, results, modes };
}
