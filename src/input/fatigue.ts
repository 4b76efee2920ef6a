// Validated fatigue input -> FatigueInput: which equivalent static loads apply (by structure
// kind unless the input says), their pressures and importance factors, and the details'
// thresholds, each default logged.
import type { FatigueDetail, FatigueInput, FatigueLoad, FatigueLoadName, StructureKind } from '../design/design.ts';
import { importanceFactor, IMPORTANCE_SOURCE, thresholdOfCategory, THRESHOLD_SOURCE } from '../design/fatigue-tables.ts';
import type { DefaultName } from './defaults.ts';
import type { AssumptionLog } from './assumptions.ts';
import { error, warning, type InputPath, type Problem } from './problem.ts';
import type { DesignInput } from './schema.ts';

const ANCHOR_BOLT_DEFAULT_CATEGORY = 'D';

const PRESSURE_DEFAULT: Readonly<Record<FatigueLoadName, DefaultName>> = {
  galloping: 'gallopingPressure',
  naturalGust: 'naturalGustPressure',
  truckGust: 'truckGustPressure',
};

const LOAD_LABEL: Readonly<Record<FatigueLoadName, string>> = { galloping: 'galloping', naturalGust: 'natural wind gust', truckGust: 'truck-induced gust' };

export function buildFatigue(input: DesignInput, log: AssumptionLog, problems: Problem[]): FatigueInput | null {
  const f = input.loads.fatigue;
  if (!f) return null;
  const kind = input.structure.kind;
  const base: InputPath = ['loads', 'fatigue'];
  const category = log.take('fatigueCategory', f.category) as FatigueInput['category'];

  const load = (name: FatigueLoadName): FatigueLoad | null => {
    const given = f[name];
    const table = importanceFactor(kind, name, category);
    if (given === false) return null;
    if (given === undefined && table === null) return null; // not a load of this kind of structure
    const block = given ?? {};
    if (given !== undefined && table === null && block.importance === undefined) {
      problems.push(error([...base, name, 'importance'], `the importance factor table has no ${LOAD_LABEL[name]} for a ${kind}; give importance to apply this load`));
    }
    const pressure = log.take(PRESSURE_DEFAULT[name], block.pressure);
    let importance: number;
    if (block.importance !== undefined) {
      importance = block.importance;
      log.note({ key: `loads.fatigue.${name}.importance`, label: `Fatigue importance factor, ${LOAD_LABEL[name]}`, value: importance, source: 'input', defaulted: false });
    } else {
      importance = table ?? 1;
      log.note({ key: `loads.fatigue.${name}.importance`, label: `Fatigue importance factor, ${LOAD_LABEL[name]} (category ${category}, ${kind})`, value: importance, source: IMPORTANCE_SOURCE, defaulted: true });
    }
    return { pressure_Pa: pressure, importance };
  };

  const galloping = load('galloping');
  const naturalGust = load('naturalGust');
  const truckBase = load('truckGust');
  const tg = f.truckGust === false || f.truckGust === undefined ? {} : f.truckGust;
  const arms = input.structure.arms ?? [];
  let truckGust: FatigueInput['truckGust'] = null;
  if (truckBase) {
    const lanes = (tg.lanes ?? []).map((l, i) => {
      const arm = arms.find((a) => String(a.id) === l.arm);
      const path: InputPath = [...base, 'truckGust', 'lanes', i];
      if (!arm) problems.push(error([...path, 'arm'], `no arm with id '${l.arm}'; expected one of: ${arms.map((a) => a.id).join(', ') || '(there are no arms)'}`));
      else if (l.to > arm.length * (1 + 1e-9)) problems.push(error([...path, 'to'], `the lane part ends beyond the tip of arm ${arm.id}`));
      if (l.to <= l.from) problems.push(error([...path, 'to'], 'expected the end of the lane part after its start (to > from)'));
      return { arm: l.arm, from_m: l.from, to_m: l.to };
    });
    if (tg.lanes === undefined) {
      log.note({ key: 'loads.fatigue.truckGust.lanes', label: 'Parts of each arm over the traffic lanes, where the truck gust acts', value: 'the whole length of every arm', source: 'polebook default (conservative: the whole arm is taken over traffic); give lanes to restrict it, verify', defaulted: true });
    }
    const full = log.take('truckGustFullHeight', tg.fullPressureHeight);
    const zero = log.take('truckGustZeroHeight', tg.zeroPressureHeight);
    if (zero <= full) problems.push(error([...base, 'truckGust', 'zeroPressureHeight'], 'expected the height of zero truck-gust pressure above the height of full pressure'));
    const areas = tg.horizontalAreas ?? {};
    const ids = new Set([...(input.attachments?.panels ?? []), ...(input.attachments?.points ?? [])].map((a) => String(a.id)));
    for (const id of Object.keys(areas)) {
      if (!ids.has(id)) problems.push(error([...base, 'truckGust', 'horizontalAreas', id], `no attachment with id '${id}'`, 'key'));
    }
    log.note({
      key: 'loads.fatigue.truckGust.horizontalAreas',
      label: 'Horizontal projected areas of attachments under the truck gust (seen from above)',
      value: Object.keys(areas).length === 0 ? 'none given: attachments carry no truck gust' : Object.keys(areas).join(', '),
      source: Object.keys(areas).length === 0 ? 'polebook default: the input gives no horizontal areas, so only the arms carry the truck gust; verify (a signal head seen from above has an area of its own)' : 'input',
      defaulted: Object.keys(areas).length === 0,
    });
    truckGust = {
      ...truckBase,
      lanes: tg.lanes === undefined ? arms.map((a) => ({ arm: String(a.id), from_m: 0, to_m: a.length })) : lanes,
      roadLevel_m: log.take('roadLevel', tg.roadLevel),
      fullPressureHeight_m: full,
      zeroPressureHeight_m: zero,
      horizontalAreas_m2: areas,
    };
  }
  if (!galloping && !naturalGust && !truckGust) problems.push(warning(base, 'every fatigue load is switched off, so no fatigue check is made; remove the fatigue block or switch a load on'));

  const dc = f.dragCoefficients ?? {};
  const detail = (what: 'poleBase' | 'armRoot' | 'anchorBolt', required: boolean): FatigueDetail | null => {
    const cat = f[`${what}Category`];
    const thr = f[`${what}Threshold`];
    const key = `loads.fatigue.${what}`;
    if (cat !== undefined && thr !== undefined) problems.push(error([...base, `${what}Threshold`], `give ${what}Category or ${what}Threshold, not both`));
    if (cat !== undefined) {
      const t = thresholdOfCategory(cat);
      if (t === undefined) return null; // the schema allows only known categories
      log.note({ key: `${key}Category`, label: `Constant-amplitude fatigue threshold, ${what} detail, category ${cat}`, value: t, dim: 'stress', source: THRESHOLD_SOURCE, defaulted: false });
      return { category: cat, threshold_Pa: t };
    }
    if (thr !== undefined) return { category: null, threshold_Pa: thr };
    if (required) problems.push(error([...base, `${what}Category`], `required key is missing: give the detail category (${what}Category, e.g. "E'") or the threshold (${what}Threshold) of the ${what === 'poleBase' ? 'pole base' : 'arm root'} detail`));
    return null;
  };
  const poleBase = detail('poleBase', true);
  const armRoot = detail('armRoot', arms.length > 0);
  let anchorBolts = detail('anchorBolt', false);
  if (anchorBolts === null) {
    const t = thresholdOfCategory(ANCHOR_BOLT_DEFAULT_CATEGORY) as number;
    log.note({ key: 'loads.fatigue.anchorBoltCategory', label: `Constant-amplitude fatigue threshold, anchor bolts in axial tension, category ${ANCHOR_BOLT_DEFAULT_CATEGORY}`, value: t, dim: 'stress', source: `from memory: anchor bolts in axial tension (stress range on the tensile stress area) are category D in the fatigue detail table of AASHTO LRFD-LTS; ${THRESHOLD_SOURCE}`, defaulted: true });
    anchorBolts = { category: ANCHOR_BOLT_DEFAULT_CATEGORY, threshold_Pa: t };
  }
  return {
    category,
    meanWindSpeed_mps: log.take('fatigueMeanWind', f.meanWindSpeed),
    galloping,
    naturalGust,
    truckGust,
    drag: {
      panels: log.take('dragPanels', dc.panels),
      roundMembers: log.take('dragRound', dc.roundMembers),
      multisidedMembers: log.take('dragMultisided', dc.multisidedMembers),
      points: log.take('dragPoints', dc.points),
    },
    poleBase: poleBase ?? { category: null, threshold_Pa: NaN },
    armRoot: armRoot ?? { category: null, threshold_Pa: NaN },
    anchorBolts,
  };
}
