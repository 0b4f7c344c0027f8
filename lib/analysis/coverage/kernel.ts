/**
 * Light from one fixture onto the cells of a coverage grid. Round beams use the tight loop of
 * roundKernel.ts (a tabulated profile within 1e-10 of the closed form, only the cells inside the beam's
 * edge); oval and measured beams the loop of beamFrameKernel.ts (the point-source arithmetic written
 * out), only inside the bounding box of the round cone beyond which they give no light (coneRange);
 * soft sources cell by cell with the Lambertian point-source form beyond 5 × their size (within
 * ~1 %) and the area integral nearer (its coarse rule, within 1e-3).
 */
import { roundConeSection } from '../../geometry/coneSection';
import { type Vec3, normalize, subtract, vec3 } from '../../geometry/vector';
import { degToRad } from '../../numeric';
import {
  areaSourceIlluminanceLx,
  largestDimensionM,
  PHOTOMETRIC_DISTANCE_FACTOR,
} from '../../photometry/areaSource';
import { MAX_EMISSION_ANGLE_RAD, profileEdgeAngleRad } from '../../photometry/beam';
import { fixtureIlluminanceLx, hasNoAim } from '../fixtureLight';
import type { RigFixture } from '../rig';
import {
  type CoverageSpec,
  EVERY_ROW,
  type RowShare,
  cellCentreX,
  cellCentreY,
  firstRowOfShare,
} from './grid';
import { type ProfileTable, profileTable } from './profileTable';
import {
  accumulateInBeamFrame,
  measuredIntensity,
  measuredReachRad,
  ovalIntensity,
  ovalReachRad,
} from './beamFrameKernel';
import { accumulateRound } from './roundKernel';
import type { SimdBatch } from './simdRows';

/** The cells a source can reach: inclusive column and row ranges. */
export interface CellRange {
  readonly firstColumn: number;
  readonly lastColumn: number;
  readonly firstRow: number;
  readonly lastRow: number;
}

export type PreparedSource =
  | {
      readonly kind: 'round';
      readonly fixture: RigFixture;
      readonly range: CellRange | null;
      readonly mount: Vec3;
      readonly axis: Vec3;
      readonly peakCd: number;
      readonly table: ProfileTable;
    }
  | {
      readonly kind: 'cellwise';
      readonly fixture: RigFixture;
      readonly range: CellRange | null;
      /** Beyond this angle off the aim the source gives no light (oval and measured beams). */
      readonly reachRad?: number;
    };

/** Per-cell unit normals of the measuring surfaces (x, y components; z is 0 or the plane is horizontal). */
export interface CellNormals {
  readonly horizontal: boolean;
  readonly x: Float64Array;
  readonly y: Float64Array;
}

/** Normals for a coverage spec: up for a horizontal plane, toward the viewpoint in plan otherwise. */
export function cellNormals(spec: CoverageSpec): CellNormals {
  const { grid, plane } = spec;
  const count = grid.columns * grid.rows;
  const x = new Float64Array(plane.kind === 'toward' ? count : 0);
  const y = new Float64Array(plane.kind === 'toward' ? count : 0);
  if (plane.kind === 'toward') {
    for (let row = 0; row < grid.rows; row += 1) {
      for (let column = 0; column < grid.columns; column += 1) {
        const index = row * grid.columns + column;
        const dx = plane.viewpoint.x - cellCentreX(grid, column);
        const dy = plane.viewpoint.y - cellCentreY(grid, row);
        const length = Math.hypot(dx, dy);
        x[index] = length > 1e-9 ? dx / length : 0;
        y[index] = length > 1e-9 ? dy / length : 0;
      }
    }
  }
  return { horizontal: plane.kind === 'horizontal', x, y };
}

const WHOLE = (spec: CoverageSpec): CellRange => ({
  firstColumn: 0,
  lastColumn: spec.grid.columns - 1,
  firstRow: 0,
  lastRow: spec.grid.rows - 1,
});

