/** What a reader returns: the candela grid with its derived figures and the file's own facts. */
import { type CandelaGrid, gridIntensityCd } from './candelaGrid';
import type { PhotometryFormat } from './errors';
import { type PlaneAngles, gridFigures } from './gridFigures';

/** Size of the luminous opening, m (0 when the file gives none; negative LM-63 sizes mean round). */
export interface LuminousOpening {
  readonly widthM: number;
  readonly lengthM: number;
  readonly heightM: number;
}

/** The facts a reader takes from a file, before figures are derived. */
export interface ParsedPhotometry {
  readonly format: PhotometryFormat;
  /** e.g. "LM-63-2002", "LM-63-2019", "LM-63-1995", "LM-63-1991", "LM-63-1986", "EULUMDAT". */
  readonly formatVersion: string;
  readonly fileName: string;
  /** Luminaire name or catalogue text from the file, or the file name. */
  readonly title: string;
  readonly grid: CandelaGrid;
  /** Rated lamp lumens the intensities are for (lamps × lumens per lamp); null for absolute photometry. */
  readonly ratedLampLumens: number | null;
  readonly inputWatts: number | null;
  readonly luminousOpening: LuminousOpening | null;
  /** LM-63 keywords (`[MANUFAC]` → "MANUFAC") or EULUMDAT header fields, as text. */
  readonly keywords: Readonly<Record<string, string>>;
  /** Things read but not used, or repaired, one line each. */
  readonly warnings: readonly string[];
  /** The file exactly as given, for export. */
  readonly originalText: string;
}

/**
 * A measured distribution with derived figures. Angles in degrees, γ from nadir (the photometric
 * axis), C about it. `beamAngleDeg`/`fieldAngleDeg` are across the C0–C180 plane pair, the `Cross`
 * figures across C90–C270; min/max run over plane pairs every 5° of C (see gridFigures).
 */
export interface PhotometryDistribution extends ParsedPhotometry {
  readonly totalLumens: number;
  readonly peakCd: number;
  /** Intensity on the photometric axis (γ = 0), cd. */
  readonly axialCd: number;
  readonly beamAngleDeg: number;
  readonly fieldAngleDeg: number;
  readonly beamAngleCrossDeg: number;
  readonly fieldAngleCrossDeg: number;
  readonly beamAngleMinDeg: number;
  readonly beamAngleMaxDeg: number;
  readonly fieldAngleMinDeg: number;
  readonly fieldAngleMaxDeg: number;
  readonly planes: readonly PlaneAngles[];
  /** Total lumens ÷ rated lamp lumens (relative photometry), else null. */
  readonly efficiency: number | null;
  /** Intensity (cd) toward γ = verticalDeg, C = horizontalDeg; bilinear, symmetry respected. */
  intensityCd(verticalDeg: number, horizontalDeg: number): number;
}

/** Derive the figures of a parsed file. */
export function describeDistribution(parsed: ParsedPhotometry): PhotometryDistribution {
  const figures = gridFigures(parsed.grid);
  const grid = parsed.grid;
  return {
    ...parsed,
    totalLumens: figures.totalLumens,
    peakCd: figures.peakCd,
    axialCd: figures.axialCd,
    beamAngleDeg: figures.c0.beamAngleDeg,
    fieldAngleDeg: figures.c0.fieldAngleDeg,
    beamAngleCrossDeg: figures.c90.beamAngleDeg,
    fieldAngleCrossDeg: figures.c90.fieldAngleDeg,
    beamAngleMinDeg: figures.beamAngleMinDeg,
    beamAngleMaxDeg: figures.beamAngleMaxDeg,
    fieldAngleMinDeg: figures.fieldAngleMinDeg,
    fieldAngleMaxDeg: figures.fieldAngleMaxDeg,
    planes: figures.planes,
    efficiency:
      parsed.ratedLampLumens !== null && parsed.ratedLampLumens > 0
        ? figures.totalLumens / parsed.ratedLampLumens
        : null,
    intensityCd: (verticalDeg, horizontalDeg) => gridIntensityCd(grid, verticalDeg, horizontalDeg),
  };
}
