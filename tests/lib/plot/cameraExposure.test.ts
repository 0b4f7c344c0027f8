import { describe, expect, it } from 'vitest';
import { type CameraSettings, cameraNeedsLx, shutterSeconds, subjectExposure } from '@/lib/plot';

// REFERENCE-CHECKS §6 [DER]: ISO 800, f/2.8, 1/50 s, C = 250 → 122.5 lx.
const camera: CameraSettings = {
  iso: 800,
  shutter: { kind: 'angle', angleDeg: 180, framesPerSecond: 25 },
  fNumber: 2.8,
  meterConstant: 250,
};

describe('what a camera viewpoint needs', () => {
  it('a 180° shutter at 25 fps is 1/50 s (common practice), so ISO 800 at f/2.8 needs 122.5 lx', () => {
    expect(shutterSeconds(camera)).toBeCloseTo(1 / 50, 15);
    expect(cameraNeedsLx(camera)).toBeCloseTo(122.5, 9);
    expect(cameraNeedsLx({ ...camera, shutter: { kind: 'time', seconds: 1 / 50 } })).toBeCloseTo(122.5, 9);
  });

  it('a key of 245 lx is one stop over, and would expose normally at f/2.8·√2 ≈ f/4', () => {
    const exposure = subjectExposure(camera, 245);
    expect(exposure.keyStops).toBeCloseTo(1, 12);
    expect(exposure.fNumberForKey).toBeCloseTo(2.8 * Math.SQRT2, 9);
    expect(exposure.markedFNumberForKey).toBe(4);
  });

  it('with no key light there is nothing to compare, and no NaN', () => {
    expect(subjectExposure(camera, 0)).toEqual({
      neededLx: expect.closeTo(122.5, 9),
      keyStops: null,
      fNumberForKey: null,
      markedFNumberForKey: null,
    });
  });
});
