'use client';

import { LengthInput } from '@/components/inputs/LengthInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import type { SoftPhotometry } from '@/lib/plot';
import { useEditor } from '@/components/editor/EditorContext';
import { OutputFields } from './OutputFields';
import { type Commit, softAreaM2 } from './photometryFields';

type SoftShape = SoftPhotometry['shape'];

/** A soft type's face (disc or rectangle, its size) and its output (luminance or lumens). */
export function SoftFields({
  photometry,
  commit,
}: {
  photometry: SoftPhotometry;
  commit: Commit<SoftPhotometry>;
}) {
  const { document } = useEditor();
  const units = document.displayUnits;
  const { shape, output } = photometry;
  return (
    <fieldset className="type-photometry" data-photometry="soft">
      <legend>Soft source</legend>
      <SelectInput
        label="Shape"
        value={shape.kind}
        options={[
          { value: 'disc', label: 'Disc' },
          { value: 'rectangle', label: 'Rectangle' },
        ]}
        hint="Switching keeps the emitting area (a disc becomes a square)."
        onCommit={(kind) => {
          if (kind === shape.kind) return null;
          const areaM2 = softAreaM2(shape);
          const next: SoftShape =
            kind === 'disc'
              ? { kind: 'disc', radiusM: Math.sqrt(areaM2 / Math.PI) }
              : { kind: 'rectangle', widthM: Math.sqrt(areaM2), heightM: Math.sqrt(areaM2) };
          return commit({ ...photometry, shape: next });
        }}
      />
      {shape.kind === 'disc' ? (
        <LengthInput
          label="Diameter"
          valueM={shape.radiusM * 2}
          units={units}
          onCommit={(diameterM) => commit({ ...photometry, shape: { kind: 'disc', radiusM: diameterM / 2 } })}
        />
      ) : (
        <div className="panel-pair">
          <LengthInput
            label="Width"
            valueM={shape.widthM}
            units={units}
            onCommit={(widthM) => commit({ ...photometry, shape: { ...shape, widthM } })}
          />
          <LengthInput
            label="Height"
            valueM={shape.heightM}
            units={units}
            onCommit={(heightM) => commit({ ...photometry, shape: { ...shape, heightM } })}
          />
        </div>
      )}
      <OutputFields<'luminance' | 'lumens'>
        options={[
          {
            kind: 'luminance',
            choiceLabel: 'Luminance (cd/m²)',
            fieldLabel: 'Luminance',
            unit: 'cd/m²',
            max: 1e9,
            hint: 'Of the face at full.',
          },
          {
            kind: 'lumens',
            choiceLabel: 'Lumens (lm)',
            fieldLabel: 'Output',
            unit: 'lm',
            max: 1e7,
            hint: 'Total at full, from the face.',
          },
        ]}
        kind={output.kind}
        value={output.kind === 'luminance' ? output.cdPerM2 : output.lumens}
        switchHint="Switching converts by Φ = π·L·A, so the light stays the same."
        onSwitch={() => {
          const areaM2 = softAreaM2(shape);
          return commit({
            ...photometry,
            output:
              output.kind === 'luminance'
                ? { kind: 'lumens', lumens: Math.PI * output.cdPerM2 * areaM2 }
                : { kind: 'luminance', cdPerM2: output.lumens / (Math.PI * areaM2) },
          });
        }}
        onValue={(value) =>
          commit({
            ...photometry,
            output:
              output.kind === 'luminance'
                ? { kind: 'luminance', cdPerM2: value }
                : { kind: 'lumens', lumens: value },
          })
        }
      />
    </fieldset>
  );
}
