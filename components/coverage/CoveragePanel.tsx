'use client';

import type { CoverageResponse, LightRegion } from '@/lib/analysis';
import { formatIlluminance, formatLength, footcandlesToLux, luxToFootcandles } from '@/lib/units';
import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { PanelSection } from '@/components/panels/PanelSection';
import { useEditor } from '@/components/editor/EditorContext';
import { type CoverageSettings } from './coverageSettings';
import type { CoverageStatus } from './useCoverage';
import { STOPS_OVER, STOPS_UNDER, scaleColour } from './colourScale';

export interface CoveragePanelProps {
  readonly settings: CoverageSettings;
  readonly onSettingsChange: (settings: CoverageSettings) => void;
  readonly status: CoverageStatus;
  readonly map: CoverageResponse | null;
  /** Zoom the plan to a region and select the units behind it. */
  readonly onShowRegion: (region: LightRegion) => void;
}

/** Light map settings, the colour key, statistics per acting area, and hot spots and dark gaps. */
export function CoveragePanel({ settings, onSettingsChange, status, map, onShowRegion }: CoveragePanelProps) {
  const { units, document, derived } = useEditor();
  const change = (changes: Partial<CoverageSettings>) => {
    onSettingsChange({ ...settings, ...changes });
    return null;
  };
  const imperial = units === 'imperial';
  const names = new Map(
    derived.units.map((unit) => [
      unit.fixture.id,
      label(unit.fixture.positionId, unit.fixture.unit, unit.fixture.id, document),
    ]),
  );
  return (
    <div className="panel coverage-panel" data-testid="coverage-panel">
      <h2 className="panel-title">Light map</h2>
      <label className="coverage-toggle">
        <input
          type="checkbox"
          checked={settings.visible}
          onChange={(event) => change({ visible: event.target.checked })}
        />
        Show the light map on the plan
      </label>
      <PanelSection title="What is measured">
        <SelectInput<'horizontal' | 'toward'>
          label="Surface"
          value={settings.plane}
          options={[
            { value: 'horizontal', label: 'Horizontal (light from above)' },
            { value: 'toward', label: 'Faces turned to a viewpoint' },
          ]}
          onCommit={(plane) => change({ plane })}
        />
        {settings.plane === 'toward' ? (
          <SelectInput<string>
            label="Viewpoint"
            value={settings.viewpointId ?? document.mainViewpointId ?? ''}
            options={document.viewpoints.map((view) => ({
              value: view.id,
              label: `${view.name}${view.id === document.mainViewpointId ? ' (main)' : ''}`,
            }))}
            onCommit={(viewpointId) => change({ viewpointId })}
          />
        ) : null}
        <NumberInput
          label="Grid spacing"
          value={settings.spacingM}
          unit="m"
          min={0.05}
          max={1}
          decimals={2}
          onCommit={(spacingM) => change({ spacingM })}
        />
        <NumberInput
          label={`Target level (${imperial ? 'fc' : 'lx'})`}
          value={imperial ? luxToFootcandles(settings.targetLx) : settings.targetLx}
          unit={imperial ? 'fc' : 'lx'}
          min={imperial ? 0.1 : 1}
          max={imperial ? 20000 : 200000}
          decimals={imperial ? 1 : 0}
          onCommit={(value) => change({ targetLx: imperial ? footcandlesToLux(value) : value })}
        />
        <NumberInput
          label="On target within"
          value={settings.toleranceStops}
          unit="stops"
          min={0.1}
          max={3}
          decimals={2}
          onCommit={(toleranceStops) => change({ toleranceStops })}
        />
        <NumberInput
          label="Hot spot: over target by"
          value={settings.hotStops}
          unit="stops"
          min={0.25}
          max={5}
          decimals={2}
          onCommit={(hotStops) => change({ hotStops })}
        />
        <NumberInput
          label="Dark gap: under target by"
          value={settings.darkStops}
          unit="stops"
          min={0.25}
          max={8}
          decimals={2}
          onCommit={(darkStops) => change({ darkStops })}
        />
        <NumberInput
          label="Beams piling up: more than"
          value={settings.maxOverlaps}
          unit="beams"
          min={1}
          max={50}
          integer
          onCommit={(maxOverlaps) => change({ maxOverlaps })}
        />
      </PanelSection>
      <Legend targetLx={settings.targetLx} units={units} />
      {status.state === 'error' ? <p className="panel-problem">{status.message}</p> : null}
      {map ? (
        <>
          <PanelSection title="Levels by area">
            <table className="coverage-table" data-testid="coverage-statistics">
              <thead>
                <tr>
                  <th scope="col">Area</th>
                  <th scope="col">Min</th>
                  <th scope="col">Average</th>
                  <th scope="col">Max</th>
                  <th scope="col" title="E min / E average">
                    U0
                  </th>
                  <th scope="col" title="Share within the target band">
                    On target
                  </th>
                </tr>
              </thead>
              <tbody>
                {map.statistics.map((row) => (
                  <tr
                    key={row.id}
                    data-area={row.id}
                    data-average={row.figures?.averageLx ?? ''}
                    data-min={row.figures?.minLx ?? ''}
                  >
                    <th scope="row">{row.name}</th>
                    {row.figures ? (
                      <>
                        <td>{formatIlluminance(row.figures.minLx, units)}</td>
                        <td>{formatIlluminance(row.figures.averageLx, units)}</td>
                        <td>{formatIlluminance(row.figures.maxLx, units)}</td>
                        <td>{row.figures.uniformityMinToAverage.toFixed(2)}</td>
                        <td>{Math.round(row.figures.withinTarget * 100)} %</td>
                      </>
                    ) : (
                      <td colSpan={5}>no cells inside</td>
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
            <p
              className="panel-note"
              data-testid="coverage-timing"
              data-threads={map.threads}
              data-simd={map.simd}
            >
              {map.spec.grid.columns * map.spec.grid.rows} cells of{' '}
              {formatLength(map.spec.grid.spacingM, units)}; computed in {map.elapsedMs.toFixed(0)} ms
              {map.threads > 1 ? ` on ${map.threads} threads` : ''} ({map.recomputed} unit
              {map.recomputed === 1 ? '' : 's'} recomputed).
            </p>
          </PanelSection>
          <PanelSection title="Hot spots and dark gaps">
            {map.regions.length === 0 ? (
              <p className="panel-note">None: every area is within the limits above.</p>
            ) : (
              <ul className="coverage-regions" data-testid="coverage-regions">
                {map.regions.slice(0, 30).map((region, index) => (
                  <li key={index}>
                    <button
                      type="button"
                      className={`coverage-region coverage-region--${region.kind}`}
                      onClick={() => onShowRegion(region)}
                    >
                      <strong>
                        {region.kind === 'hot'
                          ? region.reason === 'beams pile up'
                            ? 'Beams pile up'
                            : 'Hot spot'
                          : 'Dark gap'}
                      </strong>{' '}
                      {region.kind === 'hot' ? 'peaks at' : 'falls to'}{' '}
                      {formatIlluminance(region.extremeLx, units)} at x{' '}
                      {formatLength(region.extremeAt.x, units)}, y {formatLength(region.extremeAt.y, units)};{' '}
                      {region.areaM2.toFixed(region.areaM2 < 1 ? 2 : 1)} m².
                      <span className="coverage-region-units">
                        {region.fixtures.length === 0
                          ? ' No unit reaches it.'
                          : ` ${region.kind === 'hot' ? 'From' : 'Reached by'} ${region.fixtures
                              .slice(0, 4)
                              .map(
                                (entry) =>
                                  `${names.get(entry.fixtureId) ?? entry.fixtureId} (${formatIlluminance(entry.lx, units)})`,
                              )
                              .join(', ')}${region.fixtures.length > 4 ? '…' : ''}`}
                      </span>
                    </button>
                  </li>
                ))}
              </ul>
            )}
          </PanelSection>
        </>
      ) : status.state === 'working' ? (
        <p className="panel-note">Computing the light map…</p>
      ) : null}
    </div>
  );
}

function Legend({ targetLx, units }: { targetLx: number; units: 'metric' | 'imperial' }) {
  const steps = Array.from({ length: STOPS_UNDER + STOPS_OVER + 1 }, (_, index) => index - STOPS_UNDER);
  return (
    <figure className="coverage-legend" aria-label="Colour key of the light map">
      <div className="coverage-legend-bar">
        {Array.from({ length: 40 }, (_, index) => {
          const [red, green, blue] = scaleColour(index / 39);
          return <span key={index} style={{ background: `rgb(${red}, ${green}, ${blue})` }} />;
        })}
      </div>
      <div className="coverage-legend-labels">
        {steps.map((stops) => (
          <span key={stops}>
            {stops === 0 ? 'target' : `${stops > 0 ? '+' : ''}${stops}`}
            <br />
            {formatIlluminance(targetLx * 2 ** stops, units)}
          </span>
        ))}
      </div>
      <figcaption className="panel-note">Stops from the target level; clear under 0.1 lx.</figcaption>
    </figure>
  );
}

function label(
  positionId: string | null,
  unit: number | null,
  id: string,
  document: { positions: readonly { id: string; name: string }[] },
): string {
  const position = document.positions.find((item) => item.id === positionId);
  return position ? `${position.name} #${unit ?? '?'}` : id;
}
