// The summary page states what the JSON results say: every check type's governing ratio and
// result, the governing base reactions (factored and service) and the first frequency, after the
// display rounding of the package (formatQuantity). Both come from one run of the examples; the
// JSON is the analysis record, the summary its restatement, so they must agree exactly.
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { buildPackage } from '../../src/pipeline.ts';
import { packageRoot } from '../../src/package-root.ts';
import { formatQuantity } from '../../src/units/units.ts';
import type { Block } from '../../src/report/document.ts';

interface Json {
  combinations: { id: string; category: string }[];
  results: { combination: string; reactions: { node: number; force: number[] }[] }[];
  modes: { frequency_Hz: number }[];
  checks: { verdict: { title: string; worst: { ratio: number; combination: string | null } }[] };
}

const plain = (s: string) => s.replace(/\u2011/g, '-').replace(/\u200b/g, '');

for (const file of ['examples/cantilever-sign.yaml', 'examples/luminaire-twin.yaml', 'examples/signal-support.yaml']) {
  describe(`summary of ${file}`, () => {
    it('is the first page after the cover and states the JSON results', async () => {
      const r = await buildPackage(join(packageRoot(), file), { json: true });
      const json = JSON.parse(r.json!) as Json;
      const units = r.loaded.design.units;
      expect(r.document.front.map((s) => s.id)).toEqual(['revisions', 'summary']);
      const summary = r.document.front[1]!;
      const tables = summary.blocks.filter((b): b is Extract<Block, { kind: 'table' }> => b.kind === 'table');
      // Every check type, its ratio and combination.
      const checks = tables.find((t) => t.title.startsWith('Governing ratio'))!;
      expect(checks.rows.map((row) => row[0])).toEqual(json.checks.verdict.map((v) => v.title));
      json.checks.verdict.forEach((v, k) => {
        expect(Number(checks.rows[k]![1])).toBeCloseTo(v.worst.ratio, 3);
        expect(plain(checks.rows[k]![4]!)).toBe(v.worst.combination ?? '—');
      });
      // The largest factored base moment and its combination.
      const factored = new Set(json.combinations.filter((c) => ['strength', 'extreme-wind', 'extreme-ice'].includes(c.category)).map((c) => c.id));
      const moment = (f: number[]) => Math.hypot(f[3]!, f[4]!);
      const worst = json.results.filter((x) => factored.has(x.combination)).reduce((a, b) => (moment(b.reactions[0]!.force) > moment(a.reactions[0]!.force) ? b : a));
      const reactions = tables.find((t) => t.title === 'Base reactions for the foundation')!;
      const row = reactions.rows.find((x) => x[0] === 'Factored, moment')!;
      expect(plain(row[1]!)).toBe(worst.combination);
      expect(row[4]).toBe(formatQuantity(moment(worst.reactions[0]!.force), 'moment', units));
      expect(row[2]).toBe(formatQuantity(worst.reactions[0]!.force[2]!, 'force', units));
      // The verdict sentence and the first frequency.
      const text = summary.blocks.map((b) => (b.kind === 'paragraph' ? b.text : b.kind === 'figure' ? (b.beside?.text ?? '') : '')).join(' ');
      expect(text).toContain(r.checksFail ? 'Verdict: FAIL.' : 'Verdict: PASS.');
      expect(text).toContain(`First natural frequency ${formatQuantity(json.modes[0]!.frequency_Hz, 'frequency', units)}`);
    });
  });
}
