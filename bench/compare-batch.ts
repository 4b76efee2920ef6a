// npm run bench, comparison and batch part (issue 10). Targets: a comparison of 50 arm lengths,
// with its PDF, under 4 s on a 2-core machine; the analysis and checks of one alternative a small
// fraction of a full build; a batch of 20 inputs with one and with two worker threads, speed-up
// printed. Measured and printed only; never asserted. Run alone: node dist/bench/compare-batch.js
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { parseDocument } from 'yaml';
import { ALTERNATIVES_PER_THREAD, runComparison } from '../src/compare/run-compare.ts';
import { comparisonOutputs } from '../src/compare/compare-outputs.ts';
import { analyseAndCheck, loadForBuild, packageOf } from '../src/pipeline.ts';
import { expandInputs } from '../src/batch/inputs.ts';
import { runBatch } from '../src/batch/run-batch.ts';
import { workersFor } from '../src/batch/pool.ts';
import { packageRoot } from '../src/package-root.ts';

const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const load = () => `load average ${loadavg()[0]!.toFixed(2)} on ${availableParallelism()} cores`;
const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

async function compareBench(): Promise<void> {
  const input = join(packageRoot(), 'examples', 'cantilever-sign.yaml');
  // 50 arm lengths from the example's 36 ft (its panels and truck lane fit on all of them).
  const vary = 'A1.length=36..40.9:0.1 ft';
  const threads = workersFor(50, null, ALTERNATIVES_PER_THREAD);
  const t0 = performance.now();
  const c = await runComparison({ input, vary: [vary], env: ENV, firstOrder: false, packages: false, workers: null });
  const t1 = performance.now();
  const files = await comparisonOutputs(c, { packages: false });
  const t2 = performance.now();
  console.log(`\nComparison of ${c.rows.length} arm lengths (--vary "${vary}", examples/cantilever-sign.yaml), ${threads} worker thread(s) as chosen at the start:`);
  console.log(`  alternatives analysed and checked ${s(t1 - t0)}, comparison PDF + CSV + JSON ${s(t2 - t1)} (${files[0]!.data.length} bytes of PDF)`);
  console.log(`  total ${s(t2 - t0)} in this process; ${load()}`);
  // The command as a user runs it, from spawn to exit (Node's start, the imports, the writes): median of 3.
  const out = mkdtempSync(join(tmpdir(), 'polebook-bench-compare-'));
  try {
    const bin = join(packageRoot(), 'dist', 'src', 'cli', 'main.js');
    const walls: number[] = [];
    for (let k = 0; k < 3; k++) {
      const a = performance.now();
      spawnSync(process.execPath, [bin, 'compare', input, '--vary', vary, '--out', out, '--quiet'], { env: { ...process.env, ...ENV }, stdio: 'ignore' });
      walls.push(performance.now() - a);
    }
    const wall = [...walls].sort((a, b) => a - b)[1]!;
    console.log(`  the command \`polebook compare\` from spawn to exit ${s(wall)} (median of 3, runs ${walls.map((w) => s(w)).join(', ')}); target under 4 s: ${wall <= 4000 ? 'met' : 'NOT MET'}; ${load()}`);
  } finally {
    rmSync(out, { recursive: true, force: true });
  }

  // One alternative against a full build of the same input, warm, median of 7.
  const loaded = loadForBuild(input, { env: ENV });
  const med = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  const alt: number[] = [];
  const full: number[] = [];
  for (let k = 0; k < 9; k++) {
    const a = performance.now();
    const checked = analyseAndCheck(loaded, { env: ENV });
    const b = performance.now();
    await packageOf(loaded, { env: ENV }, checked);
    const d = performance.now();
    if (k >= 2) {
      alt.push(b - a);
      full.push(d - a);
    }
  }
  console.log(`  one alternative (analysis + checks) ${med(alt).toFixed(0)} ms against a full build with its package ${med(full).toFixed(0)} ms: ${((100 * med(alt)) / med(full)).toFixed(0)}% (median of 7, warm)`);
}

async function batchBench(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-bench-batch-'));
  try {
    const examples = ['cantilever-sign', 'luminaire-twin', 'signal-support'];
    for (let k = 0; k < 20; k++) {
      const name = examples[k % examples.length]!;
      const doc = parseDocument(readFileSync(join(packageRoot(), 'examples', `${name}.yaml`), 'utf8'));
      doc.setIn(['project', 'structureId'], `BENCH-${String(k + 1).padStart(2, '0')}`);
      writeFileSync(join(dir, `input-${String(k + 1).padStart(2, '0')}-${name}.yaml`), doc.toString());
    }
    const inputs = expandInputs([dir], dir);
    const times: number[] = [];
    for (const workers of [1, 2]) {
      const t0 = performance.now();
      await runBatch({ inputs, shard: null, outDir: join(dir, `out-${workers}`), json: false, firstOrder: false, env: ENV, workers });
      times.push(performance.now() - t0);
    }
    console.log(`\nBatch of ${inputs.length} inputs (the three examples in turn), each with its package PDF:`);
    console.log(`  1 worker thread ${s(times[0]!)}, 2 worker threads ${s(times[1]!)}: speed-up ${(times[0]! / times[1]!).toFixed(2)}x; ${load()}`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export async function printCompareAndBatchBench(): Promise<void> {
  await compareBench();
  await batchBench();
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await printCompareAndBatchBench();
