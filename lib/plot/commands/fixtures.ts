/** Commands on fixtures: hang, move, aim, re-type, level, edit, delete. */
import type { Draft } from 'immer';
import { z } from 'zod';
import { CommandRefused, checked, defineCommand, findOrRefuse, nextId, requireFreeId } from '../command';
import { type Fixture, fixture as fixtureSchema } from '../schema/fixture';
import { zoomSettingProblem } from '../schema/fixtureType';
import { type WorldPoint, worldPoint } from '../schema/primitives';
import type { PlotDocument } from '../schema/document';

type DraftDocument = Draft<PlotDocument>;

/** The lowest unit number not yet used on a position. */
export function nextUnitNumber(document: PlotDocument, positionId: string): number {
  const used = new Set(
    document.fixtures.filter((unit) => unit.positionId === positionId).map((unit) => unit.unit),
  );
  let candidate = 1;
  while (used.has(candidate)) candidate += 1;
  return candidate;
}

function requireType(draft: DraftDocument, typeId: string) {
  return findOrRefuse(draft.fixtureTypes, typeId, 'fixture type');
}

/** Keep a zoom setting only if the (new) type has a zoom that contains it. */
function fitZoom(draft: DraftDocument, unit: Draft<Fixture>): void {
  if (unit.zoomBeamDeg === null) return;
  const type = requireType(draft, unit.typeId);
  const zoom = type.photometry.kind === 'beam' ? type.photometry.zoom : null;
  if (!zoom) {
    unit.zoomBeamDeg = null;
    return;
  }
  unit.zoomBeamDeg = Math.min(zoom.maxBeamDeg, Math.max(zoom.minBeamDeg, unit.zoomBeamDeg));
}

export interface HangFixtureArgs {
  readonly id?: string;
  readonly typeId: string;
  readonly positionId: string | null;
  readonly mount: WorldPoint;
  readonly focus: WorldPoint;
  readonly levelPct?: number;
  readonly purpose?: string;
}

/** Hang a new unit of a type, on a position (numbered next free unit) or standing free. */
export const hangFixture = defineCommand<HangFixtureArgs>({
  name: 'fixture.hang',
  label: () => 'Hang fixture',
  apply(draft, args) {
    requireType(draft, args.typeId);
    if (args.positionId !== null) findOrRefuse(draft.positions, args.positionId, 'position');
    const id = args.id ?? nextId(draft, 'fx');
    requireFreeId(draft, id);
    const unit = checked(
      fixtureSchema,
      {
        id,
        typeId: args.typeId,
        positionId: args.positionId,
        unit: args.positionId === null ? null : nextUnitNumber(draft, args.positionId),
        purpose: args.purpose ?? '',
        mount: args.mount,
        focus: args.focus,
        zoomBeamDeg: null,
        levelPct: args.levelPct ?? 100,
        filter: null,
        channel: null,
        circuit: null,
        notes: '',
      },
      'new fixture',
    );
    draft.fixtures.push(unit);
  },
});

/** Move a unit's mount point (along its position or anywhere); its focus point stays where it is. */
export const moveFixture = defineCommand<{ id: string; mount: WorldPoint }>({
  name: 'fixture.move',
  label: () => 'Move fixture',
  apply(draft, { id, mount }) {
    const unit = findOrRefuse(draft.fixtures, id, 'fixture');
    unit.mount = checked(worldPoint, mount, `fixture ${id} mount`);
  },
});

/** Aim a unit at a new focus point. */
export const aimFixture = defineCommand<{ id: string; focus: WorldPoint }>({
  name: 'fixture.aim',
  label: () => 'Aim fixture',
  apply(draft, { id, focus }) {
    const unit = findOrRefuse(draft.fixtures, id, 'fixture');
    unit.focus = checked(worldPoint, focus, `fixture ${id} focus`);
  },
});

