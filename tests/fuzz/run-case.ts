// Runs one input text through the library chain (no PDF) or the whole CLI and says whether
// polebook kept its promise: a located input error, an unstable-structure error naming the
// combination, or finite results everywhere. Anything else is a failure with its reason.
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadDesignText } from '../../src/input/index.ts';
import { analyseDesign } from '../../src/analyse-design.ts';
import { buildDocument } from '../../src/report/sections/build-document.ts';
import { analysisSections } from '../../src/report/sections/analysis-sections.ts';
import { runChecks } from '../../src/checks/run-checks.ts';
import { resultsJson } from '../../src/export/results-json.ts';
import { analysisSummaryLines, movementWarningLines } from '../../src/analysis-summary.ts';
import { FileLevelError, InputError, UnstableStructureError, formatDiagnostic } from '../../src/errors.ts';
import { cli } from '../cli/run-cli.ts';
import { readPdfText } from '../support/pdf-text.ts';

export type Outcome =
  | { readonly kind: 'input'; readonly first: string }
  | { readonly kind: 'unstable'; readonly message: string }
  | { readonly kind: 'ok' }
  | { readonly kind: 'failure'; readonly reason: string };

/** The promised first line of a bad-input message: file:line:col: ... */
export const LOCATED = /^.+:\d+:\d+: /;
/** An unstable-structure message names the combination or the degree of freedom. */
export const NAMES_COMBINATION_OR_DOF = /combination|degree of freedom|\b[uUrR][xyz]\b|mechanism/;

/** Paths (dotted) of every non-finite number, and of every printed NaN/Infinity, in a value. */
export function nonFinite(value: unknown, opts: { readonly text?: boolean } = {}, limit = 5): string[] {
  const out: string[] = [];
  const seen = new Set<unknown>();
  const walk = (v: unknown, path: string) => {
    if (out.length >= limit) return;
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) out.push(`${path} = ${v}`);
    } else if (typeof v === 'string' && opts.text !== false) {
      if (/\bNaN\b|Infinity|undefined/.test(v)) out.push(`${path}: text "${v.length > 80 ? `${v.slice(0, 80)}...` : v}"`);
    } else if (ArrayBuffer.isView(v) && !(v instanceof DataView)) {
      const arr = v as unknown as ArrayLike<number>;
      for (let i = 0; i < arr.length; i++) if (!Number.isFinite(arr[i]!)) { out.push(`${path}[${i}] = ${arr[i]}`); break; }
    } else if (v !== null && typeof v === 'object') {
      if (seen.has(v)) return;
      seen.add(v);
      if (v instanceof Map) for (const [k, x] of v) walk(x, `${path}.${String(k)}`);
      else for (const [k, x] of Object.entries(v)) walk(x, path === '' ? k : `${path}.${k}`);
    }
  };
  walk(value, '');
  return out;
}

/** Keys of the results JSON that may be null by design: a dead or ice case has no wind angle;
 * a check with no station (anchor bolts, base plate) has no s_m. */
const NULLABLE_KEYS = new Set(['windAngle_rad', 's_m']);

/** Keys of the results JSON that carry a unit must hold numbers: JSON.stringify writes NaN as null. */
export function nullQuantities(jsonText: string): string[] {
  const out: string[] = [];
  JSON.parse(jsonText, function (key, v) {
    if (v === null && !NULLABLE_KEYS.has(key) && /_(m|m2|m4|N|Nm|Pa|rad|kg|Hz|N_per_m|Nm_per_rad|kg_per_m|s)$/.test(key)) out.push(key);
    return v;
  });
  return out;
}

