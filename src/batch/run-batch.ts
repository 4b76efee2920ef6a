// A batch: every input built into its own package (in worker threads when it pays), then the
// index of the batch. One bad or unstable input is a row of the index; the others go on.
import type { BuildOutcome } from './build-one.ts';
import { refuseSameNames, shardOf, type BatchInput, type Shard } from './inputs.ts';
import { indexRow, sortedIndex, type BatchIndex } from './index-files.ts';
import { runPool, workersFor } from './pool.ts';

export interface BatchRequest {
  readonly inputs: readonly BatchInput[];
  readonly shard: Shard | null;
  readonly outDir: string;
  readonly json: boolean;
  readonly firstOrder: boolean;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly workers: number | null;
  readonly onDone?: (outcome: BuildOutcome, done: number, total: number) => void;
}

export interface BatchResult {
  readonly outcomes: readonly BuildOutcome[];
  readonly index: BatchIndex;
}

export async function runBatch(req: BatchRequest): Promise<BatchResult> {
  const mine = shardOf(req.inputs, req.shard);
  refuseSameNames(mine);
  const tasks = mine.map((i) => ({ file: i.file, display: i.display, outDir: req.outDir, json: req.json, firstOrder: req.firstOrder, env: req.env }));
  const outcomes = await runPool('build', tasks, {
    workers: workersFor(tasks.length, req.workers),
    onDone: (_k, done, result) => req.onDone?.(result as BuildOutcome, done, tasks.length),
  });
  return { outcomes, index: sortedIndex(outcomes.map(indexRow)) };
}
