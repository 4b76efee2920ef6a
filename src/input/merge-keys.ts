// YAML merge keys (<<: *block) are not part of YAML 1.2, which polebook reads: the yaml library
// would keep '<<' as an ordinary key. Say so at the key, instead of "unknown key '<<'".
import { error, type InputPath, type Problem } from './problem.ts';

export function mergeKeyProblems(data: unknown, path: InputPath = []): Problem[] {
  if (Array.isArray(data)) return data.flatMap((v, i) => mergeKeyProblems(v, [...path, i]));
  if (data === null || typeof data !== 'object') return [];
  return Object.entries(data as Record<string, unknown>).flatMap(([k, v]) => [
    ...(k === '<<' ? [error([...path, k], 'merge keys (<<: *name) are not supported: write the keys of the block out here (an alias *name may stand for a whole value)', 'key')] : []),
    ...mergeKeyProblems(v, [...path, k]),
  ]);
}
