'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import type { CameraSettings } from '@/lib/plot';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';

type Shutter = CameraSettings['shutter'];

/** Common practice for film-style video: a 180° shutter at 25 frames per second. */
const USUAL_FRAME_RATE = 25;

/** A shutter time as photographers write it: 1/50 below a second, else seconds. */
function formatShutterSeconds(seconds: number): string {
  if (seconds < 1) {
    const denominator = 1 / seconds;
    if (Math.abs(denominator - Math.round(denominator)) < 1e-6) return `1/${Math.round(denominator)}`;
  }
  return String(Number(seconds.toFixed(4)));
}

/** The same exposure time the other way round: angle and frame rate ↔ seconds. */
function convertShutter(shutter: Shutter, kind: Shutter['kind']): Shutter {
  if (shutter.kind === kind) return shutter;
  if (shutter.kind === 'angle') {
    return { kind: 'time', seconds: shutter.angleDeg / 360 / shutter.framesPerSecond };
  }
  const angleDeg = shutter.seconds * 360 * USUAL_FRAME_RATE;
  if (angleDeg <= 360) return { kind: 'angle', angleDeg, framesPerSecond: USUAL_FRAME_RATE };
  return { kind: 'angle', angleDeg: 180, framesPerSecond: 1 / (2 * shutter.seconds) };
}

/** A camera's exposure settings: ISO, shutter (time, or angle and frame rate), f-number, meter constant. */
export function CameraFields({
  camera,
  onChange,
}: {
  camera: CameraSettings;
  onChange: (camera: CameraSettings) => CommitOutcome;
}) {
  const shutter = camera.shutter;
  const setShutter = (next: Shutter) => onChange({ ...camera, shutter: next });
  return (
    <>
      <NumberInput
        label="ISO"
        value={camera.iso}
        min={0}
        minExclusive
        max={409600}
        decimals={0}
        onCommit={(iso) => onChange({ ...camera, iso })}
      />
      <SelectInput
        label="Shutter given as"
        value={shutter.kind}
        options={[
          { value: 'time', label: 'Time in seconds' },
          { value: 'angle', label: 'Angle and frame rate' },
        ]}
        onCommit={(kind) => setShutter(convertShutter(shutter, kind))}
      />
      {shutter.kind === 'time' ? (
        <NumberInput
          label="Shutter time"
          value={shutter.seconds}
          unit="s"
          min={0}
          minExclusive
          max={60}
          allowFraction
          format={formatShutterSeconds}
          hint="A fraction such as 1/50 is fine."
          onCommit={(seconds) => setShutter({ kind: 'time', seconds })}
        />
      ) : (
        <div className="panel-pair">
          <NumberInput
            label="Shutter angle"
            value={shutter.angleDeg}
            unit="°"
            min={0}
            minExclusive
            max={360}
            decimals={1}
            onCommit={(angleDeg) => setShutter({ ...shutter, angleDeg })}
          />
          <NumberInput
            label="Frame rate"
            value={shutter.framesPerSecond}
            unit="fps"
            min={0}
            minExclusive
            max={1000}
            decimals={3}
            onCommit={(framesPerSecond) => setShutter({ ...shutter, framesPerSecond })}
          />
        </div>
      )}
      <NumberInput
        label="f-number"
        value={camera.fNumber}
        min={0.5}
        max={128}
        decimals={1}
        onCommit={(fNumber) => onChange({ ...camera, fNumber })}
      />
      <NumberInput
        label="Meter constant"
        value={camera.meterConstant}
        min={100}
        max={1000}
        decimals={0}
        hint="250 for a flat receptor, 330 for a dome."
        onCommit={(meterConstant) => onChange({ ...camera, meterConstant })}
      />
    </>
  );
}
