import { describe, expect, it } from 'vitest';
import {
  type CoverageSpec,
  type RigFixture,
  areaStatistics,
  findRegions,
  gridOver,
  polygonMask,
} from '@/lib/analysis';
import { vec3 } from '@/lib/geometry';

describe('area statistics', () => {
  // REFERENCE-CHECKS §9 [DER]: grid {300, 400, 500, 400} → Ē 400, U0 = 0.75, Emin/Emax = 0.60.
  it('the reference grid {300, 400, 500, 400} lx has Ē 400 lx, U0 0.75, Emin/Emax 0.60', () => {
    const stats = areaStatistics(new Float64Array([300, 400, 500, 400]), null, {
      targetLx: 400,
      toleranceStops: 0.5,
    });
    expect(stats).toMatchObject({ cells: 4, minLx: 300, averageLx: 400, maxLx: 500 });
    expect(stats?.uniformityMinToAverage).toBeCloseTo(0.75, 12);
    expect(stats?.uniformityMinToMax).toBeCloseTo(0.6, 12);
    // ±½ stop around 400 lx is 282.8–565.7 lx: all four cells.
    expect(stats?.withinTarget).toBe(1);
  });

  it('a hand-worked 3 × 3 grid, masked to its middle row', () => {
    // Middle row 100, 200, 400: Ē = 233.33, U0 = 100/233.33 = 0.4286, Emin/Emax = 0.25;
    // within ±1 stop of 200 lx (100–400 lx): all three.
    const values = new Float64Array([0, 0, 0, 100, 200, 400, 900, 900, 900]);
    const mask = new Uint8Array([0, 0, 0, 1, 1, 1, 0, 0, 0]);
    const stats = areaStatistics(values, mask, { targetLx: 200, toleranceStops: 1 });
    expect(stats?.averageLx).toBeCloseTo(233.3333333, 6);
    expect(stats?.uniformityMinToAverage).toBeCloseTo(0.4285714, 6);
    expect(stats?.uniformityMinToMax).toBe(0.25);
    expect(stats?.withinTarget).toBe(1);
    expect(areaStatistics(values, null, { targetLx: 200, toleranceStops: 0.5 })?.withinTarget).toBeCloseTo(
      1 / 9,
      12,
    );
  });

  it('an empty mask gives no statistics rather than NaN', () => {
    expect(
      areaStatistics(new Float64Array([1, 2]), new Uint8Array([0, 0]), { targetLx: 100, toleranceStops: 1 }),
    ).toBeNull();
  });

  it('masks cells whose centres fall inside a polygon', () => {
    const grid = gridOver({ minX: 0, maxX: 4, minY: 0, maxY: 4 }, 1);
    const mask = polygonMask(grid, [
      { x: 0, y: 0 },
      { x: 2, y: 0 },
      { x: 2, y: 2 },
      { x: 0, y: 2 },
    ]);
    expect(Array.from(mask)).toEqual([1, 1, 0, 0, 1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0]);
  });
});

describe('hot spots and dark gaps on crafted maps', () => {
  // A 10 × 6 grid of 1 m cells at 400 lx, with a 2 × 2 block at 1600 lx (+2 stops), a 3-cell strip at
  // 50 lx (−3 stops) and one lone dim cell too small to report.
  const spec: CoverageSpec = {
    grid: gridOver({ minX: 0, maxX: 10, minY: 0, maxY: 6 }, 1),
    plane: { kind: 'horizontal', heightM: 1.6 },
  };
  const values = new Float64Array(60).fill(400);
  for (const index of [12, 13, 22, 23]) values[index] = 1600;
  for (const index of [47, 48, 49]) values[index] = 50;
  values[5] = 120;
  const overlaps = new Uint16Array(60);
  const rules = { targetLx: 400, hotStops: 1, maxOverlaps: 3, darkStops: 1, minimumAreaM2: 1.5 };
  const fixture: RigFixture = {
    id: 'hot-unit',
    mount: vec3(2.5, 1.5, 6),
    focus: vec3(2.5, 1.5, 1.6),
    source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 30 }, peakCd: 10000 },
  };

  it('finds the hot block and the dark strip with where, how big and how bright', () => {
    const regions = findRegions({ spec, values, overlaps, mask: null, rules, fixtures: [fixture] });
    expect(regions.map((region) => [region.kind, region.reason, region.areaM2])).toEqual([
      ['hot', 'over target', 4],
      ['dark', 'under target', 3],
    ]);
    const [hot, dark] = regions;
    expect(hot.centre).toEqual({ x: 3, y: 2 }); // cells (2, 1), (3, 1), (2, 2), (3, 2): centres 2.5–3.5, 1.5–2.5
    expect(hot.bounds).toEqual({ minX: 2, maxX: 4, minY: 1, maxY: 3 });
    expect(hot.extremeLx).toBe(1600);
    expect(hot.fixtures[0].fixtureId).toBe('hot-unit');
    expect(dark.centre).toEqual({ x: 8.5, y: 4.5 });
    expect(dark.extremeLx).toBe(50);
  });

  it('flags beams piling up even when the level is in range', () => {
    const piled = new Uint16Array(60);
    for (const index of [30, 31, 32]) piled[index] = 5;
    const regions = findRegions({
      spec,
      values: new Float64Array(60).fill(400),
      overlaps: piled,
      mask: null,
      rules,
      fixtures: [],
    });
    expect(regions).toHaveLength(1);
    expect(regions[0]).toMatchObject({ kind: 'hot', reason: 'beams pile up', areaM2: 3 });
  });

  it('looks only inside the mask', () => {
    const mask = new Uint8Array(60);
    for (const index of [12, 13, 22, 23]) mask[index] = 1;
    const regions = findRegions({ spec, values, overlaps, mask, rules, fixtures: [] });
    expect(regions.map((region) => region.kind)).toEqual(['hot']);
  });
});
