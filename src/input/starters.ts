// Commented starter input files, one per structure kind, for `polebook new <kind>`.
// They live as files under templates/starters/ and are read at run time.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { packageRoot } from '../package-root.ts';
import type { StructureKind } from '../design/design.ts';
import type { UnitSystem } from '../units/units.ts';
import { STRUCTURE_KIND_VALUES } from './schema.ts';

export const STRUCTURE_KINDS: readonly StructureKind[] = STRUCTURE_KIND_VALUES;

/** US starters under templates/starters/, SI starters (round SI values) under templates/starters/si/. */
export function starterPath(kind: StructureKind, units: UnitSystem = 'us'): string {
  return join(packageRoot(), 'templates', 'starters', ...(units === 'si' ? ['si'] : []), `${kind}.yaml`);
}

export function starterInput(kind: StructureKind, units: UnitSystem = 'us'): string {
  if (!STRUCTURE_KINDS.includes(kind)) throw new Error(`unknown structure kind '${kind}'; expected ${STRUCTURE_KINDS.join(', ')}`);
  return readFileSync(starterPath(kind, units), 'utf8');
}
