// Reading the input file's bytes. A file that cannot be read (missing, a folder, no permission) is
// bad input (exit code 2) reported against the file alone: it has no line or column to point at.
import { readFileSync, statSync } from 'node:fs';
import { FileLevelError } from '../errors.ts';

export function readInputBytes(file: string): Buffer {
  try {
    // Looked at before reading so that a folder or a pipe is refused instead of read or waited on.
    const stats = statSync(file);
    if (stats.isDirectory()) throw cannotRead(file, 'it is a folder, not an input file');
    if (!stats.isFile()) throw cannotRead(file, 'it is not a regular file');
    return readFileSync(file);
  } catch (e) {
    if (e instanceof FileLevelError) throw e;
    throw cannotRead(file, readFailureReason(e));
  }
}

/** The reason a file system call failed, in words (the Node message repeats the path and the code). */
export function readFailureReason(e: unknown): string {
  switch ((e as NodeJS.ErrnoException).code) {
    case 'ENOENT':
      return 'there is no such file';
    case 'EACCES':
    case 'EPERM':
      return 'no permission to read it';
    case 'ENOTDIR':
      return 'a part of its path is a file, not a folder';
    case 'EISDIR':
      return 'it is a folder, not an input file';
    default:
      return e instanceof Error ? e.message : String(e);
  }
}

function cannotRead(file: string, reason: string): FileLevelError {
  return new FileLevelError(file, `cannot read the input file ${file}: ${reason}`);
}
