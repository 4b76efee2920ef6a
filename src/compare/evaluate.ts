// One alternative from its input text to its row: loaded, analysed and checked by the same
// functions as `polebook build` (src/pipeline.ts), optionally with its full package. A structure
// that is unstable, or an input the validation refuses, is an outcome of its row, not a crash.
import { InputError, UnstableStructureError, formatDiagnostic } from '../errors.ts';
import { analyseAndCheck, loadTextForBuild, packageOf, type BuildOptions } from '../pipeline.ts';
import { inputHash } from '../input/index.ts';
import { alternativeMetrics, type AlternativeMetrics } from './metrics.ts';

export type AlternativeStatus = 'passes' | 'fails' | 'unstable' | 'refused';

export interface EvaluateTask {
  /** The alternative's complete input. */
  readonly text: string;
  /** The file name it is read as (printed in its package and in messages). */
  readonly file: string;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly firstOrder: boolean;
  /** Also render its full package (PDF) and the JSON results. */
  readonly package: boolean;
}

export interface EvaluateResult {
  readonly status: AlternativeStatus;
  readonly inputHash: string;
  /** Why it is unstable or refused; null otherwise. */
  readonly message: string | null;
  /** Refused: the errors by key path, to tell a bad varied value from a problem it causes elsewhere. */
  readonly problems: readonly { readonly path: string; readonly message: string }[];
  readonly metrics: AlternativeMetrics | null;
  readonly pdf: Uint8Array | null;
  readonly json: string | null;
}

export async function evaluateAlternative(task: EvaluateTask): Promise<EvaluateResult> {
  const opts: BuildOptions = { env: task.env, firstOrder: task.firstOrder, json: task.package };
  let loaded;
  try {
    loaded = loadTextForBuild(task.text, task.file, opts);
  } catch (err) {
    if (err instanceof InputError) {
      const errors = err.diagnostics.filter((d) => d.severity === 'error');
      return { ...refused(task, errors.map(formatDiagnostic).join('; ')), problems: errors.map((d) => ({ path: d.path, message: d.message })) };
    }
    throw err;
  }
  try {
    const checked = analyseAndCheck(loaded, opts);
    const metrics = alternativeMetrics(loaded, checked);
    const pkg = task.package ? await packageOf(loaded, opts, checked) : null;
    return { status: checked.checks.fails ? 'fails' : 'passes', inputHash: loaded.inputHash, message: null, problems: [], metrics, pdf: pkg ? pkg.pdf : null, json: pkg?.json ?? null };
  } catch (err) {
    if (err instanceof UnstableStructureError) return { status: 'unstable', inputHash: loaded.inputHash, message: err.message, problems: [], metrics: null, pdf: null, json: null };
    throw err;
  }
}

function refused(task: EvaluateTask, message: string): EvaluateResult {
  return { status: 'refused', inputHash: inputHash(Buffer.from(task.text, 'utf8')), message, problems: [], metrics: null, pdf: null, json: null };
}
