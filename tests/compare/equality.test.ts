// Every row of a comparison is what a single `polebook build` of that alternative's input gives:
// on every example, each alternative's input is written to a file and built on its own; its
// package PDF bytes, its JSON results and the row's numbers must be identical (not close).
// (The reference here is the build command itself, by design: the claim is identity with it.)
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runComparison } from '../../src/compare/run-compare.ts';
import { buildPackage, loadForBuild } from '../../src/pipeline.ts';
import { alternativeMetrics } from '../../src/compare/metrics.ts';

const ROOT = join(import.meta.dirname, '../..');
const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const dir = mkdtempSync(join(tmpdir(), 'polebook-cmp-eq-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** One key per example that changes its numbers (two values each, one of them the input's own). */
const VARY: Record<string, string> = {
  'cantilever-sign.yaml': 'A1.section.wall=0.3125,0.375 in',
  'luminaire-twin.yaml': 'A1.length+L1.position=2.5,2.75 m',
  'signal-support.yaml': 'pole.section.wall=0.4375,0.5 in',
};

describe('each alternative equals a single build of its input', () => {
  it('covers every example', () => {
    expect(Object.keys(VARY).sort()).toEqual(readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml')).sort());
  });
  for (const [example, vary] of Object.entries(VARY)) {
    it(`${example}: --vary ${vary}`, async () => {
      const c = await runComparison({ input: join(ROOT, 'examples', example), vary: [vary], env: ENV, firstOrder: false, packages: true, workers: 1 });
      expect(c.rows).toHaveLength(2);
      for (const row of c.rows) {
        const file = join(dir, row.file);
        writeFileSync(file, row.text);
        const single = await buildPackage(file, { env: ENV, json: true });
        expect(row.result.inputHash).toBe(single.loaded.inputHash);
        expect(row.result.status).toBe(single.checksFail ? 'fails' : 'passes');
        expect(row.result.metrics).toEqual(alternativeMetrics(single.loaded, single));
        expect(row.result.json).toBe(single.json);
        expect(Buffer.from(row.result.pdf!).equals(single.pdf)).toBe(true);
      }
    }, 120_000);
  }

  it('an alternative with the input\u2019s own value is the input: the same design', async () => {
    const input = join(ROOT, 'examples', 'cantilever-sign.yaml');
    const c = await runComparison({ input, vary: ['A1.length=36 ft'], env: ENV, firstOrder: false, packages: false, workers: 1 });
    const file = join(dir, c.rows[0]!.file);
    writeFileSync(file, c.rows[0]!.text);
    // 36 ft written as "36 ft" instead of 36: the same length, so the same design.
    expect(loadForBuild(file, { env: ENV }).design).toEqual(loadForBuild(input, { env: ENV }).design);
  }, 60_000);
});
