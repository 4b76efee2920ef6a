// The limits of ours on input size (src/input/size-limits.ts) refuse a file before it is parsed,
// as a whole-file refusal (named, with no line and column).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { describe, expect, it } from 'vitest';
import { FileLevelError } from '../../src/errors.ts';
import { loadDesignFile, loadDesignText } from '../../src/input/index.ts';
import { MAX_INPUT_BYTES } from '../../src/input/size-limits.ts';

const refusal = (f: () => unknown): FileLevelError => {
  try {
    f();
  } catch (e) {
    if (e instanceof FileLevelError) return e;
    throw e;
  }
  throw new Error('accepted');
};

describe('input size limit', () => {
  it('a file one byte over the limit is refused by its size, naming the limit', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-size-'));
    try {
      const file = join(dir, 'big.yaml');
      writeFileSync(file, `formatVersion: 1\n#${'x'.repeat(MAX_INPUT_BYTES - 18)}\n`);
      const e = refusal(() => loadDesignFile(file));
      expect(e.message).toContain(`more than the ${MAX_INPUT_BYTES} bytes`);
      expect(e.message).not.toMatch(/:\d+:\d+/);
      expect(e.exitCode).toBe(2);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
  it('text passed to the library is held to the same limit', () => {
    expect(refusal(() => loadDesignText(`#${'x'.repeat(MAX_INPUT_BYTES)}`, 'big.yaml', {})).message).toContain('bytes an input may have');
  });
});
