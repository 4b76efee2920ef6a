// Bad vary paths and values: one positioned message, exit 2, nothing written; alternatives that
// are unstable or refused are rows of the comparison, not a crash.
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { cli } from '../cli/run-cli.ts';
import { parseVaryValues } from '../../src/compare/vary-values.ts';

const ROOT = join(import.meta.dirname, '../..');
const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const dir = mkdtempSync(join(tmpdir(), 'polebook-cmp-err-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const SIGN = join(ROOT, 'examples/cantilever-sign.yaml');

async function compare(vary: string, input = SIGN) {
  const out = mkdtempSync(join(dir, 'out-'));
  const r = await cli(['compare', input, '--vary', vary, '--out', out, '--quiet'], { env: ENV });
  return { ...r, written: readdirSync(out) };
}

/** The caret of a --vary message stands under `word` of the option printed above it. */
function caretUnder(stderr: string, word: string): void {
  const lines = stderr.split('\n');
  const k = lines.findIndex((l) => l.startsWith('  --vary '));
  expect(k).toBeGreaterThanOrEqual(0);
  expect(lines[k + 1]!.indexOf('^')).toBe(lines[k]!.indexOf(word));
}

describe('bad --vary paths', () => {
  const cases: [string, string, RegExp][] = [
    ['A1.lenght=28,32 ft', 'lenght', /no key 'lenght' in structure\.arms\[0\]; expected one of: .*length/],
    ['Z9.length=28 ft', 'Z9', /'Z9' is neither an id in the input \(.*A1.*S1.*\)/],
    ['A1.section=1', 'section', /structure\.arms\[0\]\.section is a group of keys; vary one of them: shape, rootDiameter, taper, wall/],
    ['structure.arms[7].length=1', '7', /no item '7' in structure\.arms; expected ids A1 or an index \[0\] to \[0\]/],
    ['A1..length=1', '.length', /an empty key in the path/],
    ['A1.id=B1', 'id', /an id names a part; it cannot be varied/],
    ['A1.length', 'A1.length', /expected path=values/],
  ];
  for (const [vary, at, message] of cases) {
    it(`--vary ${vary}`, async () => {
      const r = await compare(vary);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      if (vary.includes('=')) caretUnder(r.stderr, at);
      expect(r.stdout).toBe('');
      expect(r.written).toEqual([]);
    });
  }
});

describe('bad --vary values', () => {
  const cases: [string, string, RegExp][] = [
    ['A1.length=28 psf,30 psf', '28 psf', /A1\.length = 28 psf: .*'psf' is a unit of pressure, but a length is expected/],
    ['A1.length=20..45:7 ft', '45', /the range does not land on its end/],
    ['A1.length=20 ft..45 m:5 ft', 'm:5', /differs from the unit 'ft'/],
    ['A1.length=45..20:5 ft', '20', /below the start/],
    ['A1.length=36,36 ft', '36 ft', /36 ft is given twice/],
    ['A1.length=36,,40', '', /an empty value in the list/],
    ['A1.length=36,abc', 'abc', /cannot read 'abc' as a number/],
    ['pole.section.wall=0,0.5 in', '0', /pole\.section\.wall = 0 in|structure\.pole\.section\.wall/],
    ['A1.length=1..1000:1 ft', '1 ft', /1000 values, more than the 200/],
  ];
  for (const [vary, at, message] of cases) {
    it(`--vary ${vary}`, async () => {
      const r = await compare(vary);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      if (at !== '') {
        const lines = r.stderr.split('\n');
        const k = lines.findIndex((l) => l.startsWith('  --vary '));
        const caret = lines[k + 1]!.indexOf('^');
        // The caret stands at the value (or within the range part) it names.
        expect(lines[k]!.slice(caret)).toContain(at.trim().split(' ')[0]!.slice(0, 1));
      }
      expect(r.written).toEqual([]);
    });
  }
});

describe('the compare block of an input', () => {
  it('a bad path in the block is reported at its line and column in the file', async () => {
    const doc = parseDocument(readFileSync(SIGN, 'utf8'));
    doc.set('compare', { vary: [{ path: 'A1.lenght', values: '30, 36 ft' }] });
    const file = join(dir, 'block-bad.yaml');
    writeFileSync(file, doc.toString());
    const text = readFileSync(file, 'utf8').split('\n');
    const line = text.findIndex((l) => l.includes('A1.lenght')) + 1;
    const col = text[line - 1]!.indexOf('A1.lenght') + 1 + 'A1.'.length;
    const r = await cli(['compare', file, '--out', join(dir, 'block-out'), '--quiet'], { env: ENV });
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`${file}:${line}:${col}: compare.vary[0].path: no key 'lenght'`);
    expect(existsSync(join(dir, 'block-out'))).toBe(false);
  });

  it('a good block is used when no --vary is given, and build ignores it', async () => {
    const doc = parseDocument(readFileSync(SIGN, 'utf8'));
    doc.set('compare', { vary: [{ path: 'A1.section.wall', values: [0.3125, '0.375 in'] }] });
    const file = join(dir, 'block-good.yaml');
    writeFileSync(file, doc.toString());
    const out = join(dir, 'block-good-out');
    const r = await cli(['compare', file, '--out', out, '--quiet'], { env: ENV });
    expect(r.stdout).toMatch(/1 {2}A1\.section\.wall = 0\.3125 in: FAILS/);
    expect(r.stdout).toMatch(/2 {2}A1\.section\.wall = 0\.375 in: FAILS/);
    expect(r.code).toBe(1); // no alternative passes (the example fails its fatigue check on purpose)
    const b = await cli(['build', file, '--out', out], { env: ENV });
    expect(b.code).toBe(1);
  }, 60_000);
});

describe('alternatives without results are rows', () => {
  it('an unstable alternative (steel soft enough to buckle) and one refused by the input checks', async () => {
    const out = join(dir, 'rows-out');
    const r = await cli(['compare', join(ROOT, 'examples/signal-support.yaml'), '--vary', 'structure.material.E=200,29000 ksi', '--out', out, '--quiet'], { env: ENV });
    expect(r.stdout).toMatch(/1 {2}structure\.material\.E = 200 ksi: UNSTABLE, combination \S+: loss of stability/);
    expect(r.stdout).toMatch(/2 {2}structure\.material\.E = 29000 ksi: FAILS, governing ratio/);
    const csv = readFileSync(join(out, 'signal-support.comparison.csv'), 'utf8');
    expect(csv.split('\n')[1]).toMatch(/^1,200 ksi,UNSTABLE,/);
    const s = await cli(['compare', SIGN, '--vary', 'A1.length=30,36 ft', '--out', out, '--quiet'], { env: ENV });
    expect(s.stdout).toMatch(/1 {2}A1\.length = 30 ft: INPUT REFUSED, .*attachments\.panels\[1\]\.position: the panel \(centre at 29 ft, width 10 ft\) reaches past the tip of arm A1 at 30 ft/);
  }, 60_000);
});

describe('vary values as typed', () => {
  it('a range keeps decimal text: 0.1 steps do not drift', () => {
    expect(parseVaryValues('0.1..0.5:0.1 in').map((v) => v.label)).toEqual(['0.1 in', '0.2 in', '0.3 in', '0.4 in', '0.5 in']);
  });
  it('a unit at the end of a list applies to the numbers without one', () => {
    expect(parseVaryValues('28, 32, 36 ft').map((v) => v.yaml)).toEqual(['28 ft', '32 ft', '36 ft']);
    expect(parseVaryValues('28, 32').map((v) => v.yaml)).toEqual([28, 32]);
    expect(parseVaryValues('20ft..30ft:5ft').map((v) => v.yaml)).toEqual(['20 ft', '25 ft', '30 ft']);
  });
  it('words for keys that take one', () => {
    expect(parseVaryValues('fixed, rotational-spring').map((v) => v.yaml)).toEqual(['fixed', 'rotational-spring']);
  });
});
