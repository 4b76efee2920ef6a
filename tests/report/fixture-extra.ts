// An extra section like the ones later stages will hand to buildDocument: calculation
// steps (one passing, one failing) and a figure drawn as SVG. Invented numbers; the steps
// are arithmetic the reader can redo: 2 kN × 3 m = 6 kN·m; 180 MPa ≤ 0.9 × 345 MPa = 310.5 MPa.
import { qty, StepCollector } from '../../src/calc/step.ts';
import type { DocSection } from '../../src/report/document.ts';

export function demoStepsSection(): DocSection {
  const steps = new StepCollector();
  const P = qty(2000, 'force');
  const a = qty(3, 'length');
  steps.add({
    description: 'Moment at the arm root from the tip load',
    symbol: 'M',
    formula: 'P · a',
    substituted: [P, ' · ', a],
    result: qty(6000, 'moment'),
    source: 'statics of a cantilever',
  });
  steps.add({
    description: 'Bending stress against its limit',
    symbol: 'σ',
    formula: 'M · c / I ≤ φ · Fy',
    substituted: [qty(180e6, 'stress'), ' ≤ 0.9 · ', qty(345e6, 'stress')],
    result: qty(180e6, 'stress'),
    source: 'demonstration step for the renderer test',
    status: 'ok',
  });
  steps.add({
    description: 'A check that does not pass (rendering test only)',
    symbol: 'Δ',
    formula: 'δ ≥ L / 100',
    substituted: [qty(0.12, 'length'), ' ≥ ', qty(0.09, 'length')],
    result: qty(0.12, 'length'),
    source: 'demonstration step for the renderer test',
    status: 'fail',
  });
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="300" height="120" viewBox="0 0 300 120">
  <line x1="40" y1="110" x2="40" y2="15" stroke="#1a1a1a" stroke-width="3"/>
  <line x1="40" y1="20" x2="260" y2="20" stroke="#1a1a1a" stroke-width="2"/>
  <polygon points="255,28 265,28 260,40" fill="#24507a"/>
  <text x="200" y="55" font-family="DejaVuSans" font-size="10">P = 2 kN</text>
  <text x="120" y="14" font-family="DejaVuSans" font-size="10">a = 3 m</text>
  <text x="46" y="80" font-family="DejaVuSans" font-size="10">σ ≤ φ·Fy</text>
  <text x="46" y="100" font-family="DejaVuSans" font-size="10">M<tspan font-size="7" dy="2">root</tspan><tspan dy="-2">=6 kN·m</tspan></text>
</svg>`;
  return {
    id: 'demo-steps',
    title: 'Demonstration steps',
    blocks: [
      { kind: 'paragraph', text: 'Steps and a figure handed in by a later stage.' },
      { kind: 'heading', level: 2, text: 'Arm root' },
      ...steps.steps.map((step) => ({ kind: 'step' as const, step })),
      { kind: 'heading', level: 2, text: 'Sketch' },
      { kind: 'figure', title: 'Arm with tip load', svg, width_pt: 300, caption: 'Not to scale.' },
    ],
  };
}
