// Batch builds: one package per input and an index; a broken and an unstable input among good
// ones are rows of the index and do not stop the others; the exit code is the worst of the runs;
// shards cover the sorted list exactly once and their merged index equals the unsharded one.
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { cli } from '../cli/run-cli.ts';
import { shardOf, parseShard } from '../../src/batch/inputs.ts';

const ROOT = join(import.meta.dirname, '../..');
const ENV = { SOURCE_DATE_EPOCH: '1767225600' };
const dir = mkdtempSync(join(tmpdir(), 'polebook-batch-'));
const inputs = join(dir, 'inputs');
afterAll(() => rmSync(dir, { recursive: true, force: true }));

beforeAll(() => {
  mkdirSync(inputs);
  const lum = readFileSync(join(ROOT, 'examples/luminaire-twin.yaml'), 'utf8');
  writeFileSync(join(inputs, 'a-luminaire.yaml'), lum);
  const other = parseDocument(lum);
  other.setIn(['project', 'structureId'], 'KB-LP-113');
  other.setIn(['structure', 'arms', 0, 'length'], 3.5); // its tip luminaire now 1 m short of the tip
  writeFileSync(join(inputs, 'c-luminaire-long-arm.yaml'), other.toString());
  writeFileSync(join(inputs, 'b-broken.yaml'), 'formatVersion: 1\nunits: us\nproject: { name: x\n');
  const soft = parseDocument(readFileSync(join(ROOT, 'examples/signal-support.yaml'), 'utf8'));
  soft.setIn(['structure', 'material', 'E'], '200 ksi'); // buckles under the factored loads
  writeFileSync(join(inputs, 'd-unstable.yaml'), soft.toString());
  writeFileSync(join(inputs, 'notes.txt'), 'not an input');
});

const csvRows = (out: string) => readFileSync(join(out, 'index.csv'), 'utf8').trim().split('\n').slice(1);

describe('polebook build <folder>', () => {
  let run: Awaited<ReturnType<typeof cli>>;
  const out = join(dir, 'all');
  beforeAll(async () => {
    run = await cli(['build', 'inputs', '--out', out], { cwd: dir, env: ENV });
  }, 120_000);

  it('exits with the worst code of the runs: 3, unstable', () => {
    expect(run.code).toBe(3);
  });
  it('writes a package for each good input and the index, nothing for the bad ones', () => {
    expect(readdirSync(out).sort()).toEqual(['a-luminaire.pdf', 'c-luminaire-long-arm.pdf', 'index.csv', 'index.json', 'index.pdf']);
  });
  it('lists every input with its verdict, in file order, with the reason for the bad ones', () => {
    const rows = csvRows(out);
    expect(rows).toHaveLength(4);
    expect(rows[0]).toMatch(/^inputs\/a-luminaire\.yaml,KB-LP-112,passes,0\.6371,Base plate bending,f44198d1bce9,a-luminaire\.pdf,0,$/);
    expect(rows[1]).toMatch(/^inputs\/b-broken\.yaml,,BAD INPUT,,,[0-9a-f]{12},,2,inputs\/b-broken\.yaml:4:1: /);
    expect(rows[2]).toMatch(/^inputs\/c-luminaire-long-arm\.yaml,KB-LP-113,(passes|FAILS),[\d.]+,/);
    expect(rows[3]).toMatch(/^inputs\/d-unstable\.yaml,,UNSTABLE,,,[0-9a-f]{12},,3,"combination \S+: loss of stability/);
    // The input hash of the good input is the one its own package prints.
    expect(readFileSync(join(out, 'index.csv'), 'utf8')).not.toContain(dir); // no absolute paths
  });
  it('prints one line per input on stdout and progress lines on stderr (not a terminal)', () => {
    expect(run.stdout.trim().split('\n')).toHaveLength(4);
    expect(run.stdout).toMatch(/^inputs\/b-broken\.yaml: BAD INPUT: /m);
    expect(run.stderr).toMatch(/^inputs 4\/4: /m);
    expect(run.stderr).toContain(`wrote ${join(out, 'index.pdf')}`);
  });
});

describe('shards', () => {
  it('K/N parts of a list cover it exactly once, for N = 1 to 7', () => {
    const list = Array.from({ length: 23 }, (_, i) => `input-${String(i).padStart(2, '0')}.yaml`);
    for (let n = 1; n <= 7; n++) {
      const parts = Array.from({ length: n }, (_, k) => shardOf(list, { k: k + 1, n }));
      expect(parts.flat().sort()).toEqual(list);
      expect(new Set(parts.flat()).size).toBe(list.length);
      // Balanced: sizes differ by at most one.
      const sizes = parts.map((p) => p.length);
      expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
    }
  });
  it('refuses a shard that is not K/N with 1 <= K <= N', () => {
    for (const bad of ['0/3', '4/3', '1/0', 'a/b', '1-3']) expect(() => parseShard(bad)).toThrow(/expected K\/N/);
  });

  it('merged shard indexes equal the unsharded index, byte for byte (CSV, JSON and PDF)', async () => {
    const whole = join(dir, 'whole');
    const w = await cli(['build', 'inputs', '--out', whole, '--quiet'], { cwd: dir, env: ENV });
    expect(w.stderr).toBe(''); // --quiet: nothing on stderr
    const codes: number[] = [];
    for (const k of [1, 2, 3]) codes.push((await cli(['build', 'inputs', '--shard', `${k}/3`, '--out', join(dir, `shard-${k}`), '--quiet'], { cwd: dir, env: ENV })).code);
    // Sorted list: a, b, c, d -> shard 1: a, d; shard 2: b; shard 3: c.
    expect(csvRows(join(dir, 'shard-1')).map((r) => r.split(',')[0])).toEqual(['inputs/a-luminaire.yaml', 'inputs/d-unstable.yaml']);
    expect(codes.slice(0, 2)).toEqual([3, 2]); // shard 1 holds the unstable input, shard 2 the broken one
    expect(Math.max(...codes)).toBe(w.code);
    const merged = join(dir, 'merged');
    const m = await cli(['index', 'shard-1', 'shard-2', 'shard-3', '--out', merged, '--quiet'], { cwd: dir, env: ENV });
    expect(m.code).toBe(3);
    for (const f of ['index.csv', 'index.json', 'index.pdf']) expect(readFileSync(join(merged, f)).equals(readFileSync(join(whole, f)))).toBe(true);
  }, 180_000);

  it('merging overlapping shards is refused', async () => {
    const r = await cli(['index', 'whole', 'shard-1', '--out', join(dir, 'overlap')], { cwd: dir, env: ENV });
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/inputs\/a-luminaire\.yaml is listed in the index of .* and of .*: the shards overlap/);
    expect(existsSync(join(dir, 'overlap'))).toBe(false);
  });
});

