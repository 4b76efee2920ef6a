// `polebook compare`: the input and what to vary, to one row per alternative. Nothing is
// written here (see src/cli/commands/compare.ts). A bad path stops the run before any analysis,
// a bad value (refused at its own key when the alternative's input is read) after the run; both
// with a positioned error, exit 2, and nothing written.
import { basename, extname } from 'node:path';
import { LineCounter, parseDocument } from 'yaml';
import type { LoadedDesign } from '../design/design.ts';
import { EXIT, PolebookError } from '../errors.ts';
import { formatPath } from '../input/problem.ts';
import { loadForBuild, type BuildOptions } from '../pipeline.ts';
import { runPool, workersFor } from '../batch/pool.ts';
import { alternativeLabel, alternativesOf, gridSize, MAX_ALTERNATIVES, type Alternative } from './alternatives.ts';
import type { EvaluateResult } from './evaluate.ts';
import { picksOf, type Picks } from './picks.ts';
import { refuseRepeatedKeys, varyFromBlock, varyFromOption, varyProblem, type VarySpec } from './vary-spec.ts';
import type { VaryValue } from './vary-values.ts';

/** A thread pays for its start-up only with many alternatives: measured on a quiet 2-core machine,
 * 50 alternatives of about 40 ms took 4.0-4.1 s through the command on one thread and 4.6 s with a
 * worker beside this thread (it imports for about 0.3 s and runs its first alternatives cold, and
 * one thread already keeps about 1.4 cores busy with the collector). */
export const ALTERNATIVES_PER_THREAD = 40;

export interface CompareRequest {
  /** Absolute path of the input. */
  readonly input: string;
  /** `--vary` options; when empty, the input's compare block. */
  readonly vary: readonly string[];
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly firstOrder: boolean;
  /** Render each alternative's full package as well. */
  readonly packages: boolean;
  /** Threads asked for (--workers); null: as many as pay. */
  readonly workers: number | null;
  readonly onProgress?: (done: number, total: number, row: number) => void;
}

export interface CompareRow {
  readonly index: number;
  readonly values: readonly VaryValue[];
  /** "A1.length = 32 ft" */
  readonly label: string;
  /** File name of the alternative's input (written with --packages; its package is named alike). */
  readonly file: string;
  readonly text: string;
  readonly result: EvaluateResult;
}

export interface Comparison {
  readonly base: LoadedDesign;
  readonly specs: readonly VarySpec[];
  readonly rows: readonly CompareRow[];
  readonly picks: Picks;
  /** Where the varied keys came from. */
  readonly source: 'options' | 'compare block';
  /** Whether the alternatives were analysed second order (P-delta). */
  readonly secondOrder: boolean;
}

export function alternativeFileName(input: string, index: number, count: number): string {
  const width = Math.max(2, String(count).length);
  return `${basename(input, extname(input))}.alt-${String(index).padStart(width, '0')}.yaml`;
}

/** Reads the input and what to vary, and writes out every alternative's input text. */
export function prepareComparison(req: Pick<CompareRequest, 'input' | 'vary' | 'env' | 'firstOrder'>): { base: LoadedDesign; specs: VarySpec[]; alternatives: Alternative[]; source: Comparison['source'] } {
  const opts: BuildOptions = { env: req.env, firstOrder: req.firstOrder };
  const base = loadForBuild(req.input, opts);
  const lines = new LineCounter();
  const doc = parseDocument(base.text.replace(/^\uFEFF/, ''), { lineCounter: lines, uniqueKeys: true });
  const data: unknown = doc.toJS();
  const specs = req.vary.length > 0 ? req.vary.map((v) => varyFromOption(v, data)) : varyFromBlock(doc, lines, base.file, data);
  if (specs.length === 0) throw new PolebookError('nothing to vary: give --vary path=values (e.g. --vary "A1.length=28,32,36 ft") or a compare block in the input', EXIT.badInput);
  refuseRepeatedKeys(specs);
  const n = gridSize(specs);
  if (n > MAX_ALTERNATIVES) throw new PolebookError(`the varied values make ${n} alternatives (${specs.map((s) => s.values.length).join(' × ')}), more than the ${MAX_ALTERNATIVES} one comparison takes (a limit of ours); vary fewer values`, EXIT.badInput);
  const alternatives = alternativesOf(doc, specs);
  return { base, specs, alternatives, source: req.vary.length > 0 ? 'options' : 'compare block' };
}

/** A varied value the input stage refuses at its own key (a wrong unit, out of range) is a bad
 * value: said at the value, exit 2, nothing written. Problems elsewhere that a value causes (a
 * panel beyond a shortened arm) are outcomes of that alternative's row. Read from the refused
 * alternatives after the run, so no input is loaded twice. */
function refuseBadValues(specs: readonly VarySpec[], alternatives: readonly Alternative[], results: readonly EvaluateResult[]): void {
  for (const [n, alt] of alternatives.entries()) {
    for (const d of results[n]!.problems) {
      const hits = (s: VarySpec) => s.paths.some((p) => d.path === formatPath(p.path) || d.path.startsWith(`${formatPath(p.path)}.`));
      const k = specs.findIndex(hits);
      if (k < 0) continue;
      const v = alt.values[k]!;
      throw varyProblem(specs[k]!, { value: specs[k]!.values.indexOf(v), col: v.col }, `${specs[k]!.text} = ${v.label}: ${d.path}: ${d.message}`, d.path);
    }
  }
}

export type PreparedComparison = ReturnType<typeof prepareComparison>;

/** The comparison from its prepared alternatives and their results, in the order of the
 * alternatives; the same function wherever the comparison document is made, so a render thread
 * and this one hold the same comparison. */
export function comparisonFrom(prepared: PreparedComparison, results: readonly EvaluateResult[], firstOrder: boolean): Comparison {
  const { base, specs, alternatives, source } = prepared;
  refuseBadValues(specs, alternatives, results);
  const rows: CompareRow[] = alternatives.map((a, k) => ({ index: a.index, values: a.values, label: alternativeLabel(specs, a.values), file: alternativeFileName(base.file, a.index, alternatives.length), text: a.text, result: results[k]! }));
  return { base, specs, rows, picks: picksOf(rows, specs, base.design.arms.map((a) => a.id)), source, secondOrder: base.design.analysis.secondOrder && !firstOrder };
}

export async function runComparison(req: CompareRequest, prepared: PreparedComparison = prepareComparison(req)): Promise<Comparison> {
  const { base, alternatives } = prepared;
  const tasks = alternatives.map((a) => ({ text: a.text, file: alternativeFileName(base.file, a.index, alternatives.length), env: req.env, firstOrder: req.firstOrder, package: req.packages }));
  const results = await runPool('alternative', tasks, {
    workers: workersFor(tasks.length, req.workers, ALTERNATIVES_PER_THREAD),
    onDone: (k, done) => req.onProgress?.(done, tasks.length, k + 1),
  });
  return comparisonFrom(prepared, results, req.firstOrder);
}
