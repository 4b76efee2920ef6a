// Section "Hand check by the moment-area method": the in-plane dead-load case of the longest arm
// and the pole by Mohr's theorems along the real taper (src/handcheck/), the steps a checker
// would write, the integration tables to follow by hand, and the comparison with the matrix
// analysis of the 'dead' case alone.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { LoadedDesign } from '../../design/design.ts';
import { compareWithMatrix, EXPECTED_AGREEMENT, type ComparisonRow } from '../../handcheck/matrix-comparison.ts';
import { momentAreaCheck, TABLE_INTERVALS, type IntegrationTable, type MomentAreaCheck } from '../../handcheck/moment-area.ts';
import { displayUnit, formatNumber, formatPercent, formatTolerance, fromSI, prettyUnit, type UnitSystem } from '../../units/units.ts';
import type { Block, DocSection } from '../document.ts';
import { arrow, INK, line, polyline, svgDocument, text, type Pt } from '../figures/svg.ts';
import { display, type Display } from './display.ts';
import { templateBlocks } from './templates.ts';

export const HAND_CHECK_TITLE = 'Hand check by the moment-area method';

/** A per-length quantity (curvature M/EI) in the user's length unit. */
function perLength(v_per_m: number, units: UnitSystem): string {
  const unit = displayUnit(units, 'length');
  return `${formatNumber(v_per_m / fromSI(1, unit, 'length'))} rad/${prettyUnit(unit)}`;
}

function tableBlock(t: IntegrationTable, check: MomentAreaCheck, d: Display): Block {
  const pole = t.member === 'pole';
  const x = pole ? 'z' : 's';
  const lever = pole ? '(h − z)' : '(L − s) cos α';
  const curvatureQuad = pole ? check.poleRotationIntegral_rad : null;
  const leveredQuad = pole ? check.poleSwayIntegral_m : check.armDrop_m;
  const name = pole ? `the pole from the base to the joint (h = ${d.q(t.length_m, 'length')})` : `arm ${check.statics.arm.id} from the pole face to the tip (L = ${d.q(t.length_m, 'length')})`;
  return {
    kind: 'table',
    title: `Integration table: ${name}, ${TABLE_INTERVALS} intervals`,
    header: [x, 'M', 'I', 'M/EI', `M ${lever}/EI`],
    widths: [62, '*', '*', '*', '*'],
    rows: t.rows.map((r) => [d.q(r.position_m, 'length'), d.q(r.M_Nm, 'moment'), d.q(r.I_m4, 'inertia'), perLength(r.curvature_per_m, d.units), `${formatNumber(r.leveredCurvature)} rad`]),
    note:
      `E = ${d.q(check.E_Pa, 'stress')}. ${pole ? 'M at the joint height is the value just below the joint. ' : ''}` +
      `Simpson's rule on these ${TABLE_INTERVALS + 1} points gives ∫ M/EI d${x} = ${d.angle(t.simpsonCurvature)}` +
      (curvatureQuad !== null ? ` (quadrature: ${d.angle(curvatureQuad)})` : '') +
      ` and ∫ M ${lever}/EI d${x} = ${d.q(t.simpsonLevered, 'section')} (quadrature: ${d.q(leveredQuad, 'section')}). ` +
      'The table is coarse and M has kinks between its points, so Simpson agrees within a few per cent, not exactly; the package uses the quadrature.',
  };
}

/** A dimension line with a head at each end. */
function dimension(a: Pt, c: Pt): string[] {
  const m: Pt = [(a[0] + c[0]) / 2, (a[1] + c[1]) / 2];
  return [arrow(m[0], m[1], a[0], a[1], { width: 0.6, head: 4 }), arrow(m[0], m[1], c[0], c[1], { width: 0.6, head: 4 })];
}

/** Sketch of the quantities, not to scale: the pole and the arm, the deflected shape (dashed,
 * exaggerated) and the positive senses of θ_joint, Δ_joint and δ_tip. */
