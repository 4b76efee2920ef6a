// The built package, read back with pdfjs-dist (a PDF reader outside the project), holds the
// hand-check section, its steps, the integration tables and the comparison table with numbers.
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { compareWithMatrix } from '../../src/handcheck/matrix-comparison.ts';
import { momentAreaCheck } from '../../src/handcheck/moment-area.ts';
import { buildPackage, type PackageResult } from '../../src/pipeline.ts';
import { formatQuantity } from '../../src/units/units.ts';
import { readPdfText, squeeze } from '../support/pdf-text.ts';

const ROOT = join(import.meta.dirname, '..', '..');

describe.each(['cantilever-sign.yaml', 'luminaire-twin.yaml'])('examples/%s built to PDF', (example) => {
  let built: PackageResult;
  let text: string;
  beforeAll(async () => {
    built = await buildPackage(join(ROOT, 'examples', example), { env: { SOURCE_DATE_EPOCH: '1767225600' } });
    text = (await readPdfText(built.pdf)).pages.join('\n');
  }, 120_000);

  it('has the section, after "Design checks" (the design before the derivation), in the contents and the body', () => {
    const titles = built.document.sections.map((s) => s.title);
    expect(titles.indexOf('Hand check by the moment-area method')).toBe(titles.indexOf('Design checks') + 1);
    expect(text.split('Hand check by the moment-area method').length).toBeGreaterThanOrEqual(3);
  });

  it('prints the steps, the integration tables and the comparison table', () => {
    const flat = squeeze(text);
    for (const s of ['θ_joint', 'Δ_joint', 'δ_tip', "Mohr's theorems", 'Integration table: the pole', 'Hand check against the matrix analysis', 'Moment-area', 'Matrix', 'Difference']) {
      expect(flat).toContain(squeeze(s));
    }
  });

  it('the comparison table holds the moment-area and matrix tip drops as computed', () => {
    const check = momentAreaCheck(built.loaded.design);
    if (!check) throw new Error('no arm');
    const row = compareWithMatrix(check, built.analysis.model, built.analysis.cases).rows.find((r) => r.key === 'tipDrop');
    if (!row) throw new Error('no tip row');
    const units = built.loaded.design.units;
    const line = text.split('\n').find((l) => l.includes('tip drop δ_tip') && l.includes('%'));
    expect(line, 'comparison row of the tip drop').toBeDefined();
    expect(line).toContain(formatQuantity(row.momentArea, 'section', units));
    expect(line).toContain(formatQuantity(row.matrix, 'section', units));
  });
});
