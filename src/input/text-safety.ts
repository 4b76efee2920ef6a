// Characters that must never reach the terminal or the package from an input: control characters
// (an escape sequence in a project name would recolour or rewrite the terminal, a carriage return
// would overwrite a line) and the bidirectional overrides that reorder what a reader sees. Tab and
// line feed are ordinary text.
const UNSAFE = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u200E\u200F\u202A-\u202E\u2066-\u2069]/u;
const UNSAFE_ALL = new RegExp(UNSAFE.source, 'gu');

const NAMES: Readonly<Record<number, string>> = { 0x00: 'NUL', 0x07: 'bell', 0x08: 'backspace', 0x0d: 'carriage return', 0x1b: 'escape', 0x7f: 'delete' };

const hex = (cp: number): string => `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;

/** The first unsafe character of a text, named (e.g. "U+001B (escape)"), or undefined. */
export function unsafeCharacter(text: string): string | undefined {
  const m = UNSAFE.exec(text);
  if (!m) return undefined;
  const cp = m[0].codePointAt(0)!;
  const name = NAMES[cp] ?? (cp >= 0x2000 ? 'a bidirectional text control' : 'a control character');
  return `${hex(cp)} (${name})`;
}

/** The text with every unsafe character written as \u{XXXX}, for echoing it in a message. */
export const escapeUnsafe = (text: string): string => text.replace(UNSAFE_ALL, (c) => `\\u{${c.codePointAt(0)!.toString(16).toUpperCase()}}`);
