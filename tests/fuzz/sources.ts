// The inputs the fuzz test mutates: every example and the US twin of the luminaire example.
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse, stringify } from 'yaml';
import type { Json, Mutation } from './mutate.ts';
import { applyMutation } from './mutate.ts';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

export interface FuzzSource {
  readonly name: string;
  readonly data: Json;
}

export const FUZZ_SOURCES: readonly FuzzSource[] = [
  ...readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml')).sort().map((f) => join(ROOT, 'examples', f)),
  join(ROOT, 'tests', 'fixtures', 'luminaire-twin-us.yaml'),
].map((file) => ({ name: file.split('/').pop()!, data: parse(readFileSync(file, 'utf8')) as Json }));

/** The mutated input as YAML text, with what was done to it. */
export function mutatedText(source: FuzzSource, mutations: readonly Mutation[]): { text: string; done: string[] } {
  const data = structuredClone(source.data);
  const done = mutations.map((m) => applyMutation(data, m));
  return { text: stringify(data), done };
}
