/**
 * Oval and measured beams on the cells of a grid: the point-source functions' arithmetic
 * (beamIlluminanceLx with an oval spread, measuredIntensityTowardCd) written out as one loop over the
 * cells a source can reach, with the beam frame worked out once and nothing allocated per cell. Per
 * cell, as the reference does it: d = cell − mount; θ = atan2(|a × d|, a · d); the azimuth
 * φ = atan2(d · v, d · u) in the beam frame (u, v, a); the intensity toward (θ, φ); E = I·cos i / d².
 * An oval beam's intensity: its half-angles at φ less the rotation on elliptical contours,
 * 1/√(cos²/x² + sin²/y²); p = ln(ln 10 / ln 2) / ln(hf / hb); f = exp(−ln2·(θ/hb)^p), nothing at or
 * beyond 90° or below 0.1 % of peak. A measured beam's: its candela grid at γ = θ, C = −φ (degrees;
 * measuredSource.ts), times its scale.
 */
import { normalize, perpendicularBasis, subtract } from '../../geometry/vector';
import { type CandelaGrid, gridIntensityCd } from '../../formats/candelaGrid';
import { degToRad, radToDeg } from '../../numeric';
import {
  type BeamSpread,
  MAX_EMISSION_ANGLE_RAD,
  PROFILE_EDGE_FRACTION,
  profileEdgeAngleRad,
  spreadHalfAnglesAt,
} from '../../photometry/beam';
import { MIN_THROW_M } from '../fixtureLight';
import type { RigFixture } from '../rig';
import { type CoverageSpec, type RowShare, firstRowOfShare } from './grid';

const EXPONENT_NUMERATOR = Math.log(Math.LN10 / Math.LN2);

/** Intensity (cd) toward off-axis angle θ and beam-frame azimuth φ (rad). */
export type BeamFrameIntensity = (offAxisRad: number, azimuthRad: number) => number;

/** An oval spread's intensity, as spreadProfile gives it, times the peak. */
export function ovalIntensity(
  spread: Extract<BeamSpread, { kind: 'oval' }>,
  peakCd: number,
): BeamFrameIntensity {
  const beamX = degToRad(spread.beamAngleXDeg / 2);
  const beamY = degToRad(spread.beamAngleYDeg / 2);
  const fieldX = degToRad(spread.fieldAngleXDeg / 2);
  const fieldY = degToRad(spread.fieldAngleYDeg / 2);
  const rotation = degToRad(spread.rotationDeg);
  return (offAxis, azimuth) => {
    if (offAxis >= MAX_EMISSION_ANGLE_RAD) return 0;
    const relative = azimuth - rotation;
    const cosine = Math.cos(relative);
    const sine = Math.sin(relative);
    const beamHalf = 1 / Math.sqrt((cosine * cosine) / (beamX * beamX) + (sine * sine) / (beamY * beamY));
    const fieldHalf =
      1 / Math.sqrt((cosine * cosine) / (fieldX * fieldX) + (sine * sine) / (fieldY * fieldY));
    const exponent = EXPONENT_NUMERATOR / Math.log(fieldHalf / beamHalf);
    const profile = Math.exp(-Math.LN2 * Math.pow(offAxis / beamHalf, exponent));
    return profile < PROFILE_EDGE_FRACTION ? 0 : peakCd * profile;
  };
}

/**
 * The widest angle off the aim at which an oval beam gives any light (rad): the largest of its edge
 * angles (profileEdgeAngleRad at the half-angles on elliptical contours) over 1440 azimuths, both
 * axes among them, with 1 % to spare (the edge varies smoothly; sampling misses far less). Cells
 * beyond it get nothing, so the loop need not visit them.
 */
export function ovalReachRad(spread: Extract<BeamSpread, { kind: 'oval' }>): number {
  let widest = 0;
  const rotation = degToRad(spread.rotationDeg);
  for (let step = 0; step < 1440; step += 1) {
    const { beamHalfRad, fieldHalfRad } = spreadHalfAnglesAt(spread, rotation + (step * Math.PI) / 720);
    widest = Math.max(widest, profileEdgeAngleRad(beamHalfRad, fieldHalfRad));
  }
  return widest * 1.01;
}

const reachOf = new WeakMap<CandelaGrid, number>();

/**
 * The largest γ (rad) at which a candela grid gives any light, or −1 if it gives none: every plane is
 * 0 from the sample after its last non-zero value on (interpolation reaches 0 there), or unmeasured.
 */
export function measuredReachRad(grid: CandelaGrid): number {
  const known = reachOf.get(grid);
  if (known !== undefined) return known;
  let last = -1;
  for (const row of grid.candelaCd) {
    for (let index = row.length - 1; index > last; index -= 1) {
      if (row[index] > 0) {
        last = index;
        break;
      }
    }
  }
  const angles = grid.verticalAnglesDeg;
  // A hair over the sample, so that rounding between degrees and radians never cuts a lit cell.
  const reach = last < 0 ? -1 : degToRad(angles[Math.min(last + 1, angles.length - 1)]) + 1e-9;
  reachOf.set(grid, reach);
  return reach;
}

/** A measured unit's intensity: its grid toward γ = θ, C = −φ, times its scale (measuredSource.ts). */
export function measuredIntensity(grid: CandelaGrid, scale: number): BeamFrameIntensity {
  return (offAxis, azimuth) => scale * gridIntensityCd(grid, radToDeg(offAxis), -radToDeg(azimuth));
}

export interface FrameRange {
  readonly firstColumn: number;
  readonly lastColumn: number;
  readonly firstRow: number;
  readonly lastRow: number;
}

/**
 * Add (sign +1) or take away (sign −1) a unit's light, `intensityAt` in its beam frame, on `range` in
 * `share`'s rows; `intensityAt` is not asked beyond `maxOffAxisRad` (it must give 0 there).
 */
export function accumulateInBeamFrame(
  fixture: RigFixture,
  spec: CoverageSpec,
  normals: { readonly horizontal: boolean; readonly x: Float64Array; readonly y: Float64Array },
  values: Float64Array,
  sign: 1 | -1,
  range: FrameRange,
  share: RowShare,
  intensityAt: BeamFrameIntensity,
  maxOffAxisRad = Infinity,
): void {
  const { grid, plane } = spec;
  const axis = normalize(subtract(fixture.focus, fixture.mount));
  const { u, v } = perpendicularBasis(axis);
  const { x: mx, y: my, z: mz } = fixture.mount;
  const dz = plane.heightM - mz;
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
      if (offAxis > maxOffAxisRad) continue; // no light out there: skip the azimuth and the lookup
      const azimuth = Math.atan2(dx * v.x + dy * v.y + dz * v.z, dx * u.x + dy * u.y + dz * u.z);
      const intensity = intensityAt(offAxis, azimuth);
      if (!(intensity > 0)) continue;
      values[index] += sign * ((intensity * cosIncidence) / (distance * distance));
    }
  }
}
