// The verdict through the command: a modest design of our own passes with exit 0; the same
// design with a heavy weight at one arm tip is over-stressed at that arm's root and must exit 1,
// still writing the package and the JSON, and naming the arm root in the terminal summary.
// The over-stress is a statics fact: 5 kN at the tip of a 2.5 m arm is a root moment of about
// 12.5 kN·m before load factors, against φ Fy Z ≈ 0.9 × Fy × 29.6 cm³ ≈ 9 kN·m for the 90 × 4 mm
// tube (Z = (D³ − d³)/6, AISC 360-16 Eq. F8-1 for a compact round HSS, taking Fy = 345 MPa).
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { parseDocument } from 'yaml';
import { cli } from './run-cli.ts';

const ROOT = join(import.meta.dirname, '../..');
const MODEST = readFileSync(join(ROOT, 'examples/luminaire-twin.yaml'), 'utf8');

async function build(text: string) {
  const dir = mkdtempSync(join(tmpdir(), 'polebook-verdict-'));
  try {
    writeFileSync(join(dir, 'pole.yaml'), text);
    const r = await cli(['build', 'pole.yaml', '--out', 'out', '--json'], { cwd: dir, env: { SOURCE_DATE_EPOCH: '1767225600' } });
    const written = readdirSync(join(dir, 'out')).sort();
    const json = JSON.parse(readFileSync(join(dir, 'out', 'pole.results.json'), 'utf8')) as { checks: { records: { type: string; member: string; s_m: number | null; ratio: number; pass: boolean }[] } };
    return { ...r, written, json };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('verdict and exit code of polebook build', () => {
  it('a modest design passes: exit 0', async () => {
    const r = await build(MODEST);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/verdict: every check made passes/);
    expect(r.json.checks.records.every((x) => x.pass)).toBe(true);
  }, 60_000);

  it('a heavy weight at the tip of arm A1 fails at its root: exit 1, the package still written', async () => {
    const doc = parseDocument(MODEST);
    doc.setIn(['attachments', 'points', 0, 'weight'], 5000);
    const r = await build(doc.toString());
    expect(r.code).toBe(1);
    expect(r.written).toEqual(['pole.pdf', 'pole.results.json']);
    expect(r.stdout).toMatch(/Member strength[^\n]*arm A1 at 0 m[^\n]*FAILS/);
    // The worst member record is the root of A1 (the slim top of the pole, carrying the same
    // unbalanced moment, may fail as well).
    const members = r.json.checks.records.filter((x) => x.type === 'member-strength');
    const worst = members.reduce((a, b) => (b.ratio > a.ratio ? b : a));
    expect([worst.member, worst.s_m, worst.pass]).toEqual(['A1', 0, false]);
  }, 60_000);
});
