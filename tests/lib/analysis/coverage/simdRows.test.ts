// Values here are checked two ways: bit for bit against the same engine on one thread or with the
// JavaScript loop (differential), and within 1e-9 against bruteForceCoverage, which evaluates every unit
// on every cell through the point-source functions; tests/lib/photometry holds those to E = I·cos i / d²
// (1 cd at 1 m gives 1 lx, SI Brochure) and to the worked values in docs/reference-checks.md. Rigs and
// candela grids here are invented.
import { describe, expect, it, vi } from 'vitest';
import fc from 'fast-check';
import {
  type CoverageSpec,
  type RigFixture,
  LIGHT_ROWS_WASM_BASE64,
  accumulateRound,
  bruteForceCoverage,
  cellNormals,
  createCoverageEngine,
  gridOver,
  prepareSource,
  residentTableCount,
  simdRowsAvailable,
  withSimdRows,
} from '@/lib/analysis';
import { vec3 } from '@/lib/geometry';
import { expectNearReference, expectSameBits } from './gridChecks';
import { assembleLightRows } from '../../../../scripts/build-wasm.mjs';

const spec: CoverageSpec = {
  grid: gridOver({ minX: -6, maxX: 6.1, minY: -1, maxY: 7 }, 0.1),
  plane: { kind: 'horizontal', heightM: 1.6 },
};

function unit(
  id: string,
  mount: ReturnType<typeof vec3>,
  focus: ReturnType<typeof vec3>,
  beam: number,
  field: number,
  peakCd = 30000,
): RigFixture {
  return {
    id,
    mount,
    focus,
    source: { kind: 'beam', spread: { kind: 'round', beamAngleDeg: beam, fieldAngleDeg: field }, peakCd },
  };
}

