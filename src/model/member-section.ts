// Section properties of a named member of the design at a distance along it, for checks
// and the package (the real taper, not the segment idealisation of the frame model).
import type { Design } from '../design/design.ts';
import { findAxis } from './member-axes.ts';
import { sectionAt } from './taper.ts';
import type { TubeProperties } from './tube-section.ts';

/** member: 'pole' or an arm id; s_m from the member root (pole base, arm root at the pole face). */
export function memberSectionAt(design: Design, member: string, s_m: number): TubeProperties {
  const ax = findAxis(design, member);
  return sectionAt(ax.section, ax.length_m, s_m);
}
