/**
 * Oval beams on the cells of a grid: the point-source functions' arithmetic (beamIlluminanceLx with
 * an oval spread) written out as one loop over the cells inside the beam edge's bounding box, with the
 * beam frame worked out once and nothing allocated per cell. Per cell, as the reference does it:
 * d = cell − mount; θ = atan2(|a × d|, a · d); the azimuth φ = atan2(d · v, d · u) in the beam frame
 * (u, v, a), less the oval's rotation; the beam and field half-angles there on elliptical contours,
 * 1/√(cos²/x² + sin²/y²); p = ln(ln 10 / ln 2) / ln(hf / hb); f = exp(−ln2·(θ/hb)^p), nothing at or
 * beyond 90° or below 0.1 % of peak; E = I0·f·cos i / d².
 */
import { perpendicularBasis, subtract, normalize } from '../../geometry/vector';
import { degToRad } from '../../numeric';
import { MAX_EMISSION_ANGLE_RAD, PROFILE_EDGE_FRACTION } from '../../photometry/beam';
import { MIN_THROW_M } from '../fixtureLight';
import type { RigFixture } from '../rig';
import { type CoverageSpec, type RowShare, firstRowOfShare } from './grid';

const EXPONENT_NUMERATOR = Math.log(Math.LN10 / Math.LN2);

export interface OvalRange {
  readonly firstColumn: number;
  readonly lastColumn: number;
  readonly firstRow: number;
  readonly lastRow: number;
}

/** Add (sign +1) or take away (sign −1) an oval beam's light on the cells of `range` in `share`'s rows. */
export function accumulateOval(
  fixture: RigFixture,
  spec: CoverageSpec,
  normals: { readonly horizontal: boolean; readonly x: Float64Array; readonly y: Float64Array },
  values: Float64Array,
  sign: 1 | -1,
  range: OvalRange,
  share: RowShare,
): void {
  const source = fixture.source;
  if (source.kind !== 'beam' || source.spread.kind !== 'oval')
    throw new Error('accumulateOval: an oval beam only');
  const spread = source.spread;
  const { grid, plane } = spec;
  const axis = normalize(subtract(fixture.focus, fixture.mount));
  const { u, v } = perpendicularBasis(axis);
  const beamX = degToRad(spread.beamAngleXDeg / 2);
  const beamY = degToRad(spread.beamAngleYDeg / 2);
  const fieldX = degToRad(spread.fieldAngleXDeg / 2);
  const fieldY = degToRad(spread.fieldAngleYDeg / 2);
  const rotation = degToRad(spread.rotationDeg);
  const { x: mx, y: my, z: mz } = fixture.mount;
  const dz = plane.heightM - mz;
  const scaled = sign * source.peakCd;
  for (let row = firstRowOfShare(range.firstRow, share); row <= range.lastRow; row += share.every) {
    const dy = grid.minY + (row + 0.5) * grid.spacingM - my;
    for (let column = range.firstColumn; column <= range.lastColumn; column += 1) {
      const index = row * grid.columns + column;
      const dx = grid.minX + (column + 0.5) * grid.spacingM - mx;
      const distance = Math.sqrt(dx * dx + dy * dy + dz * dz);
      if (distance < MIN_THROW_M) continue;
      // Incidence: the direction from the cell back to the unit is −d.
      let cosIncidence: number;
      if (normals.horizontal) cosIncidence = -dz / distance;
      else {
        const nx = normals.x[index];
        const ny = normals.y[index];
        if (nx === 0 && ny === 0) continue;
        cosIncidence = -(dx * nx + dy * ny) / (distance * Math.hypot(nx, ny));
      }
      if (!(cosIncidence > 0)) continue;
      const cx = axis.y * dz - axis.z * dy;
      const cy = axis.z * dx - axis.x * dz;
      const cz = axis.x * dy - axis.y * dx;
      const offAxis = Math.atan2(
        Math.sqrt(cx * cx + cy * cy + cz * cz),
        axis.x * dx + axis.y * dy + axis.z * dz,
      );
      if (offAxis >= MAX_EMISSION_ANGLE_RAD) continue;
      const relative = Math.atan2(dx * v.x + dy * v.y + dz * v.z, dx * u.x + dy * u.y + dz * u.z) - rotation;
      const cosine = Math.cos(relative);
      const sine = Math.sin(relative);
      const beamHalf = 1 / Math.sqrt((cosine * cosine) / (beamX * beamX) + (sine * sine) / (beamY * beamY));
      const fieldHalf =
        1 / Math.sqrt((cosine * cosine) / (fieldX * fieldX) + (sine * sine) / (fieldY * fieldY));
      const exponent = EXPONENT_NUMERATOR / Math.log(fieldHalf / beamHalf);
      const profile = Math.exp(-Math.LN2 * Math.pow(offAxis / beamHalf, exponent));
      if (profile < PROFILE_EDGE_FRACTION) continue;
      values[index] += (scaled * profile * cosIncidence) / (distance * distance);
    }
  }
}