/** Change the type of units, keeping their place, aim and control; a zoom setting is kept within the new range. */
export const retypeFixtures = defineCommand<{ ids: readonly string[]; typeId: string }>({
  name: 'fixture.retype',
  label: ({ ids }) => (ids.length === 1 ? 'Change fixture type' : `Change type of ${ids.length} fixtures`),
  apply(draft, { ids, typeId }) {
    requireType(draft, typeId);
    for (const id of ids) {
      const unit = findOrRefuse(draft.fixtures, id, 'fixture');
      unit.typeId = typeId;
      fitZoom(draft, unit);
    }
  },
});

const level = z
  .number()
  .refine(Number.isFinite, 'must be a number')
  .pipe(z.number().min(0, 'must be between 0 and 100').max(100, 'must be between 0 and 100'));

/** Set the level of one or more units. */
export const setFixtureLevel = defineCommand<{ ids: readonly string[]; levelPct: number }>({
  name: 'fixture.level',
  label: ({ ids, levelPct }) => `Set ${ids.length === 1 ? 'level' : `${ids.length} levels`} to ${levelPct} %`,
  apply(draft, { ids, levelPct }) {
    const value = checked(level, levelPct, 'levelPct');
    for (const id of ids) findOrRefuse(draft.fixtures, id, 'fixture').levelPct = value;
  },
});

export type FixtureChanges = Partial<Omit<Fixture, 'id'>>;

/** Edit any fields of a unit (inspector); the result is checked as a whole before it is kept. */
export const updateFixture = defineCommand<{ id: string; changes: FixtureChanges }>({
  name: 'fixture.update',
  label: () => 'Edit fixture',
  apply(draft, { id, changes }) {
    const index = draft.fixtures.findIndex((unit) => unit.id === id);
    if (index < 0) throw new CommandRefused(`There is no fixture with id "${id}".`);
    const merged = checked(fixtureSchema, { ...draft.fixtures[index], ...changes, id }, `fixture ${id}`);
    const type = requireType(draft, merged.typeId);
    if (merged.positionId !== null) findOrRefuse(draft.positions, merged.positionId, 'position');
    const zoomProblem = zoomSettingProblem(type, merged.zoomBeamDeg);
    if (zoomProblem) throw new CommandRefused(`fixture ${id}.zoomBeamDeg: ${zoomProblem}`);
    draft.fixtures[index] = merged;
  },
});

/** Delete units. */
export const deleteFixtures = defineCommand<{ ids: readonly string[] }>({
  name: 'fixture.delete',
  label: ({ ids }) => (ids.length === 1 ? 'Delete fixture' : `Delete ${ids.length} fixtures`),
  apply(draft, { ids }) {
    for (const id of ids) findOrRefuse(draft.fixtures, id, 'fixture');
    const doomed = new Set(ids);
    draft.fixtures = draft.fixtures.filter((unit) => !doomed.has(unit.id));
  },
});

/** Copy units, offset in plan, as new units on the same positions (next free unit numbers). */
export const duplicateFixtures = defineCommand<{ ids: readonly string[]; offset: { x: number; y: number } }>({
  name: 'fixture.duplicate',
  label: ({ ids }) => (ids.length === 1 ? 'Duplicate fixture' : `Duplicate ${ids.length} fixtures`),
  apply(draft, { ids, offset }) {
    const copies = ids.map((id) => findOrRefuse(draft.fixtures, id, 'fixture'));
    for (const original of copies) {
      const id = nextId(draft, 'fx');
      const shift = (point: WorldPoint) => ({ x: point.x + offset.x, y: point.y + offset.y, z: point.z });
      const copy = checked(
        fixtureSchema,
        {
          ...JSON.parse(JSON.stringify(original)),
          id,
          unit: original.positionId === null ? null : nextUnitNumber(draft, original.positionId),
          mount: shift(original.mount),
          focus: shift(original.focus),
        },
        `copy of fixture ${original.id}`,
      );
      draft.fixtures.push(copy);
    }
  },
});
