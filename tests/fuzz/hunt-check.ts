// Bug hunt for `polebook check`: mutated inputs through the check command (it writes nothing).
// Run: npx tsx tests/fuzz/hunt-check.ts <seed> <runs per source>
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { mutationsArb, oddButValidMutationsArb } from './mutate.ts';
import { FUZZ_SOURCES, mutatedText } from './sources.ts';
import { cli } from '../cli/run-cli.ts';
import { LOCATED } from './run-case.ts';

const seed = Number(process.argv[2] ?? 1);
const runs = Number(process.argv[3] ?? 50);
const dir = mkdtempSync(join(tmpdir(), 'polebook-check-'));
const counts: Record<string, number> = {};
for (const [si, source] of FUZZ_SOURCES.entries()) {
  for (const arb of [mutationsArb, oddButValidMutationsArb]) {
    for (const muts of fc.sample(arb, { seed: seed * 101 + si, numRuns: runs })) {
      const { text, done } = mutatedText(source, muts);
      const file = join(dir, source.name);
      writeFileSync(file, text);
      const r = await cli(['check', file], { cwd: dir, env: { SOURCE_DATE_EPOCH: '1767225600' } });
      counts[r.code] = (counts[r.code] ?? 0) + 1;
      const bad = r.code === 2 ? !LOCATED.test(r.stderr.split('\n')[0] ?? '') : r.code !== 0 || /\bNaN\b|Infinity|undefined/.test(r.stdout);
      if (bad && !/NaN|Infinity|undefined/.test(text)) console.log(`FAIL ${source.name} [${done.join(' | ')}] exit ${r.code}\n  ${(r.stderr || r.stdout).slice(0, 400)}`);
    }
  }
}
rmSync(dir, { recursive: true, force: true });
console.log(JSON.stringify(counts));
