// Reads the "displacements (vx,vy,vz) for set ..." blocks of a ccx .dat file.
// ccx writes about 7 significant digits; Fortran drops the "E" of three-digit exponents
// ("1.234567-100"), which parseFloat would misread, so numbers are parsed explicitly.

export function parseFortranNumber(s: string): number {
  const m = /^([+-]?\d*\.?\d+)(?:[eEdD]?([+-]\d+))?$/.exec(s.trim());
  if (m === null) throw new Error(`CalculiX harness: cannot read number "${s}"`);
  return Number(m[1]) * 10 ** Number(m[2] ?? 0);
}

/** Node id -> [vx, vy, vz] from the last displacement block(s) of the file (a nonlinear step prints one
 * block per increment; later blocks overwrite earlier ones). */
export function parseDatDisplacements(dat: string): Map<number, [number, number, number]> {
  const result = new Map<number, [number, number, number]>();
  let inBlock = false;
  let inThisBlock = 0; // rows read since the last header (the blank line after a header is not the end)
  for (const line of dat.split(/\r?\n/)) {
    if (/^\s*displacements \(vx,vy,vz\)/.test(line)) {
      inBlock = true;
      inThisBlock = 0;
      continue;
    }
    if (!inBlock) continue;
    const parts = line.trim().split(/\s+/);
    if (line.trim() === '') {
      if (inThisBlock > 0) inBlock = false;
      continue;
    }
    if (parts.length !== 4 || !/^\d+$/.test(parts[0] ?? '')) {
      inBlock = false;
      continue;
    }
    inThisBlock++;
    result.set(Number(parts[0]), [parseFortranNumber(parts[1]!), parseFortranNumber(parts[2]!), parseFortranNumber(parts[3]!)]);
  }
  return result;
}
