// The README is what a new user reads first: its input reference must be the one the schema
// generates (run `npm run docs` after changing the schema), and it must keep the job
// statement, the two quick-start commands and the caution.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { inputReferenceMarkdown } from '../../src/input/reference-markdown.ts';
import { markedSection } from '../../scripts/marked-section.ts';
import { inputLimitsMarkdown } from '../../src/input/limits-markdown.ts';

const readme = readFileSync(join(import.meta.dirname, '../../README.md'), 'utf8');

describe('README', () => {
  it('holds the input reference generated from the schema (npm run docs refreshes it)', () => {
    expect(markedSection(readme, 'input-reference')).toBe(inputReferenceMarkdown().trim());
  });
  it('prints the input limits the input stage enforces (npm run docs refreshes them)', () => {
    expect(markedSection(readme, 'input-limits')).toBe(inputLimitsMarkdown().trim());
  });
  it('gives the two quick-start commands and the caution', () => {
    expect(readme).toContain('npm ci && npm start');
    expect(readme).toContain('npm ci && npm test');
    expect(readme).toMatch(/licensed engineer/);
    expect(readme).toMatch(/governing codes?/);
  });
});
