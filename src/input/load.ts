// Reading an input file: YAML (or JSON) text -> schema -> normalised Design, with every
// problem located at its line and column and reported at once.
import { createHash } from 'node:crypto';
import { LineCounter, isAlias, parseDocument, visit, type Document } from 'yaml';
import type { Design, LoadedDesign } from '../design/design.ts';
import { FileLevelError, InputError, type Diagnostic } from '../errors.ts';
import type { UnitSystem } from '../units/units.ts';
import { normalise } from './normalise.ts';
import { plausibilityWarnings } from './plausibility.ts';
import { readInputBytes } from './read-input-file.ts';
import { jsonSyntaxError } from './json-syntax.ts';
import { mergeKeyProblems } from './merge-keys.ts';
import { decodeInput, sizeProblem, unsafeTextProblems } from './input-text.ts';
import { locate } from './positions.ts';
import { textPath } from './text-path.ts';
import { formatPath, type Problem } from './problem.ts';
import { buildInputSchema } from './schema.ts';
import { issueToProblems } from './zod-issues.ts';

export interface LoadEnv {
  readonly SOURCE_DATE_EPOCH?: string;
}

const schemas: Partial<Record<UnitSystem, ReturnType<typeof buildInputSchema>>> = {};
function schemaFor(system: UnitSystem) {
  return (schemas[system] ??= buildInputSchema(system));
}

export function inputHash(bytes: Uint8Array | string): string {
  return createHash('sha256').update(bytes).digest('hex').slice(0, 12);
}

/** Reads and validates a design file. Throws InputError with all diagnostics.
 * env defaults to the process environment (SOURCE_DATE_EPOCH). */
export function loadDesignFile(file: string, env?: LoadEnv): LoadedDesign {
  const bytes = readInputBytes(file);
  return loadFromText(decodeInput(file, bytes), file, inputHash(bytes), env ?? { SOURCE_DATE_EPOCH: process.env.SOURCE_DATE_EPOCH });
}

/** Validates design text as if read from `file`. env defaults to the process environment. */
export function loadDesignText(text: string, file: string, env?: LoadEnv): LoadedDesign {
  const big = sizeProblem(file, Buffer.byteLength(text, 'utf8'));
  if (big) throw big;
  return loadFromText(text, file, inputHash(Buffer.from(text, 'utf8')), env ?? { SOURCE_DATE_EPOCH: process.env.SOURCE_DATE_EPOCH });
}

function loadFromText(original: string, file: string, hash: string, env: LoadEnv): LoadedDesign {
  const text = original.replace(/^\uFEFF/, '');
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: true, uniqueKeys: true });
  const toDiagnostic = (p: Problem): Diagnostic => {
    const pos = locate(doc, lines, p.path, p.at);
    return { file, line: pos.line, col: pos.col, path: formatPath(p.path), message: p.message, severity: p.severity };
  };

  const jsonProblem = file.toLowerCase().endsWith('.json') ? strictJsonDiagnostic(text, lines, file) : undefined;
  if (jsonProblem) throw new InputError([jsonProblem]);
  // An unknown tag (height: !m 26) is only a warning to yaml, which then reads the plain value:
  // 26 in the file's own unit, silently. Refuse it.
  const tagProblems = doc.warnings.filter((w) => w.code === 'TAG_RESOLVE_FAILED');
  const yamlProblems = [...doc.errors, ...tagProblems];
  if (yamlProblems.length > 0) {
    throw new InputError(oneTabMessage(uniquePlaces(sortByPlace(yamlProblems.map((e) => yamlErrorDiagnostic(e, text, lines, file))))));
  }
  const data: unknown = toData(doc, text, lines, file);
  if (data === null || data === undefined) {
    throw new FileLevelError(file, `cannot read the input file ${file}: it is empty; expected an input starting with formatVersion: 1 (\`polebook new <kind>\` writes a starter)`);
  }
  const unsafe = [...unsafeTextProblems(data), ...mergeKeyProblems(data)];
  if (unsafe.length > 0) throw new InputError(sortByPlace(unsafe.map(toDiagnostic)));
  const system: UnitSystem = isRecord(data) && data.units === 'si' ? 'si' : 'us';
  const schema = schemaFor(system);
  const parsed = schema.safeParse(data);
  if (!parsed.success) {
    const problems = parsed.error.issues.flatMap((i) => issueToProblems(i, data, schema));
    throw new InputError(sortByPlace(dropMissingExplainedByTypo(problems).map(toDiagnostic)));
  }
  const { design, problems } = normalise(parsed.data, env);
  const warnings = plausibilityWarnings(parsed.data, design?.pole.section.rootDiameter_m);
  const all = [...problems, ...warnings].map(toDiagnostic);
  const errors = sortByPlace(all.filter((d) => d.severity === 'error'));
  const warns = sortByPlace(all.filter((d) => d.severity === 'warning'));
  if (errors.length > 0 || !design) throw new InputError([...errors, ...warns]);
  return { design: design as Design, file, text: original, inputHash: hash, warnings: warns };
}

/** Most aliases a file may expand: an input needs few, and a chain of aliases of aliases grows
 * exponentially (yaml refuses it with an exception, which must not reach the user as a crash). */
