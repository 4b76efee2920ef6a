// Strict JSON syntax of a .json input, with the offset and plain words of the first mistake:
// JSON.parse says only "Unexpected token" and, on this Node, not where. This reads the grammar of
// RFC 8259 without building values (the YAML reader builds them afterwards).

export interface JsonSyntaxError {
  readonly offset: number;
  readonly message: string;
}

/** Brackets nested deeper than this are refused (an input nests a few levels). */
const MAX_DEPTH = 100;

class Fail extends Error {
  constructor(readonly offset: number, message: string) {
    super(message);
  }
}

export function jsonSyntaxError(text: string): JsonSyntaxError | undefined {
  let i = 0;
  const ws = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i]!)) i++;
    if (text.startsWith('//', i) || text.startsWith('/*', i)) throw new Fail(i, 'JSON has no comments; remove it, or write the file as YAML, where comments start with #');
  };
  const describe = (k: number) => (k >= text.length ? 'the end of the file' : `'${text[k] === '\n' ? '\\n' : text[k]}'`);

  const string = () => {
    if (text[i] === "'") throw new Fail(i, "JSON strings and keys take double quotes (\"), not single quotes (')");
    if (text[i] !== '"') throw new Fail(i, `expected a double-quoted string, found ${describe(i)}`);
    const start = i++;
    while (i < text.length && text[i] !== '"') {
      const c = text.charCodeAt(i);
      if (c === 0x0a) throw new Fail(start, 'this string is not closed on its line: a double quote (") is missing');
      if (c < 0x20) throw new Fail(i, 'a control character inside a string; write it as an escape such as \\t, or remove it');
      if (text[i] === '\\') {
        const e = text[i + 1];
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) throw new Fail(i, 'a \\u escape needs four hexadecimal digits');
          i += 6;
          continue;
        }
        if (e === undefined || !'"\\/bfnrt'.includes(e)) throw new Fail(i, `'\\${e ?? ''}' is not a JSON escape; write \\\\ for a backslash`);
        i += 2;
        continue;
      }
      i++;
    }
    if (i >= text.length) throw new Fail(start, 'this string is not closed: a double quote (") is missing');
    i++;
  };

  const number = () => {
    const m = /^-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/.exec(text.slice(i, i + 400));
    if (!m) throw new Fail(i, `expected a value (a number, a string in double quotes, true, false, null, a list or a block), found ${describe(i)}`);
    i += m[0].length;
    if (text[i] === ',' && /\d/.test(text[i + 1] ?? '')) throw new Fail(i, 'a decimal comma: JSON numbers take a decimal point (0.25, not 0,25)');
  };

  const value = (depth: number): void => {
    ws();
    const c = text[i];
    if (c === '{' || c === '[') {
      if (depth >= MAX_DEPTH) throw new Fail(i, `blocks and lists are nested more than ${MAX_DEPTH} deep; an input nests a few levels`);
      container(c === '{', depth + 1);
    } else if (c === '"' || c === "'") string();
    else if (text.startsWith('true', i)) i += 4;
    else if (text.startsWith('false', i)) i += 5;
    else if (text.startsWith('null', i)) i += 4;
    else number();
  };

  const container = (object: boolean, depth: number) => {
    const close = object ? '}' : ']';
    const open = i++;
    ws();
    if (text[i] === close) {
      i++;
      return;
    }
    for (;;) {
      if (object) {
        string();
        ws();
        if (text[i] !== ':') throw new Fail(i, `expected ':' after the key, found ${describe(i)}`);
        i++;
      }
      value(depth);
      ws();
      if (text[i] === ',') {
        const comma = i++;
        ws();
        if (text[i] === close) throw new Fail(comma, `a trailing comma before ${close}: JSON allows no comma after the last ${object ? 'key' : 'item'}; remove it`);
        continue;
      }
      if (text[i] === close) {
        i++;
        return;
      }
      if (i >= text.length) throw new Fail(open, `this ${object ? 'block { ' : 'list [ '}is not closed: '${close}' is missing`);
      throw new Fail(i, `expected ',' or '${close}', found ${describe(i)}: a comma is missing before it, or a bracket is not closed`);
    }
  };

  try {
    value(0);
    ws();
    if (i < text.length) throw new Fail(i, `text after the end of the JSON value, found ${describe(i)}; a file holds one block { ... }`);
    return undefined;
  } catch (e) {
    if (e instanceof Fail) return { offset: e.offset, message: e.message };
    throw e;
  }
}
