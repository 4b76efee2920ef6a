// Input mistakes found by the mutated-input fuzz test (tests/fuzz/mutated-inputs.test.ts): each must
// be an InputError located at the key, never a crash further down the chain.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.ts';
import { loadDesignText } from '../../src/input/index.ts';

const SIGN = readFileSync('examples/cantilever-sign.yaml', 'utf8');
const TWIN = readFileSync('examples/luminaire-twin.yaml', 'utf8');

function swap(text: string, from: string, to: string): string {
  expect(text).toContain(from);
  return text.replace(from, to);
}

function firstError(text: string) {
  try {
    loadDesignText(text, 'x.yaml', {});
  } catch (e) {
    if (e instanceof InputError) return e.diagnostics.find((d) => d.severity === 'error')!;
    throw e;
  }
  throw new Error('loaded without error');
}

/** 1-based line and column of the first occurrence of `mark` (worked out from the text). */
function where(text: string, mark: string): { line: number; col: number } {
  const i = text.indexOf(mark);
  const before = text.slice(0, i).split('\n');
  return { line: before.length, col: before.at(-1)!.length + 1 };
}

describe('values that read as numbers but are not finite', () => {
  it('a quantity string that overflows ("1e999 in") is refused at its key', () => {
    const text = swap(TWIN, 'rootDiameter: 90, tipDiameter: 60', 'rootDiameter: "1e999", tipDiameter: 60');
    const d = firstError(text);
    expect(d.path).toBe('structure.arms[0].section.rootDiameter');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '"1e999"'));
    expect(d.message).toContain('too large');
  });

  it('an overflowing offset is refused too (it reached the loads as a NaN direction)', () => {
    const text = swap(SIGN, 'offset: { lateral: "-10 in", vertical: "-6 in" }', 'offset: { lateral: "-10 in", vertical: "1e999 ft" }');
    const d = firstError(text);
    expect(d.path).toBe('attachments.panels[0].offset.vertical');
    expect(d.message).toContain('too large');
  });
});

describe('values beyond any pole-and-arm support are refused at their key', () => {
  it('an offset of 1e300 ft (it gave infinite moments) names the key and the limit', () => {
    const text = swap(SIGN, 'offset: { lateral: "-10 in", vertical: "-6 in" }', 'offset: { lateral: 1e300, vertical: "-6 in" }');
    const d = firstError(text);
    expect(d.path).toBe('attachments.panels[0].offset.lateral');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '1e300'));
    expect(d.message).toContain('beyond any pole-and-arm support');
    expect(d.message).toContain('3281 ft'); // 1000 m / 0.3048 m/ft (NIST SP 811 exact factor) = 3280.8 ft
  });

  it('a tube of 1e300 in (its area overflowed to NaN) is refused', () => {
    const d = firstError(swap(SIGN, 'rootDiameter: 24      # in', 'rootDiameter: 1e300   # in'));
    expect(d.path).toBe('structure.pole.section.rootDiameter');
    expect(d.message).toContain('393.7 in'); // 10 m / 0.0254 m/in (NIST SP 811 exact factor)
  });

  it('the limit on lengths is 1000 m: a 1000 m pole passes it, 1001 m does not', () => {
    const messages = (height: string) => {
      try {
        loadDesignText(swap(TWIN, 'height: 10              # m', `height: ${height}`), 'x.yaml', {});
        return [];
      } catch (e) {
        return (e as InputError).diagnostics.map((d) => `${d.path}: ${d.message}`);
      }
    };
    expect(messages('1000').filter((m) => m.includes('beyond any'))).toEqual([]);
    expect(messages('1001').filter((m) => m.includes('beyond any'))).toEqual([expect.stringMatching(/^structure\.pole\.height: /)]);
  });

  it('a station spacing that asks for more than 10 000 stations on a member is refused', () => {
    const text = swap(SIGN, 'stationSpacing: 1 ft', 'stationSpacing: 1e-9 ft');
    const d = firstError(text);
    expect(d.path).toBe('analysis.stationSpacing');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '1e-9 ft'));
    expect(d.message).toContain('more than 10000 result stations');
    // 36 ft / 10 000 = 0.0036 ft is within the per-member limit (the arm is the longest member),
    // and is then refused by the limit on all station results of all analyses instead.
    expect(() => loadDesignText(swap(SIGN, 'stationSpacing: 1 ft', 'stationSpacing: 0.0036 ft'), 'x.yaml', {})).toThrow(/station results, more than the 100000/);
  });
});

