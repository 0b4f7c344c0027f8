/**
 * Figures derived from a candela grid: peak, total flux by the zonal-lumen method, and the beam (50 %)
 * and field (10 %) edges in every half-plane, from which the full angles per plane and the iso-candela
 * contours used for pools come.
 */
import { type CandelaGrid, gridIntensityCd, unfoldedPlanesDeg } from './candelaGrid';

/** Solid angle (sr) of the zone between polar angles a and b (deg): 2π(cos a − cos b). [DER] */
export function zoneSolidAngleSr(fromDeg: number, toDeg: number): number {
  return 2 * Math.PI * (Math.cos((fromDeg * Math.PI) / 180) - Math.cos((toDeg * Math.PI) / 180));
}

/** Largest intensity anywhere in the grid, cd. */
export function gridPeakCd(grid: CandelaGrid): number {
  let peak = 0;
  for (const row of grid.candelaCd) for (const value of row) if (value > peak) peak = value;
  return peak;
}

/**
 * Total flux (lm) by the zonal-lumen method (IES handbook practice): each γ sample stands for the zone
 * from the midpoint with its lower neighbour to the midpoint with its upper one (clamped to the
 * measured range), Φ = Σ I · 2π(cos γ₁ − cos γ₂) per plane; planes (unfolded by the symmetry) are
 * weighted by the azimuth they stand for, half-way to each neighbour — the trapezoid rule in C, exact
 * for the bilinear model between planes. An isotropic grid over 0…180° gives exactly 4π·I.
 */
export function gridTotalLumens(grid: CandelaGrid): number {
  const gammas = grid.verticalAnglesDeg;
  const zones = gammas.map((gamma, index) => {
    const from = index === 0 ? gamma : (gamma + gammas[index - 1]) / 2;
    const to = index === gammas.length - 1 ? gamma : (gamma + gammas[index + 1]) / 2;
    return zoneSolidAngleSr(from, to);
  });
  const planes = unfoldedPlanesDeg(grid);
  let total = 0;
  for (let index = 0; index < planes.length; index += 1) {
    const before = index === 0 ? planes[planes.length - 1] - 360 : planes[index - 1];
    const after = index === planes.length - 1 ? planes[0] + 360 : planes[index + 1];
    const share = planes.length === 1 ? 1 : (after - before) / 2 / 360;
    let planeFlux = 0;
    for (let zone = 0; zone < gammas.length; zone += 1) {
      planeFlux += gridIntensityCd(grid, gammas[zone], planes[index]) * zones[zone];
    }
    total += share * planeFlux;
  }
  return total;
}

export interface HalfPlaneEdge {
  /** γ (deg) where intensity in this half-plane falls to the fraction of peak. */
  readonly edgeDeg: number;
  /** False when it never falls that far within the measured range (edgeDeg is then its end). */
  readonly reached: boolean;
}

/**
 * Edge of the beam in the half-plane C (deg) at `fraction` of `peakCd`: from the half-plane's own
 * maximum, outward in γ, the first γ where the intensity falls below fraction × peak, by linear
 * interpolation between the measured γ angles (exact for the bilinear model). A half-plane that
 * never reaches the level gives edge 0.
 */
export function halfPlaneEdge(
  grid: CandelaGrid,
  horizontalDeg: number,
  fraction: number,
  peakCd: number,
): HalfPlaneEdge {
  const gammas = grid.verticalAnglesDeg;
  const values = gammas.map((gamma) => gridIntensityCd(grid, gamma, horizontalDeg));
  const level = fraction * peakCd;
  let top = 0;
  for (let index = 1; index < values.length; index += 1) if (values[index] > values[top]) top = index;
  if (values[top] < level) return { edgeDeg: 0, reached: true };
  for (let index = top + 1; index < values.length; index += 1) {
    if (values[index] < level) {
      const t = (values[index - 1] - level) / (values[index - 1] - values[index]);
      return { edgeDeg: gammas[index - 1] + t * (gammas[index] - gammas[index - 1]), reached: true };
    }
  }
  // Measured to 180° and still bright: the light reaches the zenith; otherwise it stops at the range end.
  const end = gammas[gammas.length - 1];
  return end < 180 ? { edgeDeg: end, reached: true } : { edgeDeg: 180, reached: false };
}

