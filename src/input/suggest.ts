// "Did you mean" suggestions by edit distance (optimal string alignment, case-insensitive).

export function editDistance(a: string, b: string): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  const d: number[][] = Array.from({ length: s.length + 1 }, (_, i) => [i, ...new Array<number>(t.length).fill(0)]);
  for (let j = 0; j <= t.length; j++) d[0][j] = j;
  for (let i = 1; i <= s.length; i++) {
    for (let j = 1; j <= t.length; j++) {
      const cost = s[i - 1] === t[j - 1] ? 0 : 1;
      d[i][j] = Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost);
      if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1]) d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
    }
  }
  return d[s.length][t.length];
}

/** The closest candidate within a distance that scales with the word's length, if any. */
export function closest(word: string, candidates: readonly string[]): string | undefined {
  const limit = Math.max(2, Math.floor(word.length / 3));
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const c of candidates) {
    const dist = editDistance(word, c);
    if (dist < bestDistance) {
      best = c;
      bestDistance = dist;
    }
  }
  return bestDistance <= limit ? best : undefined;
}

/** Words a new user tends to type for one of our keys, where edit distance cannot find it. */
const SYNONYMS: Readonly<Record<string, readonly string[]>> = {
  yieldStrength: ['Fy', 'fy', 'yield', 'yieldStress'],
  E: ['elasticModulus', 'modulus', 'youngsModulus'],
  G: ['shearModulus'],
  poissonRatio: ['nu', 'poisson', 'poissonsRatio'],
  wall: ['thickness', 'wallThickness', 't'],
  rootAcrossFlats: ['rootDiameter', 'baseDiameter', 'baseAcrossFlats', 'bottomDiameter'],
  tipAcrossFlats: ['tipDiameter', 'topDiameter', 'topAcrossFlats'],
  rootDiameter: ['baseDiameter', 'bottomDiameter', 'rootAcrossFlats'],
  tipDiameter: ['topDiameter', 'tipAcrossFlats'],
  attachHeight: ['mountingHeight', 'attachmentHeight', 'elevation', 'z'],
  direction: ['angle', 'azimuth', 'orientation', 'planAngle'],
  rise: ['riseAngle', 'slope', 'incline'],
  weightPerArea: ['unitWeight', 'weightPerSqFt', 'weight'],
  windArea: ['area', 'projectedArea', 'EPA'],
  on: ['arm', 'member', 'attachedTo', 'mountedOn'],
  position: ['location', 'distance', 'station', 'x'],
  structureId: ['id', 'structureNumber', 'number'],
  engineerOfRecord: ['eor', 'engineer'],
  taper: ['taperRate'],
};

/** A key suggestion: a synonym we know of, else the nearest by edit distance. */
export function suggestKey(word: string, known: readonly string[]): string | undefined {
  for (const k of known) if ((SYNONYMS[k] ?? []).includes(word)) return k;
  return closest(word, known);
}
