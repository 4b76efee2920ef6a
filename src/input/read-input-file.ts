// Reads an input file as UTF-8 text; a missing or unreadable file is bad input (exit 2).
import { readFileSync } from 'node:fs';
import { InputError } from '../errors.ts';

export function readInputFile(file: string): string {
  try {
    return readFileSync(file, 'utf8');
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'is a folder, not a file' : `cannot be read (${code ?? 'unknown error'})`;
    throw new InputError([{ file, line: 1, col: 1, path: '', message: `${why}; expected a polebook input file (.yaml, .yml or .json)`, severity: 'error' }]);
  }
}