function quantitiesSketch(armId: string): { svg: string; width: number; height: number } {
  const width = 330;
  const height = 175;
  const b: Pt = [84, 150];
  const h = 105; // joint height on the page
  const top = 125;
  const R = 200;
  const sway = 12;
  const drop = 34;
  const body: string[] = [];
  for (let k = -18; k <= 18; k += 6) body.push(line(b[0] + k, b[1], b[0] + k - 5, b[1] + 6, { width: 0.5 }));
  body.push(line(b[0] - 20, b[1], b[0] + 20, b[1], { width: 1 }));
  body.push(line(b[0], b[1], b[0], b[1] - top, { width: 2.2 }));
  body.push(line(b[0], b[1] - h, b[0] + R, b[1] - h, { width: 1.8 }));
  // Deflected shape: uniform pole moment → a parabola; the arm turns by θ and bends on its own.
  const pole: Pt[] = [];
  for (let i = 0; i <= 10; i++) pole.push([b[0] + sway * (i / 10) ** 2, b[1] - (h * i) / 10]);
  const slope = (2 * sway) / h;
  const arm: Pt[] = [];
  for (let i = 0; i <= 10; i++) {
    const u = i / 10;
    arm.push([b[0] + sway + R * u, b[1] - h + slope * R * u + (drop - slope * R) * u * u * (3 - u) / 2]);
  }
  body.push(polyline(pole, { color: INK.accent, width: 1, dash: '3 2' }), polyline(arm, { color: INK.accent, width: 1, dash: '3 2' }));
  // Weights on the arm.
  for (const u of [0.45, 0.85]) body.push(arrow(b[0] + R * u, b[1] - h - 26, b[0] + R * u, b[1] - h - 3, { width: 0.9, head: 4 }));
  body.push(text(b[0] + R * 0.45 + 4, b[1] - h - 18, 'W', { size: 8, italic: true }));
  // Dimensions h and R.
  body.push(...dimension([b[0] - 50, b[1]], [b[0] - 50, b[1] - h]), text(b[0] - 54, b[1] - h / 2, 'h', { size: 8, italic: true, anchor: 'end' }));
  body.push(...dimension([b[0], b[1] - h - 36], [b[0] + R, b[1] - h - 36]), text(b[0] + R / 2, b[1] - h - 40, 'R (pole axis to tip)', { size: 7.5, anchor: 'middle' }));
  // Positive senses.
  body.push(arrow(b[0] + 2, b[1] - h + 12, b[0] + sway + 2, b[1] - h + 12, { color: INK.accent, width: 0.9, head: 4 }), text(b[0] - 4, b[1] - h + 15, 'Δ_joint', { size: 7.5, color: INK.accent, anchor: 'end' }));
  body.push(text(b[0] + sway + 34, b[1] - h + 20 + slope * 34, 'θ_joint', { size: 7.5, color: INK.accent }));
  body.push(arrow(b[0] + R + 10, b[1] - h, b[0] + R + 10, b[1] - h + drop + sway * 0, { color: INK.accent, width: 0.9, head: 4 }), text(b[0] + R + 14, b[1] - h + drop / 2 + 3, 'δ_tip', { size: 7.5, color: INK.accent }));
  body.push(text(b[0] + 6, b[1] - 30, 'pole', { size: 7.5, bold: true }), text(b[0] + R * 0.62, b[1] - h - 4, `arm ${armId}`, { size: 7.5, bold: true, anchor: 'middle' }));
  body.push(text(8, height - 4, 'dashed: deflected shape, exaggerated; arrows show the positive senses', { size: 6.5, color: INK.muted }));
  return { svg: svgDocument(width, height, body), width, height };
}

function differenceText(r: ComparisonRow): string {
  if (r.relativeDifference === null) return `nil in both (${formatTolerance(r.differenceOfScale)} of the tip drop)`;
  return formatPercent(r.relativeDifference);
}

function otherSourcesText(check: MomentAreaCheck, d: Display): string {
  const others = check.statics.poleSources.slice(1);
  if (others.length === 0) return 'The design has no other arm and no offset weight on the pole: the pole below the joint carries the joint moment alone.';
  const list = others.map((o) => `${o.what} at ${d.q(o.z_m, 'length')}: ${d.q(o.M_Nm, 'moment')}`).join('; ');
  return `Other arms and offset weights on the pole add their in-plane moments (weight × horizontal lever arm projected on the plane) to the pole below them: ${list}. Their out-of-plane parts are left out.`;
}

