/** Words for the balance panel: why a target is missed and what would reach it, in the show's units. */
import type { BalanceTarget, UnitAdvice } from '@/lib/analysis';
import { formatIlluminance, formatLength } from '@/lib/units';

type Units = 'metric' | 'imperial';

const ROLE_LIGHT = { key: 'key light', fill: 'fill light', back: 'back light' } as const;

export function stopsText(value: number | null): string {
  if (value === null) return '—';
  const shown = Math.abs(value) < 0.005 ? 0 : value; // no "−0.00"
  return `${shown >= 0 ? '+' : ''}${shown.toFixed(2)} stops`;
}

/** "Host: key light 180 lx of 250 lx (−0.47 stops): …why". */
export function missText(target: BalanceTarget, subjectName: string, units: Units): string {
  const head = `${subjectName}: ${ROLE_LIGHT[target.role]} ${formatIlluminance(target.resultLx, units)} of ${formatIlluminance(
    target.targetLx,
    units,
  )} wanted (${target.offStops === null ? 'no light' : stopsText(target.offStops)})`;
  const reason = target.reason;
  if (!reason) return head;
  switch (reason.kind) {
    case 'noUnitInRole':
      return `${head}. No unit gives ${ROLE_LIGHT[target.role]} here: choose a unit's role in the subject panel.`;
    case 'noneMayChange':
      return `${head}. None of its ${target.role} units may change: tick one under “Units that may change”.`;
    case 'atFull':
      return `${head}. The ${target.role} units that may change are at 100 %.`;
    case 'fixedTooBright':
      return `${head}. The ${target.role} units that may not change give ${formatIlluminance(reason.fixedLx, units)} alone: let them change.`;
    case 'sharedUnits':
      return `${head}. The same units light the other chosen subjects too; no levels suit all of them at once.`;
  }
}

/** Said once above the advice: what the throw and beam figures assume. */
export const ADVICE_ESTIMATE_NOTE =
  'Throw and beam figures are on-axis estimates: they hold if the face stays at the beam centre. ' +
  'Light falls with the square of the throw; a narrower beam of the same lumens has a higher peak but ' +
  'gives a smaller pool, so check the subject stays inside it.';

/** Said once above the advice: a unit moved closer must stay far enough from people and scenery. */
export const ADVICE_CLOSER_CAUTION =
  'Before moving a unit closer, check the maker’s minimum distance to people and to scenery: the unit ' +
  'runs hot, and the nearer it is, the more its beam heats what it hits. Keep at least that distance, ' +
  'whatever the light needs.';

/**
 * "Host key stand #1 at 100 % gives 364 lx; to give 520 lx move it to a throw of 2.98 m (now 3.56 m),
 * or use a 16.7° instead of a 20.0° beam (field 25.1°; a smaller pool)." On-axis estimates (see
 * ADVICE_ESTIMATE_NOTE).
 */
export function adviceText(advice: UnitAdvice, unitName: string, units: Units): string {
  const throwPart = `move it to a throw of ${formatLength(advice.throwNeededM, units)} (now ${formatLength(
    advice.throwNowM,
    units,
  )})`;
  const beam = advice.beam;
  const beamPart = beam
    ? `, or use a ${beam.beamNeededDeg.toFixed(1)}° instead of a ${beam.beamNowDeg.toFixed(1)}° beam (field ${beam.fieldNeededDeg.toFixed(1)}°; a smaller pool)`
    : '';
  return `${unitName} at 100 % gives ${formatIlluminance(advice.givesLx, units)}; to give ${formatIlluminance(
    advice.needsLx,
    units,
  )} ${throwPart}${beamPart}.`;
}