describe('batch inputs', () => {
  it('two inputs with the same name would overwrite each other: refused before building', async () => {
    mkdirSync(join(dir, 'twin'), { recursive: true });
    writeFileSync(join(dir, 'twin', 'a-luminaire.yaml'), readFileSync(join(inputs, 'a-luminaire.yaml')));
    const r = await cli(['build', 'inputs/a-luminaire.yaml', 'twin/a-luminaire.yaml', '--out', join(dir, 'twin-out')], { cwd: dir, env: ENV });
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/would both write a-luminaire\.pdf/);
  });
  it('a missing input is a row of the index, not a crash', async () => {
    const out = join(dir, 'missing-out');
    const r = await cli(['build', 'inputs/a-luminaire.yaml', 'inputs/nope.yaml', '--out', out, '--quiet'], { cwd: dir, env: ENV });
    expect(r.code).toBe(2);
    const rows = csvRows(out);
    expect(rows[1]).toMatch(/^inputs\/nope\.yaml,,BAD INPUT,,,,,2,cannot read the input file inputs\/nope\.yaml: there is no such file$/);
  }, 60_000);
});

describe('worker threads (compiled command)', () => {
  // Under the TypeScript sources a batch runs in one thread; the compiled command can use two.
  const BIN = join(ROOT, 'dist/src/cli/main.js');
  it('two worker threads write the same packages and index as one', () => {
    const run = (workers: string) =>
      spawnSync(process.execPath, [BIN, 'build', 'inputs', '--out', `w${workers}`, '--workers', workers, '--quiet'], { cwd: dir, encoding: 'utf8', env: { ...process.env, ...ENV, NO_COLOR: '1' } });
    const one = run('1');
    const two = run('2');
    expect(two.status).toBe(3);
    expect(one.status).toBe(3);
    expect(two.stdout).toBe(one.stdout);
    const files = readdirSync(join(dir, 'w1')).sort();
    expect(readdirSync(join(dir, 'w2')).sort()).toEqual(files);
    for (const f of files) expect(readFileSync(join(dir, 'w2', f)).equals(readFileSync(join(dir, 'w1', f)))).toBe(true);
  }, 180_000);
});
