'use client';

import { useState } from 'react';
import { FixtureTypesButton } from '@/components/library/FixtureTypesButton';
import { updateShow } from '@/lib/plot';
import { useEditor } from './EditorContext';
import type { Tool } from './tools';

export interface ToolbarProps {
  readonly tool: Tool;
  readonly onToolChange: (tool: Tool) => void;
  readonly onZoom: (factor: number) => void;
  readonly onFit: () => void;
  readonly showAllPools: boolean;
  readonly onShowAllPoolsChange: (value: boolean) => void;
}

/** Tools, history, view and units: one row above the plan. */
export function Toolbar({
  tool,
  onToolChange,
  onZoom,
  onFit,
  showAllPools,
  onShowAllPoolsChange,
}: ToolbarProps) {
  const { document, store, run, units } = useEditor();
  const [chosenTypeId, setChosenTypeId] = useState(document.fixtureTypes[0]?.id ?? '');
  const hangTypeId =
    tool.kind === 'hang'
      ? tool.typeId
      : document.fixtureTypes.some((type) => type.id === chosenTypeId)
        ? chosenTypeId
        : (document.fixtureTypes[0]?.id ?? '');
  const toolButton = (kind: Tool['kind'], label: string, next: Tool, hint: string) => (
    <button
      type="button"
      className="tool-button"
      aria-pressed={tool.kind === kind}
      title={hint}
      onClick={() => onToolChange(next)}
    >
      {label}
    </button>
  );
  return (
    <div className="toolbar" role="toolbar" aria-label="Plot tools">
      <div className="toolbar-group" aria-label="Tools">
        {toolButton(
          'select',
          'Select',
          { kind: 'select' },
          'Select and drag units, focus points, subjects (Esc cancels a drag)',
        )}
        {toolButton(
          'hang',
          'Hang',
          { kind: 'hang', typeId: hangTypeId },
          'Click a position to hang a unit of the chosen type',
        )}
        <label className="toolbar-select">
          <span className="visually-hidden">Type to hang</span>
          <select
            value={hangTypeId}
            onChange={(event) => {
              setChosenTypeId(event.target.value);
              onToolChange({ kind: 'hang', typeId: event.target.value });
            }}
            disabled={document.fixtureTypes.length === 0}
          >
            {document.fixtureTypes.map((type) => (
              <option key={type.id} value={type.id}>
                {type.name}
              </option>
            ))}
          </select>
        </label>
        {toolButton(
          'subject',
          'Add subject',
          { kind: 'subject' },
          'Click the plan to place a person to be lit',
        )}
        {toolButton('measure', 'Measure', { kind: 'measure' }, 'Drag to measure a distance on the plan')}
        <FixtureTypesButton />
      </div>
      <div className="toolbar-group" aria-label="History">
        <button type="button" onClick={() => store.undo()} disabled={!store.canUndo()} title="Undo (Ctrl+Z)">
          Undo
        </button>
        <button
          type="button"
          onClick={() => store.redo()}
          disabled={!store.canRedo()}
          title="Redo (Ctrl+Shift+Z)"
        >
          Redo
        </button>
      </div>
      <div className="toolbar-group" aria-label="View">
        <button type="button" onClick={() => onZoom(1.25)} title="Zoom in">
          Zoom in
        </button>
        <button type="button" onClick={() => onZoom(0.8)} title="Zoom out">
          Zoom out
        </button>
        <button type="button" onClick={onFit} title="Show the whole plot">
          Fit
        </button>
        <label className="toolbar-check">
          <input
            type="checkbox"
            checked={showAllPools}
            onChange={(event) => onShowAllPoolsChange(event.target.checked)}
          />
          All pools
        </label>
      </div>
      <div className="toolbar-group" aria-label="Units">
        <button
          type="button"
          aria-pressed={units === 'metric'}
          onClick={() => run(updateShow, { displayUnits: 'metric' })}
          title="Metres and lux"
        >
          m · lx
        </button>
        <button
          type="button"
          aria-pressed={units === 'imperial'}
          onClick={() => run(updateShow, { displayUnits: 'imperial' })}
          title="Feet and foot-candles"
        >
          ft · fc
        </button>
      </div>
    </div>
  );
}