describe('combinations', () => {
  it('a combination whose factors are all 0 is refused at its factors (it was dropped unseen, and with no combination left the report stopped)', () => {
    const text = swap(SIGN, 'combinations: default       # the labelled default set; or a list with your own factors', 'combinations:\n  - { id: c1, category: strength, factors: { dead: 0, wind: 0 } }');
    const d = firstError(text);
    expect(d.path).toBe('combinations[0].factors');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '{ dead: 0'));
    expect(d.message).toContain('every factor is 0');
  });

  it('one zero factor beside a non-zero one is fine', () => {
    const text = swap(SIGN, 'combinations: default       # the labelled default set; or a list with your own factors', 'combinations:\n  - { id: c1, category: strength, factors: { dead: 0, wind: 1 } }');
    expect(loadDesignText(text, 'x.yaml', {}).design.combinations.map((c) => c.id)).toEqual(['c1', 'service-dead']); // the dead-alone service combination is added for the dead-load deflection check
  });
});

describe('analysis settings', () => {
  it('a P-delta iteration cap of 1 is refused at its key (the analysis needs two solutions to compare, and stopped with an internal error)', () => {
    const text = swap(SIGN, '  secondOrder: true\n', '  secondOrder: true\n  pDeltaMaxIterations: 1\n');
    const d = firstError(text);
    expect(d.path).toBe('analysis.pDeltaMaxIterations');
    expect(d.message).toContain('at least 2');
    expect(() => loadDesignText(swap(SIGN, '  secondOrder: true\n', '  secondOrder: true\n  pDeltaMaxIterations: 2\n'), 'x.yaml', {})).not.toThrow();
  });
});

describe('YAML features', () => {
  it('aliases of aliases that expand past the alias limit are an input error at the first alias (yaml threw, an internal error)', () => {
    const text = 'a: &a [1, 1, 1, 1, 1, 1, 1, 1, 1, 1]\nb: &b [*a, *a, *a, *a, *a, *a, *a, *a, *a, *a]\nc: [*b, *b, *b, *b, *b, *b, *b, *b, *b, *b]\n';
    const d = firstError(text);
    expect({ line: d.line, col: d.col }).toEqual(where(text, '*a'));
    expect(d.message).toContain('aliases (*name) expand to too many nodes');
  });

  it('a few aliases are still fine', () => {
    const text = swap(SIGN, '    - id: S2', '    - id: S3\n      on: A1\n      position: 6\n      width: 2\n      height: 2\n      weightPerArea: 3.5\n      offset: &off { lateral: "-10 in", vertical: "-6 in" }\n    - id: S2');
    const aliased = swap(text, 'offset: { lateral: "-10 in", vertical: "-6 in" }\n\nloads', 'offset: *off\n\nloads');
    const s2 = loadDesignText(aliased, 'x.yaml', {}).design.attachments.find((a) => a.id === 'S2')!;
    expect(s2.offset.lateral_m).toBeCloseTo(-10 * 0.0254, 12); // NIST SP 811: 1 in = 0.0254 m exactly
  });
});

describe('messages for odd values', () => {
  it('a text key given a block says it expects text, not a number with a unit', () => {
    const d = firstError(swap(SIGN, 'name: County Road 17 guide signs, eastbound', 'name: { a: 1 }'));
    expect(d.path).toBe('project.name');
    expect(d.message).toBe('expected text or a number, got a block of keys');
  });

  it('a quantity key given a list still asks for a number with a unit', () => {
    const d = firstError(swap(SIGN, 'width: 10\n', 'width: [10]\n'));
    expect(d.path).toBe('attachments.panels[1].width');
    expect(d.message).toContain('expected a number or a number with a unit');
  });

  it('brackets nested a thousand deep are a located input error that says so (the parser ran out of stack)', () => {
    const text = swap(SIGN, 'name: County Road 17 guide signs, eastbound', `name: ${'['.repeat(2000)}${']'.repeat(2000)}`);
    const d = firstError(text);
    expect(d.line).toBe(where(text, 'name: [').line);
    expect(d.message).toContain('nested too deeply');
  });
});

