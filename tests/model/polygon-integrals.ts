// Independent exact integrals of plane polygons (shoelace / Green's theorem), used to
// check the section formulas without reusing them. Vertices counter-clockwise.
// Area: A = 1/2 Σ (x_i y_{i+1} − x_{i+1} y_i); second moment about the x axis:
// Ix = 1/12 Σ (x_i y_{i+1} − x_{i+1} y_i)(y_i² + y_i y_{i+1} + y_{i+1}²)
// (closed forms from Green's theorem, e.g. Steger, "On the calculation of arbitrary moments
// of polygons", 1996; from memory).
export type Pt = readonly [number, number];

export function polygonArea(p: readonly Pt[]): number {
  let s = 0;
  for (let k = 0; k < p.length; k++) {
    const [x0, y0] = p[k];
    const [x1, y1] = p[(k + 1) % p.length];
    s += x0 * y1 - x1 * y0;
  }
  return s / 2;
}

export function polygonIx(p: readonly Pt[]): number {
  let s = 0;
  for (let k = 0; k < p.length; k++) {
    const [x0, y0] = p[k];
    const [x1, y1] = p[(k + 1) % p.length];
    s += (x0 * y1 - x1 * y0) * (y0 * y0 + y0 * y1 + y1 * y1);
  }
  return s / 12;
}

export function polygonIy(p: readonly Pt[]): number {
  // Rotating by -90 degrees, (x, y) -> (y, -x), keeps the orientation and maps Iy to Ix.
  return polygonIx(p.map(([x, y]) => [y, -x] as Pt));
}

export function polygonPerimeter(p: readonly Pt[]): number {
  let s = 0;
  for (let k = 0; k < p.length; k++) {
    const [x0, y0] = p[k];
    const [x1, y1] = p[(k + 1) % p.length];
    s += Math.hypot(x1 - x0, y1 - y0);
  }
  return s;
}

/** Regular n-gon with the given distance from centre to the flats (apothem), rotated by rot_rad. */
export function regularPolygon(n: number, apothem: number, rot_rad = 0): Pt[] {
  const R = apothem / Math.cos(Math.PI / n);
  const pts: Pt[] = [];
  for (let k = 0; k < n; k++) {
    const a = rot_rad + (2 * Math.PI * (k + 0.5)) / n;
    pts.push([R * Math.cos(a), R * Math.sin(a)]);
  }
  return pts;
}

/** Circle approximated by an inscribed regular polygon of many vertices. */
export function circle(radius: number, n = 20000): Pt[] {
  const pts: Pt[] = [];
  for (let k = 0; k < n; k++) {
    const a = (2 * Math.PI * k) / n;
    pts.push([radius * Math.cos(a), radius * Math.sin(a)]);
  }
  return pts;
}
