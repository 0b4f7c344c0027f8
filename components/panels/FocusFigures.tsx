'use client';

import type { FixtureFocus } from '@/lib/analysis';
import type { Footprint } from '@/lib/geometry';
import { assertNever } from '@/lib/numeric';
import { type LengthUnitSystem, formatIlluminance, formatLength } from '@/lib/units';
import { Readout } from './Readout';
import { formatAngle, formatArea } from './format';

interface FocusFiguresProps {
  readonly focus: FixtureFocus;
  readonly soft: boolean;
  readonly units: LengthUnitSystem;
  readonly focusPlaneHeightM: number;
}

/** The live focus figures of one unit, as the derived plot gives them. */
export function FocusFigures({ focus, soft, units, focusPlaneHeightM }: FocusFiguresProps) {
  if (focus.problem !== null || focus.aim === null) {
    return <p className="panel-problem">{focus.problem ?? 'No figures for this unit.'}</p>;
  }
  const aim = focus.aim;
  const centre =
    focus.centreLx === null ? null : (
      <Readout
        name="centreIlluminance"
        label="Centre, square to the beam"
        value={focus.centreLx}
        text={formatIlluminance(focus.centreLx, units)}
      />
    );
  return (
    <>
      <dl className="panel-readouts">
        <Readout name="throw" label="Throw" value={aim.throwM} text={formatLength(aim.throwM, units)} />
        <Readout name="pan" label="Pan" value={aim.panDeg} text={formatAngle(aim.panDeg)} />
        <Readout
          name="tilt"
          label="Tilt below horizontal"
          value={aim.tiltDeg}
          text={formatAngle(aim.tiltDeg)}
        />
        {focus.angles ? (
          <>
            <Readout
              name="beamAngle"
              label="Beam angle"
              value={focus.angles.beamAngleDeg}
              text={pair(focus.angles.beamAngleDeg, focus.angles.beamAngleCrossDeg, formatAngle)}
            />
            <Readout
              name="fieldAngle"
              label="Field angle"
              value={focus.angles.fieldAngleDeg}
              text={pair(focus.angles.fieldAngleDeg, focus.angles.fieldAngleCrossDeg, formatAngle)}
            />
          </>
        ) : null}
        {focus.beamDiameterM !== null ? (
          <Readout
            name="beamDiameter"
            label="Beam across, at the throw"
            value={focus.beamDiameterM}
            text={pair(focus.beamDiameterM, focus.beamDiameterCrossM, (value) => formatLength(value, units))}
          />
        ) : null}
        {focus.fieldDiameterM !== null ? (
          <Readout
            name="fieldDiameter"
            label="Field across, at the throw"
            value={focus.fieldDiameterM}
            text={pair(focus.fieldDiameterM, focus.fieldDiameterCrossM, (value) =>
              formatLength(value, units),
            )}
          />
        ) : null}
        {centre}
      </dl>
      {soft ? (
        <p className="panel-note">
          A soft source has no beam edge, so it has no beam or field size and no pool.
        </p>
      ) : focus.beamPool ? (
        <div className="panel-subsection">
          <h4>Beam pool on the focus plane ({formatLength(focusPlaneHeightM, units)} up)</h4>
          <PoolFigures pool={focus.beamPool} units={units} />
        </div>
      ) : null}
    </>
  );
}

/** A round beam's figure, or an oval's two (along its X axis × along its Y axis). */
function pair(value: number, cross: number | null, format: (value: number) => string): string {
  return cross === null ? format(value) : `${format(value)} × ${format(cross)}`;
}

function PoolFigures({ pool, units }: { pool: Footprint; units: LengthUnitSystem }) {
  switch (pool.state) {
    case 'closed':
      return (
        <>
          <p className="panel-note">Edges measured from the point under the unit, along its aim.</p>
          <dl className="panel-readouts">
            {pool.nearM !== null ? (
              <Readout
                name="poolNear"
                label="Near edge"
                value={pool.nearM}
                text={formatLength(pool.nearM, units)}
              />
            ) : null}
            {pool.farM !== null ? (
              <Readout
                name="poolFar"
                label="Far edge"
                value={pool.farM}
                text={formatLength(pool.farM, units)}
              />
            ) : null}
            {pool.widthM !== null ? (
              <Readout
                name="poolWidth"
                label="Width"
                value={pool.widthM}
                text={formatLength(pool.widthM, units)}
              />
            ) : null}
            {pool.areaM2 !== null ? (
              <Readout
                name="poolArea"
                label="Area"
                value={pool.areaM2}
                text={formatArea(pool.areaM2, units)}
              />
            ) : null}
          </dl>
        </>
      );
    case 'open':
      return (
        <>
          <p className="panel-note" data-pool-state="open">
            The pool does not close: the beam&apos;s edge reaches the horizon; light spills on past the stage.
          </p>
          {pool.nearM !== null ? (
            <dl className="panel-readouts">
              <Readout
                name="poolNear"
                label="Near edge"
                value={pool.nearM}
                text={formatLength(pool.nearM, units)}
              />
            </dl>
          ) : null}
        </>
      );
    case 'misses':
      return (
        <p className="panel-note" data-pool-state="misses">
          The beam misses the focus plane: it is aimed above it, so no light lands on it.
        </p>
      );
    case 'apex-on-plane':
      return (
        <p className="panel-note" data-pool-state="apex-on-plane">
          The unit hangs in the focus plane itself, so it makes no pool on it.
        </p>
      );
    default:
      return assertNever(pool.state);
  }
}
