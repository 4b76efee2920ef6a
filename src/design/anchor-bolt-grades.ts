// ASTM F1554 anchor-bolt grades: specified minimum yield and tensile strengths.
import { KSI_PA } from '../units/units.ts';

export const F1554_SOURCE = 'ASTM F1554, mechanical requirements of anchor bolts (Grade 36: Fy 36, Fu 58 ksi; Grade 55: Fy 55, Fu 75 ksi; Grade 105: Fy 105, Fu 125 ksi), from memory; verify against the specification on the drawings';

const GRADES: Readonly<Record<string, { readonly Fy_ksi: number; readonly Fu_ksi: number }>> = {
  '36': { Fy_ksi: 36, Fu_ksi: 58 },
  '55': { Fy_ksi: 55, Fu_ksi: 75 },
  '105': { Fy_ksi: 105, Fu_ksi: 125 },
};

export function f1554Grade(grade: string): { readonly Fy_Pa: number; readonly Fu_Pa: number } | undefined {
  const g = GRADES[grade];
  return g === undefined ? undefined : { Fy_Pa: g.Fy_ksi * KSI_PA, Fu_Pa: g.Fu_ksi * KSI_PA };
}
