// Section "Scope and cautions": what the package covers and what it does not (text in templates/scope.md).
import type { LoadedDesign } from '../../design/design.ts';
import type { DocSection } from '../document.ts';
import { KIND_LABEL } from './display.ts';
import { templateBlocks } from './templates.ts';
import { labelSections } from '../section-labels.ts';
import { INPUT_ECHO_ID } from './input-echo-section.ts';

export const SCOPE_TITLE = 'Scope and cautions';

/** `contents` is every section of the package in print order, this one included. */
export function scopeSection(loaded: LoadedDesign, contents: readonly DocSection[]): DocSection {
  const { design } = loaded;
  const p = design.project;
  const labelled = labelSections(contents);
  const sectionList = labelled.map((l) => `- ${l.name}: ${l.section.title}`).join('\n');
  const echo = labelled.find((l) => l.section.id === INPUT_ECHO_ID);
  const t = templateBlocks('scope', {
    structureId: p.structureId,
    structureKind: KIND_LABEL[design.kind].toLowerCase(),
    projectName: p.name,
    location: p.location,
    unitSystem: design.units === 'us' ? 'US customary' : 'SI',
    echoAppendix: echo ? echo.name : 'the input file',
    sectionList,
    assumptionsTable: '"Assumptions and defaults" of section "Design criteria and assumptions"',
    revision: loaded.design.project.revisions.at(-1)?.id ?? 'none given',
    inputHash: loaded.inputHash,
  });
  return { id: 'scope', title: SCOPE_TITLE, blocks: t.blocks };
}
