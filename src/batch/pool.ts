// Work spread over this thread and worker threads when it pays, else run here, one task after another. The
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

/** Threads that pay. A worker starts by importing its chain (about 0.3 s for the engineering
 * alone, 0.8 s with the renderer, measured) and runs its first tasks cold, so it must get enough
 * work: `minPerThread` tasks (a comparison's alternatives take about 40 ms each, a package about 1.5 s). And a core busy with other work gives
 * no speed-up: the cores counted are those the load average leaves free (at least one). */
export function workersFor(taskCount: number, asked: number | null, minPerThread = 2): number {
  if (asked !== null) return Math.max(1, Math.min(asked, taskCount));
  if (workerScript() === null) return 1;
  const free = Math.max(1, availableParallelism() - Math.floor(loadavg()[0] ?? 0));
  return Math.max(1, Math.min(free, Math.floor(taskCount / minPerThread)));
}

/** Tasks sent ahead to a worker, so it never waits for this thread to hand it the next one. */
const IN_FLIGHT = 2;

/** Lets queued worker messages be handled between tasks run in this thread. */
const yieldToEvents = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));

export async function runPool<K extends TaskKind>(kind: K, tasks: readonly TaskOf<K>[], opts: PoolOptions): Promise<ResultOf<K>[]> {
  const script = workerScript();
  const threads = script === null ? 1 : Math.min(opts.workers, tasks.length);
  const results: ResultOf<K>[] = new Array(tasks.length);
  let done = 0;
  let next = 0;
  let failure: Error | null = null;
  const finish = (k: number, result: ResultOf<K>) => {
    results[k] = result;
    opts.onDone?.(k, ++done, result);
  };
  // This thread is one of the threads: it has the modules loaded and its code warm, and the
  // workers it starts (threads - 1) take tasks as they come free.
  const workers = Array.from({ length: threads - 1 }, () => new Worker(script!));
  const workerRuns = workers.map(
    (w) =>
      new Promise<void>((resolve, reject) => {
        let pending = 0;
        const give = () => {
          while (pending < IN_FLIGHT && next < tasks.length && failure === null) {
            const k = next++;
            pending++;
            w.postMessage({ index: k, kind, task: tasks[k] });
          }
          if (pending === 0) resolve();
        };
        w.on('message', (msg: { index: number; ok: boolean; result?: ResultOf<K>; error?: string }) => {
          pending--;
          if (!msg.ok) {
            failure ??= new Error(`worker failed on task ${msg.index + 1}: ${msg.error}`);
            return reject(failure);
          }
          finish(msg.index, msg.result!);
          give();
        });
        w.once('error', (err) => reject((failure ??= err)));
        give();
      }),
  );
  // A worker's failure is rethrown by Promise.all below; until then it must not count as unhandled.
  for (const run of workerRuns) run.catch(() => undefined);
  try {
    while (next < tasks.length && failure === null) {
      const k = next++;
      finish(k, await runTask(kind, tasks[k]!));
      if (workers.length > 0) await yieldToEvents();
    }
    await Promise.all(workerRuns);
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results;
}
