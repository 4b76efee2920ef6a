// Progress of a long run on stderr: a bar redrawn in place on a terminal, plain lines otherwise
// (a CI log), nothing with --quiet.
import type { CliIO } from './io.ts';

export interface Progress {
  readonly step: (done: number, total: number, what: string) => void;
  readonly end: () => void;
}

const BAR = 28;

export function progressFor(io: CliIO, quiet: boolean, noun: string): Progress {
  if (quiet) return { step: () => {}, end: () => {} };
  if (!io.isTTY) return { step: (done, total, what) => io.stderr(`${noun} ${done}/${total}: ${what}\n`), end: () => {} };
  let drawn = false;
  return {
    step: (done, total) => {
      const full = Math.round((BAR * done) / Math.max(total, 1));
      io.stderr(`\r[${'#'.repeat(full)}${'.'.repeat(BAR - full)}] ${done}/${total} ${noun}`);
      drawn = true;
    },
    end: () => {
      if (drawn) io.stderr('\n');
    },
  };
}
