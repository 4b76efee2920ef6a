// Warnings for magnitudes that can be built but look like a slip: a wind speed typed as a
// pressure, a pole taller than polebook is meant for, a panel's whole weight typed as its
// weight per area. The ranges are ours (common practice), stated in each message.
import { FT_M, PSF_PA, formatNumber, formatQuantity, type UnitSystem } from '../units/units.ts';
import { warning, type InputPath, type Problem } from './problem.ts';
import type { DesignInput } from './schema.ts';

/** polebook's scope: poles up to 60 ft (our limit, not a code limit). */
export const POLE_HEIGHT_SCOPE_M = 60 * FT_M;
/** Arms longer than 75 ft are beyond the usual range of mast arms (common practice). */
export const ARM_LENGTH_USUAL_M = 75 * FT_M;
/** Sign panels with their bracing weigh a few psf; above this it reads like a whole weight (common practice). */
export const PANEL_WEIGHT_SUSPECT_PA = 25 * PSF_PA;

/** Arm rises polebook accepts (limits of ours): a mast arm rises 0 to 15 deg, a luminaire arm a little more. */
export const ARM_RISE_MIN_RAD = (-45 * Math.PI) / 180;
export const ARM_RISE_MAX_RAD = (80 * Math.PI) / 180;
/** An arm rising more than this is nearly vertical: accepted, but more a pole than an arm (common practice). */
export const ARM_RISE_STEEP_RAD = (60 * Math.PI) / 180;
/** Arms closer than this in height and plan direction lie on one another (a copied block). */
const SAME_ARM_HEIGHT_M = 0.05;
const SAME_ARM_DIRECTION_RAD = (1 * Math.PI) / 180;

/** Tube walls outside these D/t read like a slip of the unit or the field (common practice). */
export const WALL_DT_PLAUSIBLE = { min: 10, max: 200 } as const;

/** A wall whose diameter-to-thickness ratio, at a diameter the user gave, is outside the usual range. */
function wallSlip(section: { readonly wall: number; readonly rootDiameter?: number | undefined; readonly tipDiameter?: number | undefined }, what: string): string | undefined {
  for (const [end, D] of [['root', section.rootDiameter], ['tip', section.tipDiameter]] as const) {
    if (D === undefined) continue;
    const dt = D / section.wall;
    if (dt < WALL_DT_PLAUSIBLE.min || dt > WALL_DT_PLAUSIBLE.max) {
      return `the ${what} wall gives D/t = ${formatNumber(dt, 3)} at the ${end}, outside the ${WALL_DT_PLAUSIBLE.min}-${WALL_DT_PLAUSIBLE.max} of pole and arm tubes (common practice); check the wall and its unit`;
    }
  }
  return undefined;
}

/** A design pressure whose number, in the units the user typed, falls where basic wind speeds do. */
function pressureSlip(p_Pa: number, units: UnitSystem): string | undefined {
  if (units === 'us') {
    const psf = p_Pa / PSF_PA;
    if (psf >= 85 && psf <= 200) {
      return `${formatNumber(psf, 4)} psf looks like a basic wind speed in mph (about 90-180 mph) typed in a pressure field; design pressures are typically tens of psf. Check the value`;
    }
    if (psf > 200) return `${formatNumber(psf, 4)} psf is far above typical design wind pressures (tens of psf); check the value and its unit`;
    if (psf > 0 && psf < 3) return `${formatNumber(psf, 3)} psf is very low for a design wind pressure; was it typed in kPa? (1 kPa = 20.9 psf)`;
    return undefined;
  }
  const kPa = p_Pa / 1000;
  if (kPa >= 35 && kPa <= 90) {
    return `${formatNumber(kPa, 4)} kPa looks like a basic wind speed in m/s (about 40-80 m/s) typed in a pressure field; design pressures are typically 0.5-3 kPa. Check the value`;
  }
  if (kPa > 10) return `${formatNumber(kPa, 4)} kPa is far above typical design wind pressures (0.5-3 kPa); was it typed in Pa? Check the value and its unit`;
  return undefined;
}

/** Runs on the schema output, so warnings are given even when the geometry has errors.
 * poleRootDiameter_m is known only when the pole section could be built. */
