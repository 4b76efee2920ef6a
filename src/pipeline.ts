// The library API: one input file to a calculation package. Data flows one way:
// input -> design -> frame model -> loads -> analysis -> checks -> document -> PDF / JSON.
import { readInputFile } from './input/read-input-file.ts';
import { loadDesignText } from './input/index.ts';
import type { LoadedDesign } from './design/design.ts';
import { buildDocument } from './report/sections/build-document.ts';
import { renderPdf } from './report/pdf/render-pdf.ts';
import type { DocumentModel } from './report/document.ts';

export interface BuildOptions {
  readonly env?: Readonly<Record<string, string | undefined>>;
  readonly firstOrder?: boolean;
  readonly json?: boolean;
}

export interface PackageResult {
  readonly loaded: LoadedDesign;
  readonly document: DocumentModel;
  readonly pdf: Buffer;
  /** The results as JSON text, when asked for. */
  readonly json: string | null;
  /** Lines for the terminal. */
  readonly summary: readonly string[];
  readonly checksFail: boolean;
}

export async function buildPackage(file: string, opts: BuildOptions = {}): Promise<PackageResult> {
  const loaded = loadDesignText(readInputFile(file), file, opts.env ?? {});
  const document = buildDocument(loaded);
  const pdf = await renderPdf(document);
  return { loaded, document, pdf, json: null, summary: [], checksFail: false };
}
