/**
 * Balance: the levels that give chosen subjects a key light, a key:fill ratio and (optionally) a
 * back:key ratio, changing only the units allowed to change.
 *
 * Light from a unit at any point is its light at full times its light fraction (the dimming curve at
 * its level; the filter is already in the light at full), so each subject's key-side, fill-side and
 * back light is linear in the fractions. Roles are each subject's roles now (the user's where given,
 * else the rule's; see subjectLighting), or at full output where nothing lights the subject yet. The
 * targets of every chosen subject are solved at once by bounded least squares, fractions in [0, 1],
 * each residual divided by its target (so a miss counts as a share of the target, near stops for
 * small misses). Fractions go back to levels through the dimming curve, rounded to 0.1 %, and the
 * figures returned are those at the rounded levels. Where a subject's key is out of reach (its key
 * units at 100 %), the solve runs again with that subject's key at what the units give, so fill and
 * back keep the wanted ratios to the key there is. A target missed by more than MISS_TOLERANCE_STOPS
 * is reported with advice (see advice.ts).
 */
import type { Vec3 } from '../../geometry/vector';
import { type DimmingCurve, levelForLightFraction, lightFractionAtLevel } from '../../photometry/dimming';
import type { BeamSpread } from '../../photometry/beam';
import { fixtureIlluminanceLx } from '../fixtureLight';
import type { LightSource, RigFixture } from '../rig';
import type { SubjectPlacement } from '../subjectLight';
import { type LightRole, subjectLighting } from '../subjectLighting';
import { type UnitAdvice, adviseUnit } from './advice';
import { boundedLeastSquares } from './boundedLeastSquares';

/** A target is met when the light is within this many stops of it. */
export const MISS_TOLERANCE_STOPS = 0.05;

export interface BalanceUnit {
  /** The unit at 100 % level, through its filter. */
  readonly atFull: RigFixture;
  readonly levelPct: number;
  readonly dimmingCurve: DimmingCurve;
  readonly mayChange: boolean;
  /** The unit's beam spread now, when a narrower beam is a possible remedy (beam types); else null. */
  readonly beamSpread: BeamSpread | null;
}

export interface BalanceSubject {
  readonly placement: SubjectPlacement;
  readonly roleOverrides: Readonly<Record<string, LightRole>>;
}

export interface BalanceRequest {
  readonly subjects: readonly BalanceSubject[];
  /** Faces are judged toward this point (the main viewpoint), else along each subject's facing. */
  readonly viewpoint: Vec3 | null;
  readonly units: readonly BalanceUnit[];
  /** Light wanted on the face from the key side, lx. */
  readonly keyLx: number;
  /**
   * Key alone over fill alone (a ratio of light, not stops), 1 or more: the key is the brighter side
   * by definition; null leaves fill out of the solve.
   */
  readonly keyOverFill: number | null;
  /** Back light over key in stops; null leaves back light out of the solve. */
  readonly backOverKeyStops: number | null;
}

export type BalancedRole = 'key' | 'fill' | 'back';

/** Why a target is missed. */
export type MissReason =
  /** No unit gives light in this role on the subject. */
  | { readonly kind: 'noUnitInRole' }
  /** Units give light in this role, but none of them may change. */
  | { readonly kind: 'noneMayChange' }
  /** Too little: the units that may change are at 100 %. */
  | { readonly kind: 'atFull' }
  /** Too much: the units that may not change give this much alone, lx. */
  | { readonly kind: 'fixedTooBright'; readonly fixedLx: number }
  /** The units that may change light other chosen subjects too and cannot suit all of them. */
  | { readonly kind: 'sharedUnits' };

export interface BalanceTarget {
  readonly role: BalancedRole;
  readonly targetLx: number;
  /** What the proposal gives, lx. */
  readonly resultLx: number;
  /** log2(result / target); null when the result is 0. */
  readonly offStops: number | null;
  readonly met: boolean;
  /** Why it is missed (null when met). */
  readonly reason: MissReason | null;
  /** What would reach it: for each unit that may change and is at 100 % in this role. */
  readonly advice: readonly UnitAdvice[];
}

