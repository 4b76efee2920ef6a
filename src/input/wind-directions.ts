// The final list of wind directions to analyse: found from the geometry (normals to the
// panel faces and to the main arm, both ways, and along the main arm) plus the angles
// the input adds, without duplicates.
import type { Arm, Attachment, WindDirection } from '../design/design.ts';

const TWO_PI = 2 * Math.PI;
/** Two directions closer than 0.001 deg are the same analysis: the load case ids carry the
 * direction to 0.001 deg (src/loads/case-ids.ts), so two directions closer than that would share
 * an id (found by tests/fuzz: 45 and 45.0002 deg stopped the analysis). */
const SAME_DIRECTION_RAD = (0.001 * Math.PI) / 180;

export function normaliseAngle(a: number): number {
  const r = ((a % TWO_PI) + TWO_PI) % TWO_PI;
  return TWO_PI - r < SAME_DIRECTION_RAD ? 0 : r;
}

/** The longest arm; the first one listed when lengths tie. */
export function mainArm(arms: readonly Arm[]): Arm | undefined {
  return arms.reduce<Arm | undefined>((best, a) => (best === undefined || a.length_m > best.length_m ? a : best), undefined);
}

export function windDirections(arms: readonly Arm[], attachments: readonly Attachment[], auto: boolean, added_rad: readonly number[]): WindDirection[] {
  const found: { angle_rad: number; labels: string[] }[] = [];
  const add = (angle: number, label: string) => {
    const a = normaliseAngle(angle);
    const same = found.find((f) => {
      const d = Math.abs(f.angle_rad - a);
      return Math.min(d, TWO_PI - d) < SAME_DIRECTION_RAD;
    });
    if (same) {
      if (!same.labels.includes(label)) same.labels.push(label);
    } else found.push({ angle_rad: a, labels: [label] });
  };
  if (auto) {
    const main = mainArm(arms);
    if (main) {
      add(main.direction_rad, `along arm ${main.id}, toward its tip`);
      add(main.direction_rad + Math.PI / 2, `normal to arm ${main.id}, toward its left side`);
      add(main.direction_rad - Math.PI / 2, `normal to arm ${main.id}, toward its right side`);
    }
    for (const att of attachments) {
      if (att.kind !== 'panel') continue;
      add(att.faceNormal_rad, `normal to panel ${att.id}, on its face`);
      add(att.faceNormal_rad + Math.PI, `normal to panel ${att.id}, on its back`);
    }
    if (!main && found.length === 0) {
      add(0, 'along +X (no arm or panel to orient by)');
      add(Math.PI / 2, 'along +Y (no arm or panel to orient by)');
    }
  }
  for (const a of added_rad) add(a, 'added in the input');
  return found.map((f) => ({ angle_rad: f.angle_rad, label: f.labels.join('; ') }));
}
