/**
 * What a camera viewpoint needs: the illuminance for a normal exposure at its settings (ISO 2720 /
 * APEX, E = C·N²/(t·S), cine shutters t = angle/(360·fps)), and how a subject's key light compares.
 */
import {
  fNumberForLux,
  luxForExposure,
  nearestMarkedFNumber,
  shutterSecondsFromAngle,
  stopsFromNormal,
} from '../photometry';
import type { CameraSettings } from './schema/people';

/** Exposure time of a camera's shutter setting, s. */
export function shutterSeconds(camera: CameraSettings): number {
  return camera.shutter.kind === 'time'
    ? camera.shutter.seconds
    : shutterSecondsFromAngle(camera.shutter.angleDeg, camera.shutter.framesPerSecond);
}

/** Illuminance (lx) a normal exposure needs at the camera's ISO, shutter, f-number and meter constant. */
export function cameraNeedsLx(camera: CameraSettings): number {
  return luxForExposure({
    iso: camera.iso,
    shutterS: shutterSeconds(camera),
    fNumber: camera.fNumber,
    meterConstant: camera.meterConstant,
  });
}

export interface SubjectExposure {
  /** What the camera needs, lx. */
  readonly neededLx: number;
  /** Stops the key light is over (+) or under (−) that; null without key light. */
  readonly keyStops: number | null;
  /** f-number the key light gives a normal exposure at (ISO and shutter unchanged); null without key light. */
  readonly fNumberForKey: number | null;
  /** The marked third-stop f-number nearest to it. */
  readonly markedFNumberForKey: number | null;
}

/** How a subject's key light (lx) sits against a camera's exposure. */
export function subjectExposure(camera: CameraSettings, keyLx: number): SubjectExposure {
  const neededLx = cameraNeedsLx(camera);
  if (!(keyLx > 0)) return { neededLx, keyStops: null, fNumberForKey: null, markedFNumberForKey: null };
  const fNumberForKey = fNumberForLux({
    lux: keyLx,
    iso: camera.iso,
    shutterS: shutterSeconds(camera),
    meterConstant: camera.meterConstant,
  });
  return {
    neededLx,
    keyStops: stopsFromNormal(keyLx, neededLx),
    fNumberForKey,
    markedFNumberForKey: nearestMarkedFNumber(fNumberForKey),
  };
}
