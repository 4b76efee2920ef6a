// Section "Loads as entered": wind pressures and directions, ice, fatigue and the load
// combinations with their factors and sources, exactly as the design holds them.
import type { FatigueInput, LoadedDesign, LoadKind } from '../../design/design.ts';
import { CATEGORY_TEXT } from './combination-labels.ts';
import { formatNumber } from '../../units/units.ts';
import { withUnbrokenIds } from '../format/unbroken-ids.ts';
import type { Block, DocSection } from '../document.ts';
import { display, type Display } from './display.ts';
import { templateBlocks } from './templates.ts';

export const LOADS_TITLE = 'Loads as entered';


const LOAD_KINDS: readonly { kind: LoadKind; label: string }[] = [
  { kind: 'dead', label: 'Dead' },
  { kind: 'wind', label: 'Wind' },
  { kind: 'ice', label: 'Ice' },
  { kind: 'ice-wind', label: 'Wind on ice' },
];

function fatigueBlocks(f: FatigueInput, d: Display): Block[] {
  const on = (l: { pressure_Pa: number; importance: number } | null, what: string): string[][] =>
    l === null
      ? [[`${what}`, 'not applied']]
      : [[`${what}: equivalent static pressure (before Cd and I_F)`, d.q(l.pressure_Pa, 'pressure')], [`${what}: importance factor I_F (dimensionless)`, formatNumber(l.importance)]];
  const detail = (x: { category: string | null; threshold_Pa: number }) => `${d.q(x.threshold_Pa, 'stress')}${x.category !== null ? ` (category ${x.category})` : ''}`;
  return [
    {
      kind: 'table',
      title: 'Fatigue loads and thresholds',
      header: ['Item', 'Value'],
      widths: ['*', 150],
      rows: [
        ['Fatigue importance category', f.category],
        ['Yearly mean wind speed at the site', d.q(f.meanWindSpeed_mps, 'speed')],
        ...on(f.galloping, 'Galloping'),
        ...on(f.naturalGust, 'Natural wind gust'),
        ...on(f.truckGust, 'Truck-induced gust'),
        ['Drag coefficients Cd: panels, round tubes, multisided tubes, point attachments (dimensionless)', [f.drag.panels, f.drag.roundMembers, f.drag.multisidedMembers, f.drag.points].map((x) => formatNumber(x)).join(', ')],
        ['Constant-amplitude fatigue threshold, pole base detail', detail(f.poleBase)],
        ['Constant-amplitude fatigue threshold, arm root detail', detail(f.armRoot)],
        ['Constant-amplitude fatigue threshold, anchor bolts', detail(f.anchorBolts)],
      ],
    },
  ];
}

export function loadsSection(loaded: LoadedDesign): DocSection {
  const { design } = loaded;
  const d = display(design.units);
  const w = design.wind;
  const typed = [w.membersPressure_Pa, w.panelsPressure_Pa, w.pointsPressure_Pa].every((p) => p !== null);
  const blocks: Block[] = [...templateBlocks('loads', { pressuresAsGiven: w.speed === null || typed }).blocks];
  const pressureText = (p: number | null): string => (p === null ? 'from the wind speed, by height (below)' : `${d.q(p, 'pressure')} (input)`);

  blocks.push({
    kind: 'table',
    title: 'Design wind pressures',
    header: ['Applied to', 'Pressure'],
    widths: ['*', 150],
    rows: [
      ['Members (pole and arms), on the projected tube area', pressureText(w.membersPressure_Pa)],
      ['Sign panels, on the panel area', pressureText(w.panelsPressure_Pa)],
      ['Luminaires, signal heads and other point attachments, on their wind area', pressureText(w.pointsPressure_Pa)],
    ],
    ...(w.speed ? { note: 'A pressure "from the wind speed" varies with height: P = 0.00256 Kz Kd G V² Cd at each element end and attachment centroid, worked in each wind load case below.' } : {}),
  });
  const own = [['pole', design.pole.wind] as const, ...design.arms.map((a) => [`arm ${a.id}`, a.wind] as const)].filter(([, mw]) => mw && (mw.pressure_Pa !== null || mw.drag !== null));
  if (own.length > 0) {
    blocks.push({
      kind: 'table',
      title: 'Members with their own wind pressure or drag coefficient',
      header: ['Member', 'Pressure', 'Drag coefficient'],
      widths: ['*', 120, 120],
      rows: own.map(([name, mw]) => [name, mw!.pressure_Pa !== null ? `${d.q(mw!.pressure_Pa, 'pressure')} (input)` : '—', mw!.drag !== null ? `${mw!.drag} (input)` : '—']),
      note: 'A member pressure overrides the members pressure and the wind speed for that member; a member drag coefficient replaces the table value in the wind-speed path.',
    });
  }
  if (w.speed) {
    const s = w.speed;
    blocks.push({
      kind: 'table',
      title: 'Design wind speed',
      header: ['Item', 'Value'],
      widths: ['*', 150],
      rows: [
        [`Basic wind speed V (${s.basis})`, d.q(s.V_mps, 'speed')],
        ['Exposure category', s.exposure],
        ['Directionality factor Kd (dimensionless)', formatNumber(s.Kd)],
        ['Gust effect factor G (dimensionless)', formatNumber(s.G)],
        ['Factor Cv on V d in the drag of round tubes (dimensionless)', formatNumber(s.Cv)],
      ],
      note: 'Sources of the defaults are in the assumptions table of the criteria section; Kz and the drag coefficients are computed in the wind load cases.',
    });
  }

  blocks.push({
    kind: 'table',
    title: 'Wind directions',
    header: ['Direction', 'Plan angle the wind blows toward'],
    widths: ['*', 150],
    rows: w.directions.map((x) => [x.label, d.angle(x.angle_rad)]),
    note: 'Angles are measured in plan from +X toward +Y. Each direction is a separate wind load case.',
  });

  if (design.ice === null) {
    blocks.push({ kind: 'paragraph', text: 'Ice: none entered. No combination with ice is analysed.' });
  } else {
    blocks.push({
      kind: 'table',
      title: 'Ice',
      header: ['Item', 'Value'],
      widths: ['*', 150],
      rows: [
        ['Ice weight per surface area, on members and attachments', d.q(design.ice.weightPerArea_Pa, 'pressure')],
        ['Factor on the design wind pressures acting with ice (dimensionless)', formatNumber(design.ice.windFactor)],
      ],
    });
  }

  if (design.fatigue === null) {
    blocks.push({ kind: 'paragraph', text: 'Fatigue: not part of this design (no fatigue loads entered).' });
  } else {
    blocks.push(...fatigueBlocks(design.fatigue, d));
  }

  blocks.push({
    kind: 'table',
    title: 'Load combinations',
    header: ['Id', 'Category', 'Description', ...LOAD_KINDS.map((k) => k.label), 'Source of the factors'],
    widths: [40, 48, '*', 28, 28, 28, 34, '*'],
    rows: design.combinations.map((c) => [
      c.id,
      CATEGORY_TEXT[c.category],
      c.description,
      ...LOAD_KINDS.map((k) => {
        const f = c.factors[k.kind];
        return f === undefined ? '–' : formatNumber(f);
      }),
      c.source,
    ]),
    note: 'Load factors are dimensionless; "–" means the load does not enter the combination. Combinations are analysed as combined loads, each as its own analysis.',
  });

  return withUnbrokenIds([{ id: 'loads', title: LOADS_TITLE, blocks }], design.combinations.map((c) => c.id))[0]!;
}
