// Appendix "Frame model: nodes and elements": every node and every element of the analysed model as the
// solver takes them, so a checker can rebuild the model in another program and compare. Reads the
// frame model only; the section "Structural model" says how it is made.
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { LoadedDesign } from '../../design/design.ts';
import type { FrameModel, Vec3 } from '../../model/frame.ts';
import type { Block, DocSection } from '../document.ts';
import { display, memberText, restrainedText, type Display } from './display.ts';
import { withoutRoundOff } from './round-off.ts';

export const MODEL_TABLES_ID = 'model-tables';
export const MODEL_TABLES_TITLE = 'Frame model: nodes and elements';

/** What a node's tag says, in words: 'base', 'pole-top', 'arm-root:A1', 'attachment:S1', 'arm-tip:A1', 'segment'. */
function tagText(tag: string): string {
  return tag
    .split(',')
    .map((t) => {
      const [kind, id] = t.split(':');
      switch (kind) {
        case 'base':
          return 'pole base';
        case 'pole-top':
          return 'pole top';
        case 'arm-root':
          return `joint of arm ${id} (pole axis)`;
        case 'arm-tip':
          return `tip of arm ${id}`;
        case 'attachment':
          return `attachment ${id}`;
        case 'segment':
          return 'segment end';
        default:
          return t;
      }
    })
    .join('; ');
}

/** A support's restraints as the table "Support conditions" gives them (its springs are there). */
function supportText(model: FrameModel, node: number): string {
  const s = model.supports.find((q) => q.node === node);
  if (!s) return '';
  return s.springs.some((k) => k > 0) ? `${restrainedText(s.fixed)}; springs` : restrainedText(s.fixed);
}

/** Coordinates; round-off of the trigonometry (cos 90°) next to the structure's size prints as 0. */
const xyz = (v: Vec3, size_m: number, d: Display) => v.map((c) => d.q(withoutRoundOff(c, size_m), 'length'));

function nodeTable(model: FrameModel, d: Display): Block {
  const size_m = Math.max(...model.nodes.flatMap((n) => n.xyz_m.map(Math.abs)));
  return {
    kind: 'table',
    title: 'Nodes',
    header: ['Node', 'x', 'y', 'z', 'What the node is', 'Support'],
    widths: [30, 52, 52, 52, '*', 58],
    rows: model.nodes.map((n) => [String(n.id), ...xyz(n.xyz_m, size_m, d), tagText(n.tag), supportText(model, n.id)]),
    note: 'Global axes, origin at the centre of the pole base, Z up (section "Structural model"). An arm\'s first node is on the pole axis; its first element starts at the pole face through a rigid offset (next table).',
  };
}

function elementTable(model: FrameModel, d: Display): Block {
  const offset = (v: Vec3) => (Math.hypot(...v) > 0 ? d.q(Math.hypot(...v), 'length') : '');
  return {
    kind: 'table',
    title: 'Elements',
    header: ['Element', 'Nodes', 's at i', 'A', 'Iy = Iz', 'J', 'Offset'],
    widths: [52, 34, 44, 54, 84, 84, '*'],
    rows: model.elements.map((e) => [
      `${e.id}, ${memberText(e.member)}`,
      `${e.i}–${e.j}`,
      d.q(e.sI_m, 'length'),
      d.q(e.A_m2, 'sectionArea'),
      e.Iy_m4 === e.Iz_m4 ? d.q(e.Iy_m4, 'inertia') : `${d.q(e.Iy_m4, 'inertia')}, ${d.q(e.Iz_m4, 'inertia')}`,
      d.q(e.J_m4, 'inertia'),
      offset(e.offsetI_m),
    ]),
    note: 'Element: its number and member. Each element is a prismatic 3D beam with the properties of its segment (section "Structural model": the tube at the segment\'s mid-length); wind and the checks take the tapered diameter at each place instead. s at i: distance of the element\'s start along the member from its root (the pole base, or an arm\'s root at the pole face). Offset: length of the rigid link at end i, from the node on the pole axis to the element\'s end at the pole face. E and G as in section "Design criteria and assumptions".',
  };
}

export function modelTablesSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  const d = display(loaded.design.units);
  const { model } = analysis;
  const blocks: Block[] = [
    { kind: 'paragraph', text: `The model has ${model.nodes.length} nodes and ${model.elements.length} elements; these are the numbers the solver takes, so the model can be rebuilt in another frame program and the results compared.` },
    nodeTable(model, d),
    elementTable(model, d),
  ];
  return { id: MODEL_TABLES_ID, title: MODEL_TABLES_TITLE, blocks, appendix: true };
}
