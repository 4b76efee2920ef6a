// Section "Structure elevation and plan": the structure drawn from the model (members,
// attachments, the hatched base) with its dimensions, and the attachment centroids as a table.
import { baseText as restraintText } from '../../design/base-text.ts';
import type { DesignAnalysis } from '../../analyse-design.ts';
import type { Arm, Attachment, Design, LoadedDesign } from '../../design/design.ts';
import type { Vec3 } from '../../model/frame.ts';
import { armAxis, findAxis, offsetVector, pointOnAxis, poleAxis, armLengthShift } from '../../model/member-axes.ts';
import { add } from '../../model/vec3.ts';
import { elevationDrawing, planDrawing, type HeightDim, type MemberDims, type Scene, type SceneAttachment, type SceneMember } from '../figures/structure-drawing.ts';
import type { Block, DocSection } from '../document.ts';
import { display, memberText, type Display } from './display.ts';
import { templateBlocks } from './templates.ts';
import { vecText } from './vector-text.ts';

export const ELEVATION_TITLE = 'Structure elevation and plan';

/** The arm the elevation looks square to: the longest (the first of equals). */
export function mainArm(design: Design): Arm | null {
  let best: Arm | null = null;
  for (const a of design.arms) if (!best || a.length_m > best.length_m) best = a;
  return best;
}

function sceneAttachment(design: Design, a: Attachment): SceneAttachment {
  const ax = findAxis(design, a.member);
  const anchor = pointOnAxis(ax, a.position_m);
  const centre = add(anchor, offsetVector(ax, a.offset));
  if (a.kind === 'panel') {
    const widthDir: Vec3 = [-Math.sin(a.faceNormal_rad), Math.cos(a.faceNormal_rad), 0];
    return { label: a.id, kind: 'panel', centre, anchor, widthDir, width_m: a.width_m, height_m: a.height_m };
  }
  return { label: a.id, kind: 'point', centre, anchor, widthDir: [1, 0, 0], width_m: 0, height_m: 0 };
}

export function buildScene(design: Design, label: (member: string) => string, baseLabel: string): Scene {
  const p = poleAxis(design);
  const members: SceneMember[] = [
    {
      id: 'pole',
      label: label('pole'),
      kind: 'pole',
      root: p.origin_m,
      tip: pointOnAxis(p, p.length_m),
      rootDiameter_m: p.section.rootDiameter_m,
      tipDiameter_m: p.section.tipDiameter_m,
      sides: p.section.sides,
    },
    ...design.arms.map((arm): SceneMember => {
      const ax = armAxis(design, arm);
      return {
        id: arm.id,
        label: label(arm.id),
        kind: 'arm',
        root: ax.origin_m,
        tip: pointOnAxis(ax, ax.length_m),
        rootDiameter_m: arm.section.rootDiameter_m,
        tipDiameter_m: arm.section.tipDiameter_m,
        sides: arm.section.sides,
        link: [0, 0, arm.attachHeight_m],
      };
    }),
  ];
  return { members, attachments: design.attachments.map((a) => sceneAttachment(design, a)), baseLabel };
}

function baseText(design: Design, d: Display): string {
  return design.pole.base.kind === 'fixed' ? 'fixed base' : `base: ${restraintText(design.pole.base, (k) => d.q(k, 'rotStiffness'))}`;
}

/** "+X", "−Y", or the plan angle, for a plan direction. */
function directionName(rad: number, d: Display): string {
  const deg = (((rad * 180) / Math.PI) % 360 + 360) % 360;
  const named: Readonly<Record<number, string>> = { 0: '+X', 90: '+Y', 180: '−X', 270: '−Y' };
  const k = Math.round(deg);
  return Math.abs(deg - k) < 1e-6 && named[k] !== undefined ? named[k] : d.angle(rad);
}

function heightDims(design: Design, d: Display): HeightDim[] {
  const groups = new Map<string, { z: number; names: string[] }>();
  const put = (z: number, name: string) => {
    const key = z.toFixed(6);
    const g = groups.get(key) ?? { z, names: [] };
    g.names.push(name);
    groups.set(key, g);
  };
  put(design.pole.height_m, 'pole top');
  for (const a of design.arms) put(a.attachHeight_m, `arm ${a.id}`);
  for (const a of design.attachments) if (a.member === 'pole') put(a.position_m, a.id);
  return [...groups.values()].map((g) => ({ z_m: g.z, text: `${g.names.join(', ')}: ${d.q(g.z, 'length')}` }));
}

