// Each file of the bad-input corpus gives an InputError whose first diagnostic points at the
// mistake: line, column and key path as worked out from the file's text (tests/fixtures/generate-bad-corpus.py).
import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FileLevelError, InputError, formatDiagnostic } from '../../src/errors.ts';
import { loadDesignFile } from '../../src/input/index.ts';
import { BAD_CORPUS, BAD_DIR } from '../fixtures/bad-corpus.ts';

function firstDiagnostic(file: string) {
  try {
    loadDesignFile(file);
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error(`${file} loaded without error`);
}

describe('bad-input corpus', () => {
  it('has at least 25 cases and a table entry for every file', () => {
    expect(BAD_CORPUS.length).toBeGreaterThanOrEqual(25);
    const files = readdirSync(BAD_DIR).filter((f) => /\.(ya?ml|json)$/.test(f) && f !== 'expected.json');
    expect(files.sort()).toEqual(BAD_CORPUS.map((c) => c.name).sort());
  });

  for (const c of BAD_CORPUS.filter((x) => x.fileLevel)) {
    it(`${c.name}: ${c.mistake} (the whole file, named without a line and column)`, () => {
      let err: unknown;
      try {
        loadDesignFile(c.file);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(FileLevelError);
      expect((err as FileLevelError).message).toContain(c.messageIncludes);
      expect((err as FileLevelError).exitCode).toBe(2);
    });
  }

  for (const c of BAD_CORPUS.filter((x) => x.stage !== 'cli' && !x.fileLevel)) {
    it(`${c.name}: ${c.mistake}`, () => {
      const err = firstDiagnostic(c.file);
      const d = err.diagnostics[0];
      expect({ line: d.line, col: d.col, path: d.path }).toEqual({ line: c.line, col: c.col, path: c.path });
      expect(d.message).toContain(c.messageIncludes);
      expect(d.severity).toBe('error');
      expect(d.file).toBe(c.file);
      // The message is the diagnostic lines, never a stack trace.
      expect(err.message.split('\n')[0]).toBe(formatDiagnostic(d));
      expect(err.message).not.toMatch(/\n\s+at /);
      expect(err.exitCode).toBe(2);
    });
  }
});
