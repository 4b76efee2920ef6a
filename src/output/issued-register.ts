// The record of issued revisions, kept beside the input file as <input name>.issued.json: for
// each revision marked issued, the input hash it was issued from. Building an issued revision
// again from a changed input is refused, so a submitted package can never silently change
// under the same revision id; a change needs a new revision.
import { existsSync, readFileSync } from 'node:fs';
import { basename, dirname, extname, join } from 'node:path';
import type { LoadedDesign } from '../design/design.ts';
import { FileLevelError, InputError } from '../errors.ts';
import { diagnosticAt } from '../input/diagnostic-at.ts';

export interface IssuedEntry {
  readonly revision: string;
  readonly date: string;
  readonly inputHash: string;
  readonly engineer: string;
  readonly licence: string;
  readonly jurisdiction: string;
}

interface Register {
  readonly format: 'polebook issued revisions';
  readonly structureId: string;
  readonly issued: readonly IssuedEntry[];
}

export interface RegisterUpdate {
  readonly path: string;
  /** The register's new text; null when it already records this revision with this input. */
  readonly text: string | null;
  readonly entry: IssuedEntry;
}

export function registerPath(inputFile: string): string {
  return join(dirname(inputFile), `${basename(inputFile, extname(inputFile))}.issued.json`);
}

function readRegister(path: string): Register | null {
  if (!existsSync(path)) return null;
  let data: unknown;
  try {
    data = JSON.parse(readFileSync(path, 'utf8'));
  } catch (err) {
    throw new FileLevelError(path, `cannot read the record of issued revisions ${path}: ${(err as Error).message}; restore it from version control (it records which input each issued revision came from)`);
  }
  const r = data as Partial<Register>;
  if (r.format !== 'polebook issued revisions' || !Array.isArray(r.issued)) {
    throw new FileLevelError(path, `${path} is not a record of issued revisions written by polebook; restore it from version control or move it away`);
  }
  return r as Register;
}

/**
 * For a package whose newest revision is marked issued: refuses (InputError, exit 2) when that
 * revision was issued before from another input, else returns the register to write with the
 * package. Null when the newest revision is not issued.
 */
export function issuedRegisterUpdate(loaded: LoadedDesign): RegisterUpdate | null {
  const revisions = loaded.design.project.revisions;
  const latest = revisions.at(-1);
  if (!latest?.issued) return null;
  const path = registerPath(loaded.file);
  const register = readRegister(path);
  const entry: IssuedEntry = {
    revision: latest.id,
    date: latest.date,
    inputHash: loaded.inputHash,
    engineer: latest.issued.engineer,
    licence: latest.issued.licence,
    jurisdiction: latest.issued.jurisdiction,
  };
  const earlier = register?.issued.find((e) => e.revision === latest.id);
  if (earlier) {
    if (earlier.inputHash === loaded.inputHash) return { path, text: null, entry };
    throw new InputError([
      diagnosticAt(
        loaded,
        ['project', 'revisions', revisions.length - 1, 'issued'],
        `revision '${latest.id}' was issued from input ${earlier.inputHash} (recorded in ${basename(path)}), and this input differs (${loaded.inputHash}); ` +
          'an issued revision is never rebuilt from a changed input: add a new revision to project.revisions ' +
          `(for example - { id: <next id>, date: yyyy-mm-dd, description: what changed }) and build again`,
      ),
    ]);
  }
  const next: Register = {
    format: 'polebook issued revisions',
    structureId: loaded.design.project.structureId,
    issued: [...(register?.issued ?? []), entry],
  };
  return { path, text: `${JSON.stringify(next, null, 2)}\n`, entry };
}
