import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import * as THREE from 'three';
import { aimFromPoints, vec3 } from '@/lib/geometry';

describe('aimFromPoints', () => {
  // REFERENCE-CHECKS §3 [DER]: h = 6 m, x0 = 6 m → throw √72 = 8.485 281 m, 45° tilt.
  it('a unit 6 m up aimed 6 m downstage has a throw of 8.485 281 m at 45° tilt, pan 0', () => {
    const aim = aimFromPoints(vec3(0, 0, 6), vec3(0, -6, 0));
    expect(aim.throwM).toBeCloseTo(8.485281, 6);
    expect(aim.tiltDeg).toBeCloseTo(45, 12);
    expect(aim.fromVerticalDeg).toBeCloseTo(45, 12);
    expect(aim.panDeg).toBeCloseTo(0, 12);
  });

  it.each([
    ['stage left (+x)', vec3(5, 0, 0), 90],
    ['stage right (−x)', vec3(-5, 0, 0), -90],
    ['upstage (+y)', vec3(0, 5, 0), 180],
    ['downstage-left diagonal', vec3(3, -3, 0), 45],
  ])('aiming %s pans %f°', (_label, focus, panDeg) => {
    expect(aimFromPoints(vec3(0, 0, 6), focus).panDeg).toBeCloseTo(panDeg, 12);
  });

  // REFERENCE-CHECKS §11 [DER]: pipe 7.7 m, focus 1.7 m, 45°/45° → offsets 4.2426 m, throw 8.4853 m.
  it('the 45°/45° front-light geometry throws 8.4853 m', () => {
    const offset = 6 / Math.SQRT2;
    const aim = aimFromPoints(vec3(-offset, -offset, 7.7), vec3(0, 0, 1.7));
    expect(aim.throwM).toBeCloseTo(8.4853, 4);
    expect(aim.tiltDeg).toBeCloseTo(45, 10);
    expect(aim.panDeg).toBeCloseTo(135, 10);
  });

  it('a vertical aim has pan 0 and tilt 90, an upward aim a negative tilt', () => {
    expect(aimFromPoints(vec3(1, 1, 6), vec3(1, 1, 0))).toMatchObject({ panDeg: 0, tiltDeg: 90 });
    expect(aimFromPoints(vec3(0, 0, 0), vec3(0, -3, 3)).tiltDeg).toBeCloseTo(-45, 12);
  });

  it('zero throw and non-finite points are refused with a message', () => {
    expect(() => aimFromPoints(vec3(1, 2, 3), vec3(1, 2, 3))).toThrow(/zero throw/);
    expect(() => aimFromPoints(vec3(Number.NaN, 0, 0), vec3(0, 0, 0))).toThrow(/finite/);
  });

  // Independent cross-check with three.js Vector3 (general-purpose 3D library).
  it('throw and tilt agree with three.js for random mounts and focus points', () => {
    const coordinate = fc.double({ min: -20, max: 20, noNaN: true });
    fc.assert(
      fc.property(
        coordinate,
        coordinate,
        coordinate,
        coordinate,
        coordinate,
        coordinate,
        (a, b, c, d, e, f) => {
          const mount = new THREE.Vector3(a, b, c);
          const focus = new THREE.Vector3(d, e, f);
          fc.pre(mount.distanceTo(focus) > 1e-3);
          const aim = aimFromPoints(vec3(a, b, c), vec3(d, e, f));
          expect(aim.throwM).toBeCloseTo(mount.distanceTo(focus), 9);
          const axis = focus.clone().sub(mount);
          const fromDown = THREE.MathUtils.radToDeg(axis.angleTo(new THREE.Vector3(0, 0, -1)));
          // three's angleTo uses acos, which loses ~2e-8 rad (~1e-6°) near 0°; ours uses atan2.
          expect(Math.abs(aim.fromVerticalDeg - fromDown)).toBeLessThan(1e-5);
        },
      ),
    );
  });
});
