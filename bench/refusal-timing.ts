// Timing guard for refused inputs: the largest file polebook reads (just under the size limit,
// filled with arms so every byte is parsed and validated before the arm limit refuses it) and a
// file just over the size limit must each be refused in well under a second. Printed, not asserted.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { performance } from 'node:perf_hooks';
import { FileLevelError, InputError } from '../src/errors.ts';
import { loadDesignFile } from '../src/input/index.ts';
import { MAX_INPUT_BYTES } from '../src/input/size-limits.ts';

const TARGET_MS = 1000;

function armsFile(): string {
  const head = 'formatVersion: 1\nunits: us\nproject: { name: Bench, structureId: B-1, date: 2026-01-01 }\nstructure:\n  kind: luminaire-pole\n  pole: { height: 30, section: { shape: round, rootDiameter: 10, tipDiameter: 6, wall: 0.25 } }\n  arms:\n';
  const arm = (k: number) => `    - { id: A${k}, attachHeight: 28, direction: ${k % 360} deg, length: 8, section: { shape: round, rootDiameter: 4, tipDiameter: 3, wall: 0.2 } }\n`;
  const tail = 'loads:\n  wind: { pressure: 30 psf }\n';
  let text = head;
  for (let k = 0; text.length + arm(k).length + tail.length < MAX_INPUT_BYTES; k++) text += arm(k);
  return text + tail;
}

function timeRefusal(file: string): { ms: number; message: string } {
  const t0 = performance.now();
  try {
    loadDesignFile(file);
  } catch (e) {
    if (e instanceof FileLevelError) return { ms: performance.now() - t0, message: e.message };
    if (!(e instanceof InputError)) throw e;
    return { ms: performance.now() - t0, message: e.diagnostics[0]!.message };
  }
  throw new Error(`${file} was accepted`);
}

export function printRefusalTiming(): void {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-bench-refusal-'));
  try {
    const under = join(dir, 'largest-read.yaml');
    writeFileSync(under, armsFile());
    const over = join(dir, 'over-size.yaml');
    writeFileSync(over, `# ${'x'.repeat(MAX_INPUT_BYTES)}\n`);
    console.log(`\nRefused inputs (target: each refused in well under ${TARGET_MS} ms):`);
    for (const [what, file] of [['largest file read (arms up to the size limit)', under], ['a file over the size limit', over]] as const) {
      const runs = Array.from({ length: 5 }, () => timeRefusal(file));
      const ms = runs.map((r) => r.ms).sort((a, b) => a - b)[2]!;
      console.log(`  ${what.padEnd(48)} ${ms.toFixed(1).padStart(7)} ms (median of 5): ${ms < TARGET_MS ? 'under target' : 'OVER TARGET'}; "${runs[0]!.message.slice(0, 70)}"`);
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
