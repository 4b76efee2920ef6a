// The meta block printed on the cover and in every footer, taken from the loaded design.
import { basename } from 'node:path';
import type { LoadedDesign } from '../../design/design.ts';
import { toolVersion } from '../../version.ts';
import type { DocumentMeta } from '../document.ts';
import { KIND_LABEL } from './display.ts';

export const PACKAGE_STATUS = 'DRAFT FOR REVIEW';
export const ISSUED_STATUS = 'ISSUED FOR SUBMITTAL';

export function documentMeta(loaded: LoadedDesign, secondOrder: boolean): DocumentMeta {
  const { project, kind, units } = loaded.design;
  // The latest revision is the last one listed.
  const latest = project.revisions.at(-1);
  return {
    projectName: project.name,
    structureId: project.structureId,
    structureKind: KIND_LABEL[kind],
    location: project.location,
    owner: project.owner,
    revision: latest?.id ?? 'none given',
    revisionDate: latest?.date ?? 'none given',
    status: latest?.issued ? ISSUED_STATUS : PACKAGE_STATUS,
    revisions: project.revisions,
    issued: latest?.issued ?? null,
    date: project.date,
    inputHash: loaded.inputHash,
    // The file name only: the folder it was read from must not change the package bytes.
    inputFile: basename(loaded.file),
    toolVersion: toolVersion(),
    analysisOrder: secondOrder ? 'P-delta' : 'first order',
    units,
  };
}
