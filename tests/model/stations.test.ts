import { describe, expect, it } from 'vitest';
import { memberSectionAt } from '../../src/model/member-section.ts';
import { GRID_SNAP_FRACTION, memberStations } from '../../src/model/stations.ts';
import { makeDesign } from './design-factory.ts';

// Expected station lists are written out by hand from the rule stated in stations.ts
// (regular grid of n pieces; grid points within a quarter spacing of a required point are
// dropped; required points within 1 mm merge).
describe('member stations', () => {
  it('a required point on a grid point adds no node', () => {
    const st = memberStations('A1', 9, [{ s_m: 4.5, tag: 'attachment:S1' }], 10);
    expect(st.map((s) => +s.s_m.toFixed(9))).toEqual([0, 0.9, 1.8, 2.7, 3.6, 4.5, 5.4, 6.3, 7.2, 8.1, 9]);
    expect(st[5].tags).toEqual(['attachment:S1']);
  });
  it('a grid point within a quarter spacing of a required point is dropped', () => {
    expect(GRID_SNAP_FRACTION).toBe(0.25);
    const st = memberStations('A1', 9, [{ s_m: 4.6, tag: 'attachment:S1' }], 10);
    expect(st.map((s) => +s.s_m.toFixed(9))).toEqual([0, 0.9, 1.8, 2.7, 3.6, 4.6, 5.4, 6.3, 7.2, 8.1, 9]);
  });
  it('a grid point farther than a quarter spacing stays', () => {
    const st = memberStations('A1', 9, [{ s_m: 4.8, tag: 'attachment:S1' }], 10);
    expect(st.map((s) => +s.s_m.toFixed(9))).toEqual([0, 0.9, 1.8, 2.7, 3.6, 4.5, 4.8, 5.4, 6.3, 7.2, 8.1, 9]);
  });
  it('required points within 1 mm merge and keep all their tags; the member ends stay exact', () => {
    const st = memberStations('A1', 9, [{ s_m: 8.9995, tag: 'attachment:H1' }, { s_m: 9, tag: 'arm-tip:A1' }, { s_m: 3.0, tag: 'a' }, { s_m: 3.0004, tag: 'b' }], 3);
    expect(st.map((s) => s.s_m)).toEqual([0, 3.0, 6, 9]);
    expect(st[1].tags).toEqual(['a', 'b']);
    expect([...st[3].tags].sort()).toEqual(['arm-tip:A1', 'attachment:H1']);
  });
  it('memberSectionAt follows the linear taper of the named member', () => {
    const design = makeDesign();
    // Arm A1: 280 mm at the root, 160 mm at the tip over 9 m; at 4.5 m the diameter is 220 mm.
    expect(Math.abs(memberSectionAt(design, 'A1', 4.5).D_m - 0.22)).toBeLessThan(1e-12);
    expect(() => memberSectionAt(design, 'A7', 1)).toThrow(/A7/);
  });
});
