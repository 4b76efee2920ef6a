// Public API of the input stage.
export { loadDesignFile, loadDesignText, inputHash, type LoadEnv } from './load.ts';
export { designJsonSchema } from './json-schema.ts';
export { starterInput, STRUCTURE_KINDS } from './starters.ts';
export { DEFAULTS, type DefaultDef } from './defaults.ts';
export { INPUT_FORMAT_VERSION } from './schema.ts';
