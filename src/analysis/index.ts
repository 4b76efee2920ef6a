// Public API of the analysis stage.
export type * from './analysis-types.ts';
export { analyzeAll, analyzeCombination, combinedLoads, solveLoads } from './analyze.ts';
export { envelope } from './envelope.ts';
export { modalAnalysis } from './modal.ts';
export { stationValue } from './member-stations.ts';
