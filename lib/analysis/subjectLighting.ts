/**
 * Light on a subject from every source, judged from a viewpoint: on the face toward the viewpoint,
 * on its two sides (normals ±45° from the viewing axis), from above and from behind; cylindrical and
 * semi-cylindrical illuminance by their definitions; each source's role (key, fill, back, side, top)
 * from geometry; and the ratios in stops.
 *
 * Roles (documented rule): a source more than 70° above the horizontal
 * seen from the face is `top`; otherwise by its plan angle from the viewing axis: beyond 110° `back`,
 * 70°–110° `side`, nearer the axis `front`. The front source giving the most light on the face is the
 * `key`; other front sources on the same side of the axis are `key` too (the key side), those on the
 * other side `fill`. The rule runs first on every source; then a role the user gave a source on this
 * subject (`overrides`, fixture id → role) replaces the rule's, and key, fill and back sums follow the
 * final roles. Each source keeps the rule's role too (`ruleRole`) and says whether it was overridden.
 */
import { type Vec3, vec3 } from '../geometry/vector';
import { degToRad, radToDeg } from '../numeric';
import { fixtureIlluminanceLx, hasNoAim } from './fixtureLight';
import type { RigFixture } from './rig';
import { type SubjectPlacement, bearingDirection } from './subjectLight';

export type LightRole = 'key' | 'fill' | 'back' | 'side' | 'top';

export interface SourceOnSubject {
  readonly fixtureId: string;
  /** The role used: the user's where given, else the rule's. */
  readonly role: LightRole;
  /** The role the geometric rule gives. */
  readonly ruleRole: LightRole;
  /** True when the user's role replaced the rule's (even if they agree). */
  readonly overridden: boolean;
  /** Plan angle of the source from the viewing axis, degrees: + toward the viewer's right, ±180 behind. */
  readonly azimuthDeg: number;
  /** Angle of the source above the horizontal seen from the face, degrees. */
  readonly elevationDeg: number;
  /** On the face turned toward the viewpoint, lx. */
  readonly faceLx: number;
  /** On the side of the face to the viewer's left / right (normals 45° off the axis), lx. */
  readonly leftLx: number;
  readonly rightLx: number;
  /** From above (horizontal surface facing up), lx. */
  readonly topLx: number;
  /** On the back of the head (facing away from the viewpoint), lx. */
  readonly backLx: number;
  readonly cylindricalLx: number;
  /** Semi-cylindrical toward the viewpoint, lx. */
  readonly semiCylindricalLx: number;
}

export interface SubjectLighting {
  readonly id: string;
  readonly facePoint: Vec3;
  /** Unit plan vector from the face toward the viewpoint (or along the facing when there is none). */
  readonly viewAxis: Vec3;
  readonly sources: readonly SourceOnSubject[];
  readonly totals: Omit<
    SourceOnSubject,
    'fixtureId' | 'role' | 'ruleRole' | 'overridden' | 'azimuthDeg' | 'elevationDeg'
  >;
  /** Light on the face from the key side and from the fill side, lx. */
  readonly keyLx: number;
  readonly fillLx: number;
  /** Light on the back of the head from the back-role sources, lx. */
  readonly backLightLx: number;
  /** log2(key / fill); null without fill light. */
  readonly keyToFillStops: number | null;
  /** The photographers' (key + fill) : fill, as one number; null without fill light. */
  readonly lightingRatio: number | null;
  /** log2(back / key); null without key or back light. */
  readonly backToKeyStops: number | null;
}

/** Azimuth samples for soft sources' cylindrical figures (trapezoid rule; within 0.1 %). */
const AZIMUTH_SAMPLES = 360;