function inputOutcome(err: InputError): Outcome {
  const errors = err.diagnostics.filter((d) => d.severity === 'error');
  if (errors.length === 0) return { kind: 'failure', reason: 'InputError without an error diagnostic' };
  const bad = err.diagnostics.find((d) => !(d.line >= 1 && d.col >= 1) || d.message.trim() === '' || /undefined|\[object /.test(d.message));
  if (bad) return { kind: 'failure', reason: `badly formed diagnostic: ${JSON.stringify(bad)}` };
  const first = formatDiagnostic(err.diagnostics[0]!);
  if (!LOCATED.test(first)) return { kind: 'failure', reason: `first line not located: ${first}` };
  return { kind: 'input', first };
}

/** Text that the input itself writes (an id "NaN", a name "-Infinity") is echoed in the package;
 * then only numbers are scanned, not printed text. */
const userWritesNaN = (text: string) => /\bNaN\b|Infinity|undefined/.test(text);

/** The library chain without the PDF: load, analyse, document model, JSON, terminal summary. */
export function runLibrary(text: string, file: string): Outcome {
  const scanText = !userWritesNaN(text);
  let loaded;
  try {
    loaded = loadDesignText(text, file, { SOURCE_DATE_EPOCH: '1767225600' });
  } catch (err) {
    if (err instanceof InputError) return inputOutcome(err);
    // A refusal of the whole file (empty, too large, UTF-16) names the file, with no position.
    if (err instanceof FileLevelError) return { kind: 'input', first: err.message };
    return { kind: 'failure', reason: `loading threw ${describe(err)}` };
  }
  let analysis;
  try {
    analysis = analyseDesign(loaded.design, {});
  } catch (err) {
    if (err instanceof UnstableStructureError) {
      return NAMES_COMBINATION_OR_DOF.test(err.message) ? { kind: 'unstable', message: err.message } : { kind: 'failure', reason: `unstable without naming a combination: ${err.message}` };
    }
    if (err instanceof InputError) return { kind: 'failure', reason: `InputError raised after validation: ${err.message}` };
    return { kind: 'failure', reason: `analysis threw ${describe(err)}` };
  }
  try {
    const bad = [
      ...nonFinite({ results: analysis.results, modes: analysis.modes, model: analysis.model }, { text: scanText }),
      ...nonFinite(buildDocument(loaded, { sections: analysisSections(loaded, analysis) }), { text: scanText }),
      ...nonFinite(analysisSummaryLines(loaded.design, analysis), { text: scanText }),
      ...nonFinite(movementWarningLines(loaded.design, analysis), { text: scanText }),
    ];
    const checks = runChecks(loaded.design, analysis);
    bad.push(...nonFinite(checks.records.map((r) => ({ demand: r.demand.si, capacity: r.capacity.si })), { text: scanText }));
    const json = resultsJson({ loaded, toolVersion: 'fuzz', ...analysis, secondOrder: analysis.options.secondOrder, checks });
    bad.push(...nullQuantities(json).map((k) => `JSON ${k} is null (NaN or Infinity)`));
    if (bad.length > 0) return { kind: 'failure', reason: `non-finite output: ${bad.slice(0, 5).join('; ')}` };
  } catch (err) {
    return { kind: 'failure', reason: `document or JSON threw ${describe(err)}` };
  }
  return { kind: 'ok' };
}

/** The whole CLI, in-process: `build file --out dir --json`; the PDF is read back with pdfjs-dist. */
export async function runCliCase(text: string, name: string): Promise<Outcome> {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-fuzz-'));
  try {
    return await cliCase(dir, text, name);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function cliCase(dir: string, text: string, name: string): Promise<Outcome> {
  const file = join(dir, name);
  writeFileSync(file, text);
  const out = join(dir, 'out');
  const r = await cli(['build', file, '--out', out, '--json'], { cwd: dir, env: { SOURCE_DATE_EPOCH: '1767225600' } });
  const written = (() => { try { return readdirSync(out); } catch { return []; } })();
  const firstErr = r.stderr.split('\n')[0] ?? '';
  switch (r.code) {
    case 2:
      if (!LOCATED.test(firstErr)) return { kind: 'failure', reason: `exit 2, first stderr line not located: ${firstErr}` };
      if (written.length > 0) return { kind: 'failure', reason: `exit 2 but wrote ${written.join(', ')}` };
      return { kind: 'input', first: firstErr };
    case 3:
      if (!NAMES_COMBINATION_OR_DOF.test(r.stderr)) return { kind: 'failure', reason: `exit 3 without naming a combination: ${r.stderr}` };
      if (written.length > 0) return { kind: 'failure', reason: `exit 3 but wrote ${written.join(', ')}` };
      return { kind: 'unstable', message: r.stderr };
    case 0:
    case 1: {
      const stem = name.replace(/\.[^.]+$/, '');
      if (!written.includes(`${stem}.pdf`)) return { kind: 'failure', reason: `exit ${r.code} without a PDF` };
      const json = readFileSync(join(out, `${stem}.results.json`), 'utf8');
      const scanText = !userWritesNaN(text);
      const pdfText = scanText ? (await readPdfText(readFileSync(join(out, `${stem}.pdf`)))).pages : [];
      const bad = [
        ...nonFinite(JSON.parse(json), { text: scanText }),
        ...nullQuantities(json),
        ...nonFinite(r.stdout.split('\n'), { text: scanText }),
        ...nonFinite(pdfText.map((page, i) => `page ${i + 1}: ${page.match(/.{0,60}(?:\bNaN\b|Infinity|undefined).{0,20}/)?.[0] ?? ''}`)),
      ];
      if (bad.length > 0) return { kind: 'failure', reason: `exit ${r.code}, non-finite output: ${bad.slice(0, 5).join('; ')}` };
      return { kind: 'ok' };
    }
    default:
      return { kind: 'failure', reason: `exit ${r.code}: ${r.stderr.slice(0, 400)}` };
  }
}

function describe(err: unknown): string {
  if (err instanceof Error) return `${err.name}: ${err.message}\n${(err.stack ?? '').split('\n').slice(1, 5).join('\n')}`;
  return String(err);
}
