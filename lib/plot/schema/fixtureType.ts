/** Fixture types: what a unit is, how its light is shaped and how much it emits. */
import { z } from 'zod';
import {
  MAX_HORIZONTAL_ANGLES,
  MAX_VERTICAL_ANGLES,
  SYMMETRIES,
  candelaGridProblems,
} from '../../formats/candelaGrid';
import { finite, id, name, notes, positiveMetres, expecting } from './primitives';

const angle = () => finite().gt(0, 'must be greater than 0°').lt(180, 'must be less than 180°');

export const roundSpread = z.strictObject({
  kind: z.literal('round'),
  beamAngleDeg: angle(),
  fieldAngleDeg: angle(),
});

export const ovalSpread = z.strictObject({
  kind: z.literal('oval'),
  beamAngleXDeg: angle(),
  fieldAngleXDeg: angle(),
  beamAngleYDeg: angle(),
  fieldAngleYDeg: angle(),
  rotationDeg: finite()
    .min(-180, 'must be between −180° and 180°')
    .max(180, 'must be between −180° and 180°'),
});

export const beamOutput = z.discriminatedUnion('kind', [
  /** Peak (centre) intensity at full, cd. */
  z.strictObject({
    kind: z.literal('peak'),
    peakCd: finite().gt(0, 'must be greater than 0').max(1e8, 'must be at most 100 000 000 cd'),
  }),
  /** Total luminous flux at full, lm (kept when a zoom changes its angle). */
  z.strictObject({
    kind: z.literal('lumens'),
    lumens: finite().gt(0, 'must be greater than 0').max(1e7, 'must be at most 10 000 000 lm'),
  }),
]);

/** A zoom: beam angle settable within [minBeamDeg, maxBeamDeg]; field = beam × fieldPerBeam. */
export const zoomRange = z.strictObject({
  minBeamDeg: angle(),
  maxBeamDeg: angle(),
  /** Field angle over beam angle across the zoom (an approximation; typical 1.3–1.8). */
  fieldPerBeam: finite().gt(1, 'must be greater than 1').max(10, 'must be at most 10'),
});

export const beamPhotometry = z.strictObject({
  kind: z.literal('beam'),
  output: beamOutput,
  /** Spread at the type's nominal setting (for a zoom, its widest beam unless a fixture sets one). */
  spread: z.discriminatedUnion('kind', [roundSpread, ovalSpread]),
  zoom: zoomRange.nullable(),
  /** Interchangeable lens tubes for a fixed-angle profile, degrees (beam angles), for the lens picker. */
  lensOptionsDeg: z.array(angle()).max(20, 'may list at most 20 lenses'),
});

export const softPhotometry = z.strictObject({
  kind: z.literal('soft'),
  shape: z.discriminatedUnion('kind', [
    z.strictObject({ kind: z.literal('disc'), radiusM: positiveMetres() }),
    z.strictObject({ kind: z.literal('rectangle'), widthM: positiveMetres(), heightM: positiveMetres() }),
  ]),
  output: z.discriminatedUnion('kind', [
    z.strictObject({
      kind: z.literal('luminance'),
      cdPerM2: finite().gt(0, 'must be greater than 0').max(1e9, 'is too large'),
    }),
    z.strictObject({
      kind: z.literal('lumens'),
      lumens: finite().gt(0, 'must be greater than 0').max(1e7, 'is too large'),
    }),
  ]),
});

/** Longest photometric file text kept in a plot for export, characters (larger files keep only the grid). */
export const MAX_STORED_FILE_CHARS = 600_000;

/**
 * A measured candela distribution (from an IES LM-63 or EULUMDAT file). Its photometric axis
 * (γ = 0, nadir in the file) is the unit's beam axis; C = 0 lies along the beam frame's horizontal u
 * (see directionInBeamFrame) and C = 90 along −v: counter-clockwise seen from behind the unit,
 * which for a unit aimed straight down is counter-clockwise seen from above, as type C files count it.
 * Intensities are absolute cd at full; level and filter scale them.
 */
