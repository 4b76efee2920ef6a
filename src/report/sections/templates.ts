// Narrative text lives in templates/*.md, not in code. A template is plain text with
// {{name}} placeholders; after filling, it is read as blocks:
//   "# x"   the template's title (used by the caution box)
//   "## x"  a numbered sub-heading, "### x" an unnumbered one
//   "- x"   a bullet item (following lines indented by two spaces continue it)
//   other   paragraphs, separated by blank lines
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { packageRoot } from '../../package-root.ts';
import type { Block } from '../document.ts';

/** Replaces each {{name}}; a placeholder without a value is an error, so a typo cannot print. */
export function fillTemplate(text: string, vars: Readonly<Record<string, string>>): string {
  return text.replace(/\{\{\s*([A-Za-z][A-Za-z0-9_]*)\s*\}\}/g, (_m, name: string) => {
    const v = vars[name];
    if (v === undefined) throw new Error(`template placeholder {{${name}}} has no value`);
    return v;
  });
}

export function readTemplate(name: string): string {
  return readFileSync(join(packageRoot(), 'templates', `${name}.md`), 'utf8');
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

/** Reads, fills and parses templates/<name>.md. */
export function templateBlocks(name: string, vars: Readonly<Record<string, string>>): TemplateText {
  return parseTemplate(fillTemplate(readTemplate(name), vars));
}
