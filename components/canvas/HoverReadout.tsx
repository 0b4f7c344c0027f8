'use client';

import { type RefObject, useEffect, useImperativeHandle, useRef, useState } from 'react';
import { type PointLight, type RigFixture, pointLight } from '@/lib/analysis';
import type { Vec3 } from '@/lib/geometry';
import { formatIlluminance, formatLength } from '@/lib/units';
import type { WorldPlanPoint } from './viewTransform';

export interface HoverReadoutHandle {
  /** Read the light at a plan point (on the next animation frame), or clear with null. */
  pointAt(world: WorldPlanPoint | null): void;
}

export interface HoverReadoutProps {
  readonly handle: RefObject<HoverReadoutHandle | null>;
  readonly rig: readonly RigFixture[];
  readonly focusPlaneHeightM: number;
  readonly viewpoint: Vec3 | null;
  readonly units: 'metric' | 'imperial';
  readonly measuredM: number | null;
}

/**
 * The light where the pointer is (horizontal, and toward the main viewpoint) at focus height. Keeps
 * its own state so pointer moves do not redraw the plan.
 */
export function HoverReadout({
  handle,
  rig,
  focusPlaneHeightM,
  viewpoint,
  units,
  measuredM,
}: HoverReadoutProps) {
  const [hover, setHover] = useState<{ world: WorldPlanPoint; light: PointLight } | null>(null);
  const frame = useRef<number | null>(null);
  const latest = useRef({ rig, focusPlaneHeightM, viewpoint });
  useEffect(() => {
    latest.current = { rig, focusPlaneHeightM, viewpoint };
  }, [rig, focusPlaneHeightM, viewpoint]);
  useImperativeHandle(
    handle,
    () => ({
      pointAt(world) {
        if (frame.current !== null) cancelAnimationFrame(frame.current);
        if (world === null) {
          setHover(null);
          return;
        }
        frame.current = requestAnimationFrame(() => {
          frame.current = null;
          const { rig: currentRig, focusPlaneHeightM: heightM, viewpoint: eye } = latest.current;
          setHover({ world, light: pointLight(currentRig, { x: world.x, y: world.y, z: heightM }, eye) });
        });
      },
    }),
    [],
  );
  return (
    <div className="plan-readout" data-testid="hover-readout">
      {hover ? (
        <>
          <span>
            x {formatLength(hover.world.x, units)}, y {formatLength(hover.world.y, units)}
          </span>
          <span>{formatIlluminance(hover.light.horizontalLx, units)} horizontal</span>
          {hover.light.towardViewpointLx !== null ? (
            <span>{formatIlluminance(hover.light.towardViewpointLx, units)} toward the main viewpoint</span>
          ) : null}
          <span className="plan-readout-note">at {formatLength(focusPlaneHeightM, units)} focus height</span>
        </>
      ) : (
        <span className="plan-readout-note">Point at the plan to read the light there.</span>
      )}
      {measuredM !== null ? (
        <span className="plan-readout-measure">Measured: {formatLength(measuredM, units)}</span>
      ) : null}
    </div>
  );
}
