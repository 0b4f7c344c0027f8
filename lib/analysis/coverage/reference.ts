/**
 * The brute-force reference for tests and benchmarks: every fixture on every cell, nothing skipped,
 * each cell evaluated with the library's own point-source functions (fixtureIlluminanceLx: the beam
 * profile exp(−ln2·(θ/hb)^p) in closed form, the inverse-square and cosine laws), and soft sources by
 * the same forms the engine uses for maps (cellwiseIlluminance). No table, no culling, no shortcuts.
 */
import { type Vec3, subtract, vec3 } from '../../geometry/vector';
import { directionInBeamFrame, spreadProfile } from '../../photometry/beam';
import { hasNoAim } from '../fixtureLight';
import type { RigFixture } from '../rig';
import type { CoverageGrid } from './engine';
import { type CoverageSpec, cellCentreX, cellCentreY, cellCount } from './grid';
import { cellNormals, cellwiseIlluminance } from './kernel';

/** Whether a beam's light reaches `point` at 50 % of peak or more (inside its beam angle). */
function insideBeamAngle(fixture: RigFixture, point: Vec3): boolean {
  const source = fixture.source;
  if (source.kind !== 'beam' || source.spread.kind !== 'round' || hasNoAim(fixture)) return false;
  const { offAxisRad, azimuthRad } = directionInBeamFrame(
    subtract(fixture.focus, fixture.mount),
    subtract(point, fixture.mount),
  );
  return spreadProfile(source.spread, offAxisRad, azimuthRad) >= 0.5;
}

/** Light on every cell from every fixture, evaluated one by one; `overlaps` counts round beams at ≥ 50 %. */
export function bruteForceCoverage(spec: CoverageSpec, fixtures: readonly RigFixture[]): CoverageGrid {
  const { grid, plane } = spec;
  const normals = cellNormals(spec);
  const result: CoverageGrid = {
    spec,
    values: new Float64Array(cellCount(grid)),
    overlaps: new Uint16Array(cellCount(grid)),
  };
  const up = vec3(0, 0, 1);
  for (const fixture of fixtures) {
    for (let row = 0; row < grid.rows; row += 1) {
      for (let column = 0; column < grid.columns; column += 1) {
        const index = row * grid.columns + column;
        const normal = normals.horizontal ? up : vec3(normals.x[index], normals.y[index], 0);
        if (normal.x === 0 && normal.y === 0 && normal.z === 0) continue; // a face at the viewpoint has no facing
        const point = vec3(cellCentreX(grid, column), cellCentreY(grid, row), plane.heightM);
        const lux = cellwiseIlluminance(fixture, point, normal);
        if (lux === 0) continue;
        result.values[index] += lux;
        if (insideBeamAngle(fixture, point)) result.overlaps[index] += 1;
      }
    }
  }
  return result;
}
