// Commented starter input files, one per structure kind, for `polebook new <kind>`.
// They live as files under templates/starters/ and are read at run time.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { packageRoot } from '../package-root.ts';
import type { StructureKind } from '../design/design.ts';
import { STRUCTURE_KIND_VALUES } from './schema.ts';

export const STRUCTURE_KINDS: readonly StructureKind[] = STRUCTURE_KIND_VALUES;

export function starterPath(kind: StructureKind): string {
  return join(packageRoot(), 'templates', 'starters', `${kind}.yaml`);
}

export function starterInput(kind: StructureKind): string {
  if (!STRUCTURE_KINDS.includes(kind)) throw new Error(`unknown structure kind '${kind}'; expected ${STRUCTURE_KINDS.join(', ')}`);
  return readFileSync(starterPath(kind), 'utf8');
}
