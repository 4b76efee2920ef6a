// The small pair of axes in a corner of a view: which way is right and which is up on the page.
import { measureText } from '../charts/text-measure.ts';
import type { Rect } from './label-place.ts';
import { arrow, group, text } from './svg.ts';

/** Axes with their origin at (x, y): right and up, named; the box keeps labels off them. */
export function viewAxes(x: number, y: number, names: readonly [string, string]): { svg: string; box: Rect } {
  const svg =
    group([arrow(x, y, x + 18, y, { width: 0.7, head: 4 }), arrow(x, y, x, y - 18, { width: 0.7, head: 4 })]) +
    text(x + 21, y + 2.5, names[0], { size: 7 }) +
    text(x + 3, y - 21, names[1], { size: 7 });
  return { svg, box: [x - 2, y - 30, x + 24 + measureText({ fontSize: 7 }, names[0]), y + 4] };
}