describe('the WebAssembly SIMD loop', () => {
  it('is the assembled lightRows.wat (npm run wasm keeps them together)', async () => {
    const assembled: Buffer = await assembleLightRows();
    expect(Buffer.from(LIGHT_ROWS_WASM_BASE64, 'base64').equals(assembled)).toBe(true);
  });

  it('runs here (Node has WebAssembly SIMD), so the comparisons below compare two loops', () => {
    expect(simdRowsAvailable()).toBe(true);
    expect(createCoverageEngine(spec).usesSimd()).toBe(true);
    expect(createCoverageEngine(spec, { simd: false }).usesSimd()).toBe(false);
    // Faces toward a viewpoint have no plane lit from above: the JavaScript loop serves them.
    expect(
      createCoverageEngine({
        ...spec,
        plane: { kind: 'toward', heightM: 1.6, viewpoint: vec3(0, -9, 1.6) },
      }).usesSimd(),
    ).toBe(false);
  });

  it('gives the same bits as the JavaScript loop: narrow, wide, near-axis and grid-edge beams', () => {
    const rig = [
      // Straight down: every near-axis path (fine table, closed form for field/beam > 1.82).
      unit('down', vec3(0.05, 3.05, 6), vec3(0.05, 3.05, 1.6), 19, 40),
      unit('narrow', vec3(-2, -3, 7), vec3(-1, 2, 1.6), 4, 6),
      unit('soft-edged', vec3(2, -3, 7), vec3(2.5, 3, 1.6), 30, 90),
      // Lighting the last column (odd count: 121) and the grid's last cell.
      unit('corner', vec3(5.9, 6.8, 5), vec3(6.05, 6.95, 1.6), 40, 60),
      unit('wide', vec3(0, 9, 3), vec3(-4, 0, 1.6), 50, 115),
    ];
    expect(spec.grid.columns % 2).toBe(1);
    const js = createCoverageEngine(spec, { simd: false }).update(rig);
    const simd = createCoverageEngine(spec).update(rig);
    expectSameBits(simd, js);
    expect(simd.values[simd.values.length - 1]).toBeGreaterThan(0);
  });

  it('gives the same bits as the JavaScript loop on random rigs, and stays within 1e-9 of the reference', () => {
    const coarse: CoverageSpec = {
      grid: gridOver({ minX: -6, maxX: 6, minY: -1, maxY: 7 }, 0.25),
      plane: { kind: 'horizontal', heightM: 1.6 },
    };
    const arbitraryUnit = fc.record({
      mx: fc.double({ min: -7, max: 7, noNaN: true }),
      my: fc.double({ min: -3, max: 9, noNaN: true }),
      mz: fc.double({ min: 2, max: 12, noNaN: true }),
      fx: fc.double({ min: -6, max: 6, noNaN: true }),
      fy: fc.double({ min: -1, max: 7, noNaN: true }),
      beam: fc.double({ min: 2, max: 70, noNaN: true }),
      ratio: fc.double({ min: 1.1, max: 2.5, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(arbitraryUnit, { minLength: 1, maxLength: 10 }), (values) => {
        const rig = values.map((value, index) =>
          unit(
            `u${index}`,
            vec3(value.mx, value.my, value.mz),
            vec3(value.fx, value.fy, 1.6),
            value.beam,
            Math.min(value.beam * value.ratio, 170),
          ),
        );
        for (const grid of [spec, coarse]) {
          const simd = createCoverageEngine(grid).update(rig);
          expectSameBits(simd, createCoverageEngine(grid, { simd: false }).update(rig));
        }
        const reference = bruteForceCoverage(coarse, rig);
        expectNearReference(createCoverageEngine(coarse).update(rig).values, reference.values);
      }),
      { numRuns: 30 },
    );
  }, 120_000);

  /** Light of `beams` on `grid` through one SIMD batch (table area limit `limit` bytes), and by JavaScript. */
  function throughBatch(grid: CoverageSpec, beams: ReturnType<typeof prepareSource>[], limit?: number) {
    const normals = cellNormals(grid);
    const cells = grid.grid.columns * grid.grid.rows;
    const expected = { values: new Float64Array(cells), overlaps: new Uint16Array(cells) };
    const got = { values: new Float64Array(cells), overlaps: new Uint16Array(cells) };
    const round = beams.flatMap((beam) => (beam.kind === 'round' ? [beam] : []));
    for (const beam of round) accumulateRound(beam, grid, normals, expected, 1);
    let usedSimd = 0;
    withSimdRows(
      got.values,
      grid.grid.rows,
      round.map((beam) => beam.table),
      (batch) => {
        if (!batch) throw new Error('no SIMD batch');
        for (const beam of round) {
          if (batch.tableAddress(beam.table) !== undefined) usedSimd += 1;
          accumulateRound(
            beam,
            grid,
            normals,
            { values: batch.values, overlaps: got.overlaps, simd: batch },
            1,
          );
        }
      },
      limit,
    );
    expect(usedSimd).toBe(round.length);
    expectSameBits(got, expected);
  }

  const beamsOf = (grid: CoverageSpec, first: number, count: number) =>
    Array.from({ length: count }, (_, index) =>
      prepareSource(
        unit(
          `b${first + index}`,
          vec3(-1 + index, 1, 6),
          vec3(index, 2, 1.6),
          10 + (first + index) * 3,
          18 + (first + index) * 5,
        ),
        grid,
      ),
    );

  it('drops its resident tables when a batch would pass the table area limit, and loads its own again', () => {
    const tableBytes = (beams: ReturnType<typeof prepareSource>[]) =>
      beams.reduce((sum, beam) => sum + (beam.kind === 'round' ? beam.table.coefficients.byteLength : 0), 0);
    const first = beamsOf(spec, 0, 2);
    const second = beamsOf(spec, 2, 3);
    // Room for the larger batch alone, not for both batches' tables together.
    const limit = Math.max(tableBytes(first), tableBytes(second)) + 1;
    expect(tableBytes(first) + tableBytes(second)).toBeGreaterThan(limit);
    throughBatch(spec, first, limit);
    expect(residentTableCount()).toBe(2);
    throughBatch(spec, second, limit);
    expect(residentTableCount()).toBe(3); // the first two were dropped
    throughBatch(spec, first, limit);
    expect(residentTableCount()).toBe(2);
    // With room for all, they stay: 2 + 3.
    throughBatch(spec, second);
    expect(residentTableCount()).toBe(5);
  });

  it('lays its memory out again when the grid changes size', () => {
    const small: CoverageSpec = {
      grid: gridOver({ minX: -3, maxX: 3, minY: 0, maxY: 4 }, 0.1),
      plane: spec.plane,
    };
    const large: CoverageSpec = {
      grid: gridOver({ minX: -12, maxX: 12, minY: -2, maxY: 14 }, 0.05),
      plane: spec.plane,
    };
    for (const grid of [spec, small, large, spec]) throughBatch(grid, beamsOf(grid, 0, 3));
  });
});

describe('without WebAssembly SIMD', () => {
  it('the engine uses the JavaScript loop and gives the same grid', async () => {
    const rig = [
      unit('a', vec3(-1, -2, 6), vec3(0, 3, 1.6), 19, 33),
      unit('b', vec3(2, -2, 7), vec3(1, 2, 1.6), 26, 40),
    ];
    const expected = createCoverageEngine(spec).update(rig);
    vi.resetModules();
    vi.stubGlobal('WebAssembly', undefined);
    try {
      const fresh = await import('@/lib/analysis/coverage/engine');
      const { simdRowsAvailable: availableThere } = await import('@/lib/analysis/coverage/simdRows');
      expect(availableThere()).toBe(false);
      const engine = fresh.createCoverageEngine(spec);
      expect(engine.usesSimd()).toBe(false);
      expectSameBits(engine.update(rig), expected);
    } finally {
      vi.unstubAllGlobals();
      vi.resetModules();
    }
  });
});
