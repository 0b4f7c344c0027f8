/**
 * Level sets: named sets of levels kept in the show (a look per scene or per camera setup).
 *
 * The fixtures' own `levelPct` are the levels in use. When a set is chosen (`activeLevelSetId`),
 * every change of level is written into that set as well (the store keeps them equal after every
 * command), and choosing another set first loads its levels onto the fixtures. A unit that is not
 * in a set is at 0 % in it.
 */
import { z } from 'zod';
import { finite, id, name } from './primitives';

export const levelPct = () =>
  finite().min(0, 'must be between 0 and 100').max(100, 'must be between 0 and 100');

export const levelSet = z.strictObject({
  id: id(),
  name: name(),
  /** Level of each unit in this set, %, keyed by fixture id. */
  levels: z.record(id(), levelPct()),
});
export type LevelSet = z.infer<typeof levelSet>;

/** Roles a user may give a source on a subject, overriding the geometric rule. */
export const LIGHT_ROLES = ['key', 'fill', 'back', 'side', 'top'] as const;
export const roleOverrides = z.record(
  id(),
  z.enum(LIGHT_ROLES, { error: `must be one of ${LIGHT_ROLES.join(', ')}` }),
);
