// Work spread over worker threads when it pays, else run here, one task after another. The
// tasks and their results are plain data; results come back in the order of the tasks, whatever
// order the workers finish in, so the output never depends on timing.
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import { existsSync } from 'node:fs';
import { Worker } from 'node:worker_threads';
import { runTask, type TaskKind, type TaskOf, type ResultOf } from './tasks.ts';

export interface PoolOptions {
  /** Threads to use; 1 runs every task in this thread. */
  readonly workers: number;
  /** Called as each task ends (in the order they end), for progress. */
  readonly onDone?: (index: number, doneCount: number, result: unknown) => void;
}

/** The compiled worker script beside this module; null under the TypeScript sources (tests), where
 * a worker thread could not load .ts files: those runs use one thread. */
export function workerScript(): URL | null {
  const here = import.meta.url;
  if (!here.endsWith('.js')) return null;
  const url = new URL('./worker.js', here);
  return existsSync(fileURLToPath(url)) ? url : null;
}

/** Threads that pay. A thread starts by importing the whole chain (about 0.8 s, measured) and
 * runs its first tasks cold, so it must get enough work: `minPerThread` tasks (a comparison's
 * alternatives take about 0.1 s each, a package about 1 s). And a core busy with other work gives
 * no speed-up: the cores counted are those the load average leaves free (at least one). */
export function workersFor(taskCount: number, asked: number | null, minPerThread = 2): number {
  if (asked !== null) return Math.max(1, Math.min(asked, taskCount));
  if (workerScript() === null) return 1;
  const free = Math.max(1, availableParallelism() - Math.floor(loadavg()[0] ?? 0));
  return Math.max(1, Math.min(free, Math.floor(taskCount / minPerThread)));
}

export async function runPool<K extends TaskKind>(kind: K, tasks: readonly TaskOf<K>[], opts: PoolOptions): Promise<ResultOf<K>[]> {
  const script = workerScript();
  const threads = script === null ? 1 : Math.min(opts.workers, tasks.length);
  const results: ResultOf<K>[] = new Array(tasks.length);
  let done = 0;
  if (threads <= 1) {
    for (const [k, task] of tasks.entries()) {
      results[k] = await runTask(kind, task);
      opts.onDone?.(k, ++done, results[k]);
    }
    return results;
  }
  let next = 0;
  const workers = Array.from({ length: threads }, () => new Worker(script!));
  try {
    await Promise.all(
      workers.map(
        (w) =>
          new Promise<void>((resolve, reject) => {
            const give = () => {
              if (next >= tasks.length) return resolve();
              const k = next++;
              w.once('message', (msg: { ok: boolean; result?: ResultOf<K>; error?: string }) => {
                if (!msg.ok) return reject(new Error(`worker failed on task ${k + 1}: ${msg.error}`));
                results[k] = msg.result!;
                opts.onDone?.(k, ++done, results[k]);
                give();
              });
              w.postMessage({ kind, task: tasks[k] });
            };
            w.once('error', reject);
            give();
          }),
      ),
    );
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results;
}
