import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type CoverageSpec,
  type RigFixture,
  bruteForceCoverage,
  cellCentreX,
  cellCentreY,
  createCoverageEngine,
  gridOver,
} from '@/lib/analysis';
import { beamIlluminanceLx } from '@/lib/photometry';
import { type Vec3, vec3 } from '@/lib/geometry';
import { expectNearReference } from './gridChecks';

const spec: CoverageSpec = {
  grid: gridOver({ minX: -6, maxX: 6, minY: -1, maxY: 7 }, 0.1),
  plane: { kind: 'horizontal', heightM: 1.6 },
};

function unit(id: string, mount: Vec3, focus: Vec3, peakCd = 30000, beam = 26, field = 40): RigFixture {
  return {
    id,
    mount,
    focus,
    source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: beam, fieldAngleDeg: field }, peakCd },
  };
}

function cellIndex(column: number, row: number) {
  return row * spec.grid.columns + column;
}

describe('the coverage engine', () => {
  it('a unit straight above a cell gives I/d² there (1 cd at 1 m is 1 lx, SI Brochure)', () => {
    // Cell (60, 40) has its centre at (0.05, 3.05); a unit 4 m above it aimed straight down.
    const x = cellCentreX(spec.grid, 60);
    const y = cellCentreY(spec.grid, 40);
    const grid = createCoverageEngine(spec).update([unit('a', vec3(x, y, 5.6), vec3(x, y, 0), 16000)]);
    expect(grid.values[cellIndex(60, 40)]).toBeCloseTo(16000 / 16, 9); // 1000 lx
  });

  it('matches the exact point-source function within 1e-10 on every cell (the tabulated profile)', () => {
    const fixture = unit('a', vec3(-1, -2, 6), vec3(0.5, 3, 1.6), 42000, 19, 33);
    const grid = createCoverageEngine(spec).update([fixture]);
    let worst = 0;
    for (let row = 0; row < spec.grid.rows; row += 1) {
      for (let column = 0; column < spec.grid.columns; column += 1) {
        const point = vec3(cellCentreX(spec.grid, column), cellCentreY(spec.grid, row), 1.6);
        const exact = beamIlluminanceLx({
          mount: fixture.mount,
          axis: vec3(1.5, 5, -4.4),
          peakCd: 42000,
          spread: { kind: 'round', beamAngleDeg: 19, fieldAngleDeg: 33 },
          point,
          normal: vec3(0, 0, 1),
        });
        const engine = grid.values[cellIndex(column, row)];
        if (exact > 0) worst = Math.max(worst, Math.abs(engine - exact) / exact);
        else expect(engine).toBe(0);
      }
    }
    expect(worst).toBeLessThan(1e-10);
  });

  it('two mirror-image units give a mirror-image map', () => {
    const grid = createCoverageEngine(spec).update([
      unit('left', vec3(-3, -2, 6), vec3(-1, 3, 1.6)),
      unit('right', vec3(3, -2, 6), vec3(1, 3, 1.6)),
    ]);
    const { columns, rows } = spec.grid;
    for (let row = 0; row < rows; row += 3) {
      for (let column = 0; column < columns / 2; column += 1) {
        const a = grid.values[cellIndex(column, row)];
        const b = grid.values[cellIndex(columns - 1 - column, row)];
        expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, a));
      }
    }
  });

  it('a ring of identical units aimed at one point gives N·I·H/d³ there (inverse-square and cosine laws)', () => {
    // Six units on a 4 m ring, 3 m above a cell centre, all aimed at it: d = 5 m, cos i = 3/5.
    const cx = cellCentreX(spec.grid, 60);
    const cy = cellCentreY(spec.grid, 30);
    const ring = Array.from({ length: 6 }, (_, index) => {
      const angle = (index * Math.PI) / 3;
      return unit(
        `r${index}`,
        vec3(cx + 4 * Math.cos(angle), cy + 4 * Math.sin(angle), 4.6),
        vec3(cx, cy, 1.6),
        25000,
      );
    });
    const grid = createCoverageEngine(spec).update(ring);
    expect(grid.values[cellIndex(60, 30)]).toBeCloseTo((6 * 25000 * 3) / 125, 9); // 3600 lx
  });

  it('light on vertical faces turned toward a viewpoint uses each cell’s own facing', () => {
    const toward: CoverageSpec = {
      grid: spec.grid,
      plane: { kind: 'toward', heightM: 1.6, viewpoint: vec3(0, -10, 1.6) },
    };
    const x = cellCentreX(spec.grid, 60);
    const y = cellCentreY(spec.grid, 40);
    // A unit 4 m downstage of the cell at face height, aimed at it: normal incidence, E = I/16.
    const grid = createCoverageEngine(toward).update([
      unit('a', vec3(x, y - 4, 1.6), vec3(x, y, 1.6), 16000),
    ]);
    const facing = Math.atan2(y + 10, x); // the face turns toward (0, −10): not quite square to the unit
    const cosIncidence = Math.abs(Math.sin(facing));
    expect(grid.values[cellIndex(60, 40)]).toBeCloseTo(1000 * cosIncidence, 6);
  });
});

