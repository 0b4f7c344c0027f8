/** The plot report as text for a terminal or a printout, in metric or imperial display units. */
import { formatFeetInches, luxToFootcandles, metresToFeet } from '../units';
import type { PlotReport, ReportFootprint } from './report';
import { formatPowerText, formatWeightText } from './powerReportText';

export type DisplayUnits = 'metric' | 'imperial';

const DASH = '—';

function length(valueM: number | null, units: DisplayUnits): string {
  if (valueM === null || !Number.isFinite(valueM)) return DASH;
  return units === 'metric' ? `${valueM.toFixed(2)} m` : formatFeetInches(valueM);
}

function illuminance(valueLx: number | null, units: DisplayUnits): string {
  if (valueLx === null || !Number.isFinite(valueLx)) return DASH;
  return units === 'metric' ? `${valueLx.toFixed(0)} lx` : `${luxToFootcandles(valueLx).toFixed(1)} fc`;
}

function angle(valueDeg: number | null): string {
  return valueDeg === null || !Number.isFinite(valueDeg) ? DASH : `${valueDeg.toFixed(1)}°`;
}

function pool(footprint: ReportFootprint | null, units: DisplayUnits): string {
  if (!footprint) return DASH;
  if (footprint.state === 'misses') return 'misses the focus plane';
  if (footprint.state === 'apex-on-plane') return 'hangs in the focus plane: no pool on it';
  if (footprint.open) return `open: from ${length(footprint.nearM, units)} out, spills past the horizon`;
  const area =
    footprint.areaM2 === null
      ? DASH
      : units === 'metric'
        ? `${footprint.areaM2.toFixed(1)} m²`
        : `${(footprint.areaM2 * metresToFeet(1) ** 2).toFixed(0)} ft²`;
  return `${length(footprint.nearM, units)} to ${length(footprint.farM, units)} out, ${length(footprint.widthM, units)} wide, ${area}`;
}

function table(rows: string[][]): string {
  const widths = rows[0].map((_, column) => Math.max(...rows.map((row) => row[column].length)));
  return rows
    .map((row) =>
      row
        .map((cell, column) => cell.padEnd(widths[column]))
        .join('  ')
        .trimEnd(),
    )
    .join('\n');
}

