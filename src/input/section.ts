// A tube section from its input: two of (root size, tip size, taper) and the wall,
// checked so that the tube can be built.
import type { TubeSection } from '../design/design.ts';
import { formatQuantity, type UnitSystem } from '../units/units.ts';
import { error, type InputPath, type Problem } from './problem.ts';
import type { SectionInput } from './schema.ts';

export function buildSection(input: SectionInput, length_m: number, path: InputPath, system: UnitSystem, problems: Problem[]): TubeSection | undefined {
  const multi = input.shape === 'multisided';
  const rootKey = multi ? 'rootAcrossFlats' : 'rootDiameter';
  const tipKey = multi ? 'tipAcrossFlats' : 'tipDiameter';
  const rootGiven = input.shape === 'multisided' ? input.rootAcrossFlats : input.rootDiameter;
  const tipGiven = input.shape === 'multisided' ? input.tipAcrossFlats : input.tipDiameter;
  const taper = input.taper;
  const given = [rootGiven, tipGiven, taper].filter((v) => v !== undefined).length;
  const len = (v: number) => formatQuantity(v, 'section', system);
  if (given !== 2) {
    problems.push(error(path, `give exactly two of ${rootKey}, ${tipKey} and taper (${given} given)`));
    return undefined;
  }
  let root: number;
  let tip: number;
  let culprit: string;
  if (rootGiven !== undefined && tipGiven !== undefined) {
    root = rootGiven;
    tip = tipGiven;
    culprit = tipKey;
  } else if (rootGiven !== undefined) {
    root = rootGiven;
    tip = rootGiven - (taper as number) * length_m;
    culprit = 'taper';
  } else {
    tip = tipGiven as number;
    root = (tipGiven as number) + (taper as number) * length_m;
    culprit = 'taper';
  }
  if (!(tip > 0) || !(root > 0)) {
    problems.push(
      error([...path, culprit], `the taper over the member length of ${formatQuantity(length_m, 'length', system)} leads to a diameter of ${len(Math.min(root, tip))}; a diameter must be positive`),
    );
    return undefined;
  }
  if (tip > root * (1 + 1e-12)) {
    problems.push(error([...path, culprit], `the tip (${len(tip)}) is larger than the root (${len(root)}); members must taper toward the tip or be prismatic`));
    return undefined;
  }
  const smallest = Math.min(root, tip);
  if (input.wall >= smallest / 2) {
    problems.push(error([...path, 'wall'], `wall ${len(input.wall)} is at or over the radius (${len(smallest / 2)} at the smaller end); expected a thin tube wall`));
    return undefined;
  }
  return {
    shape: input.shape,
    sides: input.shape === 'multisided' ? input.sides : null,
    rootDiameter_m: root,
    tipDiameter_m: tip,
    wall_m: input.wall,
  };
}
