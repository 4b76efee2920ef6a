// Which combinations each kind of check reads: a combination's category decides, never its id.
import type { CombinationCategory } from './design.ts';

/** Factored combinations: member strength, anchor bolts, base plate. */
export const isFactored = (c: CombinationCategory): boolean => c === 'strength' || c === 'extreme-wind' || c === 'extreme-ice';
export const isService = (c: CombinationCategory): boolean => c === 'service';
export const isFatigue = (c: CombinationCategory): boolean => c === 'fatigue';
