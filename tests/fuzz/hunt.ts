// Bug hunt: many more mutated inputs than the test runs, reporting every distinct failure.
// Run: npx tsx tests/fuzz/hunt.ts <seed> <runs per source> [--cli N] [--odd-but-valid] [--text] [--show-unstable]
// --text adds damage to the YAML text itself after the mutations: a deleted, doubled or inserted
// character, a line moved, an indent changed.
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
    const mutated = mutatedText(source, muts);
    const { text, done } = process.argv.includes('--text') ? damageText(mutated.text, mutated.done, seed * 7919 + si * 131 + ci) : mutated;
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

/** Deterministic damage to the text: the kind of slip an editor makes. */
function damageText(text: string, done: string[], n: number): { text: string; done: string[] } {
  const at = (n * 2654435761) % Math.max(1, text.length);
  const lines = text.split('\n');
  const line = n % lines.length;
  const chars = [' ', '\t', ':', '-', '"', "'", '[', '{', '#', '&', '*', '!', '|', '>', '%', '@', '`', '\u00a0', '\r', '0'];
  switch (n % 5) {
    case 0: return { text: text.slice(0, at) + text.slice(at + 1), done: [...done, `text: delete at ${at}`] };
    case 1: return { text: text.slice(0, at) + text[at] + text.slice(at), done: [...done, `text: double at ${at}`] };
    case 2: return { text: text.slice(0, at) + chars[n % chars.length] + text.slice(at), done: [...done, `text: insert ${JSON.stringify(chars[n % chars.length])} at ${at}`] };
    case 3: { const [l] = lines.splice(line, 1); lines.splice((line * 7) % Math.max(1, lines.length), 0, l!); return { text: lines.join('\n'), done: [...done, `text: move line ${line + 1}`] }; }
    default: lines[line] = (n % 2 ? ' ' : '') + lines[line]!.replace(/^ /, n % 2 ? '  ' : ''); return { text: lines.join('\n'), done: [...done, `text: indent line ${line + 1}`] };
  }
}
