// Public API of the analysis stage (records and sign conventions: analysis-types.ts).
//
//   analyzeAll(model, cases, combos, opts): AnalysisResults         every combination, frozen, keyed by id
//   analyzeCombination(model, cases, combo, opts): CombinationResult one combination (loads combined first)
//   solveLoads(model, loads, { stationSpacing_m? }): LinearSolution  first order, for tests and hand checks
//   envelope(results, memberId, component): Envelope                 governing value, combination and place
//   modalAnalysis(model, nModes): Mode[]                             lumped-mass natural modes
//   combinedLoads(cases, combo): { load, factor }[]                  the loads a combination applies
//
// A mechanism, a missing support or loss of stability throws UnstableStructureError (exit code 3).
export type * from './analysis-types.ts';
export { analyzeAll, analyzeCombination, combinedLoads, solveLoads } from './analyze.ts';
export { envelope } from './envelope.ts';
export { modalAnalysis } from './modal.ts';
export { stationValue } from './member-stations.ts';
