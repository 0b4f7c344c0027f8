/** The whole plot document (file format `throwline-plot`), with the checks that span collections. */
import { z } from 'zod';
import { finite, id, name, notes, expecting } from './primitives';
import { stage, hangingPosition } from './stage';
import { fixtureType, fixtureTypeRuleProblems, zoomSettingProblem } from './fixtureType';
import { fixture } from './fixture';
import { subject, viewpoint } from './people';
import { power, rigging } from './power';
import { levelSet } from './looks';

export const PLOT_FORMAT = 'throwline-plot';
export const PLOT_VERSION = 3;

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
  levelSets: z.array(levelSet).max(500, 'may have at most 500 level sets'),
  /** The level set being worked on; the fixtures' levels are its levels. Null when none is chosen. */
  activeLevelSetId: id().nullable(),
  power,
  rigging,
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
  document.levelSets.forEach((set, index) => claim(set.id, ['levelSets', index]));
  document.power.feeders.forEach((line, index) => claim(line.id, ['power', 'feeders', index]));

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
  for (const problem of referenceProblems(document)) context.addIssue({ code: 'custom', ...problem });
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

type DocumentShape = z.infer<typeof documentShape>;

/** Level sets, role overrides and circuits must name things that exist, once each. */
function referenceProblems(document: DocumentShape): { path: (string | number)[]; message: string }[] {
  const problems: { path: (string | number)[]; message: string }[] = [];
  const units = new Set(document.fixtures.map((unit) => unit.id));
  document.levelSets.forEach((set, index) => {
    for (const fixtureId of Object.keys(set.levels)) {
      if (!units.has(fixtureId))
        problems.push({
          path: ['levelSets', index, 'levels', fixtureId],
          message: `names a fixture "${fixtureId}" that does not exist`,
        });
    }
  });
  document.subjects.forEach((person, index) => {
    for (const fixtureId of Object.keys(person.roleOverrides)) {
      if (!units.has(fixtureId))
        problems.push({
          path: ['subjects', index, 'roleOverrides', fixtureId],
          message: `names a fixture "${fixtureId}" that does not exist`,
        });
    }
  });
  const chosenIndex = document.levelSets.findIndex((set) => set.id === document.activeLevelSetId);
  if (document.activeLevelSetId !== null && chosenIndex < 0)
    problems.push({
      path: ['activeLevelSetId'],
      message: `names a level set "${document.activeLevelSetId}" that does not exist`,
    });
  if (chosenIndex >= 0) {
    // The units' levels are the chosen set's levels; a file where they differ would lose one or the
    // other at the next edit, so it is refused instead of guessed at.
    const levels = document.levelSets[chosenIndex].levels;
    document.fixtures.forEach((unit, index) => {
      const kept = levels[unit.id];
      if (kept === undefined)
        problems.push({
          path: ['levelSets', chosenIndex, 'levels'],
          message: `leaves out fixtures[${index}] "${unit.id}" (at ${unit.levelPct} %) while this set is chosen`,
        });
      else if (kept !== unit.levelPct)
        problems.push({
          path: ['levelSets', chosenIndex, 'levels', unit.id],
          message: `is ${kept} % but fixtures[${index}].levelPct is ${unit.levelPct} % while this set is chosen`,
        });
    });
  }
  const feeders = new Set(document.power.feeders.map((line) => line.id));
  const addresses = new Set<string>();
  document.power.circuits.forEach((entry, index) => {
    if (addresses.has(entry.address))
      problems.push({
        path: ['power', 'circuits', index, 'address'],
        message: `repeats the circuit "${entry.address}"`,
      });
    addresses.add(entry.address);
    if (entry.feederId !== null && !feeders.has(entry.feederId))
      problems.push({
        path: ['power', 'circuits', index, 'feederId'],
        message: `names a feeder "${entry.feederId}" that does not exist`,
      });
    if (document.power.system === 'single' && entry.phase !== 'L1')
      problems.push({
        path: ['power', 'circuits', index, 'phase'],
        message: 'must be L1 on a single-phase supply',
      });
  });
  return problems;
}

/** Path as people read it: `fixtures[3].focus.z`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let text = '';
  for (const part of path) {
    if (typeof part === 'number') text += `[${part}]`;
    else text += text === '' ? String(part) : `.${String(part)}`;
  }
  return text === '' ? '(the file)' : text;
}
