// The issue workflow of a submittal, through `polebook build`: a revision marked issued drops the
// draft marks, fills the sign-off with the engineer of record and licence, and records the input
// hash beside the input; building that revision again from a changed input is refused (exit 2)
// with a message that names the place and asks for a new revision, and nothing is overwritten.
// Workflow rules of our own (common practice for sealed submittals: a changed document gets a new
// revision); the inputs are invented.
import { describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { parseDocument } from 'yaml';
import { cli } from './run-cli.ts';
import { buildPackage } from '../../src/pipeline.ts';
import type { Block } from '../../src/report/document.ts';

const ROOT = join(import.meta.dirname, '../..');
const LUMINAIRE = readFileSync(join(ROOT, 'examples/luminaire-twin.yaml'), 'utf8');
const ISSUED = { engineer: 'S. Varga, CPEng', licence: 'RPEQ 99123', jurisdiction: 'Kestrel Bay (invented)' };

function withIssued(text: string, mutate?: (doc: ReturnType<typeof parseDocument>) => void): string {
  const doc = parseDocument(text);
  const revs = doc.getIn(['project', 'revisions']) as { items: unknown[] };
  doc.setIn(['project', 'revisions', revs.items.length - 1, 'issued'], doc.createNode(ISSUED));
  mutate?.(doc);
  return doc.toString();
}

const blockText = (b: Block): string =>
  b.kind === 'paragraph' ? b.text : b.kind === 'caution' ? `${b.title} ${b.text}` : b.kind === 'table' ? `${b.title} ${b.rows.flat().join(' ')}` : b.kind === 'signoff' ? b.rows.map((r) => `${r.name} ${r.date}`).join(' ') : '';

describe('issued revisions', () => {
  it('an issued revision drops the draft marks, fills the sign-off and records its input hash; the same input builds again, a changed one is refused', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-issued-'));
    try {
      const input = join(dir, 'pole.yaml');
      writeFileSync(input, withIssued(LUMINAIRE));
      const first = await cli(['build', 'pole.yaml', '--out', 'out'], { cwd: dir });
      expect([0, 1], first.stderr).toContain(first.code);
      const register = JSON.parse(readFileSync(join(dir, 'pole.issued.json'), 'utf8')) as { issued: { revision: string; inputHash: string; licence: string }[] };
      expect(register.issued).toHaveLength(1);
      expect(register.issued[0]!.revision).toBe('0');
      expect(register.issued[0]!.licence).toBe('RPEQ 99123');
      const pdf1 = readFileSync(join(dir, 'out', 'pole.pdf'));

      // The document model of the same input: no draft mark anywhere, the sign-off filled.
      const built = await buildPackage(input);
      expect(register.issued[0]!.inputHash).toBe(built.loaded.inputHash);
      expect(built.document.meta.status).toBe('ISSUED FOR SUBMITTAL');
      const all = [...built.document.cover, ...built.document.front.flatMap((s) => s.blocks), ...built.document.sections.flatMap((s) => s.blocks)];
      for (const b of all) expect(blockText(b)).not.toMatch(/\bdraft\b/i);
      const signoff = built.document.cover.find((b) => b.kind === 'signoff');
      expect(signoff && signoff.kind === 'signoff' && signoff.issued).toBe(true);
      const eor = signoff && signoff.kind === 'signoff' ? signoff.rows.find((r) => r.role === 'Engineer of record') : undefined;
      expect(eor?.name).toBe('S. Varga, CPEng, licence RPEQ 99123 (Kestrel Bay (invented))');
      expect(eor?.date).toBe('2026-03-02');

      // The same input again: allowed, the same bytes, the register unchanged.
      const again = await cli(['build', 'pole.yaml', '--out', 'out'], { cwd: dir });
      expect(again.code).toBe(first.code);
      expect(readFileSync(join(dir, 'out', 'pole.pdf')).equals(pdf1)).toBe(true);

      // A changed input under the same issued revision: refused at the issued mark, nothing replaced.
      const changed = withIssued(LUMINAIRE, (doc) => doc.setIn(['project', 'name'], 'Harbour Link Road median lighting, stage 2'));
      writeFileSync(input, changed);
      const refused = await cli(['build', 'pole.yaml', '--out', 'out'], { cwd: dir });
      expect(refused.code).toBe(2);
      const line = changed.split('\n').findIndex((l) => /^\s+issued:/.test(l)) + 1;
      expect(refused.stderr).toContain(`pole.yaml:${line}:`);
      expect(refused.stderr).toContain("revision '0' was issued from input");
      expect(refused.stderr).toContain('add a new revision to project.revisions');
      expect(readFileSync(join(dir, 'out', 'pole.pdf')).equals(pdf1)).toBe(true);

      // A new revision (a draft) builds, and its package says draft again.
      const next = parseDocument(changed);
      (next.getIn(['project', 'revisions']) as { add(v: unknown): void }).add(next.createNode({ id: '1', date: '2026-03-20', description: 'Project renamed' }));
      writeFileSync(input, next.toString());
      const draft = await cli(['build', 'pole.yaml', '--out', 'out'], { cwd: dir });
      expect([0, 1]).toContain(draft.code);
      expect((await buildPackage(input)).document.meta.status).toBe('DRAFT FOR REVIEW');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('an earlier issued revision stays in the history; a newer draft revision is a draft package', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'polebook-issued-'));
    try {
      const doc = parseDocument(withIssued(LUMINAIRE));
      (doc.getIn(['project', 'revisions']) as { add(v: unknown): void }).add(doc.createNode({ id: '1', date: '2026-03-20', description: 'later' }));
      writeFileSync(join(dir, 'pole.yaml'), doc.toString());
      const built = await buildPackage(join(dir, 'pole.yaml'));
      expect(built.document.meta.status).toBe('DRAFT FOR REVIEW');
      expect(built.issuedRegister).toBeNull();
      const history = built.document.front.find((s) => s.id === 'revisions')!.blocks.find((b) => b.kind === 'table');
      expect(history && history.kind === 'table' ? history.rows.map((r) => r[4]) : []).toEqual(['issued by S. Varga, CPEng', 'this package (draft)']);
      const r = await cli(['build', 'pole.yaml', '--out', 'out'], { cwd: dir });
      expect([0, 1]).toContain(r.code);
      expect(existsSync(join(dir, 'pole.issued.json'))).toBe(false);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
