// Warnings go to stderr, one per line, in the same file:line:col form as errors.
import { formatDiagnostic } from '../../errors.ts';
import type { Diagnostic } from '../../errors.ts';
import type { CliIO } from '../io.ts';
import { painter } from '../io.ts';

export function printWarnings(warnings: readonly Diagnostic[], io: CliIO): void {
  const paint = painter(io);
  for (const w of warnings) io.stderr(`${paint.warn(formatDiagnostic(w))}\n`);
}
