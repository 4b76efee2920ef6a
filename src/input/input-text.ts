// The input's bytes as text, refused before any parsing when they cannot be a design file: too
// large (size-limits.ts), not UTF-8 text (a Latin-1 byte, UTF-16, a binary file), or holding
// control characters in a value or key. The refusal names the line and byte; raw bytes are never
// echoed and never silently replaced.
import { FileLevelError, InputError, type Diagnostic } from '../errors.ts';
import { MAX_INPUT_BYTES } from './size-limits.ts';
import { unsafeCharacter } from './text-safety.ts';
import { error, type InputPath, type Problem } from './problem.ts';

/** A refusal at a byte of the file, before any key can be named. */
const atByte = (file: string, message: string, line: number, col: number): Diagnostic => ({ file, line, col, path: '', message, severity: 'error' });

/** A whole-file refusal names the file, not a made-up line and column. */
export function sizeProblem(file: string, bytes: number): FileLevelError | undefined {
  if (bytes <= MAX_INPUT_BYTES) return undefined;
  return new FileLevelError(file, `cannot read the input file ${file}: it is ${bytes} bytes, more than the ${MAX_INPUT_BYTES} bytes an input may have (a limit of ours; a design is a few kilobytes): is it the right file?`);
}

/** Length of the valid UTF-8 sequence starting at i, or 0 when the bytes there are not UTF-8. */
function utf8Length(b: Uint8Array, i: number): number {
  const c = b[i]!;
  if (c < 0x80) return 1;
  const need = c >= 0xc2 && c <= 0xdf ? 2 : c >= 0xe0 && c <= 0xef ? 3 : c >= 0xf0 && c <= 0xf4 ? 4 : 0;
  if (need === 0 || i + need > b.length) return 0;
  for (let k = 1; k < need; k++) if ((b[i + k]! & 0xc0) !== 0x80) return 0;
  const c1 = b[i + 1]!;
  // Overlong forms, UTF-16 surrogates and code points past U+10FFFF are not UTF-8.
  if ((c === 0xe0 && c1 < 0xa0) || (c === 0xed && c1 > 0x9f) || (c === 0xf0 && c1 < 0x90) || (c === 0xf4 && c1 > 0x8f)) return 0;
  return need;
}

/** Decodes the file's bytes as UTF-8 text, or throws an InputError at the first byte that is not. */
export function decodeInput(file: string, bytes: Uint8Array): string {
  const big = sizeProblem(file, bytes.length);
  if (big) throw big;
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw new FileLevelError(file, `cannot read the input file ${file}: it is UTF-16 text; polebook reads UTF-8: save it again as UTF-8`);
  }
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < bytes.length; ) {
    const c = bytes[i]!;
    if (c === 0x00) {
      throw new InputError([atByte(file, `the file is not text: it has a NUL byte at line ${line}, byte ${i - lineStart + 1} of the line (a binary file, or text saved as UTF-16?); expected a YAML or JSON input in UTF-8`, line, i - lineStart + 1)]);
    }
    const n = utf8Length(bytes, i);
    if (n === 0) {
      const hex = `0x${c.toString(16).toUpperCase().padStart(2, '0')}`;
      throw new InputError([atByte(file, `the file is not UTF-8 text: byte ${hex} at line ${line}, byte ${i - lineStart + 1} of the line, is not UTF-8 (a Latin-1 or Windows-1252 letter such as é?); save the file as UTF-8`, line, i - lineStart + 1)]);
    }
    if (c === 0x0a) {
      line++;
      lineStart = i + 1;
    }
    i += n;
  }
  return new TextDecoder('utf-8').decode(bytes);
}

/** Control characters in any key or text value of the parsed input, each at its place. */
export function unsafeTextProblems(data: unknown, path: InputPath = []): Problem[] {
  if (typeof data === 'string') {
    const u = unsafeCharacter(data);
    return u ? [error(path, `the text holds ${u}, which would act on the terminal or the page instead of printing; remove it`)] : [];
  }
  if (Array.isArray(data)) return data.flatMap((v, i) => unsafeTextProblems(v, [...path, i]));
  if (data !== null && typeof data === 'object') {
    return Object.entries(data as Record<string, unknown>).flatMap(([k, v]) => {
      const u = unsafeCharacter(k);
      const here = u ? [error([...path, k], `the key holds ${u}, which would act on the terminal instead of printing; remove it`, 'key')] : [];
      return [...here, ...unsafeTextProblems(v, [...path, k])];
    });
  }
  return [];
}