export interface BalancedSubject {
  readonly id: string;
  readonly keyLx: number;
  readonly fillLx: number;
  readonly backLightLx: number;
  readonly keyToFillStops: number | null;
  readonly lightingRatio: number | null;
  readonly backToKeyStops: number | null;
  readonly targets: readonly BalanceTarget[];
  /**
   * True when the wanted key is out of reach (its units at 100 %): fill and back were then balanced
   * against the key the units can give, so the ratios hold while the key falls short.
   */
  readonly keyOutOfReach: boolean;
  /** Each unit's role on this subject as used by the solve. */
  readonly roles: Readonly<Record<string, LightRole>>;
}

export interface BalanceResult {
  /** Proposed level of every unit that may change, %, by fixture id (never above 100). */
  readonly levels: Readonly<Record<string, number>>;
  readonly subjects: readonly BalancedSubject[];
  /** Largest |offStops| over all targets; null when some target gets no light at all. */
  readonly worstStops: number | null;
  readonly allMet: boolean;
}

interface Row {
  readonly subject: number;
  readonly role: BalancedRole;
  readonly targetLx: number;
}

function scaleSource(source: LightSource, fraction: number): LightSource {
  switch (source.kind) {
    case 'beam':
      return { ...source, peakCd: source.peakCd * fraction };
    case 'soft':
      return { ...source, luminanceCdPerM2: source.luminanceCdPerM2 * fraction };
    case 'measured':
      return { ...source, scale: source.scale * fraction };
  }
}

/** A rig fixture at a fraction of the light it gives at full. */
export function atFraction(unit: RigFixture, fraction: number): RigFixture {
  return { ...unit, source: scaleSource(unit.source, fraction) };
}

interface Contributions {
  readonly roles: Readonly<Record<string, LightRole>>;
  /** Each unit's light at full on the face toward the viewpoint and on the back of the head, lx. */
  readonly face: readonly number[];
  readonly back: readonly number[];
  readonly facePoint: Vec3;
}

/** One subject's roles now (at full where nothing lights it yet) and every unit's light on it at full. */
function contributions(
  subject: BalanceSubject,
  viewpoint: Vec3 | null,
  units: readonly BalanceUnit[],
): Contributions {
  const now = units.map((unit) =>
    atFraction(unit.atFull, lightFractionAtLevel(unit.levelPct, unit.dimmingCurve)),
  );
  let lighting = subjectLighting(subject.placement, viewpoint, now, subject.roleOverrides, 'faces');
  if (!lighting.sources.some((source) => source.role === 'key' && source.faceLx > 0)) {
    const full = units.map((unit) => unit.atFull);
    lighting = subjectLighting(subject.placement, viewpoint, full, subject.roleOverrides, 'faces');
  }
  const roles = Object.fromEntries(lighting.sources.map((source) => [source.fixtureId, source.role]));
  const backNormal = { x: -lighting.viewAxis.x, y: -lighting.viewAxis.y, z: 0 };
  return {
    roles,
    face: units.map((unit) => fixtureIlluminanceLx(unit.atFull, lighting.facePoint, lighting.viewAxis)),
    back: units.map((unit) => fixtureIlluminanceLx(unit.atFull, lighting.facePoint, backNormal)),
    facePoint: lighting.facePoint,
  };
}

/**
 * Units that are key, fill or back on any of the subjects (roles as the solve takes them) and give it
 * light there at full: the natural ones to let change.
 */
export function unitsInBalancedRoles(
  subjects: readonly BalanceSubject[],
  viewpoint: Vec3 | null,
  units: readonly BalanceUnit[],
): Set<string> {
  const ids = new Set<string>();
  for (const subject of subjects) {
    const light = contributions(subject, viewpoint, units);
    units.forEach((unit, j) => {
      const role = light.roles[unit.atFull.id];
      const lx = role === 'back' ? light.back[j] : light.face[j];
      if ((role === 'key' || role === 'fill' || role === 'back') && lx > 0) ids.add(unit.atFull.id);
    });
  }
  return ids;
}

