// All load cases of a design on its frame model: dead, one wind case per direction, and,
// when the design has ice, the ice case and one wind-with-ice case per direction; when it has
// fatigue loads, each fatigue case (natural gust once per wind direction).
import type { Design } from '../design/design.ts';
import type { FrameModel } from '../model/frame.ts';
import { windCaseId } from './case-ids.ts';
import { deadLoadCase } from './dead-load.ts';
import { iceLoadCase } from './ice-load.ts';
import type { LoadCase } from './load-types.ts';
import { windLoadCase } from './wind-load.ts';
import { fatigueLoadCases } from './fatigue-load.ts';

export function buildLoadCases(design: Design, model: FrameModel): LoadCase[] {
  const ids = design.wind.directions.map((d) => windCaseId(d.angle_rad));
  const dup = ids.find((id, k) => ids.indexOf(id) !== k);
  if (dup) throw new RangeError(`two wind directions give the same case '${dup}'`);
  const cases: LoadCase[] = [deadLoadCase(design, model)];
  for (const d of design.wind.directions) cases.push(windLoadCase(design, model, d));
  if (design.ice) {
    cases.push(iceLoadCase(design, model, design.ice));
    for (const d of design.wind.directions) cases.push(windLoadCase(design, model, d, { kind: 'ice-wind', factor: design.ice.windFactor }));
  }
  cases.push(...fatigueLoadCases(design, model));
  return cases;
}
