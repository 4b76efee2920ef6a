// Reading the input file's text; a file that cannot be read is bad input (exit code 2), not a crash.
import { readFileSync } from 'node:fs';
import { InputError } from '../errors.ts';

export function readInputBytes(file: string): Buffer {
  try {
    return readFileSync(file);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (e as Error).message;
    throw new InputError([{ file, line: 1, col: 1, path: '', message: `${reason}: cannot read the input file`, severity: 'error' }]);
  }
}