/** Cells inside a plan polygon's bounding box, widened by two cells; null when it misses the grid. */
function rangeAround(spec: CoverageSpec, points: readonly { x: number; y: number }[]): CellRange | null {
  const { grid } = spec;
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const point of points) {
    minX = Math.min(minX, point.x);
    maxX = Math.max(maxX, point.x);
    minY = Math.min(minY, point.y);
    maxY = Math.max(maxY, point.y);
  }
  const firstColumn = Math.max(0, Math.floor((minX - grid.minX) / grid.spacingM) - 2);
  const lastColumn = Math.min(grid.columns - 1, Math.ceil((maxX - grid.minX) / grid.spacingM) + 2);
  const firstRow = Math.max(0, Math.floor((minY - grid.minY) / grid.spacingM) - 2);
  const lastRow = Math.min(grid.rows - 1, Math.ceil((maxY - grid.minY) / grid.spacingM) + 2);
  if (firstColumn > lastColumn || firstRow > lastRow) return null;
  return { firstColumn, lastColumn, firstRow, lastRow };
}

/**
 * The cells inside a round cone (apex at the unit, along its aim, half-angle `reachRad`) on the grid's
 * plane: the exact bounding box of its elliptical section (roundConeSection's closed forms: centre
 * (near + far)/2 along the aim's projection, semi-axes (far − near)/2 and the minor one across), widened
 * by two cells; the whole grid if the section does not close, none if the cone misses the plane.
 */
function coneRange(spec: CoverageSpec, fixture: RigFixture, reachRad: number): CellRange | null {
  if (!(reachRad < MAX_EMISSION_ANGLE_RAD)) return WHOLE(spec);
  const section = roundConeSection(fixture.mount, subtract(fixture.focus, fixture.mount), reachRad, {
    point: vec3(0, 0, spec.plane.heightM),
    normal: vec3(0, 0, 1),
  });
  if (section.state === 'misses') return null;
  if (
    section.state !== 'closed' ||
    section.farM === null ||
    section.nearM === null ||
    section.widthM === null
  )
    return WHOLE(spec);
  const centre = (section.nearM + section.farM) / 2;
  const major = (section.farM - section.nearM) / 2;
  const minor = section.widthM / 2;
  const { alongDirection: along, acrossDirection: across, foot } = section;
  const centreX = foot.x + along.x * centre;
  const centreY = foot.y + along.y * centre;
  const halfX = Math.hypot(major * along.x, minor * across.x);
  const halfY = Math.hypot(major * along.y, minor * across.y);
  return rangeAround(spec, [
    { x: centreX - halfX, y: centreY - halfY },
    { x: centreX + halfX, y: centreY + halfY },
  ]);
}

/** Everything the kernel needs for one fixture, worked out once. */
export function prepareSource(fixture: RigFixture, spec: CoverageSpec): PreparedSource {
  if (hasNoAim(fixture)) return { kind: 'cellwise', fixture, range: null };
  const source = fixture.source;
  if (source.kind === 'beam') {
    if (source.spread.kind === 'round') {
      const beamHalf = degToRad(source.spread.beamAngleDeg / 2);
      const fieldHalf = degToRad(source.spread.fieldAngleDeg / 2);
      const edge = profileEdgeAngleRad(beamHalf, fieldHalf);
      // Rows are culled one by one in the kernel (rowInterval), so the whole grid is the range here.
      return {
        kind: 'round',
        fixture,
        range: source.peakCd > 0 && edge > 0 ? WHOLE(spec) : null,
        mount: fixture.mount,
        axis: normalize(subtract(fixture.focus, fixture.mount)),
        peakCd: source.peakCd,
        table: profileTable(beamHalf, fieldHalf),
      };
    }
    // An oval lights only inside the round cone of its widest edge (all of the grid from 90° on).
    const reachRad = ovalReachRad(source.spread);
    return {
      kind: 'cellwise',
      fixture,
      range: source.peakCd > 0 ? coneRange(spec, fixture, reachRad) : null,
      reachRad,
    };
  }
  if (source.kind === 'measured') {
    // Only the cells inside the cone of the grid's last lit γ (all of them from 90° on).
    const reachRad = measuredReachRad(source.grid);
    if (reachRad < 0 || !(source.scale > 0)) return { kind: 'cellwise', fixture, range: null };
    return { kind: 'cellwise', fixture, range: coneRange(spec, fixture, reachRad), reachRad };
  }
  return { kind: 'cellwise', fixture, range: WHOLE(spec) };
}

