// Whether CalculiX (Debian package calculix-ccx, command `ccx`) can be run here.
import { spawnSync } from 'node:child_process';

export function hasCcx(): boolean {
  const r = spawnSync('ccx', ['-v'], { encoding: 'utf8', timeout: 10_000 });
  return r.error === undefined && /Version\s+\d/.test(`${r.stdout}${r.stderr}`);
}

export const CCX_ABSENT_MESSAGE = 'CalculiX (ccx) not found: reference comparisons skipped (install Debian package calculix-ccx)';

/**
 * True when ccx runs. When it does not, says so on the console; and when the environment sets
 * POLEBOOK_REQUIRE_CCX=1 (for CI, which installs calculix-ccx), fails instead of skipping.
 */
export function ccxAvailableOrSkip(): boolean {
  if (hasCcx()) return true;
  if (process.env['POLEBOOK_REQUIRE_CCX'] === '1') {
    throw new Error('CalculiX (ccx) not found but POLEBOOK_REQUIRE_CCX=1: install Debian package calculix-ccx');
  }
  console.warn(CCX_ABSENT_MESSAGE);
  return false;
}
