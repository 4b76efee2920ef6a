// Valid but degenerate designs whose ratios have zero denominators somewhere: no wind, weightless
// attachments, no attachments, no arms, all-zero combinations, 16-sided tubes. Each must analyse and
// print "–" (or leave the ratio out) where a ratio has no meaning, never NaN or Infinity.
import type { Json } from './mutate.ts';
import { FUZZ_SOURCES } from './sources.ts';

type Obj = { [k: string]: Json };
const clone = (name: string): Obj => structuredClone(FUZZ_SOURCES.find((s) => s.name === name)!.data) as Obj;
const at = (o: Obj, ...keys: string[]): Obj => keys.reduce((x, k) => x[k] as Obj, o);

function zeroWind(o: Obj): Obj {
  const w = at(o, 'loads', 'wind');
  for (const k of ['pressure', 'panels', 'members', 'points']) if (k in w) w[k] = 0;
  w.members = 0;
  const ice = at(o, 'loads').ice as Obj | undefined;
  if (ice) ice.windFactor = 0;
  return o;
}
function weightless(o: Obj): Obj {
  const a = (o.attachments ?? {}) as Obj;
  for (const p of (a.panels ?? []) as Obj[]) p.weightPerArea = 0;
  for (const p of (a.points ?? []) as Obj[]) p.weight = 0;
  return o;
}
function noAttachments(o: Obj): Obj {
  delete o.attachments;
  return o;
}
function noArms(o: Obj): Obj {
  delete at(o, 'structure').arms;
  const truck = ((at(o, 'loads').fatigue as Obj | undefined)?.truckGust ?? undefined) as Obj | undefined;
  if (truck && typeof truck === 'object') delete truck.lanes; // lanes name arms
  return noAttachments(o);
}
function sixteenSided(o: Obj): Obj {
  const sections = [at(o, 'structure', 'pole', 'section'), ...((at(o, 'structure').arms ?? []) as Obj[]).map((a) => a.section as Obj)];
  for (const s of sections) {
    if ('rootDiameter' in s) { s.rootAcrossFlats = s.rootDiameter; delete s.rootDiameter; }
    if ('tipDiameter' in s) { s.tipAcrossFlats = s.tipDiameter; delete s.tipDiameter; }
    s.shape = 'multisided';
    s.sides = 16;
  }
  return o;
}
function zeroRise(o: Obj): Obj {
  for (const a of (at(o, 'structure').arms ?? []) as Obj[]) a.rise = 0;
  return o;
}
/** Wind alone, the dead load taken away by a zero factor: no axial force, so no P-delta. */
function windOnly(o: Obj): Obj {
  o.combinations = [{ id: 'wind-only', category: 'extreme-wind', factors: { dead: 0, wind: 1 } }];
  return o;
}
/** Dead load only, with the wind taken away by a zero factor. */
function deadOnly(o: Obj): Obj {
  o.combinations = [{ id: 'dead-only', category: 'strength', factors: { dead: 1.25, wind: 0 } }];
  return o;
}
function firstOrderSettings(o: Obj): Obj {
  o.analysis = { ...((o.analysis ?? {}) as Obj), secondOrder: false };
  return o;
}

export const EDGE_DESIGNS: readonly { readonly name: string; readonly data: Json }[] = [
  { name: 'zero-wind', data: zeroWind(clone('cantilever-sign.yaml')) },
  { name: 'weightless-attachments', data: weightless(clone('signal-support.yaml')) },
  { name: 'no-attachments', data: noAttachments(clone('luminaire-twin.yaml')) },
  { name: 'no-arms', data: noArms(clone('luminaire-twin-us.yaml')) },
  { name: 'no-arms-zero-wind', data: zeroWind(noArms(clone('cantilever-sign.yaml'))) },
  { name: 'zero-rise-16-sided', data: zeroRise(sixteenSided(clone('luminaire-twin.yaml'))) },
  { name: '16-sided-sign', data: sixteenSided(clone('cantilever-sign.yaml')) },
  { name: 'wind-only', data: windOnly(clone('signal-support.yaml')) },
  { name: 'wind-only-no-arms-zero-wind', data: windOnly(zeroWind(noArms(clone('luminaire-twin.yaml')))) },
  { name: 'dead-only', data: deadOnly(clone('cantilever-sign.yaml')) },
  { name: 'weightless-zero-wind-first-order', data: firstOrderSettings(zeroWind(weightless(clone('luminaire-twin-us.yaml')))) },
];
