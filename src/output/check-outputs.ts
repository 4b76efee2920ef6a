// Whether the outputs of a run may be written, asked before the analysis so that a folder in the
// way or a protected package is reported at once, not after minutes of work, and nothing is
// created or changed when the answer is no. Protection is read from the mode bits: a file or folder
// without its owner's write bit (chmod a-w, u-w) is protected even for root, who may write anyway.
import { accessSync, constants, statSync, type Stats } from 'node:fs';
import { dirname } from 'node:path';
import { FileLevelError } from '../errors.ts';

const OWNER_WRITE = 0o200;

/** Throws FileLevelError (exit 2) unless outDir can be made or written and no target is protected. */
export function checkOutputsWritable(outDir: string, targets: readonly string[]): void {
  checkFolder(outDir);
  for (const target of targets) checkTarget(target);
}

function checkFolder(outDir: string): void {
  // Walk up to the nearest part of the path that exists: that one must be a folder we may write in.
  let existing = outDir;
  let stats = statOrNull(existing, outDir);
  while (stats === null) {
    const parent = dirname(existing);
    if (parent === existing) break;
    existing = parent;
    stats = statOrNull(existing, outDir);
  }
  if (stats === null) throw outputError(outDir, `cannot write the outputs to ${outDir}: no part of the path exists`);
  const made = existing === outDir ? '' : ` (the folder would be made inside it)`;
  if (!stats.isDirectory()) {
    const what = existing === outDir ? 'it is a file' : `${existing} is a file`;
    throw outputError(outDir, `cannot write the outputs to ${outDir}: ${what}, not a folder; give --out a folder you can write to`);
  }
  if ((stats.mode & OWNER_WRITE) === 0 || !canWrite(existing)) {
    throw outputError(outDir, `cannot write the outputs to ${outDir}: no permission to write in ${existing}${made}; give --out a folder you can write to`);
  }
}

function checkTarget(target: string): void {
  const stats = statOrNull(target, target);
  if (stats === null) return;
  if (stats.isDirectory()) throw outputError(target, `cannot write ${target}: a folder of that name is in the way; remove it or choose another --out`);
  if ((stats.mode & OWNER_WRITE) === 0) {
    throw outputError(target, `${target} is read-only: polebook does not replace a protected package; remove the protection or choose another --out`);
  }
}

/** The stats of a path, or null when nothing is there (ENOTDIR: a file further up, which the
 * walk up then finds and names); any other failure is reported. */
function statOrNull(path: string, reported: string): Stats | null {
  try {
    return statSync(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || code === 'ENOTDIR') return null;
    if (code === 'EACCES' || code === 'EPERM') throw outputError(reported, `cannot write the outputs to ${reported}: no permission to look into ${path}`);
    throw outputError(reported, `cannot write the outputs to ${reported}: ${(e as Error).message}`);
  }
}

function canWrite(folder: string): boolean {
  try {
    accessSync(folder, constants.W_OK | constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

function outputError(path: string, message: string): FileLevelError {
  return new FileLevelError(path, message);
}