function armDims(design: Design, arm: Arm, side: 'above' | 'below', d: Display): MemberDims {
  const ax = armAxis(design, arm);
  const on = design.attachments.filter((a) => a.member === arm.id).sort((p, q) => p.position_m - q.position_m);
  let clearance = arm.section.rootDiameter_m / 2;
  for (const a of on) {
    const half = a.kind === 'panel' ? a.height_m / 2 : 0;
    const reach = side === 'below' ? -(a.offset.vertical_m - half) : a.offset.vertical_m + half;
    clearance = Math.max(clearance, reach);
  }
  // Dimensions as the drawing gave them: from the pole axis they start at the axis and add the face radius.
  const shift = armLengthShift(design, arm);
  const from = pointOnAxis(ax, -shift);
  const where = shift > 0 ? ' from pole axis' : '';
  return {
    side,
    clearance_m: clearance,
    rows: [
      ...on.map((a) => ({ from, to: pointOnAxis(ax, a.position_m), text: `${a.id}: ${d.q(a.position_m + shift, 'length')}${where}` })),
      { from, to: pointOnAxis(ax, arm.length_m), text: `arm ${arm.id}: ${d.q(arm.length_m + shift, 'length')}${where}` },
    ],
  };
}

function positionText(design: Design, a: Attachment, d: Display): string {
  if (a.member === 'pole') return `${d.q(a.position_m, 'length')} above base` + (a.offset.vertical_m !== 0 ? `, centroid ${d.q(Math.abs(a.offset.vertical_m), 'length')} ${a.offset.vertical_m > 0 ? 'above' : 'below'}` : '');
  const arm = design.arms.find((x) => x.id === a.member);
  const shift = arm ? armLengthShift(design, arm) : 0;
  return shift > 0
    ? `${d.q(a.position_m + shift, 'length')} from pole axis (${d.q(a.position_m, 'length')} from face)`
    : `${d.q(a.position_m, 'length')} from pole face`;
}

/** Where the arms' dimensions start, as entered. */
function armOriginText(design: Design): string {
  const axis = design.arms.filter((a) => a.lengthFrom === 'axis').map((a) => a.id);
  if (axis.length === 0) return 'from the pole face';
  if (axis.length === design.arms.length) return 'from the pole axis';
  return `from the pole axis for ${axis.length === 1 ? 'arm' : 'arms'} ${axis.join(', ')}, from the pole face for the others`;
}

export function elevationPlanSection(loaded: LoadedDesign, analysis: DesignAnalysis): DocSection {
  void analysis;
  const { design } = loaded;
  const d = display(design.units);
  const main = mainArm(design);
  const phi = main ? main.direction_rad : 0;
  const horizontal: Vec3 = [Math.cos(phi), Math.sin(phi), 0];
  const inPlane = design.arms.filter((a) => Math.abs(Math.sin(a.direction_rad - phi)) < 1e-9);
  const memberDims = inPlane.map((a) => armDims(design, a, a === main ? 'below' : 'above', d));
  const elevation = elevationDrawing(buildScene(design, (m) => (m === 'pole' ? 'pole' : m), baseText(design, d)), {
    horizontal,
    horizontalLabel: directionName(phi, d),
    heightDims: heightDims(design, d),
    memberDims,
  });
  const plan = planDrawing(buildScene(design, (m) => (m === 'pole' ? 'pole' : `${m} (${d.angle(design.arms.find((a) => a.id === m)?.direction_rad ?? 0)})`), ''));
  const outOfPlane = design.arms.filter((a) => !inPlane.includes(a));
  const blocks: Block[] = [
    ...templateBlocks('elevation-plan', { unitSystem: design.units === 'us' ? 'US customary' : 'SI', armOrigin: armOriginText(design) }).blocks,
    {
      kind: 'figure',
      title: 'Elevation',
      svg: elevation.svg,
      width_pt: elevation.width,
      caption:
        (main ? `Looking square to arm ${main.id}, toward plan angle ${d.angle(phi + Math.PI / 2)}; ` : 'Looking toward +Y; ') +
        `${directionName(phi, d)} to the right, Z up. Drawn to scale.` +
        (outOfPlane.length === 1
          ? ` Arm ${outOfPlane[0].id} is not square to the view and appears shortened; its length is in the table of mast arms.`
          : outOfPlane.length > 1
            ? ` Arms ${outOfPlane.map((a) => a.id).join(', ')} are not square to the view and appear shortened; their lengths are in the table of mast arms.`
            : ''),
    },
    {
      kind: 'figure',
      title: 'Plan',
      svg: plan.svg,
      width_pt: plan.width,
      caption: 'Looking down, X to the right and Y up the page. Arm plan angles in brackets. Pole outline at the base (solid) and at the top (dashed). Drawn to scale.',
    },
  ];
  if (design.attachments.length > 0) {
    blocks.push({
      kind: 'table',
      title: 'Attachment centroids in global axes',
      header: ['Attachment', 'On', 'Position', 'X', 'Y', 'Z'],
      widths: [60, 50, '*', 62, 62, 62],
      rows: design.attachments.map((a) => {
        const s = sceneAttachment(design, a);
        return [a.id, memberText(a.member), positionText(design, a, d), ...vecText(s.centre, 'length', d)];
      }),
      note: 'The centroid is the point on the member axis at the attachment position plus the offset entered for the attachment; loads act there.',
    });
  }
  return { id: 'elevation-plan', title: ELEVATION_TITLE, blocks };
}
