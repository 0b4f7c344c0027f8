'use client';

import { useState } from 'react';
import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import { useEditor } from '@/components/editor/EditorContext';
import { outcomeOf } from '@/components/panels/format';
import { fixtureLabeller } from '@/components/panels/labels';
import type { CircuitLoad } from '@/lib/analysis';
import { type Circuit, PHASES, deleteCircuit, updateCircuit } from '@/lib/plot';
import { formatA, formatPct, formatW } from './format';
import { LoadBadge, RatingBar } from './LoadBadge';

/** One listed circuit: its load against its rating, and (opened) its fields and units. */
export function CircuitRow({ load, limitPct }: { load: CircuitLoad; limitPct: number }) {
  const { document, run, select } = useEditor();
  const [open, setOpen] = useState(false);
  const edit = (changes: Partial<Circuit>) =>
    outcomeOf(run(updateCircuit, { address: load.address, changes }));
  const feeder = document.power.feeders.find((line) => line.id === load.feederId);
  const label = fixtureLabeller(document);
  const byId = new Map(document.fixtures.map((unit) => [unit.id, unit]));
  return (
    <li
      className={`power-circuit power-circuit--${load.flag}`}
      data-circuit={load.address}
      data-current-a={String(load.currentA)}
      data-power-w={String(load.powerW)}
      data-flag={load.flag}
    >
      <div className="power-circuit-head">
        <strong className="power-circuit-address">{load.address}</strong>
        <span className="power-circuit-where">
          {load.phase}
          {feeder ? ` · ${feeder.name}` : ''}
        </span>
        <LoadBadge flag={load.flag} limitPct={limitPct} />
      </div>
      <div className="power-circuit-figures">
        {formatW(load.powerW)} · {formatA(load.currentA)} of {load.ratingA} A · {formatPct(load.ratingPct)} ·{' '}
        {load.unitIds.length} unit{load.unitIds.length === 1 ? '' : 's'}
      </div>
      <RatingBar pct={load.ratingPct} limitPct={limitPct} flag={load.flag} />
      <button
        type="button"
        className="power-circuit-toggle"
        aria-expanded={open}
        onClick={() => setOpen((value) => !value)}
      >
        {open ? 'Close' : 'Edit'} circuit {load.address}
      </button>
      {open ? (
        <div className="power-circuit-edit">
          <p className="panel-note" data-readout="atLevel" data-value={String(load.atLevelW)}>
            At the units&apos; current levels about {formatW(load.atLevelW)} (a rough figure: nameplate ×
            level; the check above uses full load).
          </p>
          <div className="panel-pair">
            <TextInput
              label="Address"
              value={load.address}
              hint="Renaming it renames it on its units."
              onCommit={(address) => edit({ address })}
            />
            <NumberInput
              label="Rating"
              value={load.ratingA}
              unit="A"
              min={0}
              minExclusive
              max={10000}
              decimals={1}
              onCommit={(ratingA) => edit({ ratingA })}
            />
          </div>
          <div className="panel-pair">
            <SelectInput
              label="Phase"
              value={load.phase}
              options={(document.power.system === 'three' ? PHASES : (['L1'] as const)).map((phase) => ({
                value: phase,
                label: phase,
              }))}
              onCommit={(phase) => edit({ phase })}
            />
            <SelectInput
              label="Feeder"
              value={load.feederId ?? ''}
              options={[
                { value: '', label: 'None given' },
                ...document.power.feeders.map((line) => ({ value: line.id, label: line.name })),
              ]}
              onCommit={(feederId) => edit({ feederId: feederId === '' ? null : feederId })}
            />
          </div>
          {load.unitIds.length > 0 ? (
            <ul className="panel-links" aria-label={`Units on ${load.address}`}>
              {load.unitIds.map((id) => {
                const unit = byId.get(id);
                return unit ? (
                  <li key={id}>
                    <button type="button" className="panel-link" onClick={() => select([id])}>
                      {label(unit)}
                    </button>
                  </li>
                ) : null;
              })}
            </ul>
          ) : (
            <p className="panel-note">
              No units are on it yet: write {load.address} in a unit&apos;s Circuit field.
            </p>
          )}
          <button
            type="button"
            className="panel-button panel-button-danger"
            onClick={() => run(deleteCircuit, { address: load.address })}
          >
            Delete circuit {load.address}
          </button>
        </div>
      ) : null}
    </li>
  );
}
