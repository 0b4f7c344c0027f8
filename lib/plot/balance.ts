/**
 * From the document to the balance solver's plain request (lib/analysis/balance): every unit at full
 * through its filter, its level and dimming curve, whether it may change, and its beam spread when a
 * narrower beam is a possible remedy (beam types); and the targets. Also the roles to keep when the
 * proposal is applied (balanceRolePins).
 */
import {
  type BalanceRequest,
  type BalanceSubject,
  type BalanceUnit,
  type BalanceResult,
  solveBalance,
  subjectLighting,
  unitsInBalancedRoles,
} from '../analysis';
import { cameraNeedsLx } from './cameraExposure';
import type { RolePin } from './commands/looks';
import { mainViewpointPosition, resolveFixture, resolveRig, spreadAtZoom } from './resolve';
import type { PlotDocument } from './schema/document';

/** The key light wanted: a number of lux, or what a camera viewpoint needs for a normal exposure. */
export type BalanceKeyTarget =
  { readonly kind: 'lux'; readonly lx: number } | { readonly kind: 'camera'; readonly viewpointId: string };

export interface BalanceChoice {
  readonly subjectIds: readonly string[];
  readonly key: BalanceKeyTarget;
  /** Key alone over fill alone (lib/units/stops.ts turns a lighting ratio or stops into it); null: fill not balanced. */
  readonly keyOverFill: number | null;
  readonly backOverKeyStops: number | null;
  /** Units that may change; every other unit keeps its level. */
  readonly mayChange: readonly string[];
}

/** Lux the key target stands for; null for a viewpoint that is missing or is not a camera. */
export function keyTargetLx(document: PlotDocument, key: BalanceKeyTarget): number | null {
  if (key.kind === 'lux') return key.lx > 0 && Number.isFinite(key.lx) ? key.lx : null;
  const camera = document.viewpoints.find((view) => view.id === key.viewpointId)?.camera;
  return camera ? cameraNeedsLx(camera) : null;
}

function balanceUnits(document: PlotDocument, mayChange: ReadonlySet<string>): BalanceUnit[] {
  const types = new Map(document.fixtureTypes.map((type) => [type.id, type]));
  return document.fixtures.flatMap((unit) => {
    const type = types.get(unit.typeId);
    if (!type) return [];
    const photometry = type.photometry;
    return [
      {
        atFull: resolveFixture({ ...unit, levelPct: 100 }, type),
        levelPct: unit.levelPct,
        dimmingCurve: type.dimmingCurve,
        mayChange: mayChange.has(unit.id),
        beamSpread: photometry.kind === 'beam' ? spreadAtZoom(photometry, unit.zoomBeamDeg) : null,
      },
    ];
  });
}

function balanceSubjects(document: PlotDocument, subjectIds: readonly string[]): BalanceSubject[] {
  return document.subjects
    .filter((person) => subjectIds.includes(person.id))
    .map((person) => ({
      placement: {
        id: person.id,
        mark: person.mark,
        faceHeightM: person.faceHeightM,
        facingDeg: person.facingDeg,
      },
      roleOverrides: person.roleOverrides,
    }));
}

/** Units that are key, fill or back on the chosen subjects: the ones the panel lets change at first. */
export function defaultBalanceUnits(document: PlotDocument, subjectIds: readonly string[]): string[] {
  const ids = unitsInBalancedRoles(
    balanceSubjects(document, subjectIds),
    mainViewpointPosition(document),
    balanceUnits(document, new Set()),
  );
  return document.fixtures.filter((unit) => ids.has(unit.id)).map((unit) => unit.id);
}

/** The solver's request for a choice, or a plain reason why there is none. */
export function balanceRequest(
  document: PlotDocument,
  choice: BalanceChoice,
): { ok: true; request: BalanceRequest } | { ok: false; reason: string } {
  const subjects = balanceSubjects(document, choice.subjectIds);
  if (subjects.length === 0) return { ok: false, reason: 'Choose at least one subject.' };
  const keyLx = keyTargetLx(document, choice.key);
  if (keyLx === null)
    return {
      ok: false,
      reason:
        choice.key.kind === 'lux' ? 'The key light must be above 0.' : 'That viewpoint is not a camera.',
    };
  if (choice.keyOverFill !== null && !(choice.keyOverFill >= 1 && Number.isFinite(choice.keyOverFill)))
    return {
      ok: false,
      reason:
        'Key over fill must be 1 or more: the key is the brighter side by definition (1 is key = fill).',
    };
  if (choice.backOverKeyStops !== null && !Number.isFinite(choice.backOverKeyStops))
    return { ok: false, reason: 'Back:key must be a number of stops.' };
  return {
    ok: true,
    request: {
      subjects,
      viewpoint: mainViewpointPosition(document),
      units: balanceUnits(document, new Set(choice.mayChange)),
      keyLx,
      keyOverFill: choice.keyOverFill,
      backOverKeyStops: choice.backOverKeyStops,
    },
  };
}

/** Solve a choice on a document; a reason instead when the choice is incomplete. */
export function balanceDocument(
  document: PlotDocument,
  choice: BalanceChoice,
): { ok: true; result: BalanceResult; keyLx: number } | { ok: false; reason: string } {
  const built = balanceRequest(document, choice);
  if (!built.ok) return built;
  return { ok: true, result: solveBalance(built.request), keyLx: built.request.keyLx };
}

/**
 * Roles to give by hand when a proposal is applied, so that the subject panel's rule (the brightest
 * single front unit is the key; see subjectLighting) does not re-decide them at the new levels: for
 * each balanced subject, every unit whose role at the proposed levels (the panel's analysis, the
 * subject's roles given by hand included) differs from the role the solve used. Only units that give
 * the subject light at 100 % are pinned: a unit that cannot light the subject adds nothing to its
 * key, fill or back whatever it is called.
 */
export function balanceRolePins(document: PlotDocument, result: BalanceResult): RolePin[] {
  const withLevels = (levelOf: (unit: PlotDocument['fixtures'][number]) => number) =>
    resolveRig({
      ...document,
      fixtures: document.fixtures.map((unit) => ({ ...unit, levelPct: levelOf(unit) })),
    });
  const proposedRig = withLevels((unit) => result.levels[unit.id] ?? unit.levelPct);
  const fullRig = withLevels(() => 100);
  const viewpoint = mainViewpointPosition(document);
  return result.subjects.flatMap((balanced) => {
    const person = document.subjects.find((candidate) => candidate.id === balanced.id);
    if (!person) return [];
    const atFull = subjectLighting(person, viewpoint, fullRig, person.roleOverrides, 'faces');
    const lights = new Set(
      atFull.sources
        .filter((source) => source.faceLx > 0 || source.backLx > 0 || source.topLx > 0)
        .map((source) => source.fixtureId),
    );
    const proposed = subjectLighting(person, viewpoint, proposedRig, person.roleOverrides, 'faces');
    return document.fixtures.flatMap((unit): RolePin[] => {
      const used = balanced.roles[unit.id];
      const source = proposed.sources.find((candidate) => candidate.fixtureId === unit.id);
      if (!used || !source || source.role === used || !lights.has(unit.id)) return [];
      return [{ subjectId: person.id, fixtureId: unit.id, role: used }];
    });
  });
}