/** Null for a design without an arm: the method checks an arm and the pole in its plane, and the
 * scope section says the hand check is not made (a section of one sentence would be a page). */
export function handCheckSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection | null {
  const { design } = loaded;
  const d = display(design.units);
  const check = momentAreaCheck(design);
  if (!check) return null;
  const cmp = compareWithMatrix(check, analysis.model, analysis.cases);
  const arm = check.statics.arm;
  const blocks: Block[] = [
    ...templateBlocks('hand-check', {
      armId: arm.id,
      planeDirection: d.angle(arm.direction_rad),
      segments: design.analysis.segmentsPerMember,
      otherSources: otherSourcesText(check, d),
      rise: d.angle(arm.rise_rad),
      points: check.quadrature.points,
      panels: 2 * check.quadrature.panels,
      integrationError: check.integrationError,
    }).blocks,
    (() => {
      const sk = quantitiesSketch(arm.id);
      return { kind: 'figure', title: 'The quantities of the hand check', svg: sk.svg, width_pt: sk.width, caption: `Not to scale. The vertical plane of arm ${arm.id}; the pole continues above the joint where it does.` } satisfies Block;
    })(),
    { kind: 'heading', level: 2, text: 'Moments and displacements by hand' },
    ...check.steps.map((step): Block => ({ kind: 'step', step })),
    { kind: 'heading', level: 2, text: 'Comparison with the matrix analysis' },
    {
      kind: 'paragraph',
      text:
        `The matrix values are polebook's first-order analysis of the load case 'dead' alone on the frame model of this package (${design.analysis.segmentsPerMember} prismatic segments per member): ` +
        `the rotation of the pole node at the joint about the axis normal to the arm's plane, its horizontal displacement along the arm's plan direction, and the downward displacement of the arm tip. ` +
        `Expected agreement: within ${formatNumber(100 * EXPECTED_AGREEMENT)} % at 20 segments per member; the segment chain's prismatic approximation of the taper is the main source of the difference, with the axial shortening and the torsion coupling that the hand method leaves out. ` +
        `The last row adds the pole's axial shortening (δ_axial above) to the hand value of the tip drop; what is left of that difference is mostly the segment chain, and it shrinks as the segments get shorter.`,
    },
    {
      kind: 'table',
      title: `Hand check against the matrix analysis, load case 'dead', arm ${arm.id}`,
      header: ['Quantity', 'Moment-area', 'Matrix', 'Difference'],
      widths: ['*', 90, 90, 110],
      rows: cmp.rows.map((r) => [r.label, d.q(r.momentArea, r.dim), d.q(r.matrix, r.dim), differenceText(r)]),
      note: "Difference = (matrix − moment-area) / moment-area. A quantity nil by symmetry is compared with the tip drop (for the rotation, the tip drop over the reach). Signs: rotation positive when it drops the arm tip, sway positive toward the arm, tip drop positive down.",
    },
    { kind: 'heading', level: 2, text: 'Integration tables' },
    {
      kind: 'paragraph',
      text: `The M/EI diagrams of the pole and the arm at ${TABLE_INTERVALS} equal intervals, with I from the tube formulas at each point, so the integrals above can be followed by hand.`,
    },
    tableBlock(check.poleTable, check, d),
    tableBlock(check.armTable, check, d),
  ];
  const worst = Math.max(...cmp.rows.map((r) => Math.abs(r.relativeDifference ?? r.differenceOfScale)));
  if (worst > EXPECTED_AGREEMENT) {
    blocks.push({
      kind: 'caution',
      title: 'Hand check differs from the analysis',
      text: `The moment-area values and the matrix analysis differ by up to ${formatNumber(100 * worst, 3)} %, more than the ${formatNumber(100 * EXPECTED_AGREEMENT)} % expected. With fewer than 20 segments per member the segment chain may be too coarse; otherwise the engineer should find the cause before relying on the results.`,
    });
  }
  return { id: 'hand-check', title: HAND_CHECK_TITLE, blocks };
}