const MAX_ALIAS_COUNT = 100;

function toData(doc: Document.Parsed, text: string, lines: LineCounter, file: string): unknown {
  try {
    return doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (e) {
    if (!(e instanceof ReferenceError)) throw e;
    let offset = 0;
    visit(doc, {
      Alias(_key, node) {
        if (isAlias(node) && node.range) offset = node.range[0];
        return visit.BREAK;
      },
    });
    const pos = lines.linePos(offset);
    const message = `the aliases (*name) expand to too many nodes (${e.message}); write the values out, or use fewer aliases of aliases`;
    throw new InputError([{ file, line: pos.line, col: pos.col, path: formatPath(textPath(text, offset)), message, severity: 'error' }]);
  }
}

/** A .json file is held to JSON's own rules (no trailing commas, no comments), located exactly. */
function strictJsonDiagnostic(text: string, lines: LineCounter, file: string): Diagnostic | undefined {
  const e = jsonSyntaxError(text);
  if (!e) return undefined;
  const pos = lines.linePos(e.offset);
  return { file, line: pos.line, col: pos.col, path: formatPath(textPath(text, e.offset)), message: `not valid JSON: ${e.message}`, severity: 'error' };
}

/** "unknown key 'load', did you mean 'loads'" already explains "loads is missing": keep one message. */
function dropMissingExplainedByTypo(problems: readonly Problem[]): Problem[] {
  const suggested = new Set(
    problems
      .filter((p) => p.at === 'key')
      .map((p) => {
        const m = /did you mean '([^']+)'/.exec(p.message);
        return m ? formatPath([...p.path.slice(0, -1), m[1]]) : '';
      }),
  );
  return problems.filter((p) => !(p.message.startsWith('required key is missing') && suggested.has(formatPath(p.path))));
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

function sortByPlace(ds: Diagnostic[]): Diagnostic[] {
  return [...ds].sort((a, b) => a.line - b.line || a.col - b.col);
}

/** Errors whose reported place is the line before the real mistake: the next, over-indented line. */
const NEXT_LINE_CODES = new Set(['BLOCK_AS_IMPLICIT_KEY', 'MULTILINE_IMPLICIT_KEY']);

function yamlErrorDiagnostic(e: { message: string; pos: [number, number]; code: string }, text: string, lines: LineCounter, file: string): Diagnostic {
  let offset = e.pos[0];
  const nextLine = NEXT_LINE_CODES.has(e.code);
  if (nextLine) {
    const next = /\n[ \t]*(?=[^ \t\n])/g;
    next.lastIndex = offset;
    const m = next.exec(text);
    if (m) offset = m.index + m[0].length;
  }
  const start = lines.linePos(offset);
  // yaml's message ends with a code excerpt after the first line; keep the first line.
  const raw = e.message.split('\n')[0].replace(/ at line \d+, column \d+:?$/, '');
  // The parser runs out of stack on brackets nested a thousand deep: say what that means.
  const first = /Maximum call stack size exceeded/.test(raw)
    ? 'the value is nested too deeply to read (lists or blocks inside each other)'
    : e.code === 'MULTIPLE_DOCS'
      ? "the file holds more than one YAML document: a line '---' (or '...') after the first design starts another; polebook reads one design per file, so remove the line or split the file"
      : raw;
  const hint = YAML_HINTS[e.code] ?? '';
  return { file, line: start.line, col: start.col, path: formatPath(textPath(text, offset, nextLine)), message: `${first}${hint}`, severity: 'error' };
}

const TAB_MARK = 'indent with spaces, not tabs';

/** Tabs in the indentation throw the structure off, and yaml then reports correct lines too:
 * one message for the tabs, naming every line that has one, and nothing else. */
function oneTabMessage(ds: Diagnostic[]): Diagnostic[] {
  const tabs = ds.filter((d) => d.message.includes(TAB_MARK));
  if (tabs.length === 0) return ds;
  const first = tabs[0]!;
  const more = tabs.slice(1).map((d) => d.line);
  return [{ ...first, message: `a tab is used for indentation${more.length > 0 ? ` (also on line${more.length > 1 ? 's' : ''} ${more.join(', ')})` : ''}; ${TAB_MARK} (other errors are not listed: the tabs change how the lines nest)` }];
}

function uniquePlaces(ds: Diagnostic[]): Diagnostic[] {
  return ds.filter((d, i) => i === 0 || d.line !== ds[i - 1].line || d.col !== ds[i - 1].col);
}

const YAML_HINTS: Readonly<Record<string, string>> = {
  DUPLICATE_KEY: '; each key may appear once in a block (remove or rename one)',
  TAB_AS_INDENT: '; indent with spaces, not tabs',
  TAG_RESOLVE_FAILED: '; polebook reads no YAML tags: write a unit inside the value instead, e.g. "26 m"',
  BAD_INDENT: '; check that keys of one block line up',
  BLOCK_AS_IMPLICIT_KEY: '; this line is indented deeper than its block (check its indentation)',
  MULTILINE_IMPLICIT_KEY: '; this line is indented deeper than its block, or a comma is missing before it',
};
