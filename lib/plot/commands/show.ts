/** Commands on the show as a whole: its settings, the stage outline, acting areas and fixture types. */
import { current, isDraft } from 'immer';
import { z } from 'zod';
import { libraryEntry } from '../library/genericTypes';
import { CommandRefused, checked, defineCommand, findOrRefuse, nextId, requireFreeId } from '../command';
import {
  type FixtureType,
  fixtureType as fixtureTypeSchema,
  fixtureTypeRuleProblems,
} from '../schema/fixtureType';
import { type ActingArea, actingArea, stage } from '../schema/stage';
import { finite, name, notes, outline, type PlanPoint } from '../schema/primitives';

const showSettings = z.strictObject({
  name: name(),
  venue: z.string().max(120, 'must be at most 120 characters'),
  notes: notes(),
  displayUnits: z.enum(['metric', 'imperial'], { error: 'must be metric or imperial' }),
  focusPlaneHeightM: finite().min(0, 'must be between 0 and 10 m').max(10, 'must be between 0 and 10 m'),
});
export type ShowSettings = z.infer<typeof showSettings>;

/** Edit the show's name, venue, notes, display units or focus-plane height. */
export const updateShow = defineCommand<Partial<ShowSettings>>({
  name: 'show.update',
  label: (changes) =>
    Object.keys(changes).length === 1 && changes.displayUnits ? 'Change units' : 'Edit show settings',
  apply(draft, changes) {
    const merged = checked(
      showSettings,
      {
        name: draft.name,
        venue: draft.venue,
        notes: draft.notes,
        displayUnits: draft.displayUnits,
        focusPlaneHeightM: draft.focusPlaneHeightM,
        ...changes,
      },
      'show',
    );
    Object.assign(draft, merged);
  },
});

/** Replace the stage outline. */
export const setStageOutline = defineCommand<{ outline: readonly PlanPoint[] }>({
  name: 'stage.outline',
  label: () => 'Edit stage outline',
  apply(draft, args) {
    draft.stage.outline = checked(outline, args.outline, 'stage.outline');
    checked(stage, draft.stage, 'stage');
  },
});

/** Add an acting area. */
export const addActingArea = defineCommand<Omit<ActingArea, 'id'> & { id?: string }>({
  name: 'area.add',
  label: ({ name: areaName }) => `Add acting area ${areaName}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'area');
    requireFreeId(draft, id);
    draft.stage.acting.push(checked(actingArea, { ...args, id }, 'new acting area'));
  },
});

/** Edit an acting area's name or outline. */
export const updateActingArea = defineCommand<{ id: string; changes: Partial<Omit<ActingArea, 'id'>> }>({
  name: 'area.update',
  label: () => 'Edit acting area',
  apply(draft, { id, changes }) {
    const index = draft.stage.acting.findIndex((area) => area.id === id);
    if (index < 0) throw new CommandRefused(`There is no acting area with id "${id}".`);
    draft.stage.acting[index] = checked(
      actingArea,
      { ...draft.stage.acting[index], ...changes, id },
      `acting area ${id}`,
    );
  },
});

/** Delete an acting area. */
export const deleteActingArea = defineCommand<{ id: string }>({
  name: 'area.delete',
  label: () => 'Delete acting area',
  apply(draft, { id }) {
    findOrRefuse(draft.stage.acting, id, 'acting area');
    draft.stage.acting = draft.stage.acting.filter((area) => area.id !== id);
  },
});

/** Add a fixture type to the show. */
export const addFixtureType = defineCommand<Omit<FixtureType, 'id'> & { id?: string }>({
  name: 'type.add',
  label: ({ name: typeName }) => `Add fixture type ${typeName}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'type');
    requireFreeId(draft, id);
    draft.fixtureTypes.push(checkedType({ ...args, id }, 'new fixture type'));
  },
});

/** Edit a fixture type; units of that type keep a zoom setting only within the new range. */
export const updateFixtureType = defineCommand<{ id: string; changes: Partial<Omit<FixtureType, 'id'>> }>({
  name: 'type.update',
  label: () => 'Edit fixture type',
  apply(draft, { id, changes }) {
    const index = draft.fixtureTypes.findIndex((type) => type.id === id);
    if (index < 0) throw new CommandRefused(`There is no fixture type with id "${id}".`);
    const type = checkedType({ ...draft.fixtureTypes[index], ...changes, id }, `fixture type ${id}`);
    draft.fixtureTypes[index] = type;
    const zoom = type.photometry.kind === 'beam' ? type.photometry.zoom : null;
    for (const unit of draft.fixtures) {
      if (unit.typeId !== id || unit.zoomBeamDeg === null) continue;
      unit.zoomBeamDeg = zoom ? Math.min(zoom.maxBeamDeg, Math.max(zoom.minBeamDeg, unit.zoomBeamDeg)) : null;
    }
  },
});

/** Delete a fixture type that no unit uses. */
export const deleteFixtureType = defineCommand<{ id: string }>({
  name: 'type.delete',
  label: () => 'Delete fixture type',
  apply(draft, { id }) {
    const type = findOrRefuse(draft.fixtureTypes, id, 'fixture type');
    const users = draft.fixtures.filter((unit) => unit.typeId === id).length;
    if (users > 0) {
      throw new CommandRefused(
        `${type.name} is used by ${users} fixture${users === 1 ? '' : 's'}: change their type first.`,
      );
    }
    draft.fixtureTypes = draft.fixtureTypes.filter((candidate) => candidate.id !== id);
  },
});

/** Copy a fixture type under a new id (default `type-N`) and name (default "… copy"). */
export const duplicateFixtureType = defineCommand<{ id: string; newId?: string; name?: string }>({
  name: 'type.duplicate',
  label: () => 'Duplicate fixture type',
  apply(draft, { id, newId, name: newName }) {
    const original = findOrRefuse(draft.fixtureTypes, id, 'fixture type');
    const copyId = newId ?? nextId(draft, 'type');
    requireFreeId(draft, copyId);
    const copyName = newName ?? `${original.name} copy`.slice(0, 120);
    draft.fixtureTypes.push(
      checkedType(
        { ...structuredClone(isDraft(original) ? current(original) : original), id: copyId, name: copyName },
        'copied fixture type',
      ),
    );
  },
});

/** Add a copy of a built-in library type to the show, so it can be hung and edited. */
export const addLibraryFixtureType = defineCommand<{ libraryId: string; id?: string }>({
  name: 'type.addFromLibrary',
  label: ({ libraryId }) => `Add ${libraryEntry(libraryId)?.type.name ?? 'library type'}`,
  apply(draft, { libraryId, id }) {
    const entry = libraryEntry(libraryId);
    if (!entry) throw new CommandRefused(`There is no library type "${libraryId}".`);
    const typeId = id ?? nextId(draft, 'type');
    requireFreeId(draft, typeId);
    draft.fixtureTypes.push(checkedType({ ...structuredClone(entry.type), id: typeId }, 'library type'));
  },
});

/** A type checked by its schema and its angle rules (field wider than beam, zoom within 180°). */
function checkedType(value: unknown, where: string): FixtureType {
  const type = checked(fixtureTypeSchema, value, where);
  const problems = fixtureTypeRuleProblems(type);
  if (problems.length > 0) {
    throw new CommandRefused(
      problems.map((problem) => `${where}.${problem.path.join('.')}: ${problem.message}`).join('\n'),
    );
  }
  return type;
}
