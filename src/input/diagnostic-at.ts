// A diagnostic at an input path of a design already loaded: for problems found after loading
// (an issued revision rebuilt from a changed input), located like every other input problem.
import { LineCounter, parseDocument } from 'yaml';
import type { LoadedDesign } from '../design/design.ts';
import type { Diagnostic } from '../errors.ts';
import { locate } from './positions.ts';
import { formatPath, type InputPath } from './problem.ts';

export function diagnosticAt(loaded: LoadedDesign, path: InputPath, message: string): Diagnostic {
  const lines = new LineCounter();
  const doc = parseDocument(loaded.text.replace(/^\uFEFF/, ''), { lineCounter: lines });
  const pos = locate(doc, lines, path, 'key');
  return { file: loaded.file, line: pos.line, col: pos.col, path: formatPath(path), message, severity: 'error' };
}