describe('ids that polebook derives must stay unique', () => {
  const windCases = (text: string) => loadDesignText(text, 'x.yaml', {}).design.wind.directions.map((d) => (d.angle_rad * 180) / Math.PI);

  it('wind directions closer than 0.001 deg are one direction (45 and 45.0002 deg shared a case id and stopped the analysis)', () => {
    const merged = windCases(swap(SIGN, 'add: [45 deg]', 'add: [45 deg, 45.0002 deg]'));
    expect(merged.filter((a) => Math.abs(a - 45) < 0.01)).toHaveLength(1);
    const apart = windCases(swap(SIGN, 'add: [45 deg]', 'add: [45 deg, 45.002 deg]'));
    expect(apart.filter((a) => Math.abs(a - 45) < 0.01)).toHaveLength(2);
  });

  it("a combination id with '@' is refused (it could take the name of another combination's wind direction)", () => {
    const text = swap(
      SIGN,
      'combinations: default       # the labelled default set; or a list with your own factors',
      'combinations:\n  - { id: c, category: strength, factors: { dead: 1, wind: 1 } }\n  - { id: "c@wind-045", category: strength, factors: { dead: 1 } }',
    );
    const d = firstError(text);
    expect(d.path).toBe('combinations[1].id');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '"c@wind-045"'));
    expect(d.message).toContain("'@' is reserved");
  });
});

describe('plausibility of arm geometry', () => {
  it('an arm drooping below the pole base loads with a warning at its rise (tip 24 - 36 sin 45 deg = -1.456 ft)', () => {
    const text = swap(SIGN, 'rise: 0 deg           # horizontal arm', 'rise: -45 deg');
    const { warnings } = loadDesignText(text, 'x.yaml', {});
    expect(warnings.map((w) => w.path)).toEqual(['structure.arms[0].rise']);
    expect(warnings[0]!.message).toContain('1.456 ft below the pole base'); // 36 x sin 45 deg - 24 = 1.4558 ft
    expect({ line: warnings[0]!.line, col: warnings[0]!.col }).toEqual(where(text, '-45 deg'));
  });

  it('a drooping arm whose tip stays above the base gives no warning', () => {
    expect(loadDesignText(swap(SIGN, 'rise: 0 deg           # horizontal arm', 'rise: -40 deg'), 'x.yaml', {}).warnings).toEqual([]); // 24 - 36 sin 40 = 0.86 ft
  });
});

describe('YAML tags', () => {
  it('a unit written as a tag (height: !m 26) is refused; it was read silently as 26 ft', () => {
    const text = swap(SIGN, 'height: 26              # ft', 'height: !m 26           # ft');
    const d = firstError(text);
    expect({ line: d.line, col: d.col }).toEqual(where(text, '!m'));
    expect(d.message).toContain('polebook reads no YAML tags');
  });
});

describe('density', () => {
  it('a tube lighter than water is refused at its key (1 g/m3 left the natural modes without a solution)', () => {
    const text = swap(SIGN, '    # density: 490 pcf      # default', '    density: 1e-6 pcf');
    const d = firstError(text);
    expect(d.path).toBe('structure.material.density');
    expect({ line: d.line, col: d.col }).toEqual(where(text, '1e-6 pcf'));
    expect(d.message).toContain('62.43 pcf'); // 1000 kg/m3 / 16.01846 kg/m3 per pcf (NIST SP 811)
  });

  it('a pcf number typed into an SI file (490 read as kg/m3) is caught by the same floor', () => {
    const d = firstError(swap(TWIN, 'density: 7850 kg/m3', 'density: 490'));
    expect(d.path).toBe('structure.material.density');
  });
});
