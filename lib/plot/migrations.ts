/**
 * File-format migrations: one function per version step, applied in order to a parsed (not yet
 * validated) file until it reaches PLOT_VERSION. A step receives the plain JSON of version N and
 * returns the plain JSON of version N + 1; it must not throw for files that were valid at N.
 */
import { PLOT_VERSION } from './schema/document';
import { DEFAULT_POWER, DEFAULT_RIGGING } from './schema/power';

export type JsonObject = { [key: string]: unknown };

export interface Migration {
  /** The version this step reads. */
  readonly from: number;
  /** What changed, for the release notes and the tests. */
  readonly summary: string;
  readonly migrate: (file: JsonObject) => JsonObject;
}

/**
 * Version 0 was the unversioned draft format written before the first release: it called the plot
 * `title` and had no display units. Kept so the migration path is exercised from day one.
 */
export const MIGRATIONS: readonly Migration[] = [
  {
    from: 0,
    summary: 'rename title → name; add displayUnits "metric"',
    migrate: (file) => {
      const { title, ...rest } = file;
      return { ...rest, name: rest.name ?? title, displayUnits: rest.displayUnits ?? 'metric', version: 1 };
    },
  },
  {
    from: 1,
    summary: 'fixture types may carry measured photometry; existing files only change their version',
    migrate: (file) => ({ ...file, version: 2 }),
  },
  {
    from: 2,
    summary:
      'add level sets (none), role overrides per subject (none), power (230 V single phase, 80 %, no circuits) and a 1 kg rigging allowance per unit',
    migrate: (file) => ({
      ...file,
      subjects: Array.isArray(file.subjects)
        ? file.subjects.map((person: unknown) =>
            person !== null && typeof person === 'object' && !Array.isArray(person)
              ? { roleOverrides: {}, ...person }
              : person,
          )
        : file.subjects,
      levelSets: file.levelSets ?? [],
      activeLevelSetId: file.activeLevelSetId ?? null,
      power: file.power ?? DEFAULT_POWER,
      rigging: file.rigging ?? DEFAULT_RIGGING,
      version: 3,
    }),
  },
];

export type MigrationResult =
  { ok: true; file: JsonObject; applied: string[] } | { ok: false; message: string };

/** Bring a file of any known older version up to PLOT_VERSION. Never throws. */
export function migrateToCurrent(file: JsonObject, version: number): MigrationResult {
  let current = file;
  const applied: string[] = [];
  for (let step = version; step < PLOT_VERSION; step += 1) {
    const migration = MIGRATIONS.find((candidate) => candidate.from === step);
    if (!migration) return { ok: false, message: `version: there is no way to read version ${step} files` };
    try {
      current = migration.migrate(current);
    } catch (error) {
      return {
        ok: false,
        message: `version: could not update from version ${step}: ${(error as Error).message}`,
      };
    }
    applied.push(`${step} → ${step + 1}: ${migration.summary}`);
  }
  return { ok: true, file: current, applied };
}
