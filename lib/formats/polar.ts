/** Points for a polar candela plot: intensity against γ in two plane pairs, as a data sheet draws it. */
import { type CandelaGrid, gridIntensityCd } from './candelaGrid';
import { gridPeakCd } from './gridFigures';

export interface PolarCurve {
  /** The plane pair, e.g. "C0–C180". */
  readonly label: string;
  /**
   * Points in the plot's own frame, scaled so the peak is 1: x to the right (toward the plane C,
   * the first of the pair on the right), y downward from the source (nadir down).
   */
  readonly points: readonly { readonly x: number; readonly y: number }[];
}

/**
 * Curves through the C0–C180 and C90–C270 plane pairs, each sampled every `stepDeg` of γ over the
 * whole circle (C on the right, C + 180 on the left), normalised to the grid's peak.
 */
export function polarCurves(grid: CandelaGrid, stepDeg = 2): PolarCurve[] {
  const peak = gridPeakCd(grid) || 1;
  const curve = (plane: number, label: string): PolarCurve => {
    const points: { x: number; y: number }[] = [];
    for (let gamma = 0; gamma <= 180 + 1e-9; gamma += stepDeg) {
      const r = gridIntensityCd(grid, gamma, plane) / peak;
      const angle = (gamma * Math.PI) / 180;
      points.push({ x: r * Math.sin(angle), y: r * Math.cos(angle) });
    }
    for (let gamma = 180; gamma >= -1e-9; gamma -= stepDeg) {
      const r = gridIntensityCd(grid, gamma, plane + 180) / peak;
      const angle = (gamma * Math.PI) / 180;
      points.push({ x: -r * Math.sin(angle), y: r * Math.cos(angle) });
    }
    return { label, points };
  };
  return [curve(0, 'C0–C180'), curve(90, 'C90–C270')];
}
