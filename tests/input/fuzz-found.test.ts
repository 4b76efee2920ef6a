// Input mistakes found by the mutated-input fuzz test (tests/fuzz/mutated-inputs.test.ts): each must
// be an InputError located at the key, never a crash further down the chain.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.ts';
import { loadDesignText } from '../../src/input/index.ts';

const SIGN = readFileSync('examples/cantilever-sign.yaml', 'utf8');
const TWIN = readFileSync('examples/luminaire-twin.yaml', 'utf8');

function swap(text: string, from: string, to: string): string {
  expect(text).toContain(from);
  return text.replace(from, to);
}

function firstError(text: string) {
  try {
    loadDesignText(text, 'x.yaml', {});
  } catch (e) {
    if (e instanceof InputError) return e.diagnostics.find((d) => d.severity === 'error')!;
    throw e;
  }
  throw new Error('loaded without error');
}

/** 1-based line and column of the first occurrence of `mark` (worked out from the text). */
function where(text: string, mark: string): { line: number; col: number } {
  const i = text.indexOf(mark);
  const before = text.slice(0, i).split('\n');
  return { line: before.length, col: before.at(-1)!.length + 1 };
}

describe('values that read as numbers but are not finite', () => {
  it('a quantity string that overflows ("1e999 in") is refused at its key', () => {
    const text = swap(TWIN, 'rootDiameter: 90, tipDiameter: 60', 'rootDiameter: "1e999", tipDiameter: 60');
    const d = firstError(text);
    expect(d.path).toBe('structure.arms[0].section.rootDiameter');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '"1e999"'));
    expect(d.message).toContain('too large');
  });

  it('an overflowing offset is refused too (it reached the loads as a NaN direction)', () => {
    const text = swap(SIGN, 'offset: { lateral: "-10 in", vertical: "-6 in" }', 'offset: { lateral: "-10 in", vertical: "1e999 ft" }');
    const d = firstError(text);
    expect(d.path).toBe('attachments.panels[0].offset.vertical');
    expect(d.message).toContain('too large');
  });
});
