// The document model: what the package says, in order, as plain data. Built by the
// section builders in src/report/sections/ from the design and results; turned into
// a PDF by src/report/pdf/. The renderer computes no engineering; the builders draw nothing.
import type { CalcStep } from '../calc/step.ts';
import type { UnitSystem } from '../units/units.ts';
import type { IssuedMark, Revision } from '../design/design.ts';

export type Block =
  | { readonly kind: 'heading'; readonly text: string; readonly level: 2 | 3 }
  | { readonly kind: 'paragraph'; readonly text: string; readonly emphasis?: boolean }
  | { readonly kind: 'bullets'; readonly items: readonly string[] }
  | { readonly kind: 'caution'; readonly title: string; readonly text: string }
  | { readonly kind: 'step'; readonly step: CalcStep }
  | {
      readonly kind: 'table';
      readonly title: string;
      readonly header: readonly string[];
      readonly rows: readonly (readonly string[])[];
      /** Relative column widths; '*' shares what is left. */
      readonly widths?: readonly (number | '*' | 'auto')[];
      readonly note?: string;
    }
  | {
      readonly kind: 'figure';
      readonly title: string;
      readonly svg: string;
      readonly width_pt: number;
      readonly caption: string;
      /** A paragraph printed to the left of the figure (the figure then sits at the right margin). */
      readonly beside?: { readonly text: string; readonly emphasis?: boolean };
      /** Printed on one page with the block after it (a short table read with the figure). */
      readonly withNext?: boolean;
    }
  | { readonly kind: 'code'; readonly title: string; readonly text: string }
  | {
      readonly kind: 'signoff';
      /** date: the date written beside a name, '' for a blank to fill in by hand. */
      readonly rows: readonly { readonly role: string; readonly name: string; readonly date: string }[];
      readonly date: string;
      /** An issued revision: the seal box asks for the seal, the block says the package is issued. */
      readonly issued: boolean;
    }
  | { readonly kind: 'pagebreak' };

export interface DocSection {
  readonly id: string;
  /** Numbered in the contents ("3 Loads"). */
  readonly title: string;
  readonly blocks: readonly Block[];
  /** Printed after the numbered sections and lettered ("Appendix A"). Added for the input echo. */
  readonly appendix?: boolean;
  /** Front pages only: the letter their tables and figures are numbered by ("Table S.1"). */
  readonly label?: string;
  /** Front pages only: printed on from what precedes it (the cover) instead of on a new page. */
  readonly continuous?: boolean;
}

export interface DocumentMeta {
  readonly projectName: string;
  readonly structureId: string;
  readonly structureKind: string;
  readonly location: string;
  readonly owner: string;
  readonly revision: string;
  readonly revisionDate: string;
  /** 'DRAFT FOR REVIEW', or 'ISSUED FOR SUBMITTAL' for an issued revision. */
  readonly status: string;
  /** Every revision, oldest first, for the revision history. */
  readonly revisions: readonly Revision[];
  /** The engineer of record's mark when the newest revision is issued. */
  readonly issued: IssuedMark | null;
  readonly date: string; // ISO date printed on the package
  readonly inputHash: string;
  readonly inputFile: string;
  readonly toolVersion: string;
  /** 'P-delta' or 'first order': how the analysis was made, part of the package identity (footer). */
  readonly analysisOrder: string;
  /** The user's unit system: quantities in calculation steps print in it; it also picks the page size. */
  readonly units: UnitSystem;
  /** What the document is, printed above the structure id on the cover; default 'CALCULATION PACKAGE'. */
  readonly documentTitle?: string;
}

export interface DocumentModel {
  readonly meta: DocumentMeta;
  /** Blocks on the cover page below the title block (caution, sign-off). */
  readonly cover: readonly Block[];
  /** Unnumbered pages between the cover and the contents, read first (revision history, summary). */
  readonly front: readonly DocSection[];
  readonly sections: readonly DocSection[];
  /** A short document (a comparison, a batch index): its first section runs on below the contents
   * instead of starting a page, so the contents page is not near-empty. */
  readonly runOn?: boolean;
}
