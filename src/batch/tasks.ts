// The kinds of task the pool runs, in a worker thread or in this one.
import { evaluateAlternative, type EvaluateResult, type EvaluateTask } from '../compare/evaluate.ts';
import { buildOneInput, type BuildTask, type BuildOutcome } from './build-one.ts';

interface Kinds {
  alternative: { task: EvaluateTask; result: EvaluateResult };
  build: { task: BuildTask; result: BuildOutcome };
}
export type TaskKind = keyof Kinds;
export type TaskOf<K extends TaskKind> = Kinds[K]['task'];
export type ResultOf<K extends TaskKind> = Kinds[K]['result'];

export async function runTask<K extends TaskKind>(kind: K, task: TaskOf<K>): Promise<ResultOf<K>> {
  if (kind === 'alternative') return (await evaluateAlternative(task as EvaluateTask)) as ResultOf<K>;
  return (await buildOneInput(task as BuildTask)) as ResultOf<K>;
}
