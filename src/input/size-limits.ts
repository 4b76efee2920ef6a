// Limits of ours on the size of an input and of the design it describes, checked before any
// analysis so that no file can make a build run for minutes or exhaust memory. A real support has
// a few arms, a few dozen attachments and a file of a few kilobytes; the limits leave a wide margin
// and are printed in the README.

/** Bytes of an input file: a design is a few kB, and reading YAML costs about 1.5 s per MB here, so
 * 256 kB keeps the largest refusal well under a second. */
export const MAX_INPUT_BYTES = 256_000;
export const MAX_ARMS = 12;
export const MAX_PANELS = 100;
export const MAX_POINTS = 100;
export const MAX_COMBINATIONS = 100;
export const MAX_ADDED_WIND_DIRECTIONS = 36;
export const MAX_REVISIONS = 100;
/** Analyses: each combination with wind once per wind direction, plus the fatigue cases. */
export const MAX_ANALYSES = 400;
/** Result stations of all members times the analyses: the size of the results held in memory. */
export const MAX_STATION_RESULTS = 100_000;

export const listLimit = (n: number, what: string, usual: string) => ({ error: `at most ${n} ${what} (a limit of ours, ${usual}); split the design or check the file` });
