'use client';

import { LengthInput } from '@/components/inputs/LengthInput';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';
import type { LengthUnitSystem } from '@/lib/units';

type Axis = 'x' | 'y' | 'z';

const AXIS_NOTE: Record<Axis, string> = {
  x: 'x + toward stage left',
  y: 'y + upstage',
  z: 'z up from the stage floor',
};

interface PointFieldsProps<Point extends { x: number; y: number }> {
  /** Names the group and each field: "Mount" gives "Mount x", "Mount y", … */
  readonly name: string;
  readonly point: Point;
  readonly axes: readonly (keyof Point & Axis)[];
  readonly units: LengthUnitSystem;
  readonly onCommit: (point: Point) => CommitOutcome;
  /** Say which way the axes run (default); off for a second point right after a first. */
  readonly axisNote?: boolean;
}

/** One LengthInput per coordinate of a point; each commits the whole point with one coordinate changed. */
export function PointFields<Point extends { x: number; y: number }>({
  name,
  point,
  axes,
  units,
  onCommit,
  axisNote = true,
}: PointFieldsProps<Point>) {
  return (
    <fieldset className="panel-point">
      <legend>{name}</legend>
      {axisNote ? <p className="panel-note">{axes.map((axis) => AXIS_NOTE[axis]).join(', ')}</p> : null}
      <div className="panel-point-fields">
        {axes.map((axis) => (
          <LengthInput
            key={axis}
            label={
              <>
                <span className="panel-visually-hidden">{name} </span>
                {axis}
              </>
            }
            valueM={point[axis] as number}
            units={units}
            onCommit={(valueM) => onCommit({ ...point, [axis]: valueM })}
          />
        ))}
      </div>
    </fieldset>
  );
}
