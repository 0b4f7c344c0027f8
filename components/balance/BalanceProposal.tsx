'use client';

import { useEditor } from '@/components/editor/EditorContext';
import { PanelSection } from '@/components/panels/PanelSection';
import type { BalanceResult } from '@/lib/analysis';
import { balanceRolePins, setLevels, subjectExposure } from '@/lib/plot';
import { formatIlluminance } from '@/lib/units';
import type { BalanceSettings } from './balanceSettings';
import { ADVICE_CLOSER_CAUTION, ADVICE_ESTIMATE_NOTE, adviceText, missText, stopsText } from './balanceText';

type Outcome = { ok: true; result: BalanceResult; keyLx: number } | { ok: false; reason: string };

function levelText(level: number): string {
  return `${Number.isInteger(level) ? level.toFixed(0) : level.toFixed(1)} %`;
}

/**
 * The proposed levels, what they give each subject and the roles Apply will keep by hand (so the rule
 * does not swap key and fill at the new levels), with Apply (levels and roles in one undo step).
 */
export function BalanceProposal({
  outcome,
  settings,
  subjectIds,
  unitName,
}: {
  outcome: Outcome;
  settings: BalanceSettings;
  subjectIds: readonly string[];
  unitName: (id: string) => string;
}) {
  const { document, run, units } = useEditor();
  if (!outcome.ok)
    return (
      <PanelSection title="Proposal">
        <p className="panel-note" role="status">
          {outcome.reason}
        </p>
      </PanelSection>
    );
  const { result } = outcome;
  const camera =
    settings.key.kind === 'camera'
      ? document.viewpoints.find(
          (view) => settings.key.kind === 'camera' && view.id === settings.key.viewpointId,
        )
      : document.viewpoints.find((view) => view.id === document.mainViewpointId && view.camera);
  const changes = Object.entries(result.levels).map(([id, level]) => ({
    id,
    now: document.fixtures.find((unit) => unit.id === id)?.levelPct ?? 0,
    level,
  }));
  const differs = changes.some((entry) => Math.abs(entry.now - entry.level) > 1e-9);
  const pins = balanceRolePins(document, result);
  const misses = result.subjects.flatMap((subject) =>
    subject.targets.filter((target) => !target.met).map((target) => ({ subject, target })),
  );
  const subjectName = (id: string) => document.subjects.find((person) => person.id === id)?.name ?? id;
  const count = subjectIds.length;
  return (
    <PanelSection title="Proposal">
      {changes.length === 0 ? (
        <p className="panel-note">No unit may change: tick some above.</p>
      ) : (
        <table className="balance-levels" aria-label="Proposed levels">
          <thead>
            <tr>
              <th scope="col">Unit</th>
              <th scope="col">Now</th>
              <th scope="col">Proposed</th>
            </tr>
          </thead>
          <tbody>
            {changes.map((entry) => (
              <tr key={entry.id} data-fixture={entry.id} data-proposed={entry.level}>
                <th scope="row">{unitName(entry.id)}</th>
                <td>{levelText(entry.now)}</td>
                <td className={Math.abs(entry.now - entry.level) > 1e-9 ? 'balance-changed' : undefined}>
                  {levelText(entry.level)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <ul className="balance-subjects" aria-label="What the proposal gives">
        {result.subjects.map((subject) => {
          const exposure = camera?.camera ? subjectExposure(camera.camera, subject.keyLx) : null;
          return (
            <li key={subject.id} data-subject={subject.id}>
              <strong>{subjectName(subject.id)}</strong>: key {formatIlluminance(subject.keyLx, units)}
              {exposure ? ` (${stopsText(exposure.keyStops)} for ${camera?.name})` : ''}; key : fill{' '}
              {subject.keyToFillStops === null
                ? 'no fill'
                : `${stopsText(subject.keyToFillStops)}, lighting ratio ${(subject.lightingRatio ?? 0).toFixed(1)}:1`}
              ; back : key {stopsText(subject.backToKeyStops)}
            </li>
          );
        })}
      </ul>
      {pins.length > 0 ? (
        <div className="balance-pins">
          <p className="panel-note">
            At these levels the rule would give some units other roles than the balance used. Apply keeps the
            balance’s roles by hand (change them in the subject panel):
          </p>
          <ul aria-label="Roles kept on Apply">
            {pins.map((pin) => (
              <li key={`${pin.subjectId}-${pin.fixtureId}`}>
                {unitName(pin.fixtureId)} kept as {pin.role} on {subjectName(pin.subjectId)}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {misses.length > 0 ? (
        <div className="balance-misses" role="alert">
          <p>
            <strong>Out of reach</strong> (no level is set above 100 %).
            {result.subjects.some((subject) => subject.keyOutOfReach)
              ? ' Where the key falls short, fill and back follow the key the units can give, so the ratios hold.'
              : ''}
          </p>
          {misses.some(({ target }) => target.advice.length > 0) ? (
            <>
              <p>{ADVICE_ESTIMATE_NOTE}</p>
              <p className="balance-caution">{ADVICE_CLOSER_CAUTION}</p>
            </>
          ) : null}
          <ul>
            {misses.map(({ subject, target }) => (
              <li key={`${subject.id}-${target.role}`}>
                {missText(target, subjectName(subject.id), units)}
                {target.advice.length > 0 ? (
                  <ul>
                    {target.advice.map((advice) => (
                      <li key={advice.fixtureId} className="balance-advice">
                        {adviceText(advice, unitName(advice.fixtureId), units)}
                      </li>
                    ))}
                  </ul>
                ) : null}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p className="panel-note">Every target is met within 0.05 stops.</p>
      )}
      <button
        type="button"
        className="panel-button balance-apply"
        disabled={!differs && pins.length === 0}
        onClick={() =>
          run(setLevels, {
            levels: result.levels,
            roles: pins,
            label: `Balance ${count} subject${count === 1 ? '' : 's'}`,
          })
        }
      >
        {differs || pins.length > 0 ? 'Apply these levels' : 'The units are at these levels'}
      </button>
    </PanelSection>
  );
}
