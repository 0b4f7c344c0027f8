/** Commands on level sets (named looks), on several levels at once, and on subjects' role overrides. */
import { z } from 'zod';
import { CommandRefused, checked, defineCommand, findOrRefuse, nextId, requireFreeId } from '../command';
import { LIGHT_ROLES, levelPct } from '../schema/looks';
import { name } from '../schema/primitives';

type LightRoleName = (typeof LIGHT_ROLES)[number];

/** Keep the fixtures' levels as a new level set, and choose it. */
export const storeLevelSet = defineCommand<{ name: string; id?: string }>({
  name: 'levels.store',
  label: ({ name: setName }) => `Keep levels as ${setName}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'look');
    requireFreeId(draft, id);
    const setName = checked(name(), args.name, 'level set name');
    const levels = Object.fromEntries(draft.fixtures.map((unit) => [unit.id, unit.levelPct]));
    draft.levelSets.push({ id, name: setName, levels });
    draft.activeLevelSetId = id;
  },
});

/**
 * Choose a level set: its levels go onto the fixtures (units not in it go to 0 %). Choosing none
 * keeps the levels as they are and stops writing them into any set.
 */
export const chooseLevelSet = defineCommand<{ id: string | null }>({
  name: 'levels.choose',
  label: () => 'Choose level set',
  apply(draft, { id }) {
    if (id === null) {
      draft.activeLevelSetId = null;
      return;
    }
    const set = findOrRefuse(draft.levelSets, id, 'level set');
    for (const unit of draft.fixtures) unit.levelPct = set.levels[unit.id] ?? 0;
    draft.activeLevelSetId = id;
  },
});

export const renameLevelSet = defineCommand<{ id: string; name: string }>({
  name: 'levels.rename',
  label: () => 'Rename level set',
  apply(draft, args) {
    findOrRefuse(draft.levelSets, args.id, 'level set').name = checked(name(), args.name, 'level set name');
  },
});

/** Delete a level set; the fixtures keep their levels. */
export const deleteLevelSet = defineCommand<{ id: string }>({
  name: 'levels.delete',
  label: () => 'Delete level set',
  apply(draft, { id }) {
    findOrRefuse(draft.levelSets, id, 'level set');
    draft.levelSets = draft.levelSets.filter((set) => set.id !== id);
    if (draft.activeLevelSetId === id) draft.activeLevelSetId = null;
  },
});

/** A role given to a source on a subject (as setRoleOverride gives one). */
export interface RolePin {
  readonly subjectId: string;
  readonly fixtureId: string;
  readonly role: LightRoleName;
}

const rolePin = z.object({
  subjectId: z.string(),
  fixtureId: z.string(),
  role: z.enum(LIGHT_ROLES, { error: `must be one of ${LIGHT_ROLES.join(', ')}` }),
});

/**
 * Set many units' levels in one step (e.g. the balance solver's proposal), and optionally give
 * sources roles on subjects in the same step (`roles`: the balance keeps the roles its solve used,
 * which the geometric rule could otherwise re-decide at the new levels). Every id is checked before
 * anything changes: an unknown fixture or subject refuses the whole step.
 */
export const setLevels = defineCommand<{
  levels: Readonly<Record<string, number>>;
  roles?: readonly RolePin[];
  label?: string;
}>({
  name: 'levels.set',
  label: ({ levels, label }) => label ?? `Set ${Object.keys(levels).length} levels`,
  apply(draft, { levels, roles }) {
    const checkedLevels = checked(z.record(z.string(), levelPct()), levels, 'levels');
    if (roles !== undefined && !Array.isArray(roles)) throw new CommandRefused('roles: must be a list');
    const checkedRoles = (roles ?? []).map((pin, index) => {
      const where = `roles[${index}]`;
      const valid = checked(rolePin, pin, where);
      if (!draft.subjects.some((person) => person.id === valid.subjectId))
        throw new CommandRefused(`${where}.subjectId: there is no subject with id "${valid.subjectId}".`);
      if (!draft.fixtures.some((unit) => unit.id === valid.fixtureId))
        throw new CommandRefused(`${where}.fixtureId: there is no fixture with id "${valid.fixtureId}".`);
      return valid;
    });
    for (const [id, value] of Object.entries(checkedLevels)) {
      findOrRefuse(draft.fixtures, id, 'fixture').levelPct = value;
    }
    for (const pin of checkedRoles) {
      findOrRefuse(draft.subjects, pin.subjectId, 'subject').roleOverrides[pin.fixtureId] = pin.role;
    }
  },
});

/** Give a source a role on a subject, or (role null) let the geometric rule decide again. */
export const setRoleOverride = defineCommand<{
  subjectId: string;
  fixtureId: string;
  role: LightRoleName | null;
}>({
  name: 'subject.role',
  label: ({ role }) => (role === null ? 'Let the rule choose the role' : `Call it ${role}`),
  apply(draft, { subjectId, fixtureId, role }) {
    const person = findOrRefuse(draft.subjects, subjectId, 'subject');
    findOrRefuse(draft.fixtures, fixtureId, 'fixture');
    if (role === null) {
      delete person.roleOverrides[fixtureId];
      return;
    }
    if (!LIGHT_ROLES.includes(role))
      throw new CommandRefused(`role: must be one of ${LIGHT_ROLES.join(', ')}`);
    person.roleOverrides[fixtureId] = role;
  },
});