export interface PlaneAngles {
  /** The plane pair C / C + 180, named by C (deg, 0 ≤ C < 180). */
  readonly planeDeg: number;
  /** Full beam (50 %) and field (10 %) angles across that plane pair, deg (edge(C) + edge(C + 180)). */
  readonly beamAngleDeg: number;
  readonly fieldAngleDeg: number;
}

export interface GridFigures {
  readonly peakCd: number;
  /** Intensity along the photometric axis (γ = 0), cd. */
  readonly axialCd: number;
  readonly totalLumens: number;
  /** Full angles per plane pair, every 5° of C from 0 to 175. */
  readonly planes: readonly PlaneAngles[];
  /** The C0–C180 and C90–C270 figures (the two a data sheet gives). */
  readonly c0: PlaneAngles;
  readonly c90: PlaneAngles;
  readonly beamAngleMinDeg: number;
  readonly beamAngleMaxDeg: number;
  readonly fieldAngleMinDeg: number;
  readonly fieldAngleMaxDeg: number;
  /** False when the beam (or field) never falls to 50 % (10 %) in some half-plane. */
  readonly beamEdgeReached: boolean;
  readonly fieldEdgeReached: boolean;
  /** Edge γ (deg) every CONTOUR_STEP_DEG of C from 0 to 360 − step: the 50 % and 10 % iso-candela contours. */
  readonly beamContourDeg: readonly number[];
  readonly fieldContourDeg: readonly number[];
}

/** C spacing of the iso-candela contours and the per-plane angles, deg. */
export const CONTOUR_STEP_DEG = 5;

const figuresCache = new WeakMap<CandelaGrid, GridFigures>();

/** All derived figures of a grid, memoised by the grid object (documents are immutable). */
export function gridFigures(grid: CandelaGrid): GridFigures {
  const cached = figuresCache.get(grid);
  if (cached) return cached;
  const peakCd = gridPeakCd(grid);
  const steps = Math.round(360 / CONTOUR_STEP_DEG);
  const beam: HalfPlaneEdge[] = [];
  const field: HalfPlaneEdge[] = [];
  for (let step = 0; step < steps; step += 1) {
    const c = step * CONTOUR_STEP_DEG;
    beam.push(halfPlaneEdge(grid, c, 0.5, peakCd));
    field.push(halfPlaneEdge(grid, c, 0.1, peakCd));
  }
  const planes: PlaneAngles[] = [];
  for (let step = 0; step < steps / 2; step += 1) {
    const opposite = step + steps / 2;
    planes.push({
      planeDeg: step * CONTOUR_STEP_DEG,
      beamAngleDeg: beam[step].edgeDeg + beam[opposite].edgeDeg,
      fieldAngleDeg: field[step].edgeDeg + field[opposite].edgeDeg,
    });
  }
  const beams = planes.map((plane) => plane.beamAngleDeg);
  const fields = planes.map((plane) => plane.fieldAngleDeg);
  const figures: GridFigures = {
    peakCd,
    axialCd: gridIntensityCd(grid, 0, 0),
    totalLumens: gridTotalLumens(grid),
    planes,
    c0: planes[0],
    c90: planes[Math.round(90 / CONTOUR_STEP_DEG)],
    beamAngleMinDeg: Math.min(...beams),
    beamAngleMaxDeg: Math.max(...beams),
    fieldAngleMinDeg: Math.min(...fields),
    fieldAngleMaxDeg: Math.max(...fields),
    beamEdgeReached: beam.every((edge) => edge.reached),
    fieldEdgeReached: field.every((edge) => edge.reached),
    beamContourDeg: beam.map((edge) => edge.edgeDeg),
    fieldContourDeg: field.map((edge) => edge.edgeDeg),
  };
  figuresCache.set(grid, figures);
  return figures;
}

/** Edge γ (deg) of a contour (from gridFigures) at any C (deg), linear between its samples. */
export function contourAtDeg(contourDeg: readonly number[], horizontalDeg: number): number {
  const count = contourDeg.length;
  const position = ((((horizontalDeg % 360) + 360) % 360) / 360) * count;
  const index = Math.floor(position) % count;
  const t = position - Math.floor(position);
  return contourDeg[index] + (contourDeg[(index + 1) % count] - contourDeg[index]) * t;
}