export const measuredPhotometry = z.strictObject({
  kind: z.literal('measured'),
  file: z.strictObject({
    format: z.enum(['lm63', 'eulumdat'], { error: expecting('must be lm63 or eulumdat') }),
    fileName: z
      .string({ error: expecting('must be text') })
      .min(1, 'must not be empty')
      .max(255, 'must be at most 255 characters'),
    /** The file exactly as read, for export; null when it was longer than MAX_STORED_FILE_CHARS. */
    originalText: z
      .string({ error: expecting('must be text') })
      .max(MAX_STORED_FILE_CHARS, `must be at most ${MAX_STORED_FILE_CHARS} characters`)
      .nullable(),
  }),
  grid: z.strictObject({
    symmetry: z.enum(SYMMETRIES, { error: expecting(`must be one of ${SYMMETRIES.join(', ')}`) }),
    /** γ from the axis, degrees, ascending within 0–180. */
    verticalAnglesDeg: z
      .array(z.number({ error: expecting('must be a number') }))
      .max(MAX_VERTICAL_ANGLES, `may have at most ${MAX_VERTICAL_ANGLES} angles`),
    /** Stored C planes, degrees, ascending. */
    horizontalAnglesDeg: z
      .array(z.number({ error: expecting('must be a number') }))
      .max(MAX_HORIZONTAL_ANGLES, `may have at most ${MAX_HORIZONTAL_ANGLES} angles`),
    /** Absolute cd at full, one row per stored C plane, one value per γ. */
    candelaCd: z
      .array(z.array(z.number({ error: expecting('must be a number') })))
      .max(MAX_HORIZONTAL_ANGLES, `may have at most ${MAX_HORIZONTAL_ANGLES} rows`),
  }),
});

export const FIXTURE_CATEGORIES = [
  'profile',
  'fresnel',
  'par',
  'wash',
  'followspot',
  'soft',
  'other',
] as const;

export const fixtureType = z.strictObject({
  id: id(),
  name: name(),
  category: z.enum(FIXTURE_CATEGORIES, {
    error: expecting(`must be one of ${FIXTURE_CATEGORIES.join(', ')}`),
  }),
  photometry: z.discriminatedUnion('kind', [beamPhotometry, softPhotometry, measuredPhotometry]),
  /** Electrical load at full, W. */
  powerW: finite().min(0, 'must not be negative').max(100000, 'must be at most 100 000 W'),
  /** Weight of the unit as hung (without clamp and safety), kg. */
  weightKg: finite().min(0, 'must not be negative').max(5000, 'must be at most 5000 kg'),
  /** Colour temperature at full, K. */
  colourTemperatureK: finite().min(1000, 'must be at least 1000 K').max(20000, 'must be at most 20 000 K'),
  dimmingCurve: z.enum(['linear', 'square', 'incandescent'], {
    error: 'must be linear, square or incandescent',
  }),
  /** Where the figures come from (e.g. "typical values, from memory"). */
  notes: notes(),
});
export type FixtureType = z.infer<typeof fixtureType>;
export type BeamPhotometry = z.infer<typeof beamPhotometry>;
export type SoftPhotometry = z.infer<typeof softPhotometry>;
export type MeasuredPhotometry = z.infer<typeof measuredPhotometry>;

export interface RuleProblem {
  /** Path inside the checked item. */
  readonly path: (string | number)[];
  readonly message: string;
}

/** The rules a fixture type must keep beyond field ranges: field wider than beam, a sane zoom. */
export function fixtureTypeRuleProblems(type: FixtureType): RuleProblem[] {
  if (type.photometry.kind === 'measured') {
    return candelaGridProblems(type.photometry.grid).map((message) => ({
      path: ['photometry', 'grid'],
      message,
    }));
  }
  if (type.photometry.kind !== 'beam') return [];
  const problems: RuleProblem[] = [];
  const spread = type.photometry.spread;
  const pairs: [number, number, string][] =
    spread.kind === 'round'
      ? [[spread.beamAngleDeg, spread.fieldAngleDeg, 'fieldAngleDeg']]
      : [
          [spread.beamAngleXDeg, spread.fieldAngleXDeg, 'fieldAngleXDeg'],
          [spread.beamAngleYDeg, spread.fieldAngleYDeg, 'fieldAngleYDeg'],
        ];
  for (const [beam, field, key] of pairs) {
    if (field <= beam)
      problems.push({ path: ['photometry', 'spread', key], message: 'must be wider than the beam angle' });
  }
  const zoom = type.photometry.zoom;
  if (zoom && zoom.minBeamDeg > zoom.maxBeamDeg) {
    problems.push({
      path: ['photometry', 'zoom', 'maxBeamDeg'],
      message: 'must not be less than minBeamDeg',
    });
  }
  if (zoom && zoom.maxBeamDeg * zoom.fieldPerBeam >= 180) {
    problems.push({
      path: ['photometry', 'zoom', 'fieldPerBeam'],
      message: 'makes the widest field angle 180° or more',
    });
  }
  return problems;
}

/** Whether a zoom setting fits a type: null when it does, else what is wrong with it. */
export function zoomSettingProblem(type: FixtureType, zoomBeamDeg: number | null): string | null {
  if (zoomBeamDeg === null) return null;
  const zoom = type.photometry.kind === 'beam' ? type.photometry.zoom : null;
  if (!zoom) return `is set but "${type.name}" has no zoom`;
  if (zoomBeamDeg < zoom.minBeamDeg || zoomBeamDeg > zoom.maxBeamDeg) {
    return `must be within the zoom range ${zoom.minBeamDeg}°–${zoom.maxBeamDeg}°`;
  }
  return null;
}
