// Tube and plate steel grades a user may name instead of a yield strength: the specified minimum
// yield strength of each, for the thinnest thickness range of the standard.
import { KSI_PA } from '../units/units.ts';

export const TUBE_STEEL_GRADE_SOURCE =
  'specified minimum yield strengths, from memory: EN 10025-2 and -3 (thickness up to 16 mm: S235 235, S275 275, S355 355, S420 420, S460 460 MPa); ASTM A572 (Grade 50, 55, 60, 65: that many ksi), ASTM A595 (Grade A 55, Grade B 60 ksi), ASTM A588 (50 ksi); verify against the steel specified on the drawings and its thickness';

const GRADES: Readonly<Record<string, number>> = {
  S235: 235e6,
  S275: 275e6,
  S355: 355e6,
  S420: 420e6,
  S460: 460e6,
  'A572-50': 50 * KSI_PA,
  'A572-55': 55 * KSI_PA,
  'A572-60': 60 * KSI_PA,
  'A572-65': 65 * KSI_PA,
  'A595-A': 55 * KSI_PA,
  'A595-B': 60 * KSI_PA,
  A588: 50 * KSI_PA,
};

export const TUBE_STEEL_GRADES = Object.keys(GRADES) as readonly string[];

export function tubeSteelYield(grade: string): number | undefined {
  return GRADES[grade];
}
