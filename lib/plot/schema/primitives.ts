/** Shared building blocks of the plot file schema: ids, finite numbers with units, points. */
import { z } from 'zod';

/** A type error message that says "is missing" when the field is absent, else `message`. */
export function expecting(message: string) {
  return (issue: { input?: unknown }) => (issue.input === undefined ? 'is missing' : message);
}

/** Any finite number (JSON cannot carry NaN or infinities; this also refuses them from code). */
export const finite = () =>
  z.number({ error: expecting('must be a number') }).refine(Number.isFinite, 'must be a finite number');

/** A length in metres within ±1 km (a stage plot, not a map). */
export const metres = () => finite().min(-1000, 'must be within 1 km').max(1000, 'must be within 1 km');

/** A positive length in metres up to 1 km. */
export const positiveMetres = () => finite().gt(0, 'must be greater than 0').max(1000, 'must be within 1 km');

export const id = () =>
  z
    .string({ error: expecting('must be a text id') })
    .min(1, 'must not be empty')
    .max(64, 'must be at most 64 characters')
    .regex(/^[A-Za-z0-9_.:-]+$/, 'may use only letters, digits and _ . : -');

/** A user-facing name: 1–120 characters. */
export const name = () =>
  z
    .string({ error: expecting('must be text') })
    .trim()
    .min(1, 'must not be empty')
    .max(120, 'must be at most 120 characters');

/** Free notes: up to 4000 characters. */
export const notes = () =>
  z.string({ error: expecting('must be text') }).max(4000, 'must be at most 4000 characters');

export const planPoint = z.strictObject({ x: metres(), y: metres() });
export type PlanPoint = z.infer<typeof planPoint>;

export const worldPoint = z.strictObject({ x: metres(), y: metres(), z: metres() });
export type WorldPoint = z.infer<typeof worldPoint>;

/** A closed outline in plan: at least three points. */
export const outline = z
  .array(planPoint)
  .min(3, 'needs at least 3 points')
  .max(500, 'may have at most 500 points');
