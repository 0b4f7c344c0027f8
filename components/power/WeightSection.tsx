'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { useEditor } from '@/components/editor/EditorContext';
import { PanelSection } from '@/components/panels/PanelSection';
import { formatKg, outcomeOf } from '@/components/panels/format';
import type { PositionWeight } from '@/lib/analysis';
import { WEIGHT_CAUTION, updateRigging } from '@/lib/plot';
import { formatPct } from './format';
import { WeightBadge } from './LoadBadge';
import { BENDING_ONLY_NOTE } from './weightNote';

/** Weight on every hanging position against its rating, the allowance per unit, and the rigging caution. */
export function WeightSection({ weights }: { weights: readonly PositionWeight[] }) {
  const { document, run, select } = useEditor();
  return (
    <PanelSection title="Weight on positions">
      <p className="panel-caution" role="note">
        {WEIGHT_CAUTION}
      </p>
      <NumberInput
        label="Allowance per unit"
        value={document.rigging.allowancePerUnitKg}
        unit="kg"
        min={0}
        max={100}
        decimals={1}
        hint="Clamp, safety cable and its share of cable, added to every unit."
        onCommit={(allowancePerUnitKg) => outcomeOf(run(updateRigging, { allowancePerUnitKg }))}
      />
      {weights.length === 0 ? (
        <p className="panel-note">No hanging positions yet.</p>
      ) : (
        <ul className="power-weights" data-testid="power-weights">
          {weights.map((position) => (
            <li
              key={position.id}
              className="power-weight"
              data-position={position.id}
              data-total-kg={String(position.totalKg)}
              data-flag={position.flag}
            >
              <div className="power-circuit-head">
                <button
                  type="button"
                  className="panel-link power-weight-name"
                  onClick={() => select([position.id])}
                >
                  {position.name}
                </button>
                <WeightBadge flag={position.flag} />
              </div>
              <div className="power-circuit-figures">
                {formatKg(position.totalKg)}
                {position.ratedLoadKg === null
                  ? ' (no rating given)'
                  : ` of ${formatKg(position.ratedLoadKg)} ${position.loadKind === 'uniform' ? 'spread evenly' : 'at one point'} · ${formatPct(position.ratingPct)}`}
                {' · '}
                {position.unitIds.length} unit{position.unitIds.length === 1 ? '' : 's'}
                {position.kgPerM === null ? '' : ` · ${position.kgPerM.toFixed(1)} kg/m`}
              </div>
              {position.peakMomentKgM !== null && position.ratedMomentKgM !== null ? (
                <div className="panel-note">
                  Bending {formatPct((position.peakMomentKgM / position.ratedMomentKgM) * 100)} of the rated
                  load spread evenly
                </div>
              ) : null}
              {position.unknownWeightUnitIds.length > 0 ? (
                <div className="panel-note">
                  {position.unknownWeightUnitIds.length} unit
                  {position.unknownWeightUnitIds.length === 1 ? "'s" : "s'"} weight not known: counted as 0 kg
                  plus the allowance.
                </div>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      <p className="panel-note">
        Totals are the units&apos; own weight plus the allowance per unit. A rating &quot;at one point&quot;
        is for the whole load at one point, and the total is compared with it. A rating &quot;spread
        evenly&quot; assumes the load spread along the run: the total is compared with it, and units bunched
        together are flagged (&quot;Too much in one place&quot;) when, taking the run as one span held at its
        two ends, their largest bending moment is more than that of the rated load spread evenly (W·L/8).
        Exactly at a rating is within it.
      </p>
      <p className="panel-note" data-readout="bendingOnly">
        {BENDING_ONLY_NOTE}
      </p>
    </PanelSection>
  );
}
