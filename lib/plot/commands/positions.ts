/** Commands on hanging positions: add, edit, move (units travel with it), delete (with a choice). */
import { CommandRefused, checked, defineCommand, findOrRefuse, nextId, requireFreeId } from '../command';
import { type HangingPosition, hangingPosition } from '../schema/stage';

export type NewPosition = Omit<HangingPosition, 'id'> & { id?: string };

/** Add a hanging position. */
export const addPosition = defineCommand<NewPosition>({
  name: 'position.add',
  label: ({ name }) => `Add position ${name}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'pos');
    requireFreeId(draft, id);
    draft.positions.push(checked(hangingPosition, { ...args, id }, 'new position'));
  },
});

/**
 * Edit a position's fields. A change of height (trim) moves its units' mounts by the same amount,
 * as flying a pipe in or out does.
 */
export const updatePosition = defineCommand<{ id: string; changes: Partial<Omit<HangingPosition, 'id'>> }>({
  name: 'position.update',
  label: () => 'Edit position',
  apply(draft, { id, changes }) {
    const index = draft.positions.findIndex((position) => position.id === id);
    if (index < 0) throw new CommandRefused(`There is no position with id "${id}".`);
    const before = draft.positions[index];
    const merged = checked(hangingPosition, { ...before, ...changes, id }, `position ${id}`);
    const rise = merged.heightM - before.heightM;
    if (rise !== 0) {
      for (const unit of draft.fixtures) if (unit.positionId === id) unit.mount.z += rise;
    }
    draft.positions[index] = merged;
  },
});

/** Move a position in plan by an offset; its units move with it and keep their focus points. */
export const movePosition = defineCommand<{ id: string; offset: { x: number; y: number } }>({
  name: 'position.move',
  label: () => 'Move position',
  apply(draft, { id, offset }) {
    if (!Number.isFinite(offset.x) || !Number.isFinite(offset.y)) {
      throw new CommandRefused('The offset must be finite numbers.');
    }
    const position = findOrRefuse(draft.positions, id, 'position');
    const shape = position.shape;
    if (shape.kind === 'line') {
      shape.start.x += offset.x;
      shape.start.y += offset.y;
      shape.end.x += offset.x;
      shape.end.y += offset.y;
    } else {
      shape.at.x += offset.x;
      shape.at.y += offset.y;
    }
    checked(hangingPosition, position, `position ${id}`);
    for (const unit of draft.fixtures) {
      if (unit.positionId !== id) continue;
      unit.mount.x += offset.x;
      unit.mount.y += offset.y;
    }
  },
});

/** What to do with the units on a position being deleted. */
export type UnitsOnDeletedPosition = 'delete-units' | 'leave-units-free';

/**
 * Delete a position. If units hang on it the caller must choose: delete them too, or leave them
 * standing free where they are. Without a choice the command refuses, so no unit is orphaned silently.
 */
export const deletePosition = defineCommand<{ id: string; units?: UnitsOnDeletedPosition }>({
  name: 'position.delete',
  label: () => 'Delete position',
  apply(draft, { id, units }) {
    const position = findOrRefuse(draft.positions, id, 'position');
    const held = draft.fixtures.filter((unit) => unit.positionId === id);
    if (held.length > 0 && units === undefined) {
      throw new CommandRefused(
        `${position.name} holds ${held.length} fixture${held.length === 1 ? '' : 's'}: choose to delete them with it or leave them standing free.`,
      );
    }
    if (units === 'delete-units') {
      draft.fixtures = draft.fixtures.filter((unit) => unit.positionId !== id);
    } else {
      for (const unit of held) {
        unit.positionId = null;
        unit.unit = null;
      }
    }
    draft.positions = draft.positions.filter((candidate) => candidate.id !== id);
  },
});
