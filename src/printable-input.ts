// Refuses an input whose text the package's fonts cannot draw (a name in a script they do not
// cover), at the line and column of the first such character: printing it would leave an empty
// box on the page. Sits between the input stage and the renderer, which it asks what it can draw.
import type { LoadedDesign } from './design/design.ts';
import { InputError } from './errors.ts';
import { formatPath } from './input/problem.ts';
import { textPath } from './input/text-path.ts';
import { FONT_COVERAGE, firstUndrawable } from './report/pdf/font-coverage.ts';

export function assertPrintable(loaded: LoadedDesign): void {
  const text = loaded.text;
  const bad = firstUndrawable(text);
  if (!bad) return;
  const before = text.slice(0, bad.offset);
  const line = before.split('\n').length;
  const col = bad.offset - (before.lastIndexOf('\n') + 1) + 1;
  const ch = String.fromCodePoint(bad.codePoint);
  const cp = `U+${bad.codePoint.toString(16).toUpperCase().padStart(4, '0')}`;
  throw new InputError([{
    file: loaded.file, line, col, path: formatPath(textPath(text.replace(/^\uFEFF/, ''), bad.offset - (text.startsWith('\uFEFF') ? 1 : 0))),
    message: `the package's fonts cannot draw '${ch}' (${cp}); it would print as an empty box. The fonts are ${FONT_COVERAGE}: write this text with those (comments are printed too, in the input echo)`,
    severity: 'error',
  }]);
}
