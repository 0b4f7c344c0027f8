'use client';

import { useEditor } from '../editor/EditorContext';
import { FocusCards } from './FocusCards';
import { ScheduleTable } from './ScheduleTable';
import './paperwork.css';

/** What the editor's main area shows. */
export type MainView = 'plan' | 'schedule' | 'focus';

const VIEWS: readonly { value: MainView; label: string }[] = [
  { value: 'plan', label: 'Plan' },
  { value: 'schedule', label: 'Schedule' },
  { value: 'focus', label: 'Focus chart' },
];

/** Plan / Schedule / Focus chart, over the top left of the main area. */
export function MainViewSwitch({ value, onChange }: { value: MainView; onChange: (view: MainView) => void }) {
  return (
    <div className="main-view-switch" role="tablist" aria-label="Main view">
      {VIEWS.map((view) => (
        <button
          key={view.value}
          type="button"
          role="tab"
          aria-selected={value === view.value}
          onClick={() => onChange(view.value)}
        >
          {view.label}
        </button>
      ))}
    </div>
  );
}

/** The schedule or the focus chart in the main area, scrolling on its own. */
export function PaperworkView({ view }: { view: Exclude<MainView, 'plan'> }) {
  const { document } = useEditor();
  return (
    <div
      className="paperwork-view"
      role="tabpanel"
      aria-label={view === 'schedule' ? 'Fixture schedule' : 'Focus chart'}
    >
      {view === 'schedule' ? <ScheduleTable /> : <FocusCards document={document} />}
    </div>
  );
}
