// Typed errors with stable exit codes (documented in README.md).

export const EXIT = {
  ok: 0,
  checkFails: 1,
  badInput: 2,
  unstable: 3,
  internal: 4,
} as const;

export type ExitCode = (typeof EXIT)[keyof typeof EXIT];

export class PolebookError extends Error {
  constructor(
    message: string,
    readonly exitCode: ExitCode,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** One problem in an input file, located by line and column (1-based). */
export interface Diagnostic {
  readonly file: string;
  readonly line: number;
  readonly col: number;
  /** Dotted key path in the input, e.g. "arms[0].length". */
  readonly path: string;
  readonly message: string;
  readonly severity: 'error' | 'warning';
}

export function formatDiagnostic(d: Diagnostic): string {
  const where = `${d.file}:${d.line}:${d.col}`;
  const tag = d.severity === 'warning' ? 'warning: ' : '';
  return `${where}: ${tag}${d.path === '' ? '' : `${d.path}: `}${d.message}`;
}

/** Bad input: every error found, reported at once. Exit code 2. */
export class InputError extends PolebookError {
  constructor(readonly diagnostics: readonly Diagnostic[]) {
    super(diagnostics.map(formatDiagnostic).join('\n'), EXIT.badInput);
  }
}

/** A file that cannot be used at all (missing, a folder, no permission, protected): there is no
 * line or column to name, so the message names the file and the reason only. Exit code 2. */
export class FileLevelError extends PolebookError {
  constructor(
    readonly file: string,
    message: string,
  ) {
    super(message, EXIT.badInput);
  }
}

/** The structure is a mechanism or loses stability under a combination. Exit code 3. */
export class UnstableStructureError extends PolebookError {
  constructor(
    message: string,
    readonly detail: {
      combination?: string;
      node?: number;
      dof?: string;
      /** Loss of stability: where the buckling mode moves most (member id, distance from its root). */
      place?: { readonly member: string; readonly s_m: number };
    } = {},
  ) {
    super(message, EXIT.unstable);
  }
}
