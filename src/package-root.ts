// The folder holding polebook's package.json and templates/, found by walking up from this
// module: the same code runs from src/ (tests) and from dist/src/ (the compiled CLI); templates/
// is checked too because a build may copy package.json into dist/.
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

let cached: string | undefined;

export function packageRoot(): string {
  if (cached) return cached;
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!(existsSync(join(dir, 'package.json')) && existsSync(join(dir, 'templates')))) {
    const up = dirname(dir);
    if (up === dir) throw new Error('polebook package.json not found above ' + fileURLToPath(import.meta.url));
    dir = up;
  }
  cached = dir;
  return dir;
}
