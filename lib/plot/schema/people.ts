/** Subjects (the people to be lit) and viewpoints (the audience and cameras that see them). */
import { z } from 'zod';
import { finite, id, name, notes, planPoint, worldPoint, expecting } from './primitives';
import { roleOverrides } from './looks';

export const subject = z.strictObject({
  id: id(),
  name: name(),
  /** Floor mark in plan, m. */
  mark: planPoint,
  /** Height of the face above the floor, m (about 1.6 m standing, 1.2 m seated: common practice). */
  faceHeightM: finite().gt(0, 'must be greater than 0 m').max(5, 'must be at most 5 m'),
  /** Plan bearing the subject faces, degrees, same convention as pan: 0 = toward the audience (−y). */
  facingDeg: finite().min(-360, 'must be between −360° and 360°').max(360, 'must be between −360° and 360°'),
  /** Roles the user has given sources on this subject, keyed by fixture id; others follow the rule. */
  roleOverrides,
  notes: notes(),
});
export type Subject = z.infer<typeof subject>;

export const cameraSettings = z.strictObject({
  iso: finite().gt(0, 'must be greater than 0').max(409600, 'must be at most 409 600'),
  shutter: z.discriminatedUnion('kind', [
    z.strictObject({
      kind: z.literal('time'),
      seconds: finite().gt(0, 'must be greater than 0 s').max(60, 'must be at most 60 s'),
    }),
    z.strictObject({
      kind: z.literal('angle'),
      angleDeg: finite().gt(0, 'must be greater than 0°').max(360, 'must be at most 360°'),
      framesPerSecond: finite().gt(0, 'must be greater than 0').max(1000, 'must be at most 1000'),
    }),
  ]),
  fNumber: finite().min(0.5, 'must be at least 0.5').max(128, 'must be at most 128'),
  /** Incident-meter constant C (ISO 2720): 250 flat receptor, 330 dome. */
  meterConstant: finite().min(100, 'must be between 100 and 1000').max(1000, 'must be between 100 and 1000'),
});
export type CameraSettings = z.infer<typeof cameraSettings>;

export const viewpoint = z.strictObject({
  id: id(),
  name: name(),
  kind: z.enum(['audience', 'camera'], { error: expecting('must be audience or camera') }),
  /** Eye or lens position, world m. */
  position: worldPoint,
  /** Exposure settings for a camera; null for an audience position. */
  camera: cameraSettings.nullable(),
});
export type Viewpoint = z.infer<typeof viewpoint>;
