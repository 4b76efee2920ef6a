// A small argument reader: positionals, --flag and --key value. Unknown options are errors.

export interface ParsedArgs {
  readonly positionals: readonly string[];
  readonly flags: ReadonlySet<string>;
  readonly values: ReadonlyMap<string, string>;
  /** Every value of the repeatable options, in order. */
  readonly lists: ReadonlyMap<string, readonly string[]>;
}

export interface ArgSpec {
  /** Options that take no value, without the dashes. */
  readonly flags: readonly string[];
  /** Options that take one value. */
  readonly values: readonly string[];
  /** Options that take one value and may be given again (--vary a=1 --vary b=2). */
  readonly repeatable?: readonly string[];
}

export class UsageError extends Error {}

export function parseArgs(argv: readonly string[], spec: ArgSpec): ParsedArgs {
  const positionals: string[] = [];
  const flags = new Set<string>();
  const values = new Map<string, string>();
  const lists = new Map<string, string[]>();
  for (let k = 0; k < argv.length; k++) {
    const arg = argv[k]!;
    if (!arg.startsWith('-') || arg === '-') {
      positionals.push(arg);
      continue;
    }
    const [name, inline] = arg.replace(/^--?/, '').split(/=(.*)/s, 2) as [string, string | undefined];
    if (name === 'h') {
      flags.add('help');
    } else if (spec.flags.includes(name)) {
      if (inline !== undefined) throw new UsageError(`option --${name} takes no value`);
      flags.add(name);
    } else if (spec.repeatable?.includes(name)) {
      const value = inline ?? argv[++k];
      if (value === undefined) throw new UsageError(`option --${name} needs a value`);
      lists.set(name, [...(lists.get(name) ?? []), value]);
    } else if (spec.values.includes(name)) {
      const value = inline ?? argv[++k];
      if (value === undefined) throw new UsageError(`option --${name} needs a value`);
      if (values.has(name)) throw new UsageError(`option --${name} is given twice`);
      values.set(name, value);
    } else {
      throw new UsageError(`unknown option ${arg}`);
    }
  }
  return { positionals, flags, values, lists };
}
