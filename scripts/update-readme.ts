// npm run docs: rewrites the README's input reference from the schema.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { inputReferenceMarkdown } from '../src/input/reference-markdown.ts';
import { replaceMarked } from './marked-section.ts';

const path = join(import.meta.dirname, '..', 'README.md');
writeFileSync(path, replaceMarked(readFileSync(path, 'utf8'), 'input-reference', inputReferenceMarkdown()));
console.log('README.md: input reference updated');
