/** The stage, its acting areas and the hanging positions (pipes, truss, booms, stands, floor). */
import { z } from 'zod';
import { finite, id, metres, name, notes, outline, planPoint, expecting } from './primitives';

export const actingArea = z.strictObject({
  id: id(),
  name: name(),
  outline,
});
export type ActingArea = z.infer<typeof actingArea>;

export const stage = z.strictObject({
  /** Outline of the playing floor in plan. */
  outline,
  acting: z.array(actingArea).max(200, 'may have at most 200 acting areas'),
});
export type Stage = z.infer<typeof stage>;

export const POSITION_KINDS = ['pipe', 'truss', 'boom', 'stand', 'floor', 'other'] as const;
export type PositionKind = (typeof POSITION_KINDS)[number];

export const positionShape = z.discriminatedUnion('kind', [
  /** A straight run in plan (a pipe or batten, a truss span, a ladder face). */
  z.strictObject({ kind: z.literal('line'), start: planPoint, end: planPoint }),
  /** A single point in plan (a stand, a boom, a floor spot). */
  z.strictObject({ kind: z.literal('point'), at: planPoint }),
]);
export type PositionShape = z.infer<typeof positionShape>;

export const hangingPosition = z.strictObject({
  id: id(),
  name: name(),
  kind: z.enum(POSITION_KINDS, { error: expecting(`must be one of ${POSITION_KINDS.join(', ')}`) }),
  shape: positionShape,
  /** Height of the hanging point (trim) above the stage floor, m. Booms: the height of the top unit. */
  heightM: metres(),
  /** The load the position is rated for, kg, as given by whoever is responsible for it; null if unknown. */
  ratedLoadKg: finite().gt(0, 'must be greater than 0').max(100000, 'must be at most 100 000 kg').nullable(),
  /** How the rating applies: spread evenly along the position, or at one point. */
  loadKind: z.enum(['uniform', 'point'], { error: expecting('must be uniform or point') }),
  notes: notes(),
});
export type HangingPosition = z.infer<typeof hangingPosition>;
