'use client';

import type Konva from 'konva';
import { useEffect, useRef, useState } from 'react';
import { Layer, Stage } from 'react-konva';
import {
  addSubject,
  aimFixture,
  hangFixture,
  movePosition,
  moveFixture,
  moveSubject,
  updateSubject,
  updateViewpoint,
  mainViewpointPosition,
} from '@/lib/plot';
import { useEditor } from '../editor/EditorContext';
import type { Tool } from '../editor/tools';
import type { CoverageResponse } from '@/lib/analysis';
import { GridLayer } from './layers/GridLayer';
import { LightMapLayer } from './layers/LightMapLayer';
import { StageLayer } from './layers/StageLayer';
import { PoolLayer } from './layers/PoolLayer';
import { PositionLayer } from './layers/PositionLayer';
import { FixtureLayer } from './layers/FixtureLayer';
import { PeopleLayer } from './layers/PeopleLayer';
import { HoverReadout, type HoverReadoutHandle } from './HoverReadout';
import { GestureLayer } from './layers/GestureLayer';
import { hangingPlacement, itemsInBox } from './hanging';
import { planBounds } from './planBounds';
import { useContainerSize } from './useContainerSize';
import {
  type ScreenPoint,
  type ViewTransform,
  type WorldPlanPoint,
  fitView,
  nearestOnSegment,
  panBy,
  screenToWorld,
  zoomAt,
} from './viewTransform';

export interface PlanCanvasProps {
  readonly tool: Tool;
  readonly view: ViewTransform | null;
  readonly onViewChange: (view: ViewTransform) => void;
  readonly onCanvasSize: (size: { width: number; height: number }) => void;
  /** Changes whenever the toolbar asks to fit the plot to the canvas. */
  readonly fitRequest: number;
  readonly showAllPools: boolean;
  /** The light map to draw under the plot, or null. */
  readonly lightMap: CoverageResponse | null;
  readonly lightMapTargetLx: number;
}

type Drag =
  | { kind: 'aim' | 'move-fixture' | 'move-subject' | 'turn-subject' | 'move-viewpoint'; id: string }
  | { kind: 'move-position'; id: string; last: WorldPlanPoint }
  | { kind: 'pan'; last: ScreenPoint }
  | { kind: 'box'; start: ScreenPoint; end: ScreenPoint; additive: boolean }
  | { kind: 'measure'; start: WorldPlanPoint; end: WorldPlanPoint };