/** Text of the report (fixtures table, pools, subject light) in the chosen display units. */
export function formatReportText(report: PlotReport, units: DisplayUnits): string {
  const lines: string[] = [];
  lines.push(`${report.show}${report.venue ? ` — ${report.venue}` : ''}`);
  lines.push(
    `Focus plane ${length(report.focusPlaneHeightM, units)} above the stage; faces judged from ${report.mainViewpoint ?? 'each subject’s facing (no viewpoint)'}.`,
  );
  lines.push('');
  lines.push('FIXTURES');
  const names = new Map(report.fixtures.map((fixture) => [fixture.id, label(fixture)]));
  lines.push(
    table([
      ['Unit', 'Type', 'Ch', 'Level', 'Throw', 'Pan', 'Tilt', 'Beam ⌀', 'Field ⌀', 'Centre'],
      ...report.fixtures.map((fixture) => [
        label(fixture),
        fixture.type,
        fixture.channel === null ? DASH : String(fixture.channel),
        `${fixture.levelPct.toFixed(0)} %`,
        length(fixture.throwM, units),
        angle(fixture.panDeg),
        angle(fixture.tiltDeg),
        length(fixture.beamDiameterM, units),
        length(fixture.fieldDiameterM, units),
        illuminance(fixture.centreLx, units),
      ]),
    ]),
  );
  lines.push('');
  lines.push('POOLS ON THE FOCUS PLANE (beam edge; distances from the point under the unit, along its aim)');
  const labelWidth = Math.max(0, ...report.fixtures.map((fixture) => label(fixture).length));
  for (const fixture of report.fixtures) {
    const note = fixture.problem ? `  (${fixture.problem})` : '';
    const shape =
      fixture.beamAngleDeg === null && !fixture.problem
        ? 'soft source: no beam edge'
        : pool(fixture.footprint, units);
    lines.push(`  ${label(fixture).padEnd(labelWidth)}  ${shape}${note}`);
  }
  lines.push('');
  lines.push(`LIGHT ON FACES (vertical, toward ${report.mainViewpoint ?? 'each subject’s facing'})`);
  for (const subject of report.subjects) {
    lines.push(`  ${subject.name}: ${illuminance(subject.totalFaceLx, units)} in all`);
    const stops = (value: number | null) =>
      value === null ? DASH : `${value >= 0 ? '+' : ''}${value.toFixed(2)} stops`;
    lines.push(
      `    key ${illuminance(subject.keyLx, units)}, fill ${illuminance(subject.fillLx, units)} (key:fill ${stops(subject.keyToFillStops)}; lighting ratio ${
        subject.lightingRatio === null ? DASH : `${subject.lightingRatio.toFixed(1)}:1`
      }), back ${illuminance(subject.backLightLx, units)} (${stops(subject.backToKeyStops)} from key); cylindrical ${illuminance(subject.cylindricalLx, units)}`,
    );
    if (subject.exposure) {
      const exposure = subject.exposure;
      lines.push(
        `    camera needs ${illuminance(exposure.neededLx, units)} for a normal exposure; key side ${stops(exposure.keyStops)}${
          exposure.markedFNumberForKey === null
            ? ''
            : `, about f/${exposure.markedFNumberForKey} at this ISO and shutter`
        }`,
      );
    }
    const roles = new Map(subject.roles.map((entry) => [entry.fixtureId, entry]));
    for (const source of subject.sources.filter((entry) => entry.faceLx >= 0.5)) {
      const role = roles.get(source.fixtureId);
      const roleText = !role
        ? ''
        : role.overridden
          ? `${role.role} (set by hand; rule: ${role.ruleRole})`
          : role.role;
      lines.push(
        `    ${(names.get(source.fixtureId) ?? source.fixtureId).padEnd(labelWidth)}  ${illuminance(source.faceLx, units).padEnd(8)} ${roleText}`,
      );
    }
  }
  lines.push('');
  lines.push('LEVEL SETS');
  if (report.levelSets.length === 0) lines.push('  none (the levels above are the only ones)');
  for (const set of report.levelSets) {
    const levels = Object.entries(set.levels)
      .map(([fixtureId, level]) => `${names.get(fixtureId) ?? fixtureId} ${Math.round(level)} %`)
      .join(', ');
    lines.push(
      `  ${set.name}${set.chosen ? ' (chosen: the levels above)' : ''}: ${levels || 'every unit at 0 %'}`,
    );
  }
  const coverage = report.coverage;
  lines.push('');
  lines.push(
    `COVERAGE (horizontal at ${length(coverage.planeHeightM, units)}, ${length(coverage.spacingM, units)} grid; target ${illuminance(coverage.targetLx, units)} ± ${coverage.toleranceStops} stop)`,
  );
  lines.push(
    table([
      ['Area', 'Min', 'Average', 'Max', 'U0', 'Min/max', 'On target'],
      ...coverage.areas.map((area) => [
        area.name,
        illuminance(area.minLx, units),
        illuminance(area.averageLx, units),
        illuminance(area.maxLx, units),
        area.uniformityMinToAverage.toFixed(2),
        area.uniformityMinToMax.toFixed(2),
        `${Math.round(area.withinTarget * 100)} %`,
      ]),
    ]),
  );
  lines.push('');
  lines.push(
    'HOT SPOTS AND DARK GAPS (over or under the target by more than 1 stop, or more than 4 beams at once)',
  );
  if (coverage.regions.length === 0) lines.push('  none');
  for (const region of coverage.regions.slice(0, 40)) {
    const causes = region.fixtures
      .slice(0, 3)
      .map((entry) => `${names.get(entry.fixtureId) ?? entry.fixtureId} ${illuminance(entry.lx, units)}`)
      .join(', ');
    lines.push(
      `  ${region.kind === 'hot' ? 'hot' : 'dark'} (${region.reason}) at x ${length(region.centre.x, units)}, y ${length(region.centre.y, units)}: ${region.areaM2.toFixed(2)} m², ${region.kind === 'hot' ? 'peak' : 'lowest'} ${illuminance(region.extremeLx, units)}${causes ? `; ${causes}` : ''}`,
    );
  }
  lines.push('', ...formatPowerText(report.power), '', ...formatWeightText(report.weight, units));
  return `${lines.join('\n')}\n`;
}

function label(fixture: { position: string | null; unit: number | null; id: string }): string {
  if (fixture.position === null) return fixture.id;
  return `${fixture.position} #${fixture.unit ?? '?'}`;
}
