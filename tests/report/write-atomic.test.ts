// writeFileAtomic and writeFilesAtomic: complete new files or the old ones, never a partial file or a stray temp.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { writeFileAtomic, writeFilesAtomic } from '../../src/output/write-atomic.ts';

/** Bytes whose length cannot be read: the write fails after the temporary file is open. */
class FailingBytes extends Uint8Array {
  override get length(): number {
    throw new Error('simulated write failure');
  }
}

describe('writeFileAtomic', () => {
  it('writes a new file and replaces an existing one, leaving nothing else in the folder', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-atomic-'));
    const file = join(dir, 'package.pdf');
    writeFileAtomic(file, Buffer.from('first'));
    writeFileAtomic(file, 'second, longer text');
    expect(readFileSync(file, 'utf8')).toBe('second, longer text');
    expect(readdirSync(dir)).toEqual(['package.pdf']);
  });

  it('a failed write leaves the previous file untouched and removes its temporary file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-atomic-'));
    const file = join(dir, 'package.pdf');
    writeFileSync(file, 'previous package');
    expect(() => writeFileAtomic(file, new FailingBytes(8))).toThrow(/simulated write failure/);
    expect(readFileSync(file, 'utf8')).toBe('previous package');
    expect(readdirSync(dir)).toEqual(['package.pdf']);
  });

  it('a failed rename (target is a folder) removes the temporary file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-atomic-'));
    const target = join(dir, 'occupied');
    mkdirSync(target);
    writeFileSync(join(target, 'inside.txt'), 'keep');
    expect(() => writeFileAtomic(target, 'data')).toThrow();
    expect(readdirSync(dir)).toEqual(['occupied']);
    expect(readFileSync(join(target, 'inside.txt'), 'utf8')).toBe('keep');
  });
});

describe('writeFilesAtomic', () => {
  it('a failure while writing the second file replaces neither: both earlier files stay, no temporary file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-atomic-'));
    const pdf = join(dir, 'package.pdf');
    const json = join(dir, 'package.results.json');
    writeFileSync(pdf, 'previous package');
    writeFileSync(json, 'previous results');
    expect(() => writeFilesAtomic([{ path: pdf, data: 'new package' }, { path: json, data: new FailingBytes(8) }])).toThrow(/simulated write failure/);
    expect(readFileSync(pdf, 'utf8')).toBe('previous package');
    expect(readFileSync(json, 'utf8')).toBe('previous results');
    expect(readdirSync(dir).sort()).toEqual(['package.pdf', 'package.results.json']);
  });

  it('writes every file when all succeed', () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-atomic-'));
    writeFilesAtomic([{ path: join(dir, 'a.pdf'), data: 'A' }, { path: join(dir, 'a.results.json'), data: '{}' }]);
    expect(readdirSync(dir).sort()).toEqual(['a.pdf', 'a.results.json']);
    expect(readFileSync(join(dir, 'a.pdf'), 'utf8')).toBe('A');
  });
});
