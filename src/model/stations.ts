// Segment boundaries along a member: the required points (member ends, attachments, arm
// connections) plus a regular grid of segmentsPerMember pieces, with grid points that fall
// close to a required point dropped so no sliver element appears.

export interface RequiredPoint {
  readonly s_m: number;
  readonly tag: string;
}

export interface Station {
  readonly s_m: number;
  readonly tags: readonly string[];
}

/** Required points closer than this are one point (1 mm, or 1/1000 of the member). */
export const mergeTolerance = (length_m: number): number => Math.min(1e-3, 1e-3 * length_m);

/** A grid point is dropped when closer than this fraction of the grid spacing to a required point. */
export const GRID_SNAP_FRACTION = 0.25;

export function memberStations(member: string, length_m: number, required: readonly RequiredPoint[], segments: number): Station[] {
  if (!Number.isInteger(segments) || segments < 1) throw new RangeError(`segments per member must be a whole number >= 1; got ${segments}`);
  const tol = mergeTolerance(length_m);
  const pts = required.map((r) => {
    if (r.s_m < -tol || r.s_m > length_m + tol) {
      throw new RangeError(`${r.tag} at ${r.s_m} m lies outside member ${member} (length ${length_m} m)`);
    }
    return { s_m: Math.min(Math.max(r.s_m, 0), length_m), tag: r.tag };
  });
  pts.push({ s_m: 0, tag: '' }, { s_m: length_m, tag: '' });
  pts.sort((a, b) => a.s_m - b.s_m);
  const merged: { s_m: number; tags: string[] }[] = [];
  for (const p of pts) {
    const last = merged[merged.length - 1];
    if (last && p.s_m - last.s_m <= tol) {
      if (p.tag !== '' && !last.tags.includes(p.tag)) last.tags.push(p.tag);
    } else {
      merged.push({ s_m: p.s_m, tags: p.tag === '' ? [] : [p.tag] });
    }
  }
  // Member ends keep their exact positions.
  merged[0].s_m = 0;
  merged[merged.length - 1].s_m = length_m;
  const h = length_m / segments;
  const grid: Station[] = [];
  for (let k = 1; k < segments; k++) {
    const s = k * h;
    if (merged.every((m) => Math.abs(m.s_m - s) > GRID_SNAP_FRACTION * h)) grid.push({ s_m: s, tags: [] });
  }
  return [...merged, ...grid].sort((a, b) => a.s_m - b.s_m);
}
