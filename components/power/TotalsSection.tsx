'use client';

import { PanelSection } from '@/components/panels/PanelSection';
import type { SupplyLoad } from '@/lib/analysis';
import { formatA, formatPct, formatW } from './format';
import { LoadBadge } from './LoadBadge';

/** Totals per phase and per feeder, the neutral current and the phase imbalance. */
export function TotalsSection({ load }: { load: SupplyLoad }) {
  const three = load.system === 'three';
  return (
    <PanelSection title="Totals">
      <table className="power-table" data-testid="power-phases">
        <thead>
          <tr>
            <th scope="col">Phase</th>
            <th scope="col">Load</th>
            <th scope="col">Current</th>
          </tr>
        </thead>
        <tbody>
          {load.phases.map((phase) => (
            <tr key={phase.phase} data-phase={phase.phase} data-current-a={String(phase.currentA)}>
              <th scope="row">{phase.phase}</th>
              <td>{formatW(phase.powerW)}</td>
              <td>{formatA(phase.currentA)}</td>
            </tr>
          ))}
          <tr data-phase="N" data-current-a={String(load.neutralCurrentA)}>
            <th scope="row">Neutral</th>
            <td />
            <td>{formatA(load.neutralCurrentA)}</td>
          </tr>
        </tbody>
      </table>
      <p className="panel-note" data-readout="totalPower" data-value={String(load.totalPowerW)}>
        Listed circuits {formatW(load.totalPowerW)} at full (about {formatW(load.totalAtLevelW)} at the
        current levels, a rough figure); every unit together {formatW(load.allUnitsPowerW)}.
        {three
          ? ` Neutral current is the phasor sum of the phase currents for loads at unity power factor; with real LED and discharge sources it can be higher.`
          : ' On a single phase the neutral carries the phase current.'}
      </p>
      {three ? (
        <p className="panel-note" data-readout="imbalance" data-value={String(load.imbalancePct ?? '')}>
          Phase imbalance {formatPct(load.imbalancePct)}: the largest difference of a phase current from the
          mean of the three, as a share of the mean (a NEMA-style definition).
        </p>
      ) : null}
      {load.feeders.map((line) => (
        <div key={line.id} className="power-feeder-load" data-feeder={line.id} data-flag={line.flag}>
          <h4>
            {line.name} <span className="panel-note">({line.ratingA} A per phase)</span>
          </h4>
          <table className="power-table">
            <tbody>
              {line.phases.map((phase) => (
                <tr key={phase.phase} data-phase={phase.phase} data-current-a={String(phase.currentA)}>
                  <th scope="row">{phase.phase}</th>
                  <td>{formatA(phase.currentA)}</td>
                  <td>{formatPct(phase.ratingPct)}</td>
                  <td>
                    <LoadBadge flag={phase.flag} limitPct={load.continuousLimitPct} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="panel-note">Neutral {formatA(line.neutralCurrentA)}</p>
        </div>
      ))}
    </PanelSection>
  );
}
