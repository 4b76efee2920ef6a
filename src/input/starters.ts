// Commented starter input files, one per structure kind, for `polebook new <kind>`.
// They live as files under templates/starters/ and are read at run time.
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { StructureKind } from '../design/design.ts';
import { STRUCTURE_KIND_VALUES } from './schema.ts';

export const STRUCTURE_KINDS: readonly StructureKind[] = STRUCTURE_KIND_VALUES;

/** The folder holding package.json and templates/: from src/input or from the compiled
 * dist/src/input (a build may copy package.json into dist/, so templates/ is checked too). */
export function packageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    if (existsSync(join(dir, 'package.json')) && existsSync(join(dir, 'templates'))) return dir;
    const up = dirname(dir);
    if (up === dir) throw new Error('polebook: cannot find package.json above the input module');
    dir = up;
  }
}

export function starterPath(kind: StructureKind): string {
  return join(packageRoot(), 'templates', 'starters', `${kind}.yaml`);
}

export function starterInput(kind: StructureKind): string {
  if (!STRUCTURE_KINDS.includes(kind)) throw new Error(`unknown structure kind '${kind}'; expected ${STRUCTURE_KINDS.join(', ')}`);
  return readFileSync(starterPath(kind), 'utf8');
}
