// The library API: one input file to a calculation package. Data flows one way:
// input -> design -> frame model -> loads -> analysis -> checks -> document -> PDF / JSON.
import { loadDesignFile, loadDesignText } from './input/index.ts';
import type { LoadedDesign } from './design/design.ts';
import { analyseDesign } from './analyse-design.ts';
import type { DesignAnalysis } from './analyse-design.ts';
import type { DocumentModel } from './report/document.ts';
import { resultsJson } from './export/results-json.ts';
import { toolVersion } from './version.ts';
import { analysisSummaryLines, movementWarningLines } from './analysis-summary.ts';
import { runChecks } from './checks/run-checks.ts';
import type { CheckResults } from './checks/check-types.ts';
import { checkSummaryLines } from './checks/check-summary.ts';
import { assertPrintable } from './printable-input.ts';
import { issuedRegisterUpdate, type RegisterUpdate } from './output/issued-register.ts';

export interface BuildOptions {
  readonly env?: Readonly<Record<string, string | undefined>>;
  readonly firstOrder?: boolean;
  readonly json?: boolean;
}

export interface PackageResult {
  readonly loaded: LoadedDesign;
  readonly analysis: DesignAnalysis;
  readonly checks: CheckResults;
  readonly document: DocumentModel;
  readonly pdf: Buffer;
  /** The results as JSON text, when asked for. */
  readonly json: string | null;
  /** Lines for the terminal. */
  readonly summary: readonly string[];
  /** Warnings about the results for the terminal (results outside the method). */
  readonly resultWarnings: readonly string[];
  readonly checksFail: boolean;
  /** For an issued revision: the record of issued revisions to write beside the input. */
  readonly issuedRegister: RegisterUpdate | null;
}

export async function buildPackage(file: string, opts: BuildOptions = {}): Promise<PackageResult> {
  return packageOf(loadForBuild(file, opts), opts);
}

/** The input stage of a build: the file read, validated and refused if the PDF fonts cannot print it. */
export function loadForBuild(file: string, opts: BuildOptions = {}): LoadedDesign {
  const loaded = loadDesignFile(file, { SOURCE_DATE_EPOCH: opts.env?.SOURCE_DATE_EPOCH });
  assertPrintable(loaded);
  // An issued revision rebuilt from a changed input is refused before any work.
  issuedRegisterUpdate(loaded);
  return loaded;
}

/** The same for input text held in memory as if read from `file` (an alternative of a comparison). */
export function loadTextForBuild(text: string, file: string, opts: BuildOptions = {}): LoadedDesign {
  const loaded = loadDesignText(text, file, { SOURCE_DATE_EPOCH: opts.env?.SOURCE_DATE_EPOCH });
  assertPrintable(loaded);
  return loaded;
}

export interface CheckedDesign {
  readonly analysis: DesignAnalysis;
  readonly checks: CheckResults;
}

/** Analysis and checks of a loaded design: the engineering of a build, shared by every command
 * (a comparison's alternatives go through exactly this, so each row is what a build gives). */
export function analyseAndCheck(loaded: LoadedDesign, opts: BuildOptions = {}): CheckedDesign {
  const analysis = analyseDesign(loaded.design, { firstOrder: opts.firstOrder });
  const checks = runChecks(loaded.design, analysis);
  return { analysis, checks };
}

/** The package of a loaded design: analysis, checks, document, PDF and JSON. */
export async function packageOf(loaded: LoadedDesign, opts: BuildOptions = {}, checked: CheckedDesign = analyseAndCheck(loaded, opts)): Promise<PackageResult> {
  const { analysis, checks } = checked;
  const issuedRegister = issuedRegisterUpdate(loaded);
  // The renderer is loaded when a package is made: a comparison's alternatives and `check` need
  // only the engineering modules, so a worker thread starts in half the time.
  const { packageDocument } = await import('./report/package-document.ts');
  const { document, pdf } = await packageDocument(loaded, analysis, checks);
  const json = opts.json
    ? resultsJson({ loaded, toolVersion: toolVersion(), ...analysis, secondOrder: analysis.options.secondOrder, checks })
    : null;
  const summary = [...analysisSummaryLines(loaded.design, analysis), ...checkSummaryLines(loaded.design, checks)];
  const resultWarnings = movementWarningLines(loaded.design, analysis);
  return { loaded, analysis, checks, document, pdf, json, summary, resultWarnings, checksFail: checks.fails, issuedRegister };
}
