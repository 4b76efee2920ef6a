// polebook index <folders...> [--out DIR]: merges the indexes of a sharded batch into one.
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { EXIT, FileLevelError } from '../../errors.ts';
import { parseArgs, UsageError } from '../args.ts';
import type { Command } from '../run.ts';
import { INDEX_STEM, sortedIndex, worstExit, type BatchIndex, type IndexRow } from '../../batch/index-files.ts';
import { printIndex, writeIndex } from './batch-output.ts';

const HELP = `Usage: polebook index <folders...> [--out DIR] [--quiet]

Merges the indexes (index.json) that polebook build --shard K/N wrote into each folder into
one index of the whole batch: <out>/index.pdf, index.csv and index.json, the same as one
unsharded run would write. An input listed by two folders is an error (exit 2). The exit code
is the worst of the runs listed.

Options:
  --out DIR   folder for the merged index (default: output)
  --quiet     no status lines on stderr
`;

function readIndex(folder: string): BatchIndex {
  const file = join(folder, `${INDEX_STEM}.json`);
  let parsed: unknown;
  try {
    parsed = JSON.parse(readFileSync(file, 'utf8'));
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    throw new FileLevelError(file, `cannot read the index ${file}: ${code === 'ENOENT' ? 'there is no such file (did polebook build write into this folder?)' : (err as Error).message}`);
  }
  const idx = parsed as Partial<BatchIndex>;
  if (idx.format !== 'polebook-index' || idx.formatVersion !== 1 || !Array.isArray(idx.rows)) throw new FileLevelError(file, `${file} is not an index written by polebook build (format polebook-index, version 1)`);
  return idx as BatchIndex;
}

export const indexCommand: Command = {
  name: 'index',
  summary: 'merge the indexes of a sharded batch (polebook build --shard K/N) into one',
  help: HELP,
  async run(argv, io) {
    const args = parseArgs(argv, { flags: ['quiet'], values: ['out'] });
    if (args.positionals.length === 0) throw new UsageError('index takes the folders the shards wrote into');
    const rows: IndexRow[] = [];
    const from = new Map<string, string>();
    for (const f of args.positionals) {
      const folder = resolve(io.cwd, f);
      for (const r of readIndex(folder).rows) {
        const other = from.get(r.file);
        if (other !== undefined) throw new FileLevelError(folder, `${r.file} is listed in the index of ${other} and of ${folder}: the shards overlap; give each folder once`);
        from.set(r.file, folder);
        rows.push(r);
      }
    }
    const index = sortedIndex(rows);
    await writeIndex(index, resolve(io.cwd, args.values.get('out') ?? 'output'), io, args.flags.has('quiet'));
    printIndex(index, io);
    return worstExit(index) as (typeof EXIT)[keyof typeof EXIT];
  },
};