/** The plan of the stage: draws the plot and turns pointer gestures into commands. */
export default function PlanCanvas({
  tool,
  view,
  onViewChange,
  onCanvasSize,
  fitRequest,
  showAllPools,
  lightMap,
  lightMapTargetLx,
}: PlanCanvasProps) {
  const editor = useEditor();
  const { document, derived, selection, store } = editor;
  const [containerRef, size] = useContainerSize();
  const [drag, setDrag] = useState<Drag | null>(null);
  const dragRef = useRef<Drag | null>(null);
  const [measure, setMeasure] = useState<{ start: WorldPlanPoint; end: WorldPlanPoint } | null>(null);
  const hoverRef = useRef<HoverReadoutHandle | null>(null);
  const mouseUpRef = useRef<(() => void) | null>(null);
  const spaceHeld = useRef(false);
  const lastFit = useRef<number | null>(null);

  const updateDrag = (next: Drag | null) => {
    dragRef.current = next;
    setDrag(next);
  };

  useEffect(() => {
    if (size) onCanvasSize(size);
  }, [size, onCanvasSize]);

  // Fit on first measure and whenever asked.
  useEffect(() => {
    if (!size || size.width === 0 || size.height === 0) return;
    if (view !== null && lastFit.current === fitRequest) return;
    lastFit.current = fitRequest;
    onViewChange(fitView(planBounds(document), size.width, size.height));
  }, [size, fitRequest, view, document, onViewChange]);

  useEffect(() => {
    const down = (event: KeyboardEvent) => {
      if (event.code === 'Space') spaceHeld.current = true;
      if (event.key === 'Escape' && dragRef.current) {
        store.cancelGesture();
        updateDrag(null);
      }
    };
    const up = (event: KeyboardEvent) => {
      if (event.code === 'Space') spaceHeld.current = false;
    };
    window.addEventListener('keydown', down);
    window.addEventListener('keyup', up);
    return () => {
      window.removeEventListener('keydown', down);
      window.removeEventListener('keyup', up);
    };
  }, [store]);

  // A drag that ends outside the canvas still ends.
  useEffect(() => {
    const up = () => mouseUpRef.current?.();
    window.addEventListener('mouseup', up);
    return () => window.removeEventListener('mouseup', up);
  }, []);

  if (!size || !view) {
    return <div ref={containerRef} className="plan-canvas" />;
  }

  const pointerOf = (event: Konva.KonvaEventObject<MouseEvent | WheelEvent>): ScreenPoint | null =>
    event.target.getStage()?.getPointerPosition() ?? null;

  const selectItem = (id: string, toggle: boolean) => {
    if (toggle)
      editor.select(selection.includes(id) ? selection.filter((item) => item !== id) : [...selection, id]);
    else if (!selection.includes(id)) editor.select([id]);
  };

  const onMouseDown = (event: Konva.KonvaEventObject<MouseEvent>) => {
    const screen = pointerOf(event);
    if (!screen) return;
    const world = screenToWorld(view, screen);
    if (event.evt.button === 1 || spaceHeld.current) {
      updateDrag({ kind: 'pan', last: screen });
      return;
    }
    if (event.evt.button !== 0) return;
    const [role, id] = String(event.target.name() || event.target.getParent()?.name() || '').split(':');
    const toggle = event.evt.shiftKey || event.evt.ctrlKey || event.evt.metaKey;

    if (tool.kind === 'hang') {
      hangAt(world);
      return;
    }
    if (tool.kind === 'subject') {
      const result = editor.run(addSubject, {
        name: `Subject ${document.subjects.length + 1}`,
        mark: world,
        faceHeightM: 1.6,
        facingDeg: 0,
        notes: '',
      });
      if (result.ok) editor.select([store.getDocument().subjects.at(-1)?.id ?? '']);
      return;
    }
    if (tool.kind === 'measure') {
      updateDrag({ kind: 'measure', start: world, end: world });
      setMeasure({ start: world, end: world });
      return;
    }
    switch (role) {
      case 'fixture':
        selectItem(id, toggle);
        store.beginGesture('Move fixture');
        updateDrag({ kind: 'move-fixture', id });
        return;
      case 'focus':
        selectItem(id, toggle);
        store.beginGesture('Drag focus point');
        updateDrag({ kind: 'aim', id });
        return;
      case 'subject':
        selectItem(id, toggle);
        store.beginGesture('Move subject');
        updateDrag({ kind: 'move-subject', id });
        return;
      case 'facing':
        selectItem(id, false);
        store.beginGesture('Turn subject');
        updateDrag({ kind: 'turn-subject', id });
        return;
      case 'viewpoint':
        selectItem(id, toggle);
        store.beginGesture('Move viewpoint');
        updateDrag({ kind: 'move-viewpoint', id });
        return;
      case 'position':
        selectItem(id, toggle);
        store.beginGesture('Move position');
        updateDrag({ kind: 'move-position', id, last: world });
        return;
      default:
        if (!toggle) editor.select([]);
        updateDrag({ kind: 'box', start: screen, end: screen, additive: toggle });
    }
  };

  const hangAt = (world: WorldPlanPoint) => {
    const placement =
      tool.kind === 'hang' ? hangingPlacement(document, world, view.scale, tool.typeId) : null;
    if (!placement) {
      editor.setMessage('Click on a position (a pipe, truss, boom or stand) to hang the unit there.');
      return;
    }
    // The first focus is 45° down toward the middle of the stage; drag it where it belongs.
    const result = editor.run(hangFixture, placement);
    if (result.ok) editor.select([store.getDocument().fixtures.at(-1)?.id ?? '']);
  };

  const onMouseMove = (event: Konva.KonvaEventObject<MouseEvent>) => {
    const screen = pointerOf(event);
    if (!screen) return;
    const world = screenToWorld(view, screen);
    const current = dragRef.current;
    if (!current) {
      hoverRef.current?.pointAt(world);
      return;
    }
    switch (current.kind) {
      case 'pan':
        onViewChange(panBy(view, screen.x - current.last.x, screen.y - current.last.y));
        updateDrag({ kind: 'pan', last: screen });
        return;
      case 'box':
        updateDrag({ ...current, end: screen });
        return;
      case 'measure':
        updateDrag({ ...current, end: world });
        setMeasure({ start: current.start, end: world });
        return;
      case 'aim': {
        const unit = document.fixtures.find((item) => item.id === current.id);
        if (unit)
          editor.run(aimFixture, { id: current.id, focus: { x: world.x, y: world.y, z: unit.focus.z } });
        return;
      }
      case 'move-fixture': {
        const unit = document.fixtures.find((item) => item.id === current.id);
        if (!unit) return;
        const position = document.positions.find((item) => item.id === unit.positionId);
        if (position?.shape.kind === 'point') return; // a unit on a boom or stand stays on it
        const target =
          position?.shape.kind === 'line'
            ? nearestOnSegment(world, position.shape.start, position.shape.end).point
            : world;
        editor.run(moveFixture, { id: current.id, mount: { x: target.x, y: target.y, z: unit.mount.z } });
        return;
      }
      case 'move-subject':
        editor.run(moveSubject, { id: current.id, mark: world });
        return;
      case 'turn-subject': {
        const person = document.subjects.find((item) => item.id === current.id);
        if (!person) return;
        const facingDeg = (Math.atan2(world.x - person.mark.x, -(world.y - person.mark.y)) * 180) / Math.PI;
        editor.run(updateSubject, { id: current.id, changes: { facingDeg: Math.round(facingDeg) } });
        return;
      }
      case 'move-viewpoint': {
        const viewpointItem = document.viewpoints.find((item) => item.id === current.id);
        if (viewpointItem)
          editor.run(updateViewpoint, {
            id: current.id,
            changes: { position: { ...viewpointItem.position, x: world.x, y: world.y } },
          });
        return;
      }
      case 'move-position':
        editor.run(movePosition, {
          id: current.id,
          offset: { x: world.x - current.last.x, y: world.y - current.last.y },
        });
        updateDrag({ ...current, last: world });
        return;
    }
  };

  const onMouseUp = () => {
    const current = dragRef.current;
    if (!current) return;
    if (current.kind === 'box') {
      const a = screenToWorld(view, current.start);
      const b = screenToWorld(view, current.end);
      const boxed = itemsInBox(document, a, b);
      const moved = Math.hypot(current.end.x - current.start.x, current.end.y - current.start.y) > 3;
      if (moved) editor.select(current.additive ? [...new Set([...selection, ...boxed])] : boxed);
    } else if (current.kind !== 'pan' && current.kind !== 'measure') {
      store.endGesture();
    }
    updateDrag(null);
  };

  // eslint-disable-next-line react-hooks/refs -- the window listener must call this render's handler
  mouseUpRef.current = onMouseUp;

  const onWheel = (event: Konva.KonvaEventObject<WheelEvent>) => {
    event.evt.preventDefault();
    const screen = pointerOf(event);
    if (!screen) return;
    onViewChange(zoomAt(view, screen, Math.exp(-event.evt.deltaY * 0.0015)));
  };

  const units = document.displayUnits;
  const cursor = drag?.kind === 'pan' ? 'grabbing' : tool.kind === 'select' ? 'default' : 'crosshair';

  return (
    <div
      ref={containerRef}
      className="plan-canvas"
      style={{ cursor }}
      data-testid="plan-canvas"
      role="img"
      aria-label={`Stage plan of ${document.name}: ${document.fixtures.length} units, ${document.subjects.length} subjects; the lists beside it reach every item by keyboard`}
      data-view-scale={view.scale}
      data-view-origin-x={view.origin.x}
      data-view-origin-y={view.origin.y}
    >
      <Stage
        width={size.width}
        height={size.height}
        onMouseDown={onMouseDown}
        onMouseMove={onMouseMove}
        onMouseUp={onMouseUp}
        onMouseLeave={() => hoverRef.current?.pointAt(null)}
        onWheel={onWheel}
      >
        <Layer listening={false}>
          <GridLayer view={view} width={size.width} height={size.height} units={units} />
          {lightMap ? (
            <LightMapLayer view={view} map={lightMap} targetLx={lightMapTargetLx} units={units} />
          ) : null}
          <StageLayer view={view} document={document} selection={selection} />
          <PoolLayer
            view={view}
            units={derived.units}
            selection={selection}
            showAll={showAllPools}
            outlineOnly={lightMap !== null}
          />
        </Layer>
        <Layer>
          <PositionLayer view={view} document={document} selection={selection} />
          <PeopleLayer view={view} document={document} selection={selection} />
          <FixtureLayer view={view} units={derived.units} selection={selection} />
        </Layer>
        <GestureLayer view={view} box={drag?.kind === 'box' ? drag : null} measure={measure} units={units} />
      </Stage>
      <HoverReadout
        handle={hoverRef}
        rig={derived.rig}
        focusPlaneHeightM={document.focusPlaneHeightM}
        viewpoint={mainViewpointPosition(document)}
        units={units}
        measuredM={
          measure ? Math.hypot(measure.end.x - measure.start.x, measure.end.y - measure.start.y) : null
        }
      />
    </div>
  );
}
