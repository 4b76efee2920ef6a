// What a command may touch of the outside world, so tests can run the CLI in-process.

export interface CliIO {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  readonly env: Readonly<Record<string, string | undefined>>;
  /** True when stderr is a terminal (colour is used only then, and never with NO_COLOR). */
  readonly isTTY: boolean;
  readonly cwd: string;
}

export interface Painter {
  readonly error: (s: string) => string;
  readonly warn: (s: string) => string;
  readonly good: (s: string) => string;
  readonly dim: (s: string) => string;
}

export function painter(io: CliIO): Painter {
  const on = io.isTTY && (io.env.NO_COLOR === undefined || io.env.NO_COLOR === '');
  const wrap = (code: number) => (s: string) => (on ? `\u001b[${code}m${s}\u001b[0m` : s);
  return { error: wrap(31), warn: wrap(33), good: wrap(32), dim: wrap(2) };
}
