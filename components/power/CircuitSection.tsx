'use client';

import { type FormEvent, useState } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { PanelSection } from '@/components/panels/PanelSection';
import type { SupplyLoad } from '@/lib/analysis';
import { type Phase, PHASES, addCircuit } from '@/lib/plot';
import { CircuitRow } from './CircuitRow';
import { defaultCircuitRatingA, formatA, formatW } from './format';

/** The least loaded phase of the supply, for a new circuit. */
function quietestPhase(load: SupplyLoad): Phase {
  const sorted = [...load.phases].sort((a, b) => a.powerW - b.powerW);
  return sorted[0]?.phase ?? 'L1';
}

/** Circuits with their loads; addresses on units that are not listed; adding a circuit. */
export function CircuitSection({ load }: { load: SupplyLoad }) {
  const { document, run } = useEditor();
  const [address, setAddress] = useState('');
  const [ratingText, setRatingText] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const power = document.power;
  const defaultRating = defaultCircuitRatingA(power.phaseVoltageV);
  const add = (circuitAddress: string, ratingA: number) => {
    const result = run(addCircuit, {
      address: circuitAddress,
      ratingA,
      feederId: power.feeders.length === 1 ? power.feeders[0].id : null,
      phase: quietestPhase(load),
    });
    setProblem(result.ok ? null : result.message);
    return result.ok;
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const rating = ratingText.trim() === '' ? defaultRating : Number(ratingText);
    if (!Number.isFinite(rating)) {
      setProblem('Rating: must be a number of amps');
      return;
    }
    if (add(address.trim(), rating)) {
      setAddress('');
      setRatingText('');
    }
  };
  return (
    <PanelSection title={`Circuits (${power.circuits.length})`}>
      {load.circuits.length === 0 ? (
        <p className="panel-note">
          No circuits listed yet. List each circuit or dimmer with its rating below.
        </p>
      ) : (
        <ul className="power-circuits" data-testid="power-circuits">
          {load.circuits.map((entry) => (
            <CircuitRow key={entry.address} load={entry} limitPct={load.continuousLimitPct} />
          ))}
        </ul>
      )}
      {load.unlisted.length > 0 ? (
        <div className="panel-warning" data-testid="power-unlisted">
          <p>Addresses on units that are not listed here (no rating known, so not checked):</p>
          <ul className="power-unlisted">
            {load.unlisted.map((entry) => (
              <li key={entry.address}>
                {entry.address}: {entry.unitIds.length} unit{entry.unitIds.length === 1 ? '' : 's'},{' '}
                {formatW(entry.powerW)}, {formatA(entry.currentA)}{' '}
                <button
                  type="button"
                  className="panel-button"
                  onClick={() => add(entry.address, defaultRating)}
                >
                  List {entry.address} at {defaultRating} A
                </button>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {load.noCircuitUnitIds.length > 0 ? (
        <p className="panel-note" data-readout="noCircuit">
          {load.noCircuitUnitIds.length} unit{load.noCircuitUnitIds.length === 1 ? ' has' : 's have'} no
          circuit given: {load.noCircuitUnitIds.length === 1 ? 'its' : 'their'} load is not counted.
        </p>
      ) : null}
      <form className="power-add" onSubmit={submit} aria-label="Add a circuit">
        <label className="power-add-field">
          <span>New circuit address</span>
          <input
            className="field-input"
            value={address}
            maxLength={32}
            onChange={(event) => setAddress(event.target.value)}
          />
        </label>
        <label className="power-add-field power-add-rating">
          <span>Rating A</span>
          <input
            className="field-input field-input-number"
            inputMode="decimal"
            placeholder={String(defaultRating)}
            value={ratingText}
            onChange={(event) => setRatingText(event.target.value)}
          />
        </label>
        <button type="submit" className="panel-button">
          Add circuit
        </button>
      </form>
      {problem ? (
        <p className="panel-problem" role="alert">
          {problem}
        </p>
      ) : null}
      <p className="panel-note">
        A new circuit goes on the least loaded phase{power.feeders.length === 1 ? ' of the only feeder' : ''};
        open it to change that. Phases{' '}
        {power.system === 'three' ? PHASES.join(', ') : 'L1 only (single phase)'}.
      </p>
    </PanelSection>
  );
}
