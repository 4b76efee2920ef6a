// A worker thread of the pool: runs the tasks it is sent one at a time, in the order sent (the
// pool sends a second ahead so the thread never waits), and answers each with its index.
import { parentPort } from 'node:worker_threads';
import { runTask, type TaskKind } from './tasks.ts';

interface Message {
  readonly index: number;
  readonly kind: TaskKind;
  readonly task: never;
}

let chain: Promise<void> = Promise.resolve();

parentPort!.on('message', (msg: Message) => {
  chain = chain.then(() =>
    runTask(msg.kind, msg.task).then(
      (result) => parentPort!.postMessage({ index: msg.index, ok: true, result }),
      (err: unknown) => parentPort!.postMessage({ index: msg.index, ok: false, error: err instanceof Error ? (err.stack ?? err.message) : String(err) }),
    ),
  );
});