export function solveBalance(request: BalanceRequest): BalanceResult {
  const { units, subjects } = request;
  if (!(request.keyLx > 0) || !Number.isFinite(request.keyLx))
    throw new RangeError('key light must be above 0 lx');
  if (request.keyOverFill !== null && !(request.keyOverFill >= 1 && Number.isFinite(request.keyOverFill)))
    throw new RangeError('key over fill must be 1 or more (the key is the brighter side by definition)');
  if (request.backOverKeyStops !== null && !Number.isFinite(request.backOverKeyStops))
    throw new RangeError('back over key must be a number of stops');
  const fractions = units.map((unit) => lightFractionAtLevel(unit.levelPct, unit.dimmingCurve));

  const perSubject = subjects.map((subject) => contributions(subject, request.viewpoint, units));
  const lightInRole = (s: number, role: BalancedRole, j: number) => {
    const entry = perSubject[s];
    if (entry.roles[units[j].atFull.id] !== role) return 0;
    return role === 'back' ? entry.back[j] : entry.face[j];
  };

  // Key wanted on each subject; lowered below to what the units can give when it is out of reach.
  const rowsFor = (keyTargets: readonly number[]): Row[] =>
    subjects.flatMap((_, s) => {
      const key = keyTargets[s];
      const wanted: Row[] = [{ subject: s, role: 'key', targetLx: key }];
      if (request.keyOverFill !== null)
        wanted.push({ subject: s, role: 'fill', targetLx: key / request.keyOverFill });
      if (request.backOverKeyStops !== null)
        wanted.push({ subject: s, role: 'back', targetLx: key * 2 ** request.backOverKeyStops });
      return wanted;
    });

  const free = units.map((unit, j) => j).filter((j) => units[j].mayChange);
  const solveRows = (rows: readonly Row[]) => {
    const matrix = rows.map((row) => free.map((j) => lightInRole(row.subject, row.role, j) / row.targetLx));
    const rhs = rows.map((row) => {
      const fixed = units.reduce(
        (sum, unit, j) => (unit.mayChange ? sum : sum + lightInRole(row.subject, row.role, j) * fractions[j]),
        0,
      );
      return (row.targetLx - fixed) / row.targetLx;
    });
    const solved = boundedLeastSquares({
      matrix,
      rhs,
      lower: free.map(() => 0),
      upper: free.map(() => 1),
      start: free.map((j) => fractions[j]),
    });
    const levels: Record<string, number> = {};
    const proposed = [...fractions];
    for (const [index, j] of free.entries()) {
      const level = Math.min(
        100,
        Math.round(levelForLightFraction(solved.x[index], units[j].dimmingCurve) * 10) / 10,
      );
      levels[units[j].atFull.id] = level;
      proposed[j] = lightFractionAtLevel(level, units[j].dimmingCurve);
    }
    return { levels, proposed };
  };
  const sumRoleAt = (fractionsAt: readonly number[], s: number, role: BalancedRole) =>
    units.reduce((sum, _, j) => sum + lightInRole(s, role, j) * fractionsAt[j], 0);

  // First pass at the wanted key. Where a subject's key is out of reach with its key units at 100 %,
  // solve again with that subject's key at what they give, so fill and back keep the wanted ratios.
  const first = solveRows(rowsFor(subjects.map(() => request.keyLx)));
  const keyAtFull = (s: number) =>
    units.some((unit, j) => unit.mayChange && lightInRole(s, 'key', j) > 0 && first.proposed[j] >= 1 - 1e-9);
  const reachable = subjects.map((_, s) => sumRoleAt(first.proposed, s, 'key'));
  const lowered = subjects.map(
    (_, s) => reachable[s] > 0 && reachable[s] < request.keyLx * 2 ** -MISS_TOLERANCE_STOPS && keyAtFull(s),
  );
  const keyTargets = subjects.map((_, s) => (lowered[s] ? reachable[s] : request.keyLx));
  const rows = rowsFor(keyTargets);
  const { levels, proposed } = lowered.some(Boolean) ? solveRows(rows) : first;
  const sumRole = (s: number, role: BalancedRole) => sumRoleAt(proposed, s, role);
  let worst: number | null = 0;
  const balanced = subjects.map((subject, s): BalancedSubject => {
    const keyLx = sumRole(s, 'key');
    const fillLx = sumRole(s, 'fill');
    const backLightLx = sumRole(s, 'back');
    const targets = rows
      .filter((row) => row.subject === s)
      .map((lowerable): BalanceTarget => {
        // The key is judged against the wanted key even when fill and back followed a lowered one.
        const row = lowerable.role === 'key' ? { ...lowerable, targetLx: request.keyLx } : lowerable;
        const resultLx = sumRole(s, row.role);
        const offStops = resultLx > 0 ? Math.log2(resultLx / row.targetLx) : null;
        worst = worst === null || offStops === null ? null : Math.max(worst, Math.abs(offStops));
        const met = offStops !== null && Math.abs(offStops) <= MISS_TOLERANCE_STOPS;
        return {
          role: row.role,
          targetLx: row.targetLx,
          resultLx,
          offStops,
          met,
          ...explainMiss(row, resultLx, met),
        };
      });
    return {
      id: subject.placement.id,
      keyLx,
      fillLx,
      backLightLx,
      keyToFillStops: keyLx > 0 && fillLx > 0 ? Math.log2(keyLx / fillLx) : null,
      lightingRatio: fillLx > 0 ? (keyLx + fillLx) / fillLx : null,
      backToKeyStops: keyLx > 0 && backLightLx > 0 ? Math.log2(backLightLx / keyLx) : null,
      targets,
      keyOutOfReach: lowered[s],
      roles: perSubject[s].roles,
    };
  });

  function explainMiss(row: Row, resultLx: number, met: boolean) {
    if (met) return { reason: null, advice: [] };
    const inRole = units.map((unit, j) => j).filter((j) => lightInRole(row.subject, row.role, j) > 0);
    const name = subjects[row.subject].placement.id;
    if (inRole.length === 0) return { reason: { kind: 'noUnitInRole' } as const, advice: [] };
    const changing = inRole.filter((j) => units[j].mayChange);
    if (resultLx < row.targetLx) {
      if (changing.length === 0) return { reason: { kind: 'noneMayChange' } as const, advice: [] };
      const atFull = changing.filter((j) => Math.max(proposed[j], first.proposed[j]) >= 1 - 1e-9);
      const shortfall = row.targetLx - resultLx;
      const advice = atFull.map((j) =>
        adviseUnit({
          fixtureId: units[j].atFull.id,
          subjectId: name,
          role: row.role,
          givesLx: lightInRole(row.subject, row.role, j),
          shortfallLx: shortfall,
          mount: units[j].atFull.mount,
          facePoint: perSubject[row.subject].facePoint,
          beamSpread: units[j].beamSpread,
        }),
      );
      const reason: MissReason = atFull.length > 0 ? { kind: 'atFull' } : { kind: 'sharedUnits' };
      return { reason, advice };
    }
    const fixedLx = inRole
      .filter((j) => !units[j].mayChange)
      .reduce((sum, j) => sum + lightInRole(row.subject, row.role, j) * fractions[j], 0);
    const reason: MissReason =
      fixedLx > row.targetLx
        ? { kind: 'fixedTooBright', fixedLx }
        : changing.length === 0
          ? { kind: 'noneMayChange' }
          : { kind: 'sharedUnits' };
    return { reason, advice: [] };
  }

  const allMet = balanced.every((subject) => subject.targets.every((target) => target.met));
  return { levels, subjects: balanced, worstStops: worst, allMet };
}
