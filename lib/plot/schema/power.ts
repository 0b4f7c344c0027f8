/**
 * The show's electrical supply and its circuits (or dimmers), and the rigging allowance per unit.
 * A fixture is on a circuit when its `circuit` text equals a circuit's `address`.
 */
import { z } from 'zod';
import { finite, id, name, expecting } from './primitives';

export const PHASES = ['L1', 'L2', 'L3'] as const;
export type Phase = (typeof PHASES)[number];

const amps = () => finite().gt(0, 'must be greater than 0 A').max(10000, 'must be at most 10 000 A');

export const feeder = z.strictObject({
  id: id(),
  name: name(),
  /** Rating of the feeder per phase conductor, A. */
  ratingA: amps(),
});
export type Feeder = z.infer<typeof feeder>;

export const circuit = z.strictObject({
  /** The address as written on the rig and on the fixtures (e.g. "A12", "2/45"). */
  address: z
    .string({ error: expecting('must be text') })
    .trim()
    .min(1, 'must not be empty')
    .max(32, 'must be at most 32 characters'),
  /** Rating of the circuit's protection (breaker or dimmer), A. */
  ratingA: amps(),
  /** The feeder it is fed from; null when not given. */
  feederId: id().nullable(),
  /** The phase conductor it is on (a single-phase supply has only L1). */
  phase: z.enum(PHASES, { error: expecting('must be L1, L2 or L3') }),
});
export type Circuit = z.infer<typeof circuit>;

export const power = z.strictObject({
  /** Single phase, or three phase with a neutral (star / wye). */
  system: z.enum(['single', 'three'], { error: expecting('must be single or three') }),
  /** Voltage from a phase conductor to neutral, V (e.g. 230, 120). */
  phaseVoltageV: finite().min(50, 'must be between 50 and 1000 V').max(1000, 'must be between 50 and 1000 V'),
  /** Share of a rating a load may draw continuously before it is flagged, % (80 % is common practice). */
  continuousLimitPct: finite().gt(0, 'must be between 1 and 100 %').max(100, 'must be between 1 and 100 %'),
  feeders: z.array(feeder).max(100, 'may have at most 100 feeders'),
  circuits: z.array(circuit).max(5000, 'may have at most 5000 circuits'),
});
export type PowerSettings = z.infer<typeof power>;

export const rigging = z.strictObject({
  /** Weight added to every unit for its clamp, safety cable and cable run, kg. */
  allowancePerUnitKg: finite()
    .min(0, 'must be between 0 and 100 kg')
    .max(100, 'must be between 0 and 100 kg'),
});
export type RiggingSettings = z.infer<typeof rigging>;

/** A new show's supply: 230 V single phase, 80 % continuous limit, no circuits listed yet. */
export const DEFAULT_POWER: PowerSettings = {
  system: 'single',
  phaseVoltageV: 230,
  continuousLimitPct: 80,
  feeders: [],
  circuits: [],
};

/** About 1 kg per unit for a clamp, safety cable and its share of cable (common practice, no source). */
export const DEFAULT_RIGGING: RiggingSettings = { allowancePerUnitKg: 1 };
