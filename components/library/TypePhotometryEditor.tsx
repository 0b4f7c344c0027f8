'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';
import { useEditor } from '@/components/editor/EditorContext';
import {
  type BeamPhotometry,
  type FixtureType,
  type MeasuredPhotometry,
  updateFixtureType,
} from '@/lib/plot';
import { assertNever } from '@/lib/numeric';
import { beamSolidAngleSr } from '@/lib/photometry';
import { ExportOriginalFile } from './ExportOriginalFile';
import { MeasuredFigures } from './MeasuredFigures';
import { OutputFields } from './OutputFields';
import { SoftFields } from './SoftPhotometryFields';
import { type Commit } from './photometryFields';

type Spread = BeamPhotometry['spread'];

/** What the schema's and the type rules' field names are called on screen. */
const FIELD_LABELS: Record<string, string> = {
  beamAngleDeg: 'Beam angle',
  fieldAngleDeg: 'Field angle',
  beamAngleXDeg: 'Beam angle X',
  fieldAngleXDeg: 'Field angle X',
  beamAngleYDeg: 'Beam angle Y',
  fieldAngleYDeg: 'Field angle Y',
  rotationDeg: 'Rotation',
  peakCd: 'Peak intensity',
  lumens: 'Output',
  cdPerM2: 'Luminance',
  minBeamDeg: 'Narrowest beam',
  maxBeamDeg: 'Widest beam',
  fieldPerBeam: 'Field/beam ratio',
  lensOptionsDeg: 'Lens options',
  radiusM: 'Radius',
  widthM: 'Width',
  heightM: 'Height',
};

/**
 * A refusal from updateFixtureType in the words of the form: `fixture type type-3.photometry.spread.
 * fieldAngleDeg: must be wider than the beam angle` becomes `Field angle must be wider than the beam
 * angle.` Lines without a path are kept as they are.
 */
export function fieldMessage(message: string): string {
  return message
    .split('\n')
    .map((line) => {
      const match = /^fixture type [^.\s]+\.([\w.[\]]+): (.*)$/.exec(line);
      if (!match) return line;
      const lens = /lensOptionsDeg\[(\d+)\]$/.exec(match[1]);
      const key =
        match[1]
          .replace(/\[\d+\]/g, '')
          .split('.')
          .at(-1) ?? '';
      const label = lens ? `Lens ${Number(lens[1]) + 1}` : (FIELD_LABELS[key] ?? match[1]);
      const text = match[2].replace(/\b(minBeamDeg|maxBeamDeg)\b/g, (name) =>
        FIELD_LABELS[name].toLowerCase(),
      );
      return `${label} ${text}${text.endsWith('.') ? '' : '.'}`;
    })
    .join(' ');
}

/** Lens options as typed: angles separated by commas or spaces, "°" allowed; a message when one is not a number. */
export function parseLensOptions(text: string): number[] | string {
  const parts = text
    .split(/[,;\s]+/)
    .map((part) => part.replace(/°$/, ''))
    .filter((part) => part !== '');
  const values: number[] = [];
  for (const part of parts) {
    const value = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/.test(part) ? Number(part) : Number.NaN;
    if (!Number.isFinite(value)) {
      return `"${part}" is not an angle: list beam angles in degrees, e.g. 19, 26, 36.`;
    }
    values.push(value);
  }
  return values;
}

const ANGLE = { unit: '°', min: 0, max: 180, minExclusive: true, decimals: 2 } as const;

/** The photometry of a show type, editable for beam and soft types, read-only for measured ones. */
export function TypePhotometryEditor({ type }: { type: FixtureType }) {
  const { run } = useEditor();
  const photometry = type.photometry;
  const commit = (next: FixtureType['photometry']): CommitOutcome => {
    const result = run(updateFixtureType, { id: type.id, changes: { photometry: next } });
    return result.ok ? null : fieldMessage(result.message);
  };
  switch (photometry.kind) {
    case 'beam':
      return <BeamFields photometry={photometry} commit={commit} />;
    case 'soft':
      return <SoftFields photometry={photometry} commit={commit} />;
    case 'measured':
      return <MeasuredFields photometry={photometry} />;
    default:
      return assertNever(photometry);
  }
}

