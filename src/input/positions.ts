// Source positions of input paths in the parsed YAML (or JSON) document.
import { isMap, isNode, isScalar, type Document, type LineCounter } from 'yaml';
import type { InputPath } from './problem.ts';

export interface Position {
  readonly line: number;
  readonly col: number;
}

function keyOf(k: unknown): unknown {
  return isScalar(k) ? k.value : k;
}

function pairAt(doc: Document, path: InputPath) {
  const parent = path.length === 0 ? doc.contents : doc.getIn(path.slice(0, -1), true);
  if (!isMap(parent)) return undefined;
  const last = path[path.length - 1];
  return parent.items.find((p) => String(keyOf(p.key)) === String(last));
}

/** Where a path is in the text: its value (or its key), else the nearest parent that exists. */
export function locate(doc: Document, lines: LineCounter, path: InputPath, at: 'key' | 'value' = 'value'): Position {
  if (at === 'key' && path.length > 0) {
    const pair = pairAt(doc, path);
    if (pair && isNode(pair.key) && pair.key.range) return toPosition(lines, pair.key.range[0]);
  }
  for (let n = path.length; n >= 0; n--) {
    const sub = path.slice(0, n);
    const node = sub.length === 0 ? doc.contents : doc.getIn(sub, true);
    if (isNode(node) && node.range) return toPosition(lines, node.range[0]);
    // A key with an empty value: point at the key.
    if (sub.length > 0) {
      const pair = pairAt(doc, sub);
      if (pair && isNode(pair.key) && pair.key.range) return toPosition(lines, pair.key.range[0]);
    }
  }
  return { line: 1, col: 1 };
}

function toPosition(lines: LineCounter, offset: number): Position {
  const p = lines.linePos(offset);
  return { line: p.line, col: p.col };
}
