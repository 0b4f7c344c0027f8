/**
 * The power and weight sections of the report (JSON and text) and the power sheet CSV.
 * JSON names are stable (README lists them); SI units: W, A, V, kg, m.
 */
import type { LoadFlag, PositionWeight, SupplyLoad, WeightFlag } from '../analysis';
import { type CsvColumn, toCsv } from './csv';
import { POWER_CAUTION, WEIGHT_CAUTION, powerCheck, weightCheck } from './powerCheck';
import type { PlotDocument } from './schema/document';

export interface ReportPower extends SupplyLoad {
  readonly caution: string;
  /** How the loads are taken: nameplate power at full, unity power factor. */
  readonly basis: string;
}

export interface ReportWeight {
  readonly caution: string;
  readonly allowancePerUnitKg: number;
  readonly positions: readonly PositionWeight[];
}

export const POWER_BASIS =
  'nameplate power at full for every unit, unity power factor (I = P / V, phase to neutral); over the limit means above limit % of the rating, over rating means above the rating; exactly at either is within it';

export function reportPower(document: PlotDocument): ReportPower {
  return { caution: POWER_CAUTION, basis: POWER_BASIS, ...powerCheck(document) };
}

export function reportWeight(document: PlotDocument): ReportWeight {
  return {
    caution: WEIGHT_CAUTION,
    allowancePerUnitKg: document.rigging.allowancePerUnitKg,
    positions: weightCheck(document),
  };
}

/** Words for a load flag, the same in the panel, the report and the CSV. */
export function loadFlagText(flag: LoadFlag, limitPct: number): string {
  switch (flag) {
    case 'over-rating':
      return 'OVER RATING';
    case 'over-limit':
      return `Over ${Number(limitPct.toFixed(1))} % limit`;
    case 'ok':
      return 'OK';
  }
}

/** Words for a weight flag. */
export function weightFlagText(flag: WeightFlag): string {
  switch (flag) {
    case 'over-rating':
      return 'OVER RATING';
    case 'bunched':
      return 'Too much in one place';
    case 'no-rating':
      return 'No rating given';
    case 'ok':
      return 'OK';
  }
}

interface SheetRow {
  readonly kind: string;
  readonly name: string;
  readonly feeder: string | null;
  readonly phase: string | null;
  readonly ratingA: number | null;
  readonly units: number | null;
  readonly loadW: number | null;
  readonly loadA: number | null;
  readonly ratingPct: number | null;
  readonly flag: string;
}

const round = (value: number | null, places: number) =>
  value === null ? null : Number(value.toFixed(places));

const SHEET_COLUMNS: readonly CsvColumn<SheetRow>[] = [
  { header: 'Row', value: (row) => row.kind },
  { header: 'Circuit or feeder', value: (row) => row.name },
  { header: 'Feeder', value: (row) => row.feeder },
  { header: 'Phase', value: (row) => row.phase },
  { header: 'Rating A', value: (row) => row.ratingA },
  { header: 'Units', value: (row) => row.units },
  { header: 'Load W', value: (row) => round(row.loadW, 0) },
  { header: 'Load A', value: (row) => round(row.loadA, 2) },
  { header: '% of rating', value: (row) => round(row.ratingPct, 1) },
  { header: 'Flag', value: (row) => row.flag },
];

/**
 * The power sheet: one row per listed circuit (Row "circuit"), then addresses on units that are not
 * listed ("not listed"), units with no circuit ("no circuit"), each feeder per phase ("feeder"), the
 * supply per phase ("phase total"), the neutral current ("neutral"), the total ("total") and the caution
 * ("note"). Loads at full (nameplate), W rounded to 1 W, A to 0.01 A, % to 0.1.
 */
export function powerSheetCsv(document: PlotDocument): string {
  const load = powerCheck(document);
  const limit = load.continuousLimitPct;
  const feederNames = new Map(load.feeders.map((line) => [line.id, line.name]));
  const rows: SheetRow[] = [
    ...load.circuits.map((entry) => ({
      kind: 'circuit',
      name: entry.address,
      feeder: entry.feederId === null ? null : (feederNames.get(entry.feederId) ?? null),
      phase: entry.phase,
      ratingA: entry.ratingA,
      units: entry.unitIds.length,
      loadW: entry.powerW,
      loadA: entry.currentA,
      ratingPct: entry.ratingPct,
      flag: loadFlagText(entry.flag, limit),
    })),
    ...load.unlisted.map((entry) => ({
      kind: 'not listed',
      name: entry.address,
      feeder: null,
      phase: null,
      ratingA: null,
      units: entry.unitIds.length,
      loadW: entry.powerW,
      loadA: entry.currentA,
      ratingPct: null,
      flag: 'Not listed: no rating known',
    })),
    ...(load.noCircuitUnitIds.length > 0
      ? [
          {
            kind: 'no circuit',
            name: '',
            feeder: null,
            phase: null,
            ratingA: null,
            units: load.noCircuitUnitIds.length,
            loadW: null,
            loadA: null,
            ratingPct: null,
            flag: 'No circuit given',
          },
        ]
      : []),
    ...load.feeders.flatMap((line) =>
      line.phases.map((phase) => ({
        kind: 'feeder',
        name: line.name,
        feeder: line.name,
        phase: phase.phase,
        ratingA: line.ratingA,
        units: null,
        loadW: phase.powerW,
        loadA: phase.currentA,
        ratingPct: phase.ratingPct,
        flag: loadFlagText(phase.flag, limit),
      })),
    ),
    ...load.phases.map((phase) => ({
      kind: 'phase total',
      name: 'All listed circuits',
      feeder: null,
      phase: phase.phase,
      ratingA: null,
      units: null,
      loadW: phase.powerW,
      loadA: phase.currentA,
      ratingPct: null,
      flag: '',
    })),
    {
      kind: 'neutral',
      name: load.system === 'three' ? 'Neutral (phasor sum)' : 'Neutral (equals the phase current)',
      feeder: null,
      phase: 'N',
      ratingA: null,
      units: null,
      loadW: null,
      loadA: load.neutralCurrentA,
      ratingPct: null,
      flag: load.imbalancePct === null ? '' : `Phase imbalance ${load.imbalancePct.toFixed(1)} %`,
    },
    {
      kind: 'total',
      name: `${load.system === 'three' ? 'Three' : 'Single'} phase, ${load.phaseVoltageV} V phase to neutral${
        load.lineVoltageV === null ? '' : `, ${load.lineVoltageV.toFixed(0)} V line to line`
      }`,
      feeder: null,
      phase: null,
      ratingA: null,
      units: load.circuits.reduce((sum, entry) => sum + entry.unitIds.length, 0),
      loadW: load.totalPowerW,
      loadA: null,
      ratingPct: null,
      flag: '',
    },
    {
      kind: 'note',
      name: POWER_CAUTION,
      feeder: null,
      phase: null,
      ratingA: null,
      units: null,
      loadW: null,
      loadA: null,
      ratingPct: null,
      flag: '',
    },
  ];
  return toCsv(rows, SHEET_COLUMNS);
}
