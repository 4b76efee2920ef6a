// The texts of our own figures never sit on one another (issue 9: no label over another label), on
// the examples and on a crowded support: a four-arm variant of the signal support whose side arm
// points at the reader in the elevation, so the loads on it all land on the pole. Read back from
// the SVG each figure builder wrote: every unrotated text with its place, measured with the
// embedded face (the measure is checked against pdfkit in label-place.test.ts). The vega charts
// lay out their own axis labels and are left out.
import { join } from 'node:path';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseDocument } from 'yaml';
import { loadDesignFile, loadDesignText } from '../../src/input/index.ts';
import type { LoadedDesign } from '../../src/design/design.ts';
import { packageRoot } from '../../src/package-root.ts';
import { analyseAndCheck } from '../../src/pipeline.ts';
import { measureText } from '../../src/report/charts/index.ts';
import { LABEL_SIZE, overlaps, type Rect } from '../../src/report/figures/label-place.ts';
import { freeBodySection } from '../../src/report/sections/free-body-section.ts';
import { analysisSections } from '../../src/report/sections/analysis-sections.ts';
import { checkSections } from '../../src/report/sections/check-sections.ts';
import { memberCharts } from '../../src/report/sections/member-charts.ts';
import { summarySection } from '../../src/report/sections/summary-section.ts';

const unescape = (s: string) => s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, '&');

/** The ink box of each unrotated text of an SVG of the given sizes: from a little above the
 * capitals to the descenders, placed by its anchor. */
function labelBoxes(svg: string, sizes: readonly number[] = [LABEL_SIZE]): { text: string; box: Rect }[] {
  const out: { text: string; box: Rect }[] = [];
  for (const m of svg.matchAll(/<text ([^>]*)>([^<]*)<\/text>/g)) {
    const attr = (name: string) => new RegExp(`\\b${name}="([^"]*)"`).exec(m[1]!)?.[1];
    const size = Number(attr('font-size'));
    if (!sizes.includes(size) || attr('transform') !== undefined) continue;
    const y = Number(attr('y'));
    const text = unescape(m[2]!);
    const w = measureText(attr('font-weight') === 'bold' ? { fontSize: size, fontWeight: 'bold' } : { fontSize: size }, text);
    const anchor = attr('text-anchor');
    const x = Number(attr('x')) - (anchor === 'middle' ? w / 2 : anchor === 'end' ? w : 0);
    out.push({ text, box: [x, y - 0.75 * size, x + w, y + 0.2 * size] });
  }
  return out;
}

function clashesOf(title: string, labels: readonly { text: string; box: Rect }[]): string[] {
  const out: string[] = [];
  for (let a = 0; a < labels.length; a++) for (let b = a + 1; b < labels.length; b++) if (overlaps(labels[a]!.box, labels[b]!.box)) out.push(`${title}: "${labels[a]!.text}" on "${labels[b]!.text}"`);
  return out;
}

function crowdedFourArm(): LoadedDesign {
  const file = join(packageRoot(), 'examples', 'signal-support.yaml');
  const doc = parseDocument(readFileSync(file, 'utf8'));
  doc.addIn(['structure', 'arms'], doc.createNode({ id: 'SB', attachHeight: 20, direction: '90 deg', length: 30, rise: '2 deg', section: { shape: 'round', rootDiameter: 12, taper: 0.14, wall: 0.25 } }));
  doc.addIn(['attachments', 'points'], doc.createNode({ id: 'H4', type: 'signal-head', description: '3-section head, side street', on: 'SB', position: 25, weight: 55, windArea: 9.5, offset: { vertical: -2.5 } }));
  return { ...loadDesignText(doc.toString(), 'four-arm.yaml', {}), file: 'four-arm.yaml' };
}

const cases: [string, () => LoadedDesign][] = [
  ...['cantilever-sign', 'luminaire-twin', 'signal-support'].map((name): [string, () => LoadedDesign] => [name, () => ({ ...loadDesignFile(join(packageRoot(), 'examples', `${name}.yaml`)), file: `${name}.yaml` })]),
  ['a four-arm support with an arm seen end-on', crowdedFourArm],
];

describe.each(cases)('figures of %s', (_name, load) => {
  it('print every label clear of every other label', () => {
    const loaded = load();
    const { analysis, checks } = analyseAndCheck(loaded);
    const figures = freeBodySection(loaded, analysis, checks).blocks.filter((b) => b.kind === 'figure' && (b.title.startsWith('Free body,') || b.title.startsWith('Load case')));
    expect(figures.length).toBeGreaterThan(2);
    const clashes: string[] = [];
    for (const fig of figures) {
      if (fig.kind !== 'figure') continue;
      const labels = labelBoxes(fig.svg);
      expect(labels.length).toBeGreaterThan(0);
      clashes.push(...clashesOf(fig.title, labels));
    }
    expect(clashes).toEqual([]);
  }, 60_000);

  it('every figure of our own drawing prints its texts clear of one another', async () => {
    const loaded = load();
    const { analysis, checks } = analyseAndCheck(loaded);
    // The package's figures, the vega charts left out.
    const charts = await memberCharts(loaded, analysis, checks);
    const chartSvgs = new Set(charts.map((c) => c.svg));
    const blocks = [
      ...summarySection(loaded, analysis, checks, { checks: 'Design checks', results: 'Analysis results' }).blocks,
      ...analysisSections(loaded, analysis, checkSections(loaded, analysis, checks), checks, charts).flatMap((sec) => sec.blocks),
    ];
    const figures = blocks.filter((b) => b.kind === 'figure' && !chartSvgs.has(b.svg));
    expect(figures.length).toBeGreaterThan(8);
    const clashes = figures.flatMap((fig) => (fig.kind === 'figure' ? clashesOf(fig.title, labelBoxes(fig.svg, [...new Set([...fig.svg.matchAll(/font-size="([\d.]+)"/g)].map((m) => Number(m[1])))])) : []));
    expect(clashes).toEqual([]);
  }, 60_000);
});