function BeamFields({ photometry, commit }: { photometry: BeamPhotometry; commit: Commit<BeamPhotometry> }) {
  const { spread, output, zoom } = photometry;
  const withSpread = (changes: Partial<Record<string, number>>) =>
    commit({ ...photometry, spread: { ...spread, ...changes } as Spread });
  const nominalBeam = spread.kind === 'round' ? spread.beamAngleDeg : spread.beamAngleXDeg;
  const nominalField = spread.kind === 'round' ? spread.fieldAngleDeg : spread.fieldAngleXDeg;
  return (
    <fieldset className="type-photometry" data-photometry="beam">
      <legend>Beam</legend>
      <SelectInput
        label="Beam shape"
        value={spread.kind}
        options={[
          { value: 'round', label: 'Round' },
          { value: 'oval', label: 'Oval (two axes)' },
        ]}
        hint="Round to oval starts with both axes equal; oval to round keeps the X axis."
        onCommit={(kind) => {
          if (kind === spread.kind) return null;
          const next: Spread =
            kind === 'oval'
              ? {
                  kind: 'oval',
                  beamAngleXDeg: nominalBeam,
                  fieldAngleXDeg: nominalField,
                  beamAngleYDeg: nominalBeam,
                  fieldAngleYDeg: nominalField,
                  rotationDeg: 0,
                }
              : { kind: 'round', beamAngleDeg: nominalBeam, fieldAngleDeg: nominalField };
          return commit({ ...photometry, spread: next });
        }}
      />
      {spread.kind === 'round' ? (
        <div className="panel-pair">
          <NumberInput
            label="Beam angle"
            {...ANGLE}
            value={spread.beamAngleDeg}
            hint="To 50 % of the peak."
            onCommit={(beamAngleDeg) => withSpread({ beamAngleDeg })}
          />
          <NumberInput
            label="Field angle"
            {...ANGLE}
            value={spread.fieldAngleDeg}
            hint="To 10 % of the peak."
            onCommit={(fieldAngleDeg) => withSpread({ fieldAngleDeg })}
          />
        </div>
      ) : (
        <>
          <div className="panel-pair">
            <NumberInput
              label="Beam angle X"
              {...ANGLE}
              value={spread.beamAngleXDeg}
              onCommit={(beamAngleXDeg) => withSpread({ beamAngleXDeg })}
            />
            <NumberInput
              label="Field angle X"
              {...ANGLE}
              value={spread.fieldAngleXDeg}
              onCommit={(fieldAngleXDeg) => withSpread({ fieldAngleXDeg })}
            />
          </div>
          <div className="panel-pair">
            <NumberInput
              label="Beam angle Y"
              {...ANGLE}
              value={spread.beamAngleYDeg}
              onCommit={(beamAngleYDeg) => withSpread({ beamAngleYDeg })}
            />
            <NumberInput
              label="Field angle Y"
              {...ANGLE}
              value={spread.fieldAngleYDeg}
              onCommit={(fieldAngleYDeg) => withSpread({ fieldAngleYDeg })}
            />
          </div>
          <NumberInput
            label="Rotation"
            unit="°"
            min={-180}
            max={180}
            decimals={1}
            value={spread.rotationDeg}
            hint="Of the X axis, counter-clockwise."
            onCommit={(rotationDeg) => withSpread({ rotationDeg })}
          />
        </>
      )}

      <OutputFields<'peak' | 'lumens'>
        options={[
          {
            kind: 'peak',
            choiceLabel: 'Peak intensity (cd)',
            fieldLabel: 'Peak intensity',
            unit: 'cd',
            max: 1e8,
            hint: 'At full, at the nominal spread.',
          },
          {
            kind: 'lumens',
            choiceLabel: 'Lumens (lm)',
            fieldLabel: 'Output',
            unit: 'lm',
            max: 1e7,
            hint: 'Total at full; kept across the zoom.',
          },
        ]}
        kind={output.kind}
        value={output.kind === 'peak' ? output.peakCd : output.lumens}
        switchHint="Switching converts through the beam's solid angle, so the light stays the same."
        onSwitch={() => {
          const solidAngleSr = beamSolidAngleSr(spread);
          return commit({
            ...photometry,
            output:
              output.kind === 'peak'
                ? { kind: 'lumens', lumens: output.peakCd * solidAngleSr }
                : { kind: 'peak', peakCd: output.lumens / solidAngleSr },
          });
        }}
        onValue={(value) =>
          commit({
            ...photometry,
            output:
              output.kind === 'peak' ? { kind: 'peak', peakCd: value } : { kind: 'lumens', lumens: value },
          })
        }
      />

      <SelectInput
        label="Zoom"
        value={zoom ? 'zoom' : 'none'}
        options={[
          { value: 'none', label: 'None (fixed angle)' },
          { value: 'zoom', label: 'Zoom range' },
        ]}
        hint="A new range starts at the nominal beam; then set its narrowest and widest beam."
        onCommit={(kind) => {
          if ((kind === 'zoom') === (zoom !== null)) return null;
          return commit({
            ...photometry,
            zoom:
              kind === 'zoom'
                ? {
                    minBeamDeg: nominalBeam,
                    maxBeamDeg: nominalBeam,
                    fieldPerBeam: nominalField / nominalBeam,
                  }
                : null,
          });
        }}
      />
      {zoom ? (
        <>
          <div className="panel-pair">
            <NumberInput
              label="Narrowest beam"
              {...ANGLE}
              value={zoom.minBeamDeg}
              onCommit={(minBeamDeg) => commit({ ...photometry, zoom: { ...zoom, minBeamDeg } })}
            />
            <NumberInput
              label="Widest beam"
              {...ANGLE}
              value={zoom.maxBeamDeg}
              onCommit={(maxBeamDeg) => commit({ ...photometry, zoom: { ...zoom, maxBeamDeg } })}
            />
          </div>
          <NumberInput
            label="Field/beam ratio"
            min={1}
            max={10}
            minExclusive
            decimals={3}
            value={zoom.fieldPerBeam}
            hint="Field angle over beam angle across the zoom (typically 1.3–1.8)."
            onCommit={(fieldPerBeam) => commit({ ...photometry, zoom: { ...zoom, fieldPerBeam } })}
          />
        </>
      ) : null}

      <TextInput
        label="Lens options"
        value={photometry.lensOptionsDeg.map((angle) => `${angle}°`).join(', ')}
        placeholder="e.g. 19, 26, 36, 50"
        hint="Beam angles of interchangeable lens tubes, for the lens picker; empty for none."
        onCommit={(text) => {
          const lensOptionsDeg = parseLensOptions(text);
          return typeof lensOptionsDeg === 'string'
            ? lensOptionsDeg
            : commit({ ...photometry, lensOptionsDeg });
        }}
      />
    </fieldset>
  );
}

function MeasuredFields({ photometry }: { photometry: MeasuredPhotometry }) {
  return (
    <fieldset className="type-photometry" data-photometry="measured">
      <legend>Measured photometry</legend>
      <p className="panel-note">
        From {photometry.file.fileName}. Its figures come from the candela grid and cannot be edited here;
        import a new file to change them.
      </p>
      <MeasuredFigures grid={photometry.grid} />
      <ExportOriginalFile file={photometry.file} />
    </fieldset>
  );
}
