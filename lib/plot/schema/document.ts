/** The whole plot document (file format `throwline-plot`), with the checks that span collections. */
import { z } from 'zod';
import { finite, id, name, notes, expecting } from './primitives';
import { stage, hangingPosition } from './stage';
import { fixtureType, fixtureTypeRuleProblems, zoomSettingProblem } from './fixtureType';
import { fixture } from './fixture';
import { subject, viewpoint } from './people';

export const PLOT_FORMAT = 'throwline-plot';
export const PLOT_VERSION = 2;

const documentShape = z.strictObject({
  format: z.literal(PLOT_FORMAT, { error: expecting(`must be "${PLOT_FORMAT}"`) }),
  version: z.literal(PLOT_VERSION, { error: expecting(`must be ${PLOT_VERSION}`) }),
  name: name(),
  venue: z.string({ error: expecting('must be text') }).max(120, 'must be at most 120 characters'),
  notes: notes(),
  displayUnits: z.enum(['metric', 'imperial'], { error: expecting('must be metric or imperial') }),
  /** Height of the focus plane (face height), m: 1.6 m standing is common practice. */
  focusPlaneHeightM: finite().min(0, 'must be between 0 and 10 m').max(10, 'must be between 0 and 10 m'),
  stage,
  positions: z.array(hangingPosition).max(1000, 'may have at most 1000 positions'),
  fixtureTypes: z.array(fixtureType).max(1000, 'may have at most 1000 fixture types'),
  fixtures: z.array(fixture).max(5000, 'may have at most 5000 fixtures'),
  subjects: z.array(subject).max(500, 'may have at most 500 subjects'),
  viewpoints: z.array(viewpoint).max(100, 'may have at most 100 viewpoints'),
  /** The viewpoint faces are judged from by default; null when there is none. */
  mainViewpointId: id().nullable(),
});

/** The plot document schema with cross-reference checks (ids, types, positions, zoom, angles). */
export const plotDocument = documentShape.superRefine((document, context) => {
  const seen = new Map<string, string>();
  const claim = (identifier: string, path: (string | number)[]) => {
    const earlier = seen.get(identifier);
    if (earlier !== undefined) {
      context.addIssue({
        code: 'custom',
        path: [...path, 'id'],
        message: `repeats the id "${identifier}" already used by ${earlier}`,
      });
    } else {
      seen.set(identifier, formatPath(path));
    }
  };
  document.stage.acting.forEach((area, index) => claim(area.id, ['stage', 'acting', index]));
  document.positions.forEach((position, index) => claim(position.id, ['positions', index]));
  document.fixtureTypes.forEach((type, index) => claim(type.id, ['fixtureTypes', index]));
  document.fixtures.forEach((unit, index) => claim(unit.id, ['fixtures', index]));
  document.subjects.forEach((person, index) => claim(person.id, ['subjects', index]));
  document.viewpoints.forEach((view, index) => claim(view.id, ['viewpoints', index]));

  document.fixtureTypes.forEach((type, index) => {
    for (const problem of fixtureTypeRuleProblems(type)) {
      context.addIssue({
        code: 'custom',
        path: ['fixtureTypes', index, ...problem.path],
        message: problem.message,
      });
    }
  });

  const types = new Map(document.fixtureTypes.map((type) => [type.id, type]));
  const positions = new Set(document.positions.map((position) => position.id));
  document.fixtures.forEach((unit, index) => {
    const type = types.get(unit.typeId);
    if (!type) {
      context.addIssue({
        code: 'custom',
        path: ['fixtures', index, 'typeId'],
        message: `names a fixture type "${unit.typeId}" that does not exist`,
      });
    }
    if (unit.positionId !== null && !positions.has(unit.positionId)) {
      context.addIssue({
        code: 'custom',
        path: ['fixtures', index, 'positionId'],
        message: `names a position "${unit.positionId}" that does not exist`,
      });
    }
    const zoomProblem = type ? zoomSettingProblem(type, unit.zoomBeamDeg) : null;
    if (zoomProblem)
      context.addIssue({ code: 'custom', path: ['fixtures', index, 'zoomBeamDeg'], message: zoomProblem });
  });

  if (
    document.mainViewpointId !== null &&
    !document.viewpoints.some((view) => view.id === document.mainViewpointId)
  ) {
    context.addIssue({
      code: 'custom',
      path: ['mainViewpointId'],
      message: `names a viewpoint "${document.mainViewpointId}" that does not exist`,
    });
  }
  document.viewpoints.forEach((view, index) => {
    if (view.kind === 'camera' && view.camera === null) {
      context.addIssue({
        code: 'custom',
        path: ['viewpoints', index, 'camera'],
        message: 'a camera needs its exposure settings',
      });
    }
  });
});

export type PlotDocument = z.infer<typeof plotDocument>;

/** Path as people read it: `fixtures[3].focus.z`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let text = '';
  for (const part of path) {
    if (typeof part === 'number') text += `[${part}]`;
    else text += text === '' ? String(part) : `.${String(part)}`;
  }
  return text === '' ? '(the file)' : text;
}
