// The limits of ours on an input, as the README prints them (npm run docs), from the constants
// the input stage enforces, so the two cannot drift apart.
import { MAX_ADDED_WIND_DIRECTIONS, MAX_ANALYSES, MAX_ARMS, MAX_COMBINATIONS, MAX_INPUT_BYTES, MAX_PANELS, MAX_POINTS, MAX_REVISIONS, MAX_STATION_RESULTS } from './size-limits.ts';
import { MAX_STATIONS_PER_MEMBER } from './normalise.ts';
import { ARM_RISE_MAX_RAD, ARM_RISE_MIN_RAD } from './plausibility.ts';

const deg = (rad: number): number => Math.round((rad * 180) / Math.PI);

export function inputLimitsMarkdown(): string {
  const rows: [string, string][] = [
    ['input file size', `${MAX_INPUT_BYTES.toLocaleString('en-US')} bytes`],
    ['arms (`structure.arms`)', `${MAX_ARMS}`],
    ['sign panels / point attachments', `${MAX_PANELS} / ${MAX_POINTS}`],
    ['combinations (`combinations`)', `${MAX_COMBINATIONS}`],
    ['added wind directions (`loads.wind.directions.add`)', `${MAX_ADDED_WIND_DIRECTIONS}`],
    ['revisions (`project.revisions`)', `${MAX_REVISIONS}`],
    ['analyses in one build (each wind combination once per wind direction, plus the fatigue cases)', `${MAX_ANALYSES}`],
    ['result stations per member (`analysis.stationSpacing`)', `${MAX_STATIONS_PER_MEMBER.toLocaleString('en-US')}`],
    ['result stations of all members times the analyses', `${MAX_STATION_RESULTS.toLocaleString('en-US')}`],
    ['plan directions (arm, offset, face, wind)', 'at least 0 and below 360 deg, never wrapped around'],
    ['arm rise (`structure.arms[].rise`)', `${deg(ARM_RISE_MIN_RAD)} to ${deg(ARM_RISE_MAX_RAD)} deg`],
    ['load factors', 'at least 0, at most 5'],
  ];
  return [
    'polebook refuses, before any analysis, an input past these limits of ours (exit code 2, with the key and the limit). They leave a wide margin over any real support (a few arms, a few dozen analyses) and keep a build under about a minute and a gigabyte of memory: a build at the analysis and station limits took about 15 s and 0.8 GB on our 2-core test machine.',
    '',
    '| limit | value |',
    '| --- | --- |',
    ...rows.map(([k, v]) => `| ${k} | ${v} |`),
    '',
    'An input must be UTF-8 text; control characters in its text, and characters the package fonts (DejaVu Sans and DejaVu Sans Mono) cannot draw, are refused at their place.',
  ].join('\n');
}
