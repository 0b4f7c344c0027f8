/** The power check and weight check sections of the text report. */
import type { DisplayUnits } from './reportText';
import { type ReportPower, type ReportWeight, loadFlagText, weightFlagText } from './powerReport';

const DASH = '—';
/** 1 lb = 0.45359237 kg exactly (international avoirdupois pound). */
const KG_PER_LB = 0.45359237;

function kg(valueKg: number | null, units: DisplayUnits): string {
  if (valueKg === null || !Number.isFinite(valueKg)) return DASH;
  const metric = `${valueKg.toFixed(1)} kg`;
  return units === 'metric' ? metric : `${metric} (${(valueKg / KG_PER_LB).toFixed(0)} lb)`;
}

function table(rows: string[][]): string[] {
  const widths = rows[0].map((_, column) => Math.max(...rows.map((row) => row[column].length)));
  return rows.map(
    (row) =>
      `  ${row
        .map((cell, column) => cell.padEnd(widths[column]))
        .join('  ')
        .trimEnd()}`,
  );
}

const amps = (value: number) => `${value.toFixed(2)} A`;
const watts = (value: number) => `${value.toFixed(0)} W`;
const pct = (value: number | null) => (value === null ? DASH : `${value.toFixed(0)} %`);

/** POWER CHECK: supply, circuits, feeders per phase, totals, neutral, imbalance, and the caution. */
export function formatPowerText(power: ReportPower): string[] {
  const limit = power.continuousLimitPct;
  const lines = [
    `POWER CHECK (${power.system === 'three' ? 'three phase' : 'single phase'}, ${power.phaseVoltageV} V phase to neutral${
      power.lineVoltageV === null ? '' : `, ${power.lineVoltageV.toFixed(0)} V line to line`
    }; continuous limit ${limit} % of a rating)`,
    `  ${power.caution}`,
  ];
  const feeders = new Map(power.feeders.map((line) => [line.id, line.name]));
  if (power.circuits.length === 0) lines.push('  no circuits listed');
  else
    lines.push(
      ...table([
        ['Circuit', 'Feeder', 'Phase', 'Rating', 'Units', 'Load', 'Current', 'Of rating', 'Flag'],
        ...power.circuits.map((entry) => [
          entry.address,
          entry.feederId === null ? DASH : (feeders.get(entry.feederId) ?? DASH),
          entry.phase,
          `${entry.ratingA} A`,
          String(entry.unitIds.length),
          watts(entry.powerW),
          amps(entry.currentA),
          pct(entry.ratingPct),
          loadFlagText(entry.flag, limit),
        ]),
      ]),
    );
  for (const entry of power.unlisted)
    lines.push(
      `  not listed: ${entry.address} carries ${unitCount(entry.unitIds.length)}, ${watts(entry.powerW)}, ${amps(entry.currentA)}; no rating known`,
    );
  if (power.noCircuitUnitIds.length > 0)
    lines.push(
      `  no circuit given: ${unitCount(power.noCircuitUnitIds.length)} (${power.noCircuitUnitIds.join(', ')})`,
    );
  if (power.unknownPowerUnitIds.length > 0)
    lines.push(`  power not known (counted as 0 W): ${power.unknownPowerUnitIds.join(', ')}`);
  for (const line of power.feeders)
    lines.push(
      `  feeder ${line.name} (${line.ratingA} A per phase): ${line.phases
        .map(
          (phase) =>
            `${phase.phase} ${amps(phase.currentA)} (${pct(phase.ratingPct)}, ${loadFlagText(phase.flag, limit)})`,
        )
        .join('; ')}; neutral ${amps(line.neutralCurrentA)}`,
    );
  lines.push(
    `  per phase: ${power.phases.map((phase) => `${phase.phase} ${watts(phase.powerW)} ${amps(phase.currentA)}`).join('; ')}`,
  );
  lines.push(
    `  listed circuits ${watts(power.totalPowerW)} at full (about ${watts(power.totalAtLevelW)} at the current levels); every unit together ${watts(power.allUnitsPowerW)}; neutral ${amps(power.neutralCurrentA)}${
      power.imbalancePct === null
        ? ''
        : `; phase imbalance ${power.imbalancePct.toFixed(1)} % (largest deviation from the mean phase current / mean)`
    }`,
  );
  return lines;
}

/** WEIGHT CHECK: every position's total against its rating, and the caution. */
export function formatWeightText(weight: ReportWeight, units: DisplayUnits): string[] {
  const lines = [
    `WEIGHT CHECK (units' own weight + ${kg(weight.allowancePerUnitKg, units)} allowance per unit)`,
    `  ${weight.caution}`,
  ];
  if (weight.positions.length === 0) return [...lines, '  no positions'];
  lines.push(
    '  Bending: the largest bending moment of the units on a uniformly rated run, taken as one span supported at its ends, against that of the rated load spread evenly (W·L/8).',
  );
  lines.push(
    ...table([
      ['Position', 'Units', 'Total', 'Rated', 'Rating', 'Of rating', 'Per metre', 'Bending', 'Flag'],
      ...weight.positions.map((position) => [
        position.name,
        String(position.unitIds.length),
        kg(position.totalKg, units),
        kg(position.ratedLoadKg, units),
        position.ratedLoadKg === null
          ? DASH
          : position.loadKind === 'uniform'
            ? 'spread evenly'
            : 'at one point',
        pct(position.ratingPct),
        position.kgPerM === null ? DASH : `${position.kgPerM.toFixed(1)} kg/m`,
        position.peakMomentKgM === null || position.ratedMomentKgM === null
          ? DASH
          : `${pct((position.peakMomentKgM / position.ratedMomentKgM) * 100)} of W·L/8`,
        weightFlagText(position.flag),
      ]),
    ]),
  );
  for (const position of weight.positions.filter((entry) => entry.unknownWeightUnitIds.length > 0))
    lines.push(
      `  ${position.name}: weight not known for ${position.unknownWeightUnitIds.join(', ')} (counted as 0 kg plus the allowance)`,
    );
  return lines;
}

function unitCount(count: number): string {
  return count === 1 ? '1 unit' : `${count} units`;
}
