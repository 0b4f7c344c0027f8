/** Fixtures as hung: which type, where, aimed where, at what level, through which filter, on what control. */
import { z } from 'zod';
import { finite, id, notes, worldPoint, expecting } from './primitives';

export const filter = z.strictObject({
  /** The user's own name for the colour or diffusion (e.g. "pale straw", "half orange"). */
  name: z
    .string({ error: expecting('must be text') })
    .trim()
    .min(1, 'must not be empty')
    .max(60, 'must be at most 60 characters'),
  /** Fraction of light passed, 0–1. */
  transmission: finite().min(0, 'must be between 0 and 1').max(1, 'must be between 0 and 1'),
  /** Colour temperature shift in mireds (+ warmer, − cooler; 0 for a non-conversion colour). */
  miredShift: finite()
    .min(-1000, 'must be between −1000 and 1000')
    .max(1000, 'must be between −1000 and 1000'),
  /** Colour used to draw the beam on the plot, #rrggbb. */
  displayColour: z
    .string({ error: expecting('must be a colour like #ffcc88') })
    .regex(/^#[0-9a-fA-F]{6}$/, 'must be a colour like #ffcc88'),
});
export type Filter = z.infer<typeof filter>;

export const fixture = z.strictObject({
  id: id(),
  typeId: id(),
  /** The hanging position it is on; null for a unit standing on its own. */
  positionId: id().nullable(),
  /** Unit number on its position (numbered as the crew numbers that position, from 1). */
  unit: z
    .int({ error: expecting('must be a whole number') })
    .min(1, 'must be at least 1')
    .max(999, 'must be at most 999')
    .nullable(),
  /** What the unit is for on the paperwork (e.g. "area 3 warm"). */
  purpose: z.string({ error: expecting('must be text') }).max(120, 'must be at most 120 characters'),
  /** Where the unit hangs (the lens / emitting face), world m. */
  mount: worldPoint,
  /** Where it is aimed, world m. */
  focus: worldPoint,
  /** Beam angle set on a zoom type, degrees; null uses the type's nominal spread. */
  zoomBeamDeg: finite().gt(0, 'must be greater than 0°').lt(180, 'must be less than 180°').nullable(),
  levelPct: finite().min(0, 'must be between 0 and 100').max(100, 'must be between 0 and 100'),
  filter: filter.nullable(),
  channel: z
    .int({ error: expecting('must be a whole number') })
    .min(1, 'must be at least 1')
    .max(99999, 'must be at most 99 999')
    .nullable(),
  /** Circuit or dimmer address as written on the rig (e.g. "A12", "2/45"). */
  circuit: z
    .string({ error: expecting('must be text') })
    .trim()
    .max(32, 'must be at most 32 characters')
    .nullable(),
  notes: notes(),
});
export type Fixture = z.infer<typeof fixture>;
