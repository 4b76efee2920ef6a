// writeFileAtomic: complete new file or the old one, never a partial file or a stray temp.
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { writeFileAtomic } from '../../src/output/write-atomic.ts';

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
