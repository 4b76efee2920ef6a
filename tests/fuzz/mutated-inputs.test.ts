// polebook's promise for any input file, however wrong: a located input error (exit 2, nothing
// written), an unstable structure naming the combination (exit 3, nothing written), or a package
// whose numbers are all finite (exit 0). Never an internal error (exit 4), never NaN or Infinity
// in the results, the JSON, the terminal summary or the PDF.
//
// Each example and the US luminaire twin is parsed with `yaml`, mutated at random (fast-check, a
// fixed seed so CI sees the same cases every run), written back and run: mutations of any kind
// (mostly input errors), and mutations that mostly keep the input valid but odd (the analysis
// side: steep arms, thin walls, clones, spring bases, analysis settings). Most cases go through
// the library chain without the PDF (load, analyse, document model, JSON, summary); a few go
// through the whole CLI. POLEBOOK_FUZZ_SEED and POLEBOOK_FUZZ_RUNS run other and more cases
// locally; tests/fuzz/hunt.ts reports every distinct failure of a long run at once.
import fc from 'fast-check';
import { stringify } from 'yaml';
import { describe, expect, it } from 'vitest';
import { mutationsArb, oddButValidMutationsArb, type Mutation } from './mutate.ts';
import { FUZZ_SOURCES, mutatedText } from './sources.ts';
import { EDGE_DESIGNS } from './edge-designs.ts';
import { runCliCase, runLibrary, type Outcome } from './run-case.ts';

const SEED = Number(process.env.POLEBOOK_FUZZ_SEED ?? 20261202);
/** Library cases per source file: 4 sources x (35 + 15) = 200 cases in CI. */
const RUNS = Number(process.env.POLEBOOK_FUZZ_RUNS ?? 35);
/** Cases per source file of mutations that mostly keep the input valid (the analysis side). */
const ODD_RUNS = Math.round((RUNS * 15) / 35);
/** Whole-CLI cases per source file (each writes and reads back a PDF, about 1-2 s). */
const CLI_RUNS = 1;

type Counts = Record<Outcome['kind'], number>;

/** Counts the outcome, and explains a failure with the mutations that made it. */
function expectKept(o: Outcome, what: string, counts: Counts): void {
  counts[o.kind]++;
  if (o.kind === 'failure') throw new Error(`${what}\n${o.reason}`);
}

function libraryProperty(arb: fc.Arbitrary<Mutation[]>, runs: number, seed: number, sourceIndex: number, needOk: boolean): void {
  const source = FUZZ_SOURCES[sourceIndex]!;
  const counts: Counts = { input: 0, unstable: 0, ok: 0, failure: 0 };
  fc.assert(
    fc.property(arb, (mutations) => {
      const { text, done } = mutatedText(source, mutations);
      expectKept(runLibrary(text, source.name), `${source.name} mutated: ${done.join(' | ')}`, counts);
    }),
    { seed, numRuns: runs },
  );
  // The cases reach the analysis, so the property cannot pass by rejecting everything.
  expect(counts.ok).toBeGreaterThan(0);
  if (needOk) expect(counts.input).toBeGreaterThan(0);
}

describe('mutated inputs through the library chain: exit 0, 2 or 3, never an internal error or a NaN', () => {
  FUZZ_SOURCES.forEach((source, i) => {
    it(`${source.name}: ${RUNS} mutated cases`, () => libraryProperty(mutationsArb, RUNS, SEED + i, i, true));
    it(`${source.name}: ${ODD_RUNS} odd-but-valid cases (steep arms, thin walls, clones, spring bases, analysis settings)`, () =>
      libraryProperty(oddButValidMutationsArb, ODD_RUNS, SEED + 50 + i, i, false));
  });
});

describe('degenerate but valid designs analyse, and ratios with a zero denominator print as "–"', () => {
  for (const e of EDGE_DESIGNS) {
    it(e.name, () => {
      const o = runLibrary(stringify(e.data), `${e.name}.yaml`);
      expect(o.kind === 'failure' ? o.reason : o.kind).toBe('ok');
    });
  }
});

describe('mutated inputs through the whole CLI (build --json): exit code, messages, nothing written on error', () => {
  FUZZ_SOURCES.forEach((source, i) => {
    it(`${source.name}: ${CLI_RUNS} mutated case(s)`, async () => {
      const cases = fc.sample(mutationsArb, { seed: SEED + 100 + i, numRuns: CLI_RUNS });
      for (const mutations of cases) {
        const { text, done } = mutatedText(source, mutations);
        const o = await runCliCase(text, source.name);
        expect(o.kind === 'failure' ? `${done.join(' | ')}: ${o.reason}` : 'kept').toBe('kept');
      }
    });
  });

  for (const name of ['no-arms-zero-wind', 'weightless-zero-wind-first-order']) {
    it(`${name}: exit 0, a PDF and finite JSON`, async () => {
      const e = EDGE_DESIGNS.find((x) => x.name === name)!;
      const o = await runCliCase(stringify(e.data), `${name}.yaml`);
      expect(o.kind === 'failure' ? o.reason : o.kind).toBe('ok');
    });
  }

  it('a located input error through the CLI: exit 2, first line file:line:col, nothing written', async () => {
    const source = FUZZ_SOURCES[0]!;
    const { text } = mutatedText(source, [{ op: 'odd-value', at: 0, value: 0 }]); // formatVersion: 0
    expect(text).toMatch(/^formatVersion: 0$/m);
    const o = await runCliCase(text, source.name);
    expect(o.kind === 'failure' ? o.reason : o.kind).toBe('input');
  });

  it('an unstable structure through the CLI: exit 3 naming the combination, nothing written', async () => {
    // The sign example read as SI: a 26 m pole of 24 mm tube, which buckles under its own weight.
    const source = FUZZ_SOURCES.find((s) => s.name === 'cantilever-sign.yaml')!;
    const { text } = mutatedText(source, [{ op: 'swap-units' }]);
    const o = await runCliCase(text, source.name);
    expect(o.kind === 'failure' ? o.reason : o.kind).toBe('unstable');
  });
});
