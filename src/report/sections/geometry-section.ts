// Section "Structure geometry": pole, arms, member sections at root and tip, attachments,
// all in the user's units.
import { baseText } from '../../design/base-text.ts';
import type { Arm, LoadedDesign, PanelAttachment, PointAttachment, TubeSection } from '../../design/design.ts';
import type { Block, DocSection } from '../document.ts';
import { diameterText, display, memberText, offsetText, positionText, shapeText, type Display } from './display.ts';
import { templateBlocks } from './templates.ts';

export const GEOMETRY_TITLE = 'Structure geometry';

const POINT_KIND_LABEL: Readonly<Record<PointAttachment['kind'], string>> = {
  luminaire: 'luminaire',
  'signal-head': 'signal head',
  other: 'other',
};

function sectionRows(member: string, s: TubeSection, rootName: string, tipName: string, d: Display): string[][] {
  return [
    [member, rootName, shapeText(s), diameterText(s.rootDiameter_m, s, d), d.q(s.wall_m, 'section')],
    [member, tipName, shapeText(s), diameterText(s.tipDiameter_m, s, d), d.q(s.wall_m, 'section')],
  ];
}

function armRow(arm: Arm, d: Display): string[] {
  return [arm.id, d.q(arm.attachHeight_m, 'length'), d.angle(arm.direction_rad), d.q(arm.length_m, 'length'), d.angle(arm.rise_rad)];
}

export function geometrySection(loaded: LoadedDesign): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const pole = design.pole;
  const blocks: Block[] = [...templateBlocks('geometry', {}).blocks];

  blocks.push({
    kind: 'table',
    title: 'Pole',
    header: ['Item', 'Value'],
    widths: ['*', 190],
    rows: [
      ['Height above the base', d.q(pole.height_m, 'length')],
      ['Base restraint', baseText(pole.base, (k) => d.q(k, 'rotStiffness'))],
      ['Cross-section', pole.section.shape === 'round' ? 'round tube' : `${pole.section.sides}-sided tube`],
    ],
  });

  if (design.arms.length === 0) {
    blocks.push({ kind: 'paragraph', text: 'The structure has no arms.' });
  } else {
    blocks.push({
      kind: 'table',
      title: 'Mast arms',
      header: ['Arm', 'Height of arm axis at pole', 'Plan direction', 'Length from pole face', 'Rise above horizontal'],
      rows: design.arms.map((a) => armRow(a, d)),
    });
  }

  blocks.push({
    kind: 'table',
    title: 'Member sections at root and tip',
    header: ['Member', 'End', 'Shape', 'Outside diameter', 'Wall thickness'],
    widths: [60, 60, 60, '*', 80],
    rows: [
      ...sectionRows('pole', pole.section, 'base', 'top', d),
      ...design.arms.flatMap((a) => sectionRows(`arm ${a.id}`, a.section, 'root', 'tip', d)),
    ],
    note: 'Diameters are outside diameters; for a multisided tube they are measured across the flats. The wall is constant along each member.',
  });

  const panels = design.attachments.filter((a): a is PanelAttachment => a.kind === 'panel');
  const points = design.attachments.filter((a): a is PointAttachment => a.kind !== 'panel');
  if (panels.length > 0) {
    blocks.push({
      kind: 'table',
      title: 'Sign panels',
      header: ['Id', 'Description', 'Position', 'Width × height', 'Weight per area', 'Centroid offset', 'Face normal'],
      widths: [34, '*', 64, 66, 50, 78, 40],
      rows: panels.map((p) => [
        p.id,
        `${p.description} (${memberText(p.member)})`,
        positionText(p, d),
        `${d.q(p.width_m, 'length')} × ${d.q(p.height_m, 'length')}`,
        d.q(p.weightPerArea_Pa, 'pressure'),
        offsetText(p, d),
        d.angle(p.faceNormal_rad),
      ]),
    });
  }
  if (points.length > 0) {
    blocks.push({
      kind: 'table',
      title: 'Luminaires, signal heads and other point attachments',
      header: ['Id', 'Kind', 'Description', 'Position', 'Weight', 'Wind area', 'Centroid offset'],
      widths: [34, 44, '*', 64, 44, 44, 78],
      rows: points.map((p) => [
        p.id,
        POINT_KIND_LABEL[p.kind],
        `${p.description} (${memberText(p.member)})`,
        positionText(p, d),
        d.q(p.weight_N, 'weight'),
        d.q(p.windArea_m2, 'area'),
        offsetText(p, d),
      ]),
    });
  }
  if (panels.length === 0 && points.length === 0) blocks.push({ kind: 'paragraph', text: 'No attachments were entered.' });

  return { id: 'geometry', title: GEOMETRY_TITLE, blocks };
}
