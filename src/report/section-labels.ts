// How sections are numbered in print: numbered sections 1, 2, 3 ... in order, then the
// appendices lettered A, B, ... Shared by the renderer and by builders that cite a section.
import type { DocSection } from './document.ts';

export interface LabelledSection {
  readonly section: DocSection;
  /** "2" or "A": the prefix of sub-heading, table and figure numbers. */
  readonly label: string;
  /** "Section 2" or "Appendix A". */
  readonly name: string;
}

export function labelSections(sections: readonly DocSection[]): LabelledSection[] {
  const main = sections.filter((s) => s.appendix !== true);
  const appendices = sections.filter((s) => s.appendix === true);
  return [
    ...main.map((section, i) => ({ section, label: String(i + 1), name: `Section ${i + 1}` })),
    ...appendices.map((section, i) => {
      const letter = String.fromCharCode(65 + i);
      return { section, label: letter, name: `Appendix ${letter}` };
    }),
  ];
}
