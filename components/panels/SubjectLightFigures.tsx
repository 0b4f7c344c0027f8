'use client';

import { useMemo, useState } from 'react';
import { type LightRole, subjectLighting } from '@/lib/analysis';
import {
  type PlotDocument,
  type DerivedPlot,
  LIGHT_ROLES,
  mainViewpointPosition,
  setRoleOverride,
  subjectExposure,
} from '@/lib/plot';
import { formatIlluminance } from '@/lib/units';
import { useEditor } from '@/components/editor/EditorContext';
import { Readout } from './Readout';
import { PanelSection } from './PanelSection';

function stopsText(value: number | null): string {
  if (value === null) return '—';
  const shown = Math.abs(value) < 0.005 ? 0 : value; // no "−0.00"
  return `${shown >= 0 ? '+' : ''}${shown.toFixed(2)} stops`;
}

/** The light on one subject from every source, with roles, ratios and (for a camera) exposure. */
export function SubjectLightFigures({
  subjectId,
  document,
  derived,
  units,
}: {
  subjectId: string;
  document: PlotDocument;
  derived: DerivedPlot;
  units: 'metric' | 'imperial';
}) {
  const subject = document.subjects.find((candidate) => candidate.id === subjectId);
  const viewpoint = document.viewpoints.find((view) => view.id === document.mainViewpointId) ?? null;
  const { run } = useEditor();
  const [everyUnit, setEveryUnit] = useState(false);
  const lighting = useMemo(
    () =>
      subject
        ? subjectLighting(subject, mainViewpointPosition(document), derived.rig, subject.roleOverrides)
        : null,
    [subject, document, derived],
  );
  if (!subject || !lighting) return null;
  const exposure = viewpoint?.camera ? subjectExposure(viewpoint.camera, lighting.keyLx) : null;
  const names = new Map(
    derived.units.map((unit) => {
      const position = document.positions.find((item) => item.id === unit.fixture.positionId);
      return [unit.fixture.id, position ? `${position.name} #${unit.fixture.unit ?? '?'}` : unit.fixture.id];
    }),
  );
  // Each unit's light where its role puts it: back light on the back of the head, top light from above.
  const shown = (source: (typeof lighting.sources)[number]) =>
    source.role === 'back' ? source.backLx : source.role === 'top' ? source.topLx : source.faceLx;
  // Lit units, and any unit given a role by hand (so the choice can be undone even when it is dark).
  const lit = lighting.sources
    .filter((source) => everyUnit || shown(source) >= 0.5 || source.overridden)
    .sort((a, b) => shown(b) - shown(a));
  const largest = Math.max(1e-9, ...lit.map(shown));
  return (
    <PanelSection title={`Light on the face, toward ${viewpoint ? viewpoint.name : 'the way they face'}`}>
      <dl className="panel-readouts">
        <Readout
          name="subjectFace"
          label="On the face"
          value={lighting.totals.faceLx}
          text={formatIlluminance(lighting.totals.faceLx, units)}
        />
        <Readout
          name="subjectKey"
          label="Key side"
          value={lighting.keyLx}
          text={formatIlluminance(lighting.keyLx, units)}
        />
        <Readout
          name="subjectFill"
          label="Fill side"
          value={lighting.fillLx}
          text={formatIlluminance(lighting.fillLx, units)}
        />
      </dl>
      <dl className="panel-readouts panel-readouts--stacked">
        <Readout
          name="keyToFillStops"
          label="Key : fill"
          value={lighting.keyToFillStops}
          text={
            lighting.keyToFillStops === null
              ? 'no fill'
              : `${stopsText(lighting.keyToFillStops)} key over fill; lighting ratio ${(lighting.lightingRatio ?? 0).toFixed(1)}:1, ${stopsText(
                  Math.log2(lighting.lightingRatio ?? 1),
                )} between the lit and the shaded side`
          }
        />
        <Readout
          name="backToKeyStops"
          label="Back : key"
          value={lighting.backToKeyStops}
          text={stopsText(lighting.backToKeyStops)}
        />
        <Readout
          name="cylindrical"
          label="Cylindrical"
          value={lighting.totals.cylindricalLx}
          text={formatIlluminance(lighting.totals.cylindricalLx, units)}
        />
        {exposure ? (
          <Readout
            name="keyExposureStops"
            label={`Exposure for ${viewpoint?.name ?? 'the camera'}`}
            value={exposure.keyStops}
            text={`needs ${formatIlluminance(exposure.neededLx, units)}; key side ${stopsText(exposure.keyStops)}${
              exposure.markedFNumberForKey === null ? '' : `, about f/${exposure.markedFNumberForKey}`
            }`}
          />
        ) : null}
      </dl>
      <p className="panel-note">
        Key : fill in stops is key alone over fill alone. The lighting ratio is the photographers&apos; (key +
        fill) : fill, so 2:1 means key = fill and one stop between the lit and the shaded side. Roles come
        from where each unit is: more than 70° up is top; behind (beyond 110° from the view) is back; 70–110°
        is side; in front, the brightest is the key and its side is the key side. Choose a role beside a unit
        to set it by hand.
      </p>
      <label className="subject-every-unit">
        <input
          type="checkbox"
          aria-label="List units that give no light here too"
          checked={everyUnit}
          onChange={(event) => setEveryUnit(event.target.checked)}
        />
        List units that give no light here too
      </label>
      <ul className="subject-bars" aria-label="Light on this subject by unit">
        {lit.map((source) => {
          const value = shown(source);
          return (
            <li key={source.fixtureId}>
              <span className="subject-bar-label">{names.get(source.fixtureId) ?? source.fixtureId}</span>
              <select
                className="subject-role"
                aria-label={`Role of ${names.get(source.fixtureId) ?? source.fixtureId}`}
                data-fixture={source.fixtureId}
                value={source.overridden ? source.role : ''}
                onChange={(event) => {
                  const value = event.target.value;
                  const role = (LIGHT_ROLES as readonly string[]).includes(value)
                    ? (value as LightRole)
                    : null;
                  run(setRoleOverride, { subjectId, fixtureId: source.fixtureId, role });
                }}
              >
                <option value="">by rule ({source.ruleRole})</option>
                {LIGHT_ROLES.map((role) => (
                  <option key={role} value={role}>
                    {role}
                  </option>
                ))}
              </select>
              <span className="subject-bar" style={{ width: `${Math.max(2, (100 * value) / largest)}%` }} />
              <span className="subject-bar-value">{formatIlluminance(value, units)}</span>
            </li>
          );
        })}
      </ul>
    </PanelSection>
  );
}
