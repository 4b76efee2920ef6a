// The tiny template language: placeholders filled, a missing value refused, blocks read.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fillTemplate, parseTemplate, readTemplate } from '../../src/report/sections/templates.ts';

describe('templates', () => {
  it('fills placeholders and refuses one without a value', () => {
    expect(fillTemplate('pole {{ id }} of {{kind}}', { id: 'P-1', kind: 'luminaire pole' })).toBe('pole P-1 of luminaire pole');
    expect(() => fillTemplate('pole {{idd}}', { id: 'P-1' })).toThrow(/\{\{idd\}\} has no value/);
  });

  it('reads the title, headings, bullets with continuation lines and paragraphs', () => {
    const t = parseTemplate('# Title\n\nFirst line\nsecond line.\n\n## Part\n\n- one\n  more\n- two\n\nLast.\n');
    expect(t.title).toBe('Title');
    expect(t.blocks).toEqual([
      { kind: 'paragraph', text: 'First line second line.' },
      { kind: 'heading', level: 2, text: 'Part' },
      { kind: 'bullets', items: ['one more', 'two'] },
      { kind: 'paragraph', text: 'Last.' },
    ]);
  });

  it('every template in templates/ reads, and its placeholders are plain names', () => {
    const dir = join(import.meta.dirname, '..', '..', 'templates');
    const names = readdirSync(dir).filter((f) => f.endsWith('.md'));
    expect(names.length).toBeGreaterThan(0);
    for (const f of names) {
      const text = readTemplate(f.replace(/\.md$/, ''));
      const bad = [...text.matchAll(/\{\{([^}]*)\}\}/g)].filter((m) => !/^\s*[A-Za-z][A-Za-z0-9_]*\s*$/.test(m[1]));
      expect(bad, f).toEqual([]);
    }
  });
});