export function subjectLighting(
  subject: SubjectPlacement,
  viewpoint: Vec3 | null,
  fixtures: readonly RigFixture[],
  overrides: Readonly<Record<string, LightRole>> = {},
  /** 'faces' skips the cylindrical figures (left at 0), for callers that need only light and roles. */
  figures: 'all' | 'faces' = 'all',
): SubjectLighting {
  const facePoint = vec3(subject.mark.x, subject.mark.y, subject.faceHeightM);
  let viewAxis = bearingDirection(subject.facingDeg);
  if (viewpoint) {
    const dx = viewpoint.x - facePoint.x;
    const dy = viewpoint.y - facePoint.y;
    const length = Math.hypot(dx, dy);
    if (length > 1e-6) viewAxis = vec3(dx / length, dy / length, 0);
  }
  // The viewer's right: looking along −axis, right is (−axis) × up.
  const right = vec3(-viewAxis.y, viewAxis.x, 0);
  const rotate = (towardRight: number) => {
    const angle = degToRad(towardRight);
    return vec3(
      viewAxis.x * Math.cos(angle) + right.x * Math.sin(angle),
      viewAxis.y * Math.cos(angle) + right.y * Math.sin(angle),
      0,
    );
  };
  const leftNormal = rotate(-45);
  const rightNormal = rotate(45);
  const back = vec3(-viewAxis.x, -viewAxis.y, 0);
  const up = vec3(0, 0, 1);

  const measured = fixtures.map((fixture) => {
    const light = (normal: Vec3) => fixtureIlluminanceLx(fixture, facePoint, normal);
    const toSource = vec3(
      fixture.mount.x - facePoint.x,
      fixture.mount.y - facePoint.y,
      fixture.mount.z - facePoint.z,
    );
    const planLength = Math.hypot(toSource.x, toSource.y);
    const distance = Math.hypot(planLength, toSource.z);
    const elevationDeg = radToDeg(Math.atan2(toSource.z, planLength));
    const azimuthDeg =
      planLength > 1e-9
        ? radToDeg(
            Math.atan2(
              toSource.x * right.x + toSource.y * right.y,
              toSource.x * viewAxis.x + toSource.y * viewAxis.y,
            ),
          )
        : 0;
    const { cylindricalLx, semiCylindricalLx } =
      figures === 'all'
        ? cylindricalFigures(fixture, facePoint, viewAxis, toSource, planLength, distance)
        : { cylindricalLx: 0, semiCylindricalLx: 0 };
    return {
      fixtureId: fixture.id,
      azimuthDeg,
      elevationDeg,
      faceLx: light(viewAxis),
      leftLx: light(leftNormal),
      rightLx: light(rightNormal),
      topLx: light(up),
      backLx: light(back),
      cylindricalLx,
      semiCylindricalLx,
    };
  });

  const roleOf = (entry: (typeof measured)[number]): Exclude<LightRole, 'key' | 'fill'> | 'front' =>
    entry.elevationDeg > 70
      ? 'top'
      : Math.abs(entry.azimuthDeg) > 110
        ? 'back'
        : Math.abs(entry.azimuthDeg) >= 70
          ? 'side'
          : 'front';
  const front = measured.filter((entry) => roleOf(entry) === 'front');
  const key = front.reduce<(typeof measured)[number] | null>(
    (best, entry) => (!best || entry.faceLx > best.faceLx ? entry : best),
    null,
  );
  const keySide = key && key.faceLx > 0 ? Math.sign(key.azimuthDeg) || 1 : 0;
  const ruleRoleOf = (entry: (typeof measured)[number]): LightRole => {
    const role = roleOf(entry);
    if (role !== 'front') return role;
    const side = Math.sign(entry.azimuthDeg) || 1;
    return keySide !== 0 && side === keySide ? 'key' : 'fill';
  };
  const sources: SourceOnSubject[] = measured.map((entry) => {
    const ruleRole = ruleRoleOf(entry);
    const given = Object.hasOwn(overrides, entry.fixtureId) ? overrides[entry.fixtureId] : undefined;
    return { ...entry, role: given ?? ruleRole, ruleRole, overridden: given !== undefined };
  });
  const sum = (
    pick: (entry: SourceOnSubject) => number,
    filter: (entry: SourceOnSubject) => boolean = () => true,
  ) => sources.filter(filter).reduce((total, entry) => total + pick(entry), 0);
  const keyLx = sum(
    (entry) => entry.faceLx,
    (entry) => entry.role === 'key',
  );
  const fillLx = sum(
    (entry) => entry.faceLx,
    (entry) => entry.role === 'fill',
  );
  const backLightLx = sum(
    (entry) => entry.backLx,
    (entry) => entry.role === 'back',
  );
  return {
    id: subject.id,
    facePoint,
    viewAxis,
    sources: [...sources].sort((a, b) => b.faceLx + b.backLx + b.topLx - (a.faceLx + a.backLx + a.topLx)),
    totals: {
      faceLx: sum((entry) => entry.faceLx),
      leftLx: sum((entry) => entry.leftLx),
      rightLx: sum((entry) => entry.rightLx),
      topLx: sum((entry) => entry.topLx),
      backLx: sum((entry) => entry.backLx),
      cylindricalLx: sum((entry) => entry.cylindricalLx),
      semiCylindricalLx: sum((entry) => entry.semiCylindricalLx),
    },
    keyLx,
    fillLx,
    backLightLx,
    keyToFillStops: keyLx > 0 && fillLx > 0 ? Math.log2(keyLx / fillLx) : null,
    lightingRatio: fillLx > 0 ? (keyLx + fillLx) / fillLx : null,
    backToKeyStops: keyLx > 0 && backLightLx > 0 ? Math.log2(backLightLx / keyLx) : null,
  };
}

