'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import { useEditor } from '@/components/editor/EditorContext';
import { retypeFixtures, setFixtureLevel } from '@/lib/plot';
import { PanelSection } from './PanelSection';
import { outcomeOf } from './format';
import { fixtureLabeller } from './labels';

/** The one value all items share, or null when they differ. */
function common<T>(values: readonly T[]): T | null {
  return values.length > 0 && values.every((value) => value === values[0]) ? values[0] : null;
}

/** Several units at once: their level and type, and the list of them. */
export function MultiFixtureInspector({ ids }: { ids: readonly string[] }) {
  const { document, run, select } = useEditor();
  const wanted = new Set(ids);
  const fixtures = document.fixtures.filter((fixture) => wanted.has(fixture.id));
  const label = fixtureLabeller(document);
  const level = common(fixtures.map((fixture) => fixture.levelPct));
  const typeId = common(fixtures.map((fixture) => fixture.typeId));
  return (
    <>
      <h2 className="panel-title">
        <span className="panel-kind">Fixtures</span> {fixtures.length} selected
      </h2>
      <PanelSection title="All selected units">
        <NumberInput
          label="Level for all"
          value={level}
          unit="%"
          min={0}
          max={100}
          decimals={1}
          placeholder="mixed"
          onCommit={(levelPct) => outcomeOf(run(setFixtureLevel, { ids, levelPct }))}
        />
        <SelectInput
          label="Type for all"
          value={typeId}
          placeholder="(mixed types)"
          options={document.fixtureTypes.map((type) => ({ value: type.id, label: type.name }))}
          onCommit={(nextType) => outcomeOf(run(retypeFixtures, { ids, typeId: nextType }))}
        />
      </PanelSection>
      <PanelSection title="Selected units">
        <ul className="panel-links">
          {fixtures.map((fixture) => (
            <li key={fixture.id}>
              <button type="button" className="panel-link" onClick={() => select([fixture.id])}>
                {label(fixture)}
              </button>
            </li>
          ))}
        </ul>
      </PanelSection>
    </>
  );
}
