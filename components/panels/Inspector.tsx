'use client';

import { type ItemKind, useEditor } from '@/components/editor/EditorContext';
import { assertNever } from '@/lib/numeric';
import { AreaInspector } from './AreaInspector';
import { FixtureInspector } from './FixtureInspector';
import { MultiFixtureInspector } from './MultiFixtureInspector';
import { PositionInspector } from './PositionInspector';
import { ShowSettings } from './ShowSettings';
import { SubjectInspector } from './SubjectInspector';
import { ViewpointInspector } from './ViewpointInspector';
import './panels.css';

/**
 * The right-hand panel: the first selected item (several selected units get a shared level and type),
 * or the show settings when nothing is selected. Fills its container and scrolls inside it.
 */
export function Inspector() {
  const { selection, kindOf } = useEditor();
  return (
    <div className="panel panel-inspector">
      <InspectorBody selection={selection} kindOf={kindOf} />
    </div>
  );
}

function InspectorBody({
  selection,
  kindOf,
}: {
  selection: readonly string[];
  kindOf: (id: string) => ItemKind | null;
}) {
  const first = selection[0];
  if (first === undefined) return <ShowSettings />;
  const kind = kindOf(first);
  if (kind === null) return <ShowSettings />;
  // Keyed by id so a half-typed value never carries over to the next item.
  switch (kind) {
    case 'fixture': {
      const fixtures = selection.filter((id) => kindOf(id) === 'fixture');
      return fixtures.length > 1 ? (
        <MultiFixtureInspector key={fixtures.join(' ')} ids={fixtures} />
      ) : (
        <FixtureInspector key={first} id={first} />
      );
    }
    case 'position':
      return <PositionInspector key={first} id={first} />;
    case 'subject':
      return <SubjectInspector key={first} id={first} />;
    case 'viewpoint':
      return <ViewpointInspector key={first} id={first} />;
    case 'area':
      return <AreaInspector key={first} id={first} />;
    default:
      return assertNever(kind);
  }
}
