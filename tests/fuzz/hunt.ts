// Bug hunt: many more mutated inputs than the test runs, reporting every distinct failure.
// Run: npx tsx tests/fuzz/hunt.ts <seed> <runs per source> [--cli N] [--odd-but-valid] [--show-unstable]
import fc from 'fast-check';
import { mutationsArb, oddButValidMutationsArb } from './mutate.ts';
import { FUZZ_SOURCES, mutatedText } from './sources.ts';
import { runCliCase, runLibrary } from './run-case.ts';

const seed = Number(process.argv[2] ?? 1);
const runs = Number(process.argv[3] ?? 100);
const cliAt = process.argv.indexOf('--cli');
const cliRuns = cliAt > 0 ? Number(process.argv[cliAt + 1]) : 0;
const counts: Record<string, number> = {};
const failures = new Map<string, string>();
for (const [si, source] of FUZZ_SOURCES.entries()) {
  const arb = process.argv.includes('--odd-but-valid') ? oddButValidMutationsArb : mutationsArb;
  const cases = fc.sample(arb, { seed: seed * 101 + si, numRuns: runs });
  for (const [ci, muts] of cases.entries()) {
    const { text, done } = mutatedText(source, muts);
    const o = ci < cliRuns ? await runCliCase(text, source.name) : runLibrary(text, source.name);
    counts[o.kind] = (counts[o.kind] ?? 0) + 1;
    if (o.kind === 'unstable' && process.argv.includes('--show-unstable')) console.log(`UNSTABLE ${source.name} [${done.join(' | ')}]\n  ${o.message.split('\n')[0]}`);
    if (o.kind === 'failure') {
      const key = o.reason.split('\n')[0]!.replace(/[-\d.e]+/g, '#').slice(0, 160);
      if (!failures.has(key)) failures.set(key, `${source.name} [${done.join(' | ')}]\n  ${o.reason.replace(/\n/g, '\n  ')}`);
    }
  }
}
console.log(JSON.stringify(counts));
for (const f of failures.values()) console.log(`FAIL ${f}\n`);