export function plausibilityWarnings(input: DesignInput, poleRootDiameter_m: number | undefined): Problem[] {
  const out: Problem[] = [];
  const units = input.units;
  const wind = input.loads.wind;
  for (const key of ['pressure', 'panels', 'members', 'points'] as const) {
    const p = wind[key];
    if (p === undefined) continue;
    const slip = pressureSlip(p, units);
    if (slip) out.push(warning(['loads', 'wind', key], slip));
  }
  const poleHeight_m = input.structure.pole.height;
  if (poleHeight_m > POLE_HEIGHT_SCOPE_M * (1 + 1e-9)) {
    out.push(
      warning(['structure', 'pole', 'height'], `a pole of ${formatQuantity(poleHeight_m, 'length', units)} is taller than polebook's scope of 60 ft (18.3 m), a limit of ours; high-mast poles need checks polebook does not make. Check the value and its unit`),
    );
  }
  const poleWall = wallSlip(input.structure.pole.section, 'pole');
  if (poleWall) out.push(warning(['structure', 'pole', 'section', 'wall'], poleWall));
  (input.structure.arms ?? []).forEach((a, i) => {
    const armWall = wallSlip(a.section, `arm ${a.id}`);
    if (armWall) out.push(warning(['structure', 'arms', i, 'section', 'wall'], armWall));
    // A drooping arm whose tip ends below the base plate would be in the foundation or the ground.
    const tipHeight_m = a.attachHeight + a.length * Math.sin(a.rise ?? 0);
    if (tipHeight_m < 0) {
      out.push(
        warning(['structure', 'arms', i, a.rise === undefined ? 'attachHeight' : 'rise'], `the tip of arm ${a.id} is ${formatQuantity(-tipHeight_m, 'length', units)} below the pole base (attached at ${formatQuantity(a.attachHeight, 'length', units)}, ${formatQuantity(a.length, 'length', units)} long, rise ${formatNumber(((a.rise ?? 0) * 180) / Math.PI, 3)} deg); check the rise and its sign`),
      );
    }
    if (a.rise !== undefined && a.rise > ARM_RISE_STEEP_RAD && a.rise <= ARM_RISE_MAX_RAD) {
      out.push(warning(['structure', 'arms', i, 'rise'], `arm ${a.id} rises ${formatNumber((a.rise * 180) / Math.PI, 3)} deg, nearly vertical (mast arms rise 0 to 15 deg, common practice); check that the rise is meant, and not its complement or a second pole`));
    }
    if (a.length > ARM_LENGTH_USUAL_M * (1 + 1e-9)) {
      out.push(warning(['structure', 'arms', i, 'length'], `arm ${a.id} is ${formatQuantity(a.length, 'length', units)} long, beyond the usual 75 ft (22.9 m) of mast arms (our limit); check the value and its unit`));
    }
  });
  sameArmWarnings(input, out);
  offsetWarnings(input, out);
  (input.attachments?.panels ?? []).forEach((p, i) => {
    if (p.weightPerArea > PANEL_WEIGHT_SUSPECT_PA) {
      const path: InputPath = ['attachments', 'panels', i, 'weightPerArea'];
      out.push(
        warning(path, `${formatQuantity(p.weightPerArea, 'pressure', units)} per panel area is far above the few psf (0.1-0.4 kPa) of sign panels with bracing; it reads like the panel's whole weight. Give weight per area = weight / (width x height)`),
      );
    }
  });
  const bolts = input.criteria?.anchorBolts;
  if (bolts && poleRootDiameter_m !== undefined && bolts.circleDiameter <= poleRootDiameter_m) {
    out.push(warning(['criteria', 'anchorBolts', 'circleDiameter'], 'the bolt circle is not larger than the pole base; anchor bolts normally sit outside the tube. Check the value and its unit'));
  }
  return out;
}

/** Two arms at one height and one plan direction lie on one another: usually a block copied and not edited. */
function sameArmWarnings(input: DesignInput, out: Problem[]): void {
  const arms = input.structure.arms ?? [];
  arms.forEach((a, i) => {
    const twin = arms.findIndex((b, j) => {
      if (j >= i) return false;
      const dPlan = Math.abs(((a.direction - b.direction + 3 * Math.PI) % (2 * Math.PI)) - Math.PI);
      return Math.abs(a.attachHeight - b.attachHeight) <= SAME_ARM_HEIGHT_M && dPlan <= SAME_ARM_DIRECTION_RAD;
    });
    if (twin >= 0) {
      out.push(warning(['structure', 'arms', i, 'direction'], `arm ${a.id} has the height and plan direction of arm ${arms[twin]!.id}: the two lie on one another. Check the direction and the attachment height (a copied block?)`));
    }
  });
}

/** An attachment offset larger than the whole structure is a slip of the unit (inches typed as feet, mm as m). */
function offsetWarnings(input: DesignInput, out: Problem[]): void {
  const size = Math.max(input.structure.pole.height, ...(input.structure.arms ?? []).map((a) => a.length));
  const check = (kind: 'panels' | 'points', list: readonly { readonly id: string; readonly offset?: { readonly vertical?: number | undefined; readonly lateral?: number | undefined } | undefined }[] | undefined) => {
    (list ?? []).forEach((x, i) => {
      for (const key of ['vertical', 'lateral'] as const) {
        const v = x.offset?.[key];
        if (v !== undefined && Math.abs(v) > size) {
          out.push(warning(['attachments', kind, i, 'offset', key], `the ${key} offset of ${x.id}, ${formatQuantity(Math.abs(v), 'length', input.units)}, is larger than the structure itself (${formatQuantity(size, 'length', input.units)}); check the value and its unit`));
        }
      }
    });
  };
  check('panels', input.attachments?.panels);
  check('points', input.attachments?.points);
}