export interface AccumulateTarget {
  readonly values: Float64Array;
  /** Per cell, how many beams (50 % contour) cover it. */
  readonly overlaps: Uint16Array;
  /** A SIMD batch the values live in (simdRows.ts), if any. */
  readonly simd?: SimdBatch | null;
}

/** Add (sign +1) or take away (sign −1) one prepared source's light on every cell it reaches in `share`'s rows. */
export function accumulateSource(
  prepared: PreparedSource,
  spec: CoverageSpec,
  normals: CellNormals,
  target: AccumulateTarget,
  sign: 1 | -1,
  share: RowShare = EVERY_ROW,
): void {
  const range = prepared.range;
  if (!range) return;
  if (prepared.kind === 'round') accumulateRound(prepared, spec, normals, target, sign, share);
  else {
    const source = prepared.fixture.source;
    const inFrame =
      source.kind === 'beam' && source.spread.kind === 'oval'
        ? ovalIntensity(source.spread, source.peakCd)
        : source.kind === 'measured'
          ? measuredIntensity(source.grid, source.scale)
          : null;
    if (inFrame)
      accumulateInBeamFrame(
        prepared.fixture,
        spec,
        normals,
        target.values,
        sign,
        range,
        share,
        inFrame,
        prepared.reachRad,
      );
    else accumulateCellwise(prepared.fixture, spec, normals, target, sign, range, share);
  }
}

function accumulateCellwise(
  fixture: RigFixture,
  spec: CoverageSpec,
  normals: CellNormals,
  target: AccumulateTarget,
  sign: 1 | -1,
  range: CellRange,
  share: RowShare,
): void {
  const { grid, plane } = spec;
  const up = vec3(0, 0, 1);
  for (let row = firstRowOfShare(range.firstRow, share); row <= range.lastRow; row += share.every) {
    for (let column = range.firstColumn; column <= range.lastColumn; column += 1) {
      const index = row * grid.columns + column;
      const point = vec3(cellCentreX(grid, column), cellCentreY(grid, row), plane.heightM);
      const normal = normals.horizontal ? up : vec3(normals.x[index], normals.y[index], 0);
      if (!normals.horizontal && normal.x === 0 && normal.y === 0) continue;
      const lux = cellwiseIlluminance(fixture, point, normal);
      if (lux === 0) continue;
      target.values[index] += sign * lux;
    }
  }
}

/** Exact light of any source at one cell; soft sources far away by their Lambertian point form. */
export function cellwiseIlluminance(fixture: RigFixture, point: Vec3, normal: Vec3): number {
  const source = fixture.source;
  if (source.kind !== 'soft') return fixtureIlluminanceLx(fixture, point, normal);
  const dx = point.x - fixture.mount.x;
  const dy = point.y - fixture.mount.y;
  const dz = point.z - fixture.mount.z;
  const distance = Math.hypot(dx, dy, dz);
  if (distance < PHOTOMETRIC_DISTANCE_FACTOR * largestDimensionM(source.shape)) {
    // Near the face: the area integral, with the coarser rule meant for maps (≤ 1e-3).
    return areaSourceIlluminanceLx(
      {
        shape: source.shape,
        centre: fixture.mount,
        facing: subtract(fixture.focus, fixture.mount),
        luminanceCdPerM2: source.luminanceCdPerM2,
        point,
        normal,
      },
      'coarse',
    );
  }
  const facing = normalize(subtract(fixture.focus, fixture.mount));
  const cosEmit = (dx * facing.x + dy * facing.y + dz * facing.z) / distance;
  const cosIncidence = -(dx * normal.x + dy * normal.y + dz * normal.z) / distance;
  if (cosEmit <= 0 || cosIncidence <= 0) return 0;
  const shape = source.shape;
  const areaM2 = shape.kind === 'disc' ? Math.PI * shape.radiusM ** 2 : shape.widthM * shape.heightM;
  return (source.luminanceCdPerM2 * areaM2 * cosEmit * cosIncidence) / (distance * distance);
}
