'use client';

import dynamic from 'next/dynamic';
import { useCallback, useState } from 'react';
import type { PlotDocument } from '@/lib/plot';
import { Inspector } from '../panels/Inspector';
import { ListsPanel } from '../panels/ListsPanel';
import type { ViewTransform } from '../canvas/viewTransform';
import { fitView, zoomAt } from '../canvas/viewTransform';
import { BalancePanel } from '../balance/BalancePanel';
import { CoveragePanel } from '../coverage/CoveragePanel';
import { PowerPanel } from '../power/PowerPanel';
import { type MainView, MainViewSwitch, PaperworkView } from '../paperwork/MainViewSwitch';
import { PaperworkMenu } from '../paperwork/PaperworkMenu';
import { useCoverageMap } from '../coverage/useCoverageMap';
import { EditorProvider, useEditor } from './EditorContext';
import { ShowSaving } from './ShowSaving';
import { Toolbar } from './Toolbar';
import type { Tool } from './tools';
import { useShortcuts } from './useShortcuts';

// Konva needs the browser's canvas: the plan is drawn on the client only.
const PlanCanvas = dynamic(() => import('../canvas/PlanCanvas'), {
  ssr: false,
  loading: () => <div className="plan-canvas plan-canvas--loading">Drawing the plan…</div>,
});

/** A plot stored on the server: its show id and the revision the editor opens (it is autosaved). */
export interface EditorShow {
  readonly id: string;
  readonly revision: number;
}

/** The whole editing screen for one plot. */
export function PlotEditor({ initialDocument, show }: { initialDocument: PlotDocument; show?: EditorShow }) {
  return (
    <EditorProvider initialDocument={initialDocument}>
      <EditorLayout show={show} />
    </EditorProvider>
  );
}

const SIDE_TABS = ['item', 'light', 'balance', 'power'] as const;
type SideTab = (typeof SIDE_TABS)[number];
/** The tab's words, and the panel's accessible name. */
const SIDE_TAB_LABELS: Record<SideTab, string> = {
  item: 'Selected item',
  light: 'Light map',
  balance: 'Balance',
  power: 'Power',
};
const SIDE_TAB_NAMES: Record<SideTab, string> = {
  item: 'Selected item',
  light: 'Light map',
  balance: 'Balance',
  power: 'Power and weight',
};

function EditorLayout({ show }: { show?: EditorShow }) {
  const editor = useEditor();
  useShortcuts(editor);
  const [tool, setTool] = useState<Tool>({ kind: 'select' });
  const [view, setView] = useState<ViewTransform | null>(null);
  const [fitRequest, setFitRequest] = useState(0);
  const [showAllPools, setShowAllPools] = useState(true);
  const [canvasSize, setCanvasSize] = useState({ width: 0, height: 0 });
  const [sideTab, setSideTab] = useState<SideTab>('item');
  const [mainView, setMainView] = useState<MainView>('plan');
  const coverage = useCoverageMap(editor.document, editor.derived);
  const openTab = (tab: SideTab) => {
    setSideTab(tab);
    coverage.setPanelOpen(tab === 'light');
  };
  const zoom = useCallback(
    (factor: number) =>
      setView((current) =>
        current ? zoomAt(current, { x: canvasSize.width / 2, y: canvasSize.height / 2 }, factor) : current,
      ),
    [canvasSize],
  );
  return (
    <div className="editor">
      <header className="editor-header">
        <div>
          <h1>Throwline</h1>
          <p className="editor-show">
            {editor.document.name}
            {editor.document.venue ? <span> — {editor.document.venue}</span> : null}
          </p>
          <PaperworkMenu showId={show?.id} planSize={canvasSize} planShown={mainView === 'plan'} />
        </div>
        <Toolbar
          tool={tool}
          onToolChange={setTool}
          onZoom={zoom}
          onFit={() => setFitRequest((count) => count + 1)}
          showAllPools={showAllPools}
          onShowAllPoolsChange={setShowAllPools}
        />
        {show ? <ShowSaving showId={show.id} revision={show.revision} /> : null}
      </header>
      <aside className="editor-lists" aria-label="Show lists">
        <ListsPanel />
      </aside>
      <main className="editor-plan">
        <h2 className="visually-hidden">Stage plan</h2>
        <MainViewSwitch value={mainView} onChange={setMainView} />
        {mainView !== 'plan' ? <PaperworkView view={mainView} /> : null}
        {mainView === 'plan' ? (
          <PlanCanvas
            tool={tool}
            view={view}
            onViewChange={setView}
            onCanvasSize={setCanvasSize}
            fitRequest={fitRequest}
            showAllPools={showAllPools}
            lightMap={coverage.settings.visible ? coverage.map : null}
            lightMapTargetLx={coverage.settings.targetLx}
          />
        ) : null}
      </main>
      <aside className="editor-inspector" aria-label={SIDE_TAB_NAMES[sideTab]}>
        <div className="side-tabs" role="tablist" aria-label="Side panel">
          {SIDE_TABS.map((tab) => (
            <button
              key={tab}
              type="button"
              role="tab"
              aria-selected={sideTab === tab}
              onClick={() => openTab(tab)}
            >
              {SIDE_TAB_LABELS[tab]}
            </button>
          ))}
        </div>
        {sideTab === 'item' ? (
          <Inspector />
        ) : sideTab === 'power' ? (
          <PowerPanel />
        ) : sideTab === 'balance' ? (
          <BalancePanel />
        ) : (
          <CoveragePanel
            settings={coverage.settings}
            onSettingsChange={coverage.setSettings}
            status={coverage.status}
            map={coverage.map}
            onShowRegion={(region) => {
              editor.select(region.fixtures.slice(0, 6).map((entry) => entry.fixtureId));
              const margin = 1.5;
              setView(
                fitView(
                  {
                    minX: region.bounds.minX - margin,
                    maxX: region.bounds.maxX + margin,
                    minY: region.bounds.minY - margin,
                    maxY: region.bounds.maxY + margin,
                  },
                  canvasSize.width,
                  canvasSize.height,
                ),
              );
            }}
          />
        )}
      </aside>
      <footer className="editor-status" role="status" aria-live="polite">
        {editor.message ?? statusHint(tool)}
      </footer>
    </div>
  );
}

function statusHint(tool: Tool): string {
  switch (tool.kind) {
    case 'select':
      return 'Drag a unit along its position, a focus point to aim, a subject or its facing handle; drag empty plan to box-select. Wheel zooms, Space+drag pans. Arrows nudge, Delete removes, Ctrl+D duplicates, Ctrl+Z undoes.';
    case 'hang':
      return 'Click on a position to hang a unit of the chosen type there.';
    case 'subject':
      return 'Click the plan to place a subject.';
    case 'measure':
      return 'Drag to measure a distance on the plan.';
  }
}
