/** From a read photometric file to the document's measured photometry and a new fixture type. */
import type { PhotometryDistribution } from '../../formats/distribution';
import { type FixtureType, MAX_STORED_FILE_CHARS, type MeasuredPhotometry } from '../schema/fixtureType';

/** The measured photometry a distribution becomes: its grid, and its text when short enough to keep. */
export function measuredPhotometryFrom(distribution: PhotometryDistribution): MeasuredPhotometry {
  const grid = distribution.grid;
  return {
    kind: 'measured',
    file: {
      format: distribution.format,
      fileName: distribution.fileName.slice(0, 255),
      originalText:
        distribution.originalText.length <= MAX_STORED_FILE_CHARS ? distribution.originalText : null,
    },
    grid: {
      symmetry: grid.symmetry,
      verticalAnglesDeg: [...grid.verticalAnglesDeg],
      horizontalAnglesDeg: [...grid.horizontalAnglesDeg],
      candelaCd: grid.candelaCd.map((row) => [...row]),
    },
  };
}

/** A new fixture type (without id) for an imported file: its name, its watts, a note of where it came from. */
export function measuredTypeDraft(
  distribution: PhotometryDistribution,
  overrides: Partial<Omit<FixtureType, 'id' | 'photometry'>> = {},
): Omit<FixtureType, 'id'> {
  const watts = distribution.inputWatts ?? 0;
  return {
    name: distribution.title.slice(0, 120).trim() || 'Imported fixture',
    category: 'other',
    photometry: measuredPhotometryFrom(distribution),
    powerW: watts > 0 && watts <= 100000 ? watts : 0,
    weightKg: 0,
    colourTemperatureK: 3200,
    dimmingCurve: 'linear',
    notes: `Measured photometry from ${distribution.fileName} (${distribution.formatVersion}).`.slice(
      0,
      4000,
    ),
    ...overrides,
  };
}
