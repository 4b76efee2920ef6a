// A worker thread of the pool: runs the tasks it is sent, one at a time.
import { parentPort } from 'node:worker_threads';
import { runTask, type TaskKind } from './tasks.ts';

parentPort!.on('message', (msg: { kind: TaskKind; task: never }) => {
  runTask(msg.kind, msg.task).then(
    (result) => parentPort!.postMessage({ ok: true, result }),
    (err: unknown) => parentPort!.postMessage({ ok: false, error: err instanceof Error ? (err.stack ?? err.message) : String(err) }),
  );
});
