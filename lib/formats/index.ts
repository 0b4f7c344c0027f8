/**
 * Measured photometry: IES LM-63 and EULUMDAT readers and the candela-grid maths. The stable entry
 * point is readPhotometryFile(text, fileName); outside verification reads its result's names
 * (totalLumens, peakCd, beamAngleDeg, fieldAngleDeg, intensityCd(verticalDeg, horizontalDeg)).
 */
import { type PhotometryDistribution, describeDistribution } from './distribution';
import { PhotometryFileError } from './errors';
import { readEulumdat } from './eulumdat';
import { readLm63 } from './lm63';

export * from './candelaGrid';
export * from './distribution';
export * from './errors';
export * from './gridFigures';
export * from './polar';
export { MAX_PHOTOMETRY_FILE_CHARS } from './text';
export { readLm63 } from './lm63';
export { readEulumdat } from './eulumdat';

/** File name endings the readers take. */
export const PHOTOMETRY_FILE_EXTENSIONS = ['.ies', '.ldt'] as const;

/**
 * Read an IES LM-63 (.ies) or EULUMDAT (.ldt) file. The format comes from the name's ending, or,
 * failing that, from the text (an LM-63 header or a TILT= line). Throws PhotometryFileError naming
 * the line of the first problem; never returns NaN figures.
 */
export function readPhotometryFile(text: string, fileName: string): PhotometryDistribution {
  const name = typeof fileName === 'string' && fileName.trim() !== '' ? fileName.trim() : 'the file';
  const lower = name.toLowerCase();
  const looksLm63 =
    typeof text === 'string' &&
    (/^\s*IES/i.test(text.slice(0, 64)) || /^\s*TILT\s*=/im.test(text.slice(0, 20000)));
  const format = lower.endsWith('.ldt')
    ? 'eulumdat'
    : lower.endsWith('.ies') || looksLm63
      ? 'lm63'
      : 'eulumdat';
  const parsed = format === 'lm63' ? readLm63(text, name) : readEulumdat(text, name);
  const distribution = describeDistribution(parsed);
  const figures = [
    distribution.totalLumens,
    distribution.peakCd,
    distribution.beamAngleDeg,
    distribution.fieldAngleDeg,
  ];
  if (!figures.every(Number.isFinite)) {
    throw new PhotometryFileError(name, null, 'its figures could not be computed (not finite numbers)');
  }
  return distribution;
}
