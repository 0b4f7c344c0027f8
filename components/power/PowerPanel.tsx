'use client';

import { useMemo } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { PanelSection } from '@/components/panels/PanelSection';
import { POWER_CAUTION, powerCheck, weightCheck } from '@/lib/plot';
import { CircuitSection } from './CircuitSection';
import { formatA } from './format';
import { SupplySection } from './SupplySection';
import { TotalsSection } from './TotalsSection';
import { WeightSection } from './WeightSection';
import '@/components/panels/panels.css';
import './power.css';

/** The Power tab: the supply, circuits and their loads, totals, and weight on the positions. */
export function PowerPanel() {
  const { document } = useEditor();
  const load = useMemo(() => powerCheck(document), [document]);
  const weights = useMemo(() => weightCheck(document), [document]);
  const overRating = load.circuits.filter((entry) => entry.flag === 'over-rating');
  const overLimit = load.circuits.filter((entry) => entry.flag === 'over-limit');
  const feedersOver = load.feeders.filter((line) => line.flag !== 'ok');
  const positionsOver = weights.filter(
    (position) => position.flag === 'over-rating' || position.flag === 'bunched',
  );
  const problems = [
    ...overRating.map(
      (entry) => `${entry.address} is over its rating: ${formatA(entry.currentA)} of ${entry.ratingA} A`,
    ),
    ...overLimit.map(
      (entry) =>
        `${entry.address} is over the ${load.continuousLimitPct} % continuous limit: ${formatA(entry.currentA)} of ${entry.ratingA} A`,
    ),
    ...feedersOver.map(
      (line) =>
        `Feeder ${line.name} is ${line.flag === 'over-rating' ? 'over its rating' : 'over the continuous limit'} on a phase`,
    ),
    ...(load.unlisted.length > 0
      ? [
          load.unlisted.length === 1
            ? '1 address on units is not listed'
            : `${load.unlisted.length} addresses on units are not listed`,
        ]
      : []),
    ...positionsOver.map(
      (position) =>
        `${position.name}: ${position.flag === 'bunched' ? 'too much weight in one place' : 'over its rated load'}`,
    ),
  ];
  return (
    <div className="panel power-panel" data-testid="power-panel">
      <h2 className="panel-title">Power and weight</h2>
      <p className="panel-caution" role="note">
        {POWER_CAUTION}
      </p>
      <div
        className={problems.length > 0 ? 'panel-warning power-summary' : 'panel-note power-summary'}
        role="status"
        data-testid="power-summary"
      >
        {problems.length === 0 ? (
          <p>Nothing over a rating or limit at full load.</p>
        ) : (
          <ul>
            {problems.map((text) => (
              <li key={text}>{text}</li>
            ))}
          </ul>
        )}
      </div>
      <CircuitSection load={load} />
      <TotalsSection load={load} />
      <SupplySection lineVoltageV={load.lineVoltageV} />
      <WeightSection weights={weights} />
      <PanelSection title="How loads are taken">
        <p className="panel-note">
          Every unit is taken at its type&apos;s full nameplate power (the usual planning practice), on the
          circuit written on it. Current is I = P / V at the phase-to-neutral voltage, i.e. unity power
          factor. A circuit is flagged over the continuous limit above {load.continuousLimitPct} % of its
          rating, and over its rating above 100 %; exactly at either is within it.
          {load.unknownPowerUnitIds.length > 0
            ? load.unknownPowerUnitIds.length === 1
              ? ' 1 unit has no known power and counts as 0 W.'
              : ` ${load.unknownPowerUnitIds.length} units have no known power and count as 0 W.`
            : ''}
        </p>
      </PanelSection>
    </div>
  );
}
