// Writes a file so that readers see either the old file or the complete new one: the data
// goes to a temporary file in the same folder (same file system, so rename is atomic),
// is flushed to disk, then renamed over the target. On failure the temporary file is
// removed and the previous file stays as it was.
import { closeSync, fsyncSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

let counter = 0;

export function writeFileAtomic(path: string, data: Uint8Array | string): void {
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
    renameSync(temp, path);
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
  syncFolder(dirname(path));
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
