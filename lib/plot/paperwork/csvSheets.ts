/**
 * The paperwork as CSV (through `toCsv`, so quotes, commas, line breaks and any script survive):
 * the fixture schedule and the focus chart. Numbers are SI (m, °, W, kg) rounded to what a crew can
 * set (mm, 0.1°); the focus position is also given in words in the show's display units.
 * The power sheet (`powerSheetCsv`) belongs with the power checks (lib/plot/powerReport.ts).
 */
import { type CsvColumn, toCsv } from '../csv';
import type { PlotDocument } from '../schema/document';
import { type FocusChartRow, focusChartRows } from './focusChart';
import { type ScheduleRow, scheduleRows } from './schedule';
import { describeAcross, describeUpDown } from './stageSide';

/** Round to `decimals` places, keeping null; -0 becomes 0. */
function rounded(value: number | null, decimals: number): number | null {
  if (value === null || !Number.isFinite(value)) return null;
  return Number(value.toFixed(decimals)) + 0;
}

const scheduleColumns: CsvColumn<ScheduleRow>[] = [
  { header: 'Position', value: (row) => row.position ?? '(free-standing)' },
  { header: 'Unit', value: (row) => row.unit },
  { header: 'Type', value: (row) => row.type },
  { header: 'Purpose', value: (row) => row.purpose },
  { header: 'Channel', value: (row) => row.channel },
  { header: 'Circuit / dimmer', value: (row) => row.circuit },
  { header: 'Level (%)', value: (row) => rounded(row.levelPct, 1) },
  { header: 'Filter', value: (row) => row.filter },
  { header: 'Power (W)', value: (row) => row.powerW },
  { header: 'Weight (kg)', value: (row) => row.weightKg },
  { header: 'Notes', value: (row) => row.notes },
  { header: 'Fixture id', value: (row) => row.fixtureId },
];

/** The fixture schedule as CSV text, one line per unit in hanging order. */
export function scheduleCsv(document: PlotDocument): string {
  return toCsv(scheduleRows(document), scheduleColumns);
}

function focusColumns(units: PlotDocument['displayUnits']): CsvColumn<FocusChartRow>[] {
  return [
    { header: 'Position', value: (row) => row.position ?? '(free-standing)' },
    { header: 'Unit', value: (row) => row.unit },
    { header: 'Channel', value: (row) => row.channel },
    { header: 'Type', value: (row) => row.type },
    { header: 'Purpose', value: (row) => row.purpose },
    { header: 'Across centre line', value: (row) => describeAcross(row.acrossM, units) },
    { header: 'Up/down from setting line', value: (row) => describeUpDown(row.upstageM, units) },
    { header: 'Across (m, + stage left)', value: (row) => rounded(row.acrossM, 3) },
    { header: 'Upstage (m, + upstage)', value: (row) => rounded(row.upstageM, 3) },
    { header: 'Focus height (m)', value: (row) => rounded(row.heightM, 3) },
    { header: 'Pan (°)', value: (row) => rounded(row.panDeg, 1) },
    { header: 'Tilt (°)', value: (row) => rounded(row.tiltDeg, 1) },
    { header: 'Throw (m)', value: (row) => rounded(row.throwM, 3) },
    { header: 'Beam angle (°)', value: (row) => rounded(row.beamAngleDeg, 1) },
    { header: 'Field angle (°)', value: (row) => rounded(row.fieldAngleDeg, 1) },
    { header: 'Zoom setting (°)', value: (row) => rounded(row.zoomBeamDeg, 1) },
    { header: 'Beam diameter (m)', value: (row) => rounded(row.beamDiameterM, 3) },
    { header: 'Field diameter (m)', value: (row) => rounded(row.fieldDiameterM, 3) },
    { header: 'Beam pool width (m)', value: (row) => rounded(row.beamPoolWidthM, 3) },
    { header: 'Beam pool length (m)', value: (row) => rounded(row.beamPoolLengthM, 3) },
    { header: 'Field pool width (m)', value: (row) => rounded(row.fieldPoolWidthM, 3) },
    { header: 'Field pool length (m)', value: (row) => rounded(row.fieldPoolLengthM, 3) },
    { header: 'Notes', value: (row) => row.notes },
    { header: 'Problem', value: (row) => row.problem },
    { header: 'Fixture id', value: (row) => row.fixtureId },
  ];
}

/** The focus chart as CSV text, one line per unit in hanging order. */
export function focusChartCsv(document: PlotDocument): string {
  return toCsv(focusChartRows(document), focusColumns(document.displayUnits));
}
