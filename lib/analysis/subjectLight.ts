/**
 * Light on a subject's face from every source: illuminance on the vertical plane of the face turned
 * toward the viewpoint (the audience seat or camera that sees it), at face height.
 */
import { type Vec3, vec3 } from '../geometry/vector';
import { degToRad } from '../numeric';
import { fixtureIlluminanceLx } from './fixtureLight';
import type { RigFixture } from './rig';

export interface SubjectPlacement {
  readonly id: string;
  /** Floor mark in plan, m. */
  readonly mark: { readonly x: number; readonly y: number };
  readonly faceHeightM: number;
  /** Plan bearing the subject faces, degrees (0 = toward the audience, −y; +90 = toward stage left, +x). */
  readonly facingDeg: number;
}

export interface SourceOnFace {
  readonly fixtureId: string;
  /** Illuminance on the face toward the viewpoint, lx. */
  readonly faceLx: number;
}

export interface SubjectFaceLight {
  readonly id: string;
  readonly facePoint: Vec3;
  /** Unit horizontal normal of the face plane used (toward the viewpoint, or the facing direction). */
  readonly faceNormal: Vec3;
  /** 'viewpoint' when judged toward a viewpoint, 'facing' when there is none (or it stands at the face). */
  readonly judgedToward: 'viewpoint' | 'facing';
  /** Every fixture's contribution, largest first (zeros included, so every source is listed). */
  readonly sources: readonly SourceOnFace[];
  readonly totalFaceLx: number;
}

/** Plan unit vector of a bearing in the pan convention (0° = −y, +90° = +x). */
export function bearingDirection(bearingDeg: number): Vec3 {
  const angle = degToRad(bearingDeg);
  return vec3(Math.sin(angle), -Math.cos(angle), 0);
}

/** Light on a subject's face from each fixture, toward `viewpoint` (world m) or, if null, its facing. */
export function subjectFaceLight(
  subject: SubjectPlacement,
  viewpoint: Vec3 | null,
  fixtures: readonly RigFixture[],
): SubjectFaceLight {
  const facePoint = vec3(subject.mark.x, subject.mark.y, subject.faceHeightM);
  let faceNormal = bearingDirection(subject.facingDeg);
  let judgedToward: 'viewpoint' | 'facing' = 'facing';
  if (viewpoint) {
    const dx = viewpoint.x - facePoint.x;
    const dy = viewpoint.y - facePoint.y;
    const planDistance = Math.hypot(dx, dy);
    if (planDistance > 1e-6) {
      faceNormal = vec3(dx / planDistance, dy / planDistance, 0);
      judgedToward = 'viewpoint';
    }
  }
  const sources = fixtures
    .map((fixture) => ({
      fixtureId: fixture.id,
      faceLx: fixtureIlluminanceLx(fixture, facePoint, faceNormal),
    }))
    .sort((a, b) => b.faceLx - a.faceLx);
  return {
    id: subject.id,
    facePoint,
    faceNormal,
    judgedToward,
    sources,
    totalFaceLx: sources.reduce((sum, source) => sum + source.faceLx, 0),
  };
}