/**
 * Cylindrical and semi-cylindrical illuminance of one source at the face. Point-like sources by the
 * closed forms E_z = E_n·sin ε/π and E_sz = E_n·sin ε·(1 + cos α)/π (E_n on a surface square to the
 * light, ε from the vertical, α the plan angle from the semi-cylinder's facing); soft sources by
 * averaging vertical illuminance over the azimuth (their definitions).
 */
function cylindricalFigures(
  fixture: RigFixture,
  facePoint: Vec3,
  viewAxis: Vec3,
  toSource: Vec3,
  planLength: number,
  distance: number,
): { cylindricalLx: number; semiCylindricalLx: number } {
  if (hasNoAim(fixture) || distance < 1e-9) return { cylindricalLx: 0, semiCylindricalLx: 0 };
  if (fixture.source.kind !== 'soft') {
    const square = vec3(toSource.x / distance, toSource.y / distance, toSource.z / distance);
    const normalLx = fixtureIlluminanceLx(fixture, facePoint, square);
    const sinFromVertical = planLength / distance;
    const cosAlpha = planLength > 1e-9 ? (toSource.x * viewAxis.x + toSource.y * viewAxis.y) / planLength : 0;
    return {
      cylindricalLx: (normalLx * sinFromVertical) / Math.PI,
      semiCylindricalLx: (normalLx * sinFromVertical * (1 + cosAlpha)) / Math.PI,
    };
  }
  let all = 0;
  let half = 0;
  for (let index = 0; index < AZIMUTH_SAMPLES; index += 1) {
    const angle = (2 * Math.PI * (index + 0.5)) / AZIMUTH_SAMPLES;
    const normal = vec3(Math.cos(angle), Math.sin(angle), 0);
    const lux = fixtureIlluminanceLx(fixture, facePoint, normal);
    all += lux;
    if (normal.x * viewAxis.x + normal.y * viewAxis.y > 0) half += lux;
  }
  // Mean over the whole turn; over the half turn facing the viewpoint: (1/π)∫ E_v dφ.
  return { cylindricalLx: all / AZIMUTH_SAMPLES, semiCylindricalLx: (2 * half) / AZIMUTH_SAMPLES };
}
