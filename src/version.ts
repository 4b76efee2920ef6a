// The tool version printed on every package, read from package.json.
import { readFileSync } from 'node:fs';
import { packageRoot } from './package-root.ts';
import { join } from 'node:path';

let cached: string | undefined;

export function toolVersion(): string {
  cached ??= (JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')) as { version: string }).version;
  return cached;
}
