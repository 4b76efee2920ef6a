// Public API of the loads stage.
export { buildLoadCases } from './build-load-cases.ts';
export { expandCombinations } from './combinations.ts';
export { deadLoadCase } from './dead-load.ts';
export { windLoadCase, normalComponent } from './wind-load.ts';
export { iceLoadCase } from './ice-load.ts';
export { loadResultant, localAxes, type Resultant } from './load-resultant.ts';
export { directionKey, windCaseId, iceWindCaseId, DEAD_CASE_ID, ICE_CASE_ID } from './case-ids.ts';
export { RULES as LOAD_RULES } from './load-rules.ts';
