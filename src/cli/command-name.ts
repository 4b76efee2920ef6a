// How to run polebook from where the user is, for the hints we print: `polebook` when that name
// on the PATH is this installation (npm link, npm install -g .), `npx polebook` inside the
// checkout, else node with the full path of the compiled command.
import { accessSync, constants, realpathSync } from 'node:fs';
import { delimiter, join, relative, isAbsolute } from 'node:path';
import { packageRoot } from '../package-root.ts';
import type { CliIO } from './io.ts';

function real(p: string): string | null {
  try {
    return realpathSync(p);
  } catch {
    return null;
  }
}

export function commandName(io: Pick<CliIO, 'env' | 'cwd'>): string {
  const root = packageRoot();
  const main = real(join(root, 'dist', 'src', 'cli', 'main.js'));
  for (const dir of (io.env.PATH ?? '').split(delimiter).filter((d) => d !== '')) {
    const candidate = join(dir, 'polebook');
    try {
      accessSync(candidate, constants.X_OK);
    } catch {
      continue;
    }
    if (main !== null && real(candidate) === main) return 'polebook';
  }
  const rel = relative(root, io.cwd);
  if (!rel.startsWith('..') && !isAbsolute(rel)) return 'npx polebook';
  return `node ${join(root, 'dist', 'src', 'cli', 'main.js')}`;
}
