// The README's input reference, generated from the JSON Schema (itself generated from the
// zod schema), so the documentation cannot drift from what the program accepts.
import { designJsonSchema } from './json-schema.ts';

interface Node {
  type?: string | string[];
  enum?: unknown[];
  const?: unknown;
  description?: string;
  properties?: Record<string, Node>;
  required?: string[];
  items?: Node;
  anyOf?: Node[];
  oneOf?: Node[];
}

function typeText(n: Node): string {
  if (n.const !== undefined) return `\`${JSON.stringify(n.const)}\``;
  if (n.enum) return n.enum.map((v) => `\`${String(v)}\``).join(' \\| ');
  const alts = n.anyOf ?? n.oneOf;
  if (alts) return [...new Set(alts.map(typeText))].join(' or ');
  if (n.type === 'array') return `list of ${n.items ? typeText(n.items) : 'values'}`;
  if (n.properties) return 'mapping';
  if (Array.isArray(n.type)) return n.type.join(' or ');
  return n.type ?? 'value';
}

function rows(n: Node, path: string, required: boolean, out: string[][]): void {
  const alts = n.anyOf ?? n.oneOf;
  const objectAlts = alts?.filter((a) => a.properties);
  if (path !== '') {
    const shown = objectAlts && objectAlts.length > 0 ? 'mapping (one of the forms below)' : typeText(n);
    out.push([`\`${path}\``, required ? 'yes' : '', shown, (n.description ?? '').replace(/\|/g, '\\|').replace(/\n/g, ' ')]);
  }
  const children: [Node, string, string][] = [];
  if (n.properties) children.push([n, path, '']);
  if (n.type === 'array' && n.items?.properties) children.push([n.items, `${path}[]`, '']);
  for (const alt of objectAlts ?? []) children.push([alt, path, formName(alt)]);
  const seen = new Set<string>();
  for (const [obj, base, form] of children) {
    for (const [key, child] of Object.entries(obj.properties ?? {})) {
      const childPath = base === '' ? key : `${base}.${key}`;
      const inEvery = (objectAlts ?? []).every((a) => a.properties?.[key] !== undefined);
      if (seen.has(childPath)) continue;
      seen.add(childPath);
      const before = out.length;
      // The key that picks the form lists every form's value.
      const shown = form !== '' && child.const !== undefined ? { ...child, const: undefined, enum: (objectAlts ?? []).map((a) => a.properties?.[key]?.const) } : child;
      rows(shown, childPath, obj.required?.includes(key) ?? false, out);
      // A key of one form only (e.g. sides, for multisided tubes) says so.
      if (form !== '' && !inEvery) out[before]![1] = `${out[before]![1] === 'yes' ? 'yes, ' : ''}${form} only`;
    }
  }
}

/** The discriminating value of one form of a union, e.g. 'shape: multisided'. */
function formName(alt: Node): string {
  for (const [key, child] of Object.entries(alt.properties ?? {})) {
    if (child.const !== undefined) return `${key}: ${String(child.const)}`;
  }
  return 'this form';
}

export function inputReferenceMarkdown(): string {
  const out: string[][] = [];
  rows(designJsonSchema() as Node, '', true, out);
  const lines = [
    'Generated from the schema (`polebook schema` prints it as JSON Schema). A number alone takes the unit',
    "system's unit for that quantity; a string with a unit (\"28 ft\", \"3.5 psf\", \"8.5 m\") is converted. Every",
    'default is printed in the package with its source. `[]` marks a list item.',
    '',
    '| key | required | type | meaning, unit and default |',
    '|---|---|---|---|',
    ...out.map((r) => `| ${r.join(' | ')} |`),
  ];
  return lines.join('\n');
}
