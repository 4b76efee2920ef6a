// The key path of a line in YAML or JSON text, found from indentation alone. Used for
// syntax errors, where the parsed document cannot be trusted.
import type { InputPath } from './problem.ts';

interface Line {
  readonly indent: number;
  readonly content: string;
}

/** Tabs count as 8 columns, the usual tab stop, so a tab-indented line finds its parent. */
function readLine(raw: string): Line {
  let indent = 0;
  let i = 0;
  for (; i < raw.length; i++) {
    if (raw[i] === ' ') indent++;
    else if (raw[i] === '\t') indent += 8 - (indent % 8);
    else break;
  }
  return { indent, content: raw.slice(i) };
}

const blank = (l: Line) => l.content === '' || l.content.startsWith('#');

/** The key a line opens, without quotes: `height: 24`, `"height": 24`, `- id: A1`. */
function keyOf(content: string): string | undefined {
  const m = /^(?:-\s+)?(?:"([^"]*)"|'([^']*)'|([^\s:#{}[\],"'][^:#{}[\],]*?))\s*:(?:\s|$)/.exec(content);
  return m ? (m[1] ?? m[2] ?? m[3]) : undefined;
}

const isItem = (content: string) => content.startsWith('- ') || content === '-';
const isJsonElement = (content: string) => !/^[}\]]/.test(content) && keyOf(content) === undefined;

/** With siblingOfPrevious, an over-indented line is read as the sibling of the line above,
 * which is what its author meant. */
export function textPath(text: string, offset: number, siblingOfPrevious = false): InputPath {
  const lines = text.split('\n').map(readLine);
  const lineIndex = Math.min(text.slice(0, offset).split('\n').length - 1, lines.length - 1);
  if (siblingOfPrevious) {
    for (let i = lineIndex - 1; i >= 0; i--) {
      if (blank(lines[i])) continue;
      if (lines[i].indent < lines[lineIndex].indent) lines[lineIndex] = { indent: lines[i].indent, content: lines[lineIndex].content };
      break;
    }
  }
  const path: (string | number)[] = [];
  const own = lines[lineIndex];
  if (!blank(own)) {
    const k = keyOf(own.content);
    if (k !== undefined) path.unshift(k);
    if (isItem(own.content)) path.unshift(elementIndex(lines, lineIndex, own.indent, isItem));
  }
  let limit = own.indent;
  let child = lineIndex;
  for (let i = lineIndex - 1; i >= 0; i--) {
    const l = lines[i];
    if (blank(l) || l.indent >= limit) continue;
    // l encloses the line below: a YAML list item, a JSON array, or a key.
    if (isItem(l.content)) path.unshift(elementIndex(lines, i, l.indent, isItem));
    else {
      if (l.content.endsWith('[')) path.unshift(elementIndex(lines, child, lines[child].indent, isJsonElement));
      const key = keyOf(l.content);
      if (key !== undefined) path.unshift(key);
    }
    limit = l.indent;
    child = i;
  }
  return path;
}

/** How many elements start at this indentation before line `at`, back to the parent. */
function elementIndex(lines: readonly Line[], at: number, indent: number, starts: (c: string) => boolean): number {
  let n = 0;
  for (let i = at - 1; i >= 0; i--) {
    const l = lines[i];
    if (blank(l)) continue;
    if (l.indent < indent) break;
    if (l.indent === indent && starts(l.content)) n++;
  }
  return n;
}
