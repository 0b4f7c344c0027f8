'use client';

import { useMemo } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { formatKg } from '@/components/panels/format';
import { WEIGHT_CAUTION, weightCheck } from '@/lib/plot';
import { formatPct } from './format';
import { WeightBadge } from './LoadBadge';
import { BENDING_ONLY_NOTE } from './weightNote';

/** The weight check of one position (the same figures as the Power tab), with the rigging caution. */
export function PositionWeightCheck({ id }: { id: string }) {
  const { document } = useEditor();
  const weight = useMemo(() => weightCheck(document).find((entry) => entry.id === id), [document, id]);
  if (!weight) return null;
  const count = weight.unitIds.length;
  const unknown = weight.unknownWeightUnitIds.length;
  const over = weight.flag === 'over-rating' || weight.flag === 'bunched';
  return (
    <>
      <p
        className={over ? 'panel-warning' : 'panel-note'}
        data-readout="hungKg"
        data-value={String(weight.unitsKg)}
        data-total={String(weight.totalKg)}
      >
        Units&apos; own weight {formatKg(weight.unitsKg)} + allowance {count} ×{' '}
        {formatKg(document.rigging.allowancePerUnitKg)} = {formatKg(weight.totalKg)}
        {weight.ratedLoadKg === null
          ? ' (no rating given).'
          : ` of ${formatKg(weight.ratedLoadKg)} rated (${formatPct(weight.ratingPct)}).`}{' '}
        <WeightBadge flag={weight.flag} />
        {unknown > 0
          ? ` ${unknown} unit${unknown === 1 ? "'s" : "s'"} weight is not known (counted as 0 kg plus the allowance).`
          : ''}
      </p>
      {weight.peakMomentKgM !== null && weight.ratedMomentKgM !== null ? (
        <p className="panel-note" data-readout="bending">
          {weight.kgPerM === null ? '' : `${weight.kgPerM.toFixed(1)} kg/m along it. `}A rating spread evenly
          assumes the load spread along the run: taking it as one span held at its ends, the units bend it{' '}
          {formatPct((weight.peakMomentKgM / weight.ratedMomentKgM) * 100)} as much as the rated load spread
          evenly would (W·L/8). {BENDING_ONLY_NOTE}
        </p>
      ) : weight.ratedLoadKg !== null && weight.loadKind === 'point' ? (
        <p className="panel-note">
          A rating at one point is for the whole load at one point: the total is set against it.
        </p>
      ) : null}
      <p className="panel-caution" role="note">
        {WEIGHT_CAUTION}
      </p>
    </>
  );
}
