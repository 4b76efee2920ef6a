// The inputs of a batch: the files named and the input files in the folders named (not their
// subfolders), sorted by their path as given so every machine sees the same list, and the
// K-th of N shards of that list for a job matrix.
import { readdirSync, statSync } from 'node:fs';
import { basename, extname, join, relative, resolve } from 'node:path';
import { EXIT, FileLevelError, PolebookError } from '../errors.ts';

export interface BatchInput {
  /** Absolute path. */
  readonly file: string;
  /** As printed in the index: relative to the working folder, with forward slashes. */
  readonly display: string;
}

export const INPUT_EXTENSIONS = ['.yaml', '.yml', '.json'];

export interface Shard {
  readonly k: number;
  readonly n: number;
}

/** "2/5" -> { k: 2, n: 5 }, 1 <= k <= n. */
export function parseShard(text: string): Shard {
  const m = /^(\d+)\/(\d+)$/.exec(text.trim());
  const k = m ? Number(m[1]) : NaN;
  const n = m ? Number(m[2]) : NaN;
  if (!m || n < 1 || k < 1 || k > n) throw new PolebookError(`--shard '${text}': expected K/N with 1 <= K <= N, e.g. --shard 2/4 for the second of four parts`, EXIT.badInput);
  return { k, n };
}

/** Code-point order (not the locale's), so the list is the same on every machine. */
const byDisplay = (a: BatchInput, b: BatchInput) => (a.display < b.display ? -1 : a.display > b.display ? 1 : 0);

export function expandInputs(args: readonly string[], cwd: string): BatchInput[] {
  const out = new Map<string, BatchInput>();
  const add = (file: string) => {
    const display = relative(cwd, file).split('\\').join('/') || basename(file);
    out.set(file, { file, display });
  };
  for (const arg of args) {
    const path = resolve(cwd, arg);
    let isDir = false;
    try {
      isDir = statSync(path).isDirectory();
    } catch {
      add(path); // a missing file is reported in its row, like any other unreadable input
      continue;
    }
    if (!isDir) {
      add(path);
      continue;
    }
    const found = readdirSync(path).filter((n) => INPUT_EXTENSIONS.includes(extname(n).toLowerCase()) && statSync(join(path, n)).isFile());
    if (found.length === 0) throw new FileLevelError(path, `the folder ${path} holds no input files (${INPUT_EXTENSIONS.join(', ')}); give input files or a folder of them`);
    for (const n of found) add(join(path, n));
  }
  return [...out.values()].sort(byDisplay);
}

/** The K-th of N parts: every N-th input of the sorted list from the K-th on, so the parts
 * together hold every input exactly once and a part's list depends only on the whole list. */
export function shardOf<T>(list: readonly T[], shard: Shard | null): T[] {
  if (shard === null) return [...list];
  return list.filter((_, i) => i % shard.n === shard.k - 1);
}

/** Two inputs with the same name would write the same package: refused before anything is built. */
export function refuseSameNames(inputs: readonly BatchInput[]): void {
  const seen = new Map<string, BatchInput>();
  for (const i of inputs) {
    const stem = basename(i.file, extname(i.file));
    const other = seen.get(stem);
    if (other) throw new PolebookError(`${i.display} and ${other.display} would both write ${stem}.pdf; rename one or build them into different --out folders`, EXIT.badInput);
    seen.set(stem, i);
  }
}
