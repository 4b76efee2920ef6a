// Whether CalculiX (Debian package calculix-ccx, command `ccx`) can be run here.
import { spawnSync } from 'node:child_process';

export function hasCcx(): boolean {
  const r = spawnSync('ccx', ['-v'], { encoding: 'utf8', timeout: 10_000 });
  return r.error === undefined && /Version\s+\d/.test(`${r.stdout}${r.stderr}`);
}

export const CCX_ABSENT_MESSAGE = 'CalculiX (ccx) not found: reference comparisons skipped (install Debian package calculix-ccx)';
