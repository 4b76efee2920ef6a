// A problem found in an input file before it is located in the source text.
// Every stage of validation (schema, geometry, plausibility) reports these; load.ts
// turns them into located Diagnostics.
import { escapeUnsafe } from './text-safety.ts';

/** Key path into the input document: object keys and array indexes. */
export type InputPath = readonly (string | number)[];

export interface Problem {
  readonly path: InputPath;
  readonly message: string;
  readonly severity: 'error' | 'warning';
  /** 'key' locates the problem at the key itself (unknown keys); default is the value. */
  readonly at?: 'key' | 'value';
}

export const error = (path: InputPath, message: string, at?: 'key' | 'value'): Problem => ({ path, message, severity: 'error', at });
export const warning = (path: InputPath, message: string): Problem => ({ path, message, severity: 'warning' });

/** "structure.arms[0].length": the dotted form printed in diagnostics. */
export function formatPath(path: InputPath): string {
  let out = '';
  for (const seg of path) {
    if (typeof seg === 'number') out += `[${seg}]`;
    else out += out === '' ? escapeUnsafe(seg) : `.${escapeUnsafe(seg)}`;
  }
  return out;
}
