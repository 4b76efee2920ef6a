// The document model to PDF bytes with pdfmake. Layout only: no engineering here.
import pdfmake from 'pdfmake';
import type { Content, TDocumentDefinitions } from 'pdfmake/interfaces.js';
import type { DocumentModel } from '../document.ts';
import { labelSections } from '../section-labels.ts';
import { blockContent, blocksContent, KEEP_WITH_NEXT_LEVEL, newCounter } from './blocks.ts';
import { titleBlock } from './cover.ts';
import { fontDictionary, isAllowedLocalFile } from './fonts.ts';
import { joinWordsAfterLayout } from './join-inlines.ts';
import { breakTooWideWordsAtNoBreakSpaces } from './whole-words.ts';
import { footerFor, headerFor } from './page-frame.ts';
import { packageDate } from './package-date.ts';
import { sizeSvgByRootTag } from './svg-size.ts';
import { DEFAULT_STYLE, PAGE_MARGINS, pageSizeFor, STYLES } from './theme.ts';

/** A heading marked keep-with-next moves to the next page when less than about a quarter page is
 * left. pdfmake lays the whole document out again after each break this asks for, so it is kept
 * for these rare cases: a section start is a fixed page break (asking here for every section cost
 * about 12 s on a 110-page package). */
function pageBreakBefore(node: { headlineLevel?: number; startPosition?: { verticalRatio?: number } }): boolean {
  return node.headlineLevel === KEEP_WITH_NEXT_LEVEL && (node.startPosition?.verticalRatio ?? 0) > 0.75;
}

export function documentDefinition(doc: DocumentModel): TDocumentDefinitions {
  const { meta } = doc;
  const date = packageDate(meta.date);
  const coverCounter = newCounter('', meta.units);
  const content: Content[] = [
    ...titleBlock(meta),
    ...doc.cover.map((b) => blockContent(b, coverCounter)),
  ];
  // Front pages: unnumbered, each on its own page, in the outline and the contents.
  for (const section of doc.front) {
    const counter = newCounter(section.label ?? section.id.charAt(0).toUpperCase(), meta.units, `section-${section.id}`);
    const continuous = section.continuous === true;
    const heading = { text: section.title, style: continuous ? 'h3' : 'h1', tocItem: true, tocStyle: { bold: true }, id: `section-${section.id}`, outline: true, ...(continuous ? { margin: [0, 8, 0, 3] } : { pageBreak: 'before' }) } as Content;
    // A section that runs on from the cover moves to the next page whole rather than split there.
    if (continuous) content.push({ stack: [heading, ...blocksContent(section.blocks, counter)], unbreakable: true } as Content);
    else content.push(heading, ...blocksContent(section.blocks, counter));
  }
  content.push({ text: 'Contents', style: 'h1', pageBreak: 'before', id: 'contents', outline: true } as Content);
  content.push({ toc: { textStyle: { fontSize: 9.5 }, numberStyle: { fontSize: 9.5 } } } as Content);
  // In a short document the first section runs on below the contents (no near-empty contents page).
  // The rest start a page: a heading that only moved on when little of a page is left would cost a
  // second layout of the whole document (pdfmake's pageBreakBefore).
  labelSections(doc.sections).forEach(({ section, label, name }, k) => {
    const heading = section.appendix === true ? `${name}  ${section.title}` : `${label}  ${section.title}`;
    const start = doc.runOn === true && k === 0 ? { margin: [0, 14, 0, 10] } : { pageBreak: 'before' };
    content.push({ text: heading, style: 'h1', tocItem: true, tocStyle: { bold: true }, ...start, id: `section-${section.id}`, outline: true } as Content);
    content.push(...blocksContent(section.blocks, newCounter(label, meta.units, `section-${section.id}`)));
  });
  return {
    pageSize: pageSizeFor(meta.units),
    pageMargins: PAGE_MARGINS,
    info: {
      title: `${meta.documentTitle === undefined ? 'Calculation package' : meta.documentTitle.charAt(0) + meta.documentTitle.slice(1).toLowerCase()} ${meta.structureId}, revision ${meta.revision}`,
      author: meta.owner,
      subject: `${meta.projectName}; input ${meta.inputFile}; input SHA-256 ${meta.inputHash}`,
      keywords: `input-hash ${meta.inputHash}; structure ${meta.structureId}; revision ${meta.revision}; analysis ${meta.analysisOrder}`,
      creator: `polebook ${meta.toolVersion}`,
      producer: `polebook ${meta.toolVersion} with pdfmake`,
      creationDate: date,
      modDate: date,
    },
    defaultStyle: DEFAULT_STYLE,
    styles: STYLES as unknown as TDocumentDefinitions['styles'],
    header: headerFor(meta),
    footer: footerFor(meta),
    pageBreakBefore: pageBreakBefore as TDocumentDefinitions['pageBreakBefore'],
    content,
  } as TDocumentDefinitions;
}

/** Renders the package. The same model gives the same bytes (no clock, no time zone). */
export async function renderPdf(doc: DocumentModel): Promise<Buffer> {
  // No network, and no local files but our fonts: a document model cannot pull anything in.
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy(isAllowedLocalFile);
  pdfmake.setFonts(fontDictionary());
  sizeSvgByRootTag();
  joinWordsAfterLayout();
  breakTooWideWordsAtNoBreakSpaces();
  return pdfmake.createPdf(documentDefinition(doc)).getBuffer();
}
