// npm run bench: analysis speed on each example, and solve time against segment count.
// Targets (issue): all combinations of an example under 50 ms; solve time about linear in
// the number of segments (40 -> 640 segments, 16x, costing no more than about 25x).
// Measured and printed only; never asserted.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { loadDesignFile } from '../src/input/index.ts';
import { analyseDesign } from '../src/analyse-design.ts';
import { packageRoot } from '../src/package-root.ts';
import { scalingTable } from './scaling.ts';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function timeIt(fn: () => void, repeats: number): number {
  fn(); // warm up the JIT
  const t: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  return median(t);
}

const examples = join(packageRoot(), 'examples');
console.log('polebook bench: median of 15 runs after one warm-up, Node', process.version);
console.log('\nWhole analysis per example (frame, loads, all combinations with P-delta, modes):');
console.log('example'.padEnd(28), 'nodes'.padStart(6), 'combos'.padStart(7), 'analysis ms'.padStart(12), 'target'.padStart(8));
for (const file of readdirSync(examples).filter((f) => /\.(ya?ml|json)$/.test(f)).sort()) {
  const loaded = loadDesignFile(join(examples, file));
  let info = { nodes: 0, combos: 0 };
  const ms = timeIt(() => {
    const a = analyseDesign(loaded.design, {});
    info = { nodes: a.model.nodes.length, combos: a.combinations.length };
  }, 15);
  console.log(file.padEnd(28), String(info.nodes).padStart(6), String(info.combos).padStart(7), ms.toFixed(2).padStart(12), (ms < 50 ? '< 50 ok' : 'OVER').padStart(8));
}

console.log('\nSolve time against segments per member (tapered pole with two arms, first order):');
const rows = scalingTable([10, 40, 160, 640]);
console.log('segments'.padStart(9), 'dof'.padStart(7), 'solve ms'.padStart(10), 'x vs 40'.padStart(9));
const base = rows.find((r) => r.segments === 40)?.solve_ms ?? NaN;
for (const r of rows) {
  console.log(String(r.segments).padStart(9), String(r.dof).padStart(7), r.solve_ms.toFixed(3).padStart(10), (r.solve_ms / base).toFixed(1).padStart(9));
}
const ratio = (rows.find((r) => r.segments === 640)?.solve_ms ?? NaN) / base;
console.log(`\n40 -> 640 segments (16x): solve time ${ratio.toFixed(1)}x (target: no more than about 25x)`);
