// Writes files so that readers see either the old file or the complete new one: the data goes
// to a temporary file in the same folder (same file system, so rename is atomic), is flushed to
// disk, then renamed over the target. Several files are all written to their temporary files
// first and renamed only when every one is complete, so a failure while writing (a full disk)
// replaces none of them. On failure the temporary files are removed and the previous files stay.
import { closeSync, fsyncSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

let counter = 0;

export interface FileToWrite {
  readonly path: string;
  readonly data: Uint8Array | string;
}

export function writeFileAtomic(path: string, data: Uint8Array | string): void {
  writeFilesAtomic([{ path, data }]);
}

export function writeFilesAtomic(files: readonly FileToWrite[]): void {
  const temps: string[] = [];
  try {
    for (const f of files) temps.push(writeTemp(f.path, f.data));
    files.forEach((f, k) => renameSync(temps[k]!, f.path));
  } catch (err) {
    for (const temp of temps) rmSync(temp, { force: true });
    throw err;
  }
  for (const folder of new Set(files.map((f) => dirname(f.path)))) syncFolder(folder);
}

/** The data in a new temporary file beside path, flushed; its name is returned. */
function writeTemp(path: string, data: Uint8Array | string): string {
  const bytes = typeof data === 'string' ? Buffer.from(data, 'utf8') : data;
  counter += 1;
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${counter}.tmp`);
  let fd: number | null = null;
  try {
    fd = openSync(temp, 'wx', 0o644);
    let offset = 0;
    while (offset < bytes.length) offset += writeSync(fd, bytes, offset, bytes.length - offset);
    fsyncSync(fd);
    closeSync(fd);
    fd = null;
    return temp;
  } catch (err) {
    if (fd !== null) {
      try {
        closeSync(fd);
      } catch {
        // already failing; the original error is the one to report
      }
    }
    rmSync(temp, { force: true });
    throw err;
  }
}

/** Makes the rename itself durable where the platform allows it (not on Windows). */
function syncFolder(folder: string): void {
  let fd: number | null = null;
  try {
    fd = openSync(folder, 'r');
    fsyncSync(fd);
  } catch {
    // best effort: the file is already complete and in place
  } finally {
    if (fd !== null) closeSync(fd);
  }
}
