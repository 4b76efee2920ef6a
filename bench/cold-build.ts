// Cold builds of each example's package, each in a fresh Node process (as the command runs): the
// wall time from spawn to exit, the time of each phase inside the process and its peak memory,
// medians of RUNS runs. Target (issue 9): the largest example under 2.0 s median cold on this
// 2-core machine, peak memory under 250 MB. Measured and printed only; never asserted.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { packageRoot } from '../src/package-root.ts';

const RUNS = 5;

interface Phases {
  imports: number;
  input: number;
  analysis: number;
  checks: number;
  charts: number;
  document: number;
  layout: number;
  write: number;
  total: number;
  maxRSS_kB: number;
  pages: number;
}

const median = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
};

export function printColdBuilds(): void {
  const child = join(packageRoot(), 'dist', 'bench', 'cold-build-child.js');
  const dir = mkdtempSync(join(tmpdir(), 'polebook-cold-'));
  try {
    console.log(`\nCold build of each example's package (fresh node process each, median of ${RUNS}; target: largest under 2.0 s, peak memory under 250 MB)`);
    console.log('example                 pages   wall ms  imports  input  analysis  checks  charts  document  layout  write   peak MB');
    const examples = readdirSync(join(packageRoot(), 'examples')).filter((f) => f.endsWith('.yaml')).sort();
    let largest: { name: string; pages: number; wall: number; peakMB: number } | null = null;
    for (const f of examples) {
      const walls: number[] = [];
      const runs: Phases[] = [];
      for (let k = 0; k < RUNS; k++) {
        const t0 = performance.now();
        const line = execFileSync(process.execPath, [child, join(packageRoot(), 'examples', f), join(dir, `${f}.pdf`)], { encoding: 'utf8' });
        walls.push(performance.now() - t0);
        runs.push(JSON.parse(line.trim().split('\n').at(-1)!) as Phases);
      }
      const m = (key: keyof Phases) => median(runs.map((r) => r[key]));
      const cols = [m('imports'), m('input'), m('analysis'), m('checks'), m('charts'), m('document'), m('layout'), m('write')].map((v, i) => v.toFixed(0).padStart([8, 6, 9, 7, 7, 9, 7, 6][i]!));
      console.log(`${f.padEnd(22)} ${String(m('pages')).padStart(6)} ${median(walls).toFixed(0).padStart(9)} ${cols.join(' ')} ${(m('maxRSS_kB') / 1024).toFixed(0).padStart(9)}`);
      if (largest === null || m('pages') > largest.pages) largest = { name: f, pages: m('pages'), wall: median(walls), peakMB: m('maxRSS_kB') / 1024 };
    }
    if (largest !== null) {
      console.log(`Largest example ${largest.name} (${largest.pages} pages): ${(largest.wall / 1000).toFixed(2)} s median wall, target under 2.0 s: ${largest.wall < 2000 ? 'met' : 'NOT MET'}; peak ${largest.peakMB.toFixed(0)} MB, target under 250 MB: ${largest.peakMB < 250 ? 'met' : 'NOT MET'}; load average ${loadavg()[0]!.toFixed(2)}`);
    }
    console.log('Phases inside the process; wall also counts starting Node. charts: the vega-lite member charts rendered to SVG; document: the document model with our own SVG drawings.');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
