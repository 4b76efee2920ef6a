// Narrative text lives in templates/*.md, not in code. A template is Handlebars text (a private
// instance, strict: a value the template names and the section does not give is an error naming
// the key and its line:column; no HTML escaping, since a PDF is not HTML). Helpers print numbers the
// one way the package prints them:
//   {{qty value "length"}}   an SI value in the package's units, with its unit (display.ts, formatQuantity)
//   {{num value}}            a plain number (formatNumber); {{num value 3}} with 3 significant digits
//   {{tol value}}            a tolerance or relative residual, written one way (formatTolerance)
//   {{pct ratio}}            a fraction as a percentage, "1.77 %"
// After filling, a template is read as blocks:
//   "# x"   the template's title (used by the caution box)
//   "## x"  a numbered sub-heading, "### x" an unnumbered one
//   "- x"   a bullet item (following lines indented by two spaces continue it)
//   other   paragraphs, separated by blank lines
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Handlebars from 'handlebars';
import { packageRoot } from '../../package-root.ts';
import { formatNumber, formatPercent, formatQuantity, formatTolerance, type Dim, type UnitSystem } from '../../units/units.ts';
import type { Block } from '../document.ts';
import { display } from './display.ts';

/** What a section may hand a template: text, numbers (SI for qty), flags for {{#if}}. */
export type TemplateValue = string | number | boolean;
export type TemplateVars = Readonly<Record<string, TemplateValue>>;

export interface TemplateOptions {
  /** The package's unit system, needed by {{qty}}. */
  readonly units?: UnitSystem;
}

const hb = Handlebars.create();

/** A helper's trailing argument is Handlebars' options object; the ones before it are the template's. */
type HelperOptions = Handlebars.HelperOptions & { loc?: { start: { line: number; column: number } } };
const where = (o: HelperOptions) => (o.loc ? ` - ${o.loc.start.line}:${o.loc.start.column}` : '');

function finite(helper: string, v: unknown, o: HelperOptions): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new Error(`{{${helper}}} needs a finite number, got ${String(v)}${where(o)}`);
  return v;
}

function digitsOf(args: unknown[]): number | undefined {
  return typeof args[0] === 'number' ? args[0] : undefined;
}

hb.registerHelper('qty', function (this: unknown, value: unknown, dim: unknown, ...rest: unknown[]) {
  const o = rest.pop() as HelperOptions;
  const units = (o.data as { units?: UnitSystem } | undefined)?.units;
  if (units === undefined) throw new Error(`{{qty}} needs the unit system: render the template with { units }${where(o)}`);
  if (typeof dim !== 'string') throw new Error(`{{qty}} needs a quantity kind such as "length"${where(o)}`);
  const digits = digitsOf(rest);
  // the package's own printing (a US density as a unit weight), or the digits asked for
  return digits === undefined ? display(units).q(finite('qty', value, o), dim as Dim) : formatQuantity(finite('qty', value, o), dim as Dim, units, digits);
});
hb.registerHelper('num', function (this: unknown, value: unknown, ...rest: unknown[]) {
  const o = rest.pop() as HelperOptions;
  return formatNumber(finite('num', value, o), digitsOf(rest));
});
hb.registerHelper('tol', function (this: unknown, value: unknown, ...rest: unknown[]) {
  const o = rest.pop() as HelperOptions;
  return formatTolerance(finite('tol', value, o));
});
hb.registerHelper('pct', function (this: unknown, value: unknown, ...rest: unknown[]) {
  const o = rest.pop() as HelperOptions;
  return formatPercent(finite('pct', value, o), digitsOf(rest));
});

const BLOCK_HELPERS_KEEPING_CONTEXT = new Set(['if', 'unless']);

interface Compiled {
  readonly render: Handlebars.TemplateDelegate;
  /** Top-level names the template reads, with where: strict mode checks plain {{name}}, this checks helper arguments too. */
  readonly names: readonly { readonly name: string; readonly at: string }[];
}

