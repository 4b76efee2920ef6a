// Results outside the method through the command, on examples/signal-support.yaml (US units) with
// its steel made soft. E = 1000 ksi: the arm tips move far beyond a tenth of their length; the
// package is still written (it is a warning), stderr names each member with its combination and
// the JSON lists the movements.
// E = 200 ksi: the structure buckles under the factored axial loads, exit 3, naming the member and the
// place of the largest movement of the buckling mode in feet; nothing is written.
import { describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { parseDocument } from 'yaml';
import { cli } from './run-cli.ts';
import { readPdfText, squeeze } from '../support/pdf-text.ts';

const ROOT = join(import.meta.dirname, '../..');
const SIGNAL = readFileSync(join(ROOT, 'examples/signal-support.yaml'), 'utf8');

async function buildWithE(E: string) {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-range-'));
  try {
    const doc = parseDocument(SIGNAL);
    doc.setIn(['structure', 'material', 'E'], E);
    writeFileSync(join(dir, 'signal.yaml'), doc.toString());
    const r = await cli(['build', 'signal.yaml', '--out', 'out', '--json'], { cwd: dir, env: { SOURCE_DATE_EPOCH: '1767225600' } });
    const pdfPath = join(dir, 'out', 'signal.pdf');
    const pdf = existsSync(pdfPath) ? squeeze((await readPdfText(readFileSync(pdfPath))).pages.join('\n')) : null;
    const jsonPath = join(dir, 'out', 'signal.results.json');
    const json = existsSync(jsonPath) ? (JSON.parse(readFileSync(jsonPath, 'utf8')) as { analysis: { outsideMethod: { limitRatio: number; movements: { member: string; combination: string; ratio: number }[] } } }) : null;
    return { ...r, pdf, json };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('results outside the small-displacement method, through polebook build', () => {
  it('soft steel: one warning per member on stderr, the caution in the package, the package written', async () => {
    const r = await buildWithE('1000 ksi');
    expect(r.code).not.toBe(3);
    // SA is 45 ft from the pole axis; the 12-sided pole is 21 - 0.14 x 20 = 18.2 in across the flats at
    // the arm, so the face radius 9.1 in = 0.758 ft comes off: 44.24 ft from the face (hand arithmetic).
    expect(r.stderr).toMatch(/warning: arm SA tip moves [\d.]+ ft under ext-\S+, [\d.]+ of its length 44\.24 ft from the pole face, beyond our limit of L\/10/);
    expect(r.stderr.match(/warning: arm SA tip/g)).toHaveLength(1);
    expect(r.pdf).not.toBeNull();
    // the PDF text with white space removed (the layout wraps lines)
    expect(r.pdf!).toContain('Resultsoutsidethesmall-displacementanalysis');
    expect(r.pdf!).toContain('Checksonresultsoutsidethesmall-displacementanalysis');
    const moved = r.json!.analysis.outsideMethod;
    expect(moved.limitRatio).toBe(0.1);
    expect(moved.movements.some((x) => x.member === 'SA' && x.combination.startsWith('ext-') && x.ratio > 0.1)).toBe(true);
    expect(r.pdf!).toMatch(/ThetipofarmSAmoves[\d.]+ftundercombinationext-[^,]+,[\d.]+ofthememberlengthL=44\.24ft/);
  }, 60_000);

  it('steel soft enough to buckle: exit 3 naming the member and the place in feet, nothing written', async () => {
    const r = await buildWithE('200 ksi');
    expect(r.code).toBe(3);
    expect(r.stderr).toMatch(/combination \S+: loss of stability[^\n]*; the buckling mode moves most on (pole|arm \w+), [\d.]+ ft (above base|from pole face)/);
    expect(r.pdf).toBeNull();
    expect(r.json).toBeNull();
  }, 60_000);
});
