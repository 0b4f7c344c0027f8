import { describe, expect, it } from 'vitest';
import {
  type CoverageRequest,
  type RigFixture,
  createCoverageService,
  gridOver,
  isoluxLines,
  niceLevels,
} from '@/lib/analysis';
import { vec3 } from '@/lib/geometry';

describe('isolux lines', () => {
  it('a level between two cells lies halfway between their centres (linear interpolation)', () => {
    // Values rise by 1 lx per 1 m column: 4.5 lx falls between the centres of columns 4 and 5 (x = 4.5 and 5.5 m
    // on a grid starting at x = 0), i.e. at x = 5 m.
    const grid = gridOver({ minX: 0, maxX: 10, minY: 0, maxY: 3 }, 1);
    const values = new Float64Array(30).map((_, index) => index % 10);
    const [line] = isoluxLines(grid, values, [4.5]);
    expect(line.levelLx).toBe(4.5);
    // The ring also runs along the grid's border (x = 10): look at the points inside it.
    const xs = line.rings
      .flat()
      .filter((point) => point.y > 0.5 && point.y < 2.5 && point.x > 0.1 && point.x < 9.9)
      .map((point) => point.x);
    expect(xs.length).toBeGreaterThan(0);
    for (const x of xs) expect(x).toBeCloseTo(5, 12);
  });

  it('labels use round levels: 1, 2, 5 × 10ⁿ', () => {
    expect(niceLevels(60, 900)).toEqual([100, 200, 500]);
    expect(niceLevels(0, 0)).toEqual([]);
  });
});

describe('the coverage service', () => {
  const unit: RigFixture = {
    id: 'a',
    mount: vec3(0, 2, 6),
    focus: vec3(0, 2, 1.6),
    source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: 30, fieldAngleDeg: 45 }, peakCd: 40000 },
  };
  const square = (minX: number, minY: number, size: number) => [
    { x: minX, y: minY },
    { x: minX + size, y: minY },
    { x: minX + size, y: minY + size },
    { x: minX, y: minY + size },
  ];
  const request: CoverageRequest = {
    spec: {
      grid: gridOver({ minX: -4, maxX: 4, minY: 0, maxY: 4 }, 0.1),
      plane: { kind: 'horizontal', heightM: 1.6 },
    },
    fixtures: [unit],
    stage: {
      id: 'stage',
      name: 'Whole stage',
      outline: square(-4, 0, 8).map((point) => ({ x: point.x, y: point.y / 2 })),
    },
    areas: [
      { id: 'centre', name: 'Centre', outline: square(-0.5, 1.5, 1) },
      { id: 'edge', name: 'Edge', outline: square(3, 0, 1) },
    ],
    band: { targetLx: 1000, toleranceStops: 1 },
    rules: { hotStops: 1, darkStops: 2, maxOverlaps: 3, minimumAreaM2: 0.05 },
  };

  it('gives statistics per area: the centre under the unit is near I/h² = 40 000 / 4.4² = 2066 lx', () => {
    const response = createCoverageService().handle(request);
    const centre = response.statistics.find((row) => row.id === 'centre')?.figures;
    expect(centre?.maxLx).toBeLessThanOrEqual(40000 / 4.4 ** 2);
    expect(centre?.maxLx).toBeGreaterThan(0.99 * (40000 / 4.4 ** 2));
    expect(response.statistics.map((row) => row.name)).toEqual(['Whole stage', 'Centre', 'Edge']);
  });

  it('lists the unit as the cause of the hot spot under it, and the far corner as a dark gap', () => {
    const response = createCoverageService().handle(request);
    const hot = response.regions.find((region) => region.kind === 'hot');
    expect(hot?.fixtures[0].fixtureId).toBe('a');
    expect(Math.abs(hot?.extremeAt.x ?? 1)).toBeCloseTo(0.05, 9); // the two cells beside x = 0 tie
    expect(response.regions.some((region) => region.kind === 'dark' && region.centre.x > 3)).toBe(true);
  });

  it('answers a second request for the same grid incrementally', () => {
    const service = createCoverageService();
    service.handle(request);
    const moved = service.handle({ ...request, fixtures: [{ ...unit, focus: vec3(0.5, 2, 1.6) }] });
    expect(moved.recomputed).toBe(1);
    const fresh = createCoverageService().handle({
      ...request,
      fixtures: [{ ...unit, focus: vec3(0.5, 2, 1.6) }],
    });
    for (let index = 0; index < fresh.values.length; index += 97) {
      expect(moved.values[index]).toBeCloseTo(fresh.values[index], 9);
    }
  });
});
