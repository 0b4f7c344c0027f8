'use client';

import { useMemo } from 'react';
import { useEditor } from '@/components/editor/EditorContext';
import { formatLength } from '@/lib/units';
import { type ListItem, SelectableList } from './SelectableList';
import { countOf } from './format';
import { fixtureLabeller, fixturesInHangingOrder } from './labels';
import './panels.css';

/**
 * The left-hand panel: every item of the plot in lists — fixtures, positions, subjects, viewpoints
 * and acting areas — so each can be found and selected without the plan (and by screen-reader users).
 * Fills its container and scrolls inside it.
 */
export function ListsPanel() {
  const { document, selection, select, units } = useEditor();
  const lists = useMemo(() => {
    const label = fixtureLabeller(document);
    const fixtures: ListItem[] = fixturesInHangingOrder(document).map((fixture) => ({
      id: fixture.id,
      label: label(fixture),
    }));
    const held = new Map<string, number>();
    for (const fixture of document.fixtures) {
      if (fixture.positionId !== null) held.set(fixture.positionId, (held.get(fixture.positionId) ?? 0) + 1);
    }
    const positions: ListItem[] = document.positions.map((position) => ({
      id: position.id,
      label: `${position.name} — ${position.kind}, ${formatLength(position.heightM, units)}, ${countOf(held.get(position.id) ?? 0, 'unit')}`,
    }));
    const subjects: ListItem[] = document.subjects.map((subject) => ({
      id: subject.id,
      label: subject.name,
    }));
    const viewpoints: ListItem[] = document.viewpoints.map((view) => ({
      id: view.id,
      label: `${view.name} — ${view.kind}${view.id === document.mainViewpointId ? ', main' : ''}`,
    }));
    const areas: ListItem[] = document.stage.acting.map((area) => ({ id: area.id, label: area.name }));
    return { fixtures, positions, subjects, viewpoints, areas };
  }, [document, units]);

  return (
    <div className="panel panel-lists">
      <h2 className="panel-title">In this plot</h2>
      <p className="panel-note">
        Arrow keys move through a list; Ctrl or Cmd with Enter, Space or a click adds to the selection.
      </p>
      <SelectableList
        title="Fixtures"
        items={lists.fixtures}
        emptyText="No fixtures hung yet."
        selection={selection}
        onSelect={select}
      />
      <SelectableList
        title="Positions"
        items={lists.positions}
        emptyText="No hanging positions yet."
        selection={selection}
        onSelect={select}
      />
      <SelectableList
        title="Subjects"
        items={lists.subjects}
        emptyText="No subjects placed yet."
        selection={selection}
        onSelect={select}
      />
      <SelectableList
        title="Viewpoints"
        items={lists.viewpoints}
        emptyText="No viewpoints yet."
        selection={selection}
        onSelect={select}
      />
      <SelectableList
        title="Acting areas"
        items={lists.areas}
        emptyText="No acting areas drawn yet."
        selection={selection}
        onSelect={select}
      />
    </div>
  );
}
