'use client';

import { useId, useMemo, useState } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { NumberInput } from '@/components/inputs/NumberInput';
import { PanelSection } from '@/components/panels/PanelSection';
import { unitPlace } from '@/components/panels/labels';
import { balanceDocument, cameraNeedsLx, defaultBalanceUnits } from '@/lib/plot';
import { footcandlesToLux, formatIlluminance, luxToFootcandles } from '@/lib/units';
import { BalanceProposal } from './BalanceProposal';
import { type BalanceSettings, choiceOf, initialBalanceSettings, ratioProblem } from './balanceSettings';
import { LevelSetControl } from './LevelSetControl';
import '@/components/panels/panels.css';
import './balance.css';

/** The panel's choices per open plot, kept while the side panel shows another tab. */
const kept = new WeakMap<object, BalanceSettings>();

/**
 * Balance: levels for a key light, a key:fill ratio and a back:key ratio on chosen subjects, shown
 * before they are applied in one undo step; and the show's level sets.
 */
export function BalancePanel() {
  const { document, selection, units, store } = useEditor();
  const [settings, setSettings] = useState<BalanceSettings>(
    () => kept.get(store) ?? initialBalanceSettings(document, selection),
  );
  const change = (changes: Partial<BalanceSettings>) =>
    setSettings((now) => {
      const next = { ...now, ...changes };
      kept.set(store, next);
      return next;
    });
  // One pass per change of the plot or the settings (the solve takes a few milliseconds per subject).
  const { subjectIds, mayChange, outcome } = useMemo(() => {
    const chosen = settings.subjectIds.filter((id) => document.subjects.some((person) => person.id === id));
    const units = (settings.mayChange ?? defaultBalanceUnits(document, chosen)).filter((id) =>
      document.fixtures.some((unit) => unit.id === id),
    );
    const choice = choiceOf({ ...settings, subjectIds: chosen }, units);
    return {
      subjectIds: chosen,
      mayChange: units,
      outcome:
        'error' in choice ? { ok: false as const, reason: choice.error } : balanceDocument(document, choice),
    };
  }, [document, settings]);

  const imperial = units === 'imperial';
  const ratioError = ratioProblem(settings);
  const ratioErrorId = useId();
  const cameras = document.viewpoints.filter((view) => view.camera);
  const positions = new Map(document.positions.map((position) => [position.id, position]));
  const unitName = (id: string) => {
    const unit = document.fixtures.find((candidate) => candidate.id === id);
    return unit ? unitPlace(unit, unit.positionId ? positions.get(unit.positionId) : undefined) : id;
  };
  const toggle = (list: readonly string[], id: string, on: boolean) =>
    on ? [...list.filter((entry) => entry !== id), id] : list.filter((entry) => entry !== id);

  return (
    <div className="panel balance-panel" data-testid="balance-panel">
      <h2 className="panel-title">Balance</h2>
      <LevelSetControl />
      <PanelSection title="Subjects">
        {document.subjects.length === 0 ? (
          <p className="panel-note">Place a subject on the plan first.</p>
        ) : null}
        {document.subjects.map((person) => (
          <label key={person.id} className="balance-check">
            <input
              type="checkbox"
              checked={subjectIds.includes(person.id)}
              onChange={(event) =>
                change({ subjectIds: toggle(subjectIds, person.id, event.target.checked) })
              }
            />
            {person.name}
          </label>
        ))}
      </PanelSection>
      <PanelSection title="Wanted">
        <label className="balance-field">
          <span>Key light</span>
          <select
            aria-label="Key light"
            value={settings.key.kind === 'camera' ? `camera:${settings.key.viewpointId}` : 'number'}
            onChange={(event) => {
              const value = event.target.value;
              change({
                key: value.startsWith('camera:')
                  ? { kind: 'camera', viewpointId: value.slice('camera:'.length) }
                  : { kind: 'lux', lx: settings.key.kind === 'lux' ? settings.key.lx : 500 },
              });
            }}
          >
            <option value="number">A level in {imperial ? 'foot-candles' : 'lux'}</option>
            {cameras.map((view) => (
              <option key={view.id} value={`camera:${view.id}`}>
                camera: {view.name} ({view.camera ? formatIlluminance(cameraNeedsLx(view.camera), units) : ''}
                )
              </option>
            ))}
          </select>
        </label>
        {settings.key.kind === 'lux' ? (
          <NumberInput
            label={`Key light (${imperial ? 'fc' : 'lx'})`}
            value={imperial ? luxToFootcandles(settings.key.lx) : settings.key.lx}
            unit={imperial ? 'fc' : 'lx'}
            min={imperial ? 0.1 : 1}
            max={imperial ? 20000 : 200000}
            decimals={imperial ? 1 : 0}
            onCommit={(value) => {
              change({ key: { kind: 'lux', lx: imperial ? footcandlesToLux(value) : value } });
              return null;
            }}
          />
        ) : (
          <p className="panel-note">What the camera needs for a normal exposure at its settings.</p>
        )}
        <label className="balance-field">
          <span>Key : fill given as</span>
          <select
            aria-label="Key : fill given as"
            value={settings.ratioMode}
            onChange={(event) => change({ ratioMode: event.target.value as BalanceSettings['ratioMode'] })}
          >
            <option value="lighting">lighting ratio (key + fill) : fill</option>
            <option value="stops">stops, key alone over fill alone</option>
            <option value="none">leave the fill as it is</option>
          </select>
        </label>
        {settings.ratioMode === 'lighting' ? (
          <label className="balance-field">
            <span>Lighting ratio</span>
            <input
              aria-label="Lighting ratio"
              value={settings.lightingRatioText}
              aria-invalid={ratioError ? true : undefined}
              aria-describedby={ratioError ? ratioErrorId : undefined}
              onChange={(event) => change({ lightingRatioText: event.target.value })}
            />
          </label>
        ) : null}
        {settings.ratioMode === 'lighting' && ratioError ? (
          <p className="field-error" id={ratioErrorId}>
            {ratioError}
          </p>
        ) : null}
        {settings.ratioMode === 'stops' ? (
          <NumberInput
            label="Key over fill"
            value={settings.keyFillStops}
            unit="stops"
            min={0}
            max={6}
            decimals={2}
            hint="The key is the brighter side by definition: 0 stops is key = fill"
            onCommit={(keyFillStops) => {
              change({ keyFillStops });
              return null;
            }}
          />
        ) : null}
        <p className="panel-note">
          A lighting ratio of 2:1 means key = fill, one stop between the lit and the shaded side; 3:1 is key =
          2 × fill. In stops, 1 stop is key = 2 × fill. The key is the brighter side, so 2:1 (0 stops) is the
          least.
        </p>
        <label className="balance-check">
          <input
            type="checkbox"
            checked={settings.backOn}
            onChange={(event) => change({ backOn: event.target.checked })}
          />
          Balance the back light too
        </label>
        {settings.backOn ? (
          <NumberInput
            label="Back over key"
            value={settings.backStops}
            unit="stops"
            min={-6}
            max={6}
            decimals={2}
            onCommit={(backStops) => {
              change({ backStops });
              return null;
            }}
          />
        ) : null}
      </PanelSection>
      <PanelSection title="Units that may change">
        <p className="panel-note">
          {settings.mayChange === null
            ? 'Suggested: the key, fill and back units of the chosen subjects. Every other unit keeps its level.'
            : 'Chosen by hand. Every other unit keeps its level.'}
        </p>
        <div className="balance-units">
          {document.fixtures.map((unit) => (
            <label key={unit.id} className="balance-check">
              <input
                type="checkbox"
                checked={mayChange.includes(unit.id)}
                onChange={(event) => change({ mayChange: toggle(mayChange, unit.id, event.target.checked) })}
              />
              {unitName(unit.id)}
            </label>
          ))}
        </div>
        {settings.mayChange !== null ? (
          <button type="button" className="panel-button" onClick={() => change({ mayChange: null })}>
            Use the suggested units
          </button>
        ) : null}
      </PanelSection>
      <BalanceProposal outcome={outcome} settings={settings} subjectIds={subjectIds} unitName={unitName} />
    </div>
  );
}
