// npm run docs: rewrites the README's input reference from the schema, and its table of input limits.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { inputReferenceMarkdown } from '../src/input/reference-markdown.ts';
import { replaceMarked } from './marked-section.ts';
import { inputLimitsMarkdown } from '../src/input/limits-markdown.ts';

const path = join(import.meta.dirname, '..', 'README.md');
writeFileSync(path, replaceMarked(replaceMarked(readFileSync(path, 'utf8'), 'input-reference', inputReferenceMarkdown()), 'input-limits', inputLimitsMarkdown()));
console.log('README.md: input reference and input limits updated');
