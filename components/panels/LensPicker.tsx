'use client';

import { useState } from 'react';
import { LengthInput } from '@/components/inputs/LengthInput';
import { useEditor } from '@/components/editor/EditorContext';
import { type AngleChoice, chooseAngle } from '@/lib/photometry';
import { type BeamPhotometry, updateFixture } from '@/lib/plot';
import { type LengthUnitSystem, formatLength } from '@/lib/units';
import { formatAngle, formatAngleShort } from './format';

interface LensPickerProps {
  readonly fixtureId: string;
  readonly photometry: BeamPhotometry;
  readonly throwM: number;
  /** The unit's beam angle now (after its zoom), degrees. */
  readonly beamAngleDeg: number;
  readonly units: LengthUnitSystem;
}

/** Which lens or zoom setting gives the pool the user wants at this unit's throw. */
export function LensPicker({ fixtureId, photometry, throwM, beamAngleDeg, units }: LensPickerProps) {
  const { run } = useEditor();
  const [wantedM, setWantedM] = useState<number | null>(null);
  const zoom = photometry.zoom;
  const hasChoices = zoom !== null || photometry.lensOptionsDeg.length > 0;
  const choice =
    wantedM === null
      ? null
      : chooseAngle(throwM, wantedM, {
          angles: hasChoices ? photometry.lensOptionsDeg : [beamAngleDeg],
          zoomRange: zoom ? [zoom.minBeamDeg, zoom.maxBeamDeg] : undefined,
        });
  return (
    <>
      <LengthInput
        label="Wanted pool diameter"
        valueM={wantedM}
        units={units}
        hint="Across the beam at this throw."
        placeholder={units === 'metric' ? 'e.g. 3 m' : `e.g. 10'`}
        onCommit={(valueM) => {
          if (!(valueM > 0)) return 'A pool diameter must be more than zero.';
          setWantedM(valueM);
          return null;
        }}
      />
      {choice && wantedM !== null ? (
        <p className="panel-sentence" data-readout="lensPicker" data-value={String(choice.neededDeg)}>
          {sentence(choice, wantedM, units, hasChoices)}
        </p>
      ) : null}
      {choice?.exact && zoom ? (
        <button
          type="button"
          className="panel-button"
          onClick={() => run(updateFixture, { id: fixtureId, changes: { zoomBeamDeg: choice.neededDeg } })}
        >
          Set the zoom to {formatAngle(choice.neededDeg)}
        </button>
      ) : null}
    </>
  );
}

function sentence(
  choice: AngleChoice,
  wantedM: number,
  units: LengthUnitSystem,
  hasChoices: boolean,
): string {
  const start = `For a ${formatLength(wantedM, units)} pool at this throw you need ${formatAngle(choice.neededDeg)}`;
  if (choice.nearestDeg === null || choice.nearestDiameterM === null) return `${start}.`;
  if (choice.exact) return `${start}: within the zoom, set ${formatAngle(choice.neededDeg)}.`;
  const nearestAngle = formatAngleShort(choice.nearestDeg);
  const nearestPool = formatLength(choice.nearestDiameterM, units);
  if (!hasChoices) {
    return `${start}; this type lists no other lens and no zoom: its own ${nearestAngle} gives ${nearestPool}.`;
  }
  return `${start}; nearest available: ${nearestAngle} (${nearestPool}).`;
}
