/** Commands on subjects and viewpoints. */
import { CommandRefused, checked, defineCommand, findOrRefuse, nextId, requireFreeId } from '../command';
import {
  type Subject,
  subject as subjectSchema,
  type Viewpoint,
  viewpoint as viewpointSchema,
} from '../schema/people';
import { type PlanPoint, planPoint } from '../schema/primitives';

/** Add a subject (a person to be lit). */
export const addSubject = defineCommand<
  Omit<Subject, 'id' | 'roleOverrides'> & { id?: string; roleOverrides?: Subject['roleOverrides'] }
>({
  name: 'subject.add',
  label: ({ name }) => `Add subject ${name}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'sub');
    requireFreeId(draft, id);
    draft.subjects.push(checked(subjectSchema, { roleOverrides: {}, ...args, id }, 'new subject'));
  },
});

/** Move a subject's floor mark. */
export const moveSubject = defineCommand<{ id: string; mark: PlanPoint }>({
  name: 'subject.move',
  label: () => 'Move subject',
  apply(draft, { id, mark }) {
    findOrRefuse(draft.subjects, id, 'subject').mark = checked(planPoint, mark, `subject ${id} mark`);
  },
});

/** Edit a subject's fields (name, face height, facing, notes, mark). */
export const updateSubject = defineCommand<{ id: string; changes: Partial<Omit<Subject, 'id'>> }>({
  name: 'subject.update',
  label: () => 'Edit subject',
  apply(draft, { id, changes }) {
    const index = draft.subjects.findIndex((person) => person.id === id);
    if (index < 0) throw new CommandRefused(`There is no subject with id "${id}".`);
    draft.subjects[index] = checked(
      subjectSchema,
      { ...draft.subjects[index], ...changes, id },
      `subject ${id}`,
    );
  },
});

/** Delete subjects. */
export const deleteSubjects = defineCommand<{ ids: readonly string[] }>({
  name: 'subject.delete',
  label: ({ ids }) => (ids.length === 1 ? 'Delete subject' : `Delete ${ids.length} subjects`),
  apply(draft, { ids }) {
    for (const id of ids) findOrRefuse(draft.subjects, id, 'subject');
    draft.subjects = draft.subjects.filter((person) => !ids.includes(person.id));
  },
});

/** Add a viewpoint (audience position or camera). The first one becomes the main viewpoint. */
export const addViewpoint = defineCommand<Omit<Viewpoint, 'id'> & { id?: string }>({
  name: 'viewpoint.add',
  label: ({ name }) => `Add viewpoint ${name}`,
  apply(draft, args) {
    const id = args.id ?? nextId(draft, 'vp');
    requireFreeId(draft, id);
    const view = checked(viewpointSchema, { ...args, id }, 'new viewpoint');
    if (view.kind === 'camera' && view.camera === null)
      throw new CommandRefused('A camera needs its exposure settings.');
    draft.viewpoints.push(view);
    if (draft.mainViewpointId === null) draft.mainViewpointId = id;
  },
});

/** Edit a viewpoint. */
export const updateViewpoint = defineCommand<{ id: string; changes: Partial<Omit<Viewpoint, 'id'>> }>({
  name: 'viewpoint.update',
  label: () => 'Edit viewpoint',
  apply(draft, { id, changes }) {
    const index = draft.viewpoints.findIndex((view) => view.id === id);
    if (index < 0) throw new CommandRefused(`There is no viewpoint with id "${id}".`);
    const view = checked(viewpointSchema, { ...draft.viewpoints[index], ...changes, id }, `viewpoint ${id}`);
    if (view.kind === 'camera' && view.camera === null)
      throw new CommandRefused('A camera needs its exposure settings.');
    draft.viewpoints[index] = view;
  },
});

/** Choose the viewpoint faces are judged from. */
export const setMainViewpoint = defineCommand<{ id: string | null }>({
  name: 'viewpoint.main',
  label: () => 'Set main viewpoint',
  apply(draft, { id }) {
    if (id !== null) findOrRefuse(draft.viewpoints, id, 'viewpoint');
    draft.mainViewpointId = id;
  },
});

/** Delete a viewpoint; if it was the main one, the first remaining viewpoint (if any) takes over. */
export const deleteViewpoint = defineCommand<{ id: string }>({
  name: 'viewpoint.delete',
  label: () => 'Delete viewpoint',
  apply(draft, { id }) {
    findOrRefuse(draft.viewpoints, id, 'viewpoint');
    draft.viewpoints = draft.viewpoints.filter((view) => view.id !== id);
    if (draft.mainViewpointId === id) draft.mainViewpointId = draft.viewpoints[0]?.id ?? null;
  },
});