/** The top-level value names a template reads (helper names and names inside {{#each}}/{{#with}} left out). */
function namesOf(ast: hbs.AST.Program): { name: string; at: string }[] {
  const out: { name: string; at: string }[] = [];
  const helpers = new Set(Object.keys(hb.helpers));
  const path = (p: hbs.AST.Expression) => {
    if (p.type !== 'PathExpression') return;
    const e = p as hbs.AST.PathExpression;
    if (e.data || e.depth > 0 || e.parts.length === 0) return;
    out.push({ name: e.parts[0], at: `${e.loc.start.line}:${e.loc.start.column}` });
  };
  const call = (node: { path: hbs.AST.Expression; params: hbs.AST.Expression[] }) => {
    const callee = node.path as hbs.AST.PathExpression;
    const isHelper = callee.type === 'PathExpression' && (helpers.has(callee.original) || node.params.length > 0);
    if (!isHelper) path(node.path);
    for (const p of node.params) p.type === 'SubExpression' ? call(p as hbs.AST.SubExpression) : path(p);
  };
  const walk = (program: hbs.AST.Program | undefined) => {
    for (const s of program?.body ?? []) {
      if (s.type === 'MustacheStatement') call(s as hbs.AST.MustacheStatement);
      else if (s.type === 'BlockStatement') {
        const b = s as hbs.AST.BlockStatement;
        call(b);
        const keeps = b.path.type === 'PathExpression' && BLOCK_HELPERS_KEEPING_CONTEXT.has((b.path as hbs.AST.PathExpression).original);
        if (keeps) {
          walk(b.program);
          walk(b.inverse);
        }
      }
    }
  };
  walk(ast);
  return out;
}

/** Compiles Handlebars text (strict, no escaping); `name` only labels error messages. */
export function compileTemplate(text: string, name = 'template'): (vars: TemplateVars, options?: TemplateOptions) => string {
  let compiled: Compiled;
  try {
    const ast = hb.parse(text);
    compiled = { render: hb.compile(text, { strict: true, noEscape: true }), names: namesOf(ast) };
  } catch (err) {
    throw new Error(`${name}: ${(err as Error).message}`);
  }
  return (vars, options = {}) => {
    for (const n of compiled.names) {
      if (!Object.hasOwn(vars, n.name)) throw new Error(`${name}: "${n.name}" not defined - ${n.at}`);
    }
    try {
      return compiled.render(vars, { data: { units: options.units } });
    } catch (err) {
      throw new Error(`${name}: ${(err as Error).message.replace(' in [object Object]', '')}`);
    }
  };
}

export function readTemplate(name: string): string {
  return readFileSync(join(packageRoot(), 'templates', `${name}.md`), 'utf8');
}

// Each template is read and compiled once per process.
const cache = new Map<string, ReturnType<typeof compileTemplate>>();
const rendered = new Set<string>();

/** Renders templates/<name>.md with the section's values. */
export function renderTemplate(name: string, vars: TemplateVars, options: TemplateOptions = {}): string {
  let t = cache.get(name);
  if (t === undefined) {
    t = compileTemplate(readTemplate(name), `templates/${name}.md`);
    cache.set(name, t);
  }
  rendered.add(name);
  return t(vars, options);
}

/** The templates rendered so far in this process (a test checks that none in templates/ is left unused). */
export function renderedTemplates(): ReadonlySet<string> {
  return rendered;
}

export interface TemplateText {
  readonly title: string | null;
  readonly blocks: readonly Block[];
}

/** Reads filled template text as blocks (see the rules at the top of this file). */
export function parseTemplate(text: string): TemplateText {
  let title: string | null = null;
  const blocks: Block[] = [];
  let paragraph: string[] = [];
  let bullets: string[] = [];
  const flush = () => {
    if (paragraph.length > 0) blocks.push({ kind: 'paragraph', text: paragraph.join(' ') });
    if (bullets.length > 0) blocks.push({ kind: 'bullets', items: bullets });
    paragraph = [];
    bullets = [];
  };
  for (const raw of text.replace(/\r\n?/g, '\n').split('\n')) {
    const line = raw.trimEnd();
    if (line.trim() === '') {
      flush();
    } else if (line.startsWith('### ')) {
      flush();
      blocks.push({ kind: 'heading', level: 3, text: line.slice(4).trim() });
    } else if (line.startsWith('## ')) {
      flush();
      blocks.push({ kind: 'heading', level: 2, text: line.slice(3).trim() });
    } else if (line.startsWith('# ')) {
      flush();
      title = line.slice(2).trim();
    } else if (line.startsWith('- ')) {
      if (paragraph.length > 0) flush();
      bullets.push(line.slice(2).trim());
    } else if (bullets.length > 0 && line.startsWith('  ')) {
      bullets[bullets.length - 1] += ` ${line.trim()}`;
    } else {
      if (bullets.length > 0) flush();
      paragraph.push(line.trim());
    }
  }
  flush();
  return { title, blocks };
}

/** Renders and parses templates/<name>.md. */
export function templateBlocks(name: string, vars: TemplateVars, options: TemplateOptions = {}): TemplateText {
  return parseTemplate(renderTemplate(name, vars, options));
}
