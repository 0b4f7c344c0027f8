'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { PanelSection } from '@/components/panels/PanelSection';
import { outcomeOf } from '@/components/panels/format';
import { addFeeder, deleteFeeder, updateFeeder, updateSupply } from '@/lib/plot';

/**
 * The supply (single or three phase, voltage, continuous limit) and its feeders. `lineVoltageV` is the
 * load check's line-to-line voltage (null on a single phase).
 */
export function SupplySection({ lineVoltageV }: { lineVoltageV: number | null }) {
  const { document, run } = useEditor();
  const power = document.power;
  return (
    <>
      <PanelSection title="Supply">
        <SelectInput
          label="System"
          value={power.system}
          options={[
            { value: 'single', label: 'Single phase' },
            { value: 'three', label: 'Three phase with neutral (star)' },
          ]}
          onCommit={(system) => outcomeOf(run(updateSupply, { system }))}
        />
        <div className="panel-pair">
          <NumberInput
            label="Phase to neutral"
            value={power.phaseVoltageV}
            unit="V"
            min={50}
            max={1000}
            decimals={1}
            onCommit={(phaseVoltageV) => outcomeOf(run(updateSupply, { phaseVoltageV }))}
          />
          <NumberInput
            label="Continuous limit"
            value={power.continuousLimitPct}
            unit="%"
            min={0}
            minExclusive
            max={100}
            decimals={1}
            hint="Of a rating; 80 % is common practice."
            onCommit={(continuousLimitPct) => outcomeOf(run(updateSupply, { continuousLimitPct }))}
          />
        </div>
        {lineVoltageV !== null ? (
          <p className="panel-note" data-readout="lineVoltage">
            Line to line: √3 × {power.phaseVoltageV} V = {lineVoltageV.toFixed(0)} V.
          </p>
        ) : null}
      </PanelSection>
      <PanelSection title={`Feeders (${power.feeders.length})`}>
        <p className="panel-note">
          A feeder is a supply run, distribution box or dimmer rack input; its rating is per phase.
        </p>
        {power.feeders.map((line) => (
          <div key={line.id} className="power-feeder" data-feeder={line.id}>
            <div className="panel-pair">
              <TextInput
                label="Feeder name"
                value={line.name}
                onCommit={(name) => outcomeOf(run(updateFeeder, { id: line.id, changes: { name } }))}
              />
              <NumberInput
                label="Rating per phase"
                value={line.ratingA}
                unit="A"
                min={0}
                minExclusive
                max={10000}
                decimals={1}
                onCommit={(ratingA) => outcomeOf(run(updateFeeder, { id: line.id, changes: { ratingA } }))}
              />
            </div>
            <button
              type="button"
              className="panel-button panel-button-danger"
              onClick={() => run(deleteFeeder, { id: line.id })}
            >
              Delete feeder {line.name}
            </button>
          </div>
        ))}
        <button
          type="button"
          className="panel-button"
          onClick={() => run(addFeeder, { name: `Feeder ${power.feeders.length + 1}`, ratingA: 32 })}
        >
          Add feeder
        </button>
      </PanelSection>
    </>
  );
}