describe('culled and incremental results equal the brute-force reference', () => {
  const unitFields = {
    mx: fc.double({ min: -8, max: 8, noNaN: true }),
    my: fc.double({ min: -4, max: 9, noNaN: true }),
    mz: fc.double({ min: 2.5, max: 9, noNaN: true }),
    fx: fc.double({ min: -6, max: 6, noNaN: true }),
    fy: fc.double({ min: -1, max: 7, noNaN: true }),
    beam: fc.double({ min: 5, max: 60, noNaN: true }),
    ratio: fc.double({ min: 1.2, max: 2.2, noNaN: true }),
    peak: fc.double({ min: 1000, max: 200000, noNaN: true }),
  };
  const arbitraryUnit = fc.record(unitFields);
  const toUnit = (
    value: {
      mx: number;
      my: number;
      mz: number;
      fx: number;
      fy: number;
      beam: number;
      ratio: number;
      peak: number;
    },
    index: number,
  ) =>
    unit(
      `u${index}`,
      vec3(value.mx, value.my, value.mz),
      vec3(value.fx, value.fy, 1.6),
      value.peak,
      value.beam,
      Math.min(value.beam * value.ratio, 170),
    );
  const coarse: CoverageSpec = {
    grid: gridOver({ minX: -6, maxX: 6, minY: -1, maxY: 7 }, 0.25),
    plane: { kind: 'horizontal', heightM: 1.6 },
  };

  it('on random rigs, and after moving one unit', () => {
    fc.assert(
      fc.property(
        fc.array(arbitraryUnit, { minLength: 1, maxLength: 12 }),
        arbitraryUnit,
        (values, moved) => {
          const rig = values.map(toUnit);
          const engine = createCoverageEngine(coarse);
          expectNearReference(engine.update(rig).values, bruteForceCoverage(coarse, rig).values);
          const changed = [...rig.slice(1), toUnit(moved, 0)];
          const grid = engine.update(changed);
          const reference = bruteForceCoverage(coarse, changed);
          expectNearReference(grid.values, reference.values);
          expect(grid.overlaps).toEqual(reference.overlaps);
        },
      ),
      { numRuns: 40 },
    );
  }, 120_000); // the reference evaluates every unit on every cell through the general point-source functions

  it('on vertical faces turned toward a viewpoint, and with units level with or below the plane', () => {
    const low = fc.record({ ...unitFields, mz: fc.double({ min: 0.5, max: 9, noNaN: true }) });
    fc.assert(
      fc.property(
        fc.array(low, { minLength: 1, maxLength: 8 }),
        fc.double({ min: -4, max: 4, noNaN: true }),
        (values, viewX) => {
          const rig = values.map(toUnit);
          const faces: CoverageSpec = {
            grid: coarse.grid,
            plane: { kind: 'toward', heightM: 1.6, viewpoint: vec3(viewX, -9, 1.6) },
          };
          for (const plane of [faces, coarse]) {
            const reference = bruteForceCoverage(plane, rig);
            const grid = createCoverageEngine(plane).update(rig);
            expectNearReference(grid.values, reference.values);
            expect(grid.overlaps).toEqual(reference.overlaps);
          }
        },
      ),
      { numRuns: 20 },
    );
  }, 120_000);

  it('a wide unit aimed almost level (its edge at 90°) lights every row it reaches (regression)', () => {
    // Found by a random rig: the row test lost rows half inside a beam whose edge is at 90°.
    const wide = unit(
      'w',
      vec3(6.818577811121941, 0.4941718252375722, 2.528070420608856),
      vec3(-5.569997836835682, 2.7030201219022274, 1.6),
      173315.7587966416,
      53.41776154353283,
      115.08506591119249,
    );
    const reference = bruteForceCoverage(coarse, [wide]);
    expectNearReference(createCoverageEngine(coarse).update([wide]).values, reference.values);
    // The cell at (−5.875, −0.375) is about 14° off the axis: well lit.
    expect(reference.values[2 * coarse.grid.columns]).toBeGreaterThan(10);
  });

  it('an incremental update recomputes only the unit that changed', () => {
    const rig = [
      unit('a', vec3(-2, -2, 6), vec3(-1, 2, 1.6)),
      unit('b', vec3(2, -2, 6), vec3(1, 2, 1.6)),
      unit('c', vec3(0, 8, 6), vec3(0, 4, 1.6)),
    ];
    const engine = createCoverageEngine(coarse);
    engine.update(rig);
    engine.update([rig[0], unit('b', vec3(2, -2, 6), vec3(1.5, 2, 1.6)), rig[2]]);
    expect(engine.lastRecomputed()).toBe(1);
    engine.update([rig[0], rig[2]]);
    expect(engine.lastRecomputed()).toBe(1);
  });

  it('a copy of the rig with equal values recomputes nothing; a changed field deep inside recomputes that unit', () => {
    const rig = [
      unit('a', vec3(-2, -2, 6), vec3(-1, 2, 1.6)),
      unit('b', vec3(2, -2, 6), vec3(1, 2, 1.6), 30000, 19, 30),
    ];
    const engine = createCoverageEngine(coarse);
    const before = Float64Array.from(engine.update(rig).values);
    // As the worker receives them: new objects, the same values.
    expect(engine.update(structuredClone(rig)).values).toEqual(before);
    expect(engine.lastRecomputed()).toBe(0);
    engine.update([rig[0], unit('b', vec3(2, -2, 6), vec3(1, 2, 1.6), 30000, 19, 31)]);
    expect(engine.lastRecomputed()).toBe(1);
  });

  it('taking every unit away leaves a dark grid', () => {
    const engine = createCoverageEngine(coarse);
    engine.update([unit('a', vec3(-2, -2, 6), vec3(-1, 2, 1.6))]);
    const empty = engine.update([]);
    expect(Math.max(...empty.values.map(Math.abs))).toBeLessThan(1e-9);
  });
});
