'use client';

import { useEffect, useRef, useState } from 'react';
import { savePlotText } from '@/lib/plot';
import { focusChartCsv, scheduleCsv } from '@/lib/plot/paperwork';
import { powerSheetCsv } from '@/lib/plot/powerReport';
import { useEditor } from '../editor/EditorContext';
import { downloadBlob, downloadText, fileStem } from './download';
import { PNG_SCALES, planPngBlob, pngSize } from './planPng';
import { PlotFileImport } from './PlotFileImport';
import { type PaperSize, type PrintSheet, printHref } from './printOptions';
import './paperwork.css';

const CSV_TYPE = 'text/csv;charset=utf-8';

/** The CSV sheets offered; the power sheet (powerSheetCsv) joins this list. */
const CSV_SHEETS = [
  { label: 'Fixture schedule (CSV)', suffix: 'schedule', csv: scheduleCsv },
  { label: 'Focus chart (CSV)', suffix: 'focus-chart', csv: focusChartCsv },
  { label: 'Power sheet (CSV)', suffix: 'power', csv: powerSheetCsv },
] as const;

export interface PaperworkMenuProps {
  /** The stored show, for the print view (which prints its saved revision); absent when not stored. */
  readonly showId?: string;
  /** Size of the plan canvas, CSS px (for the PNG's size). */
  readonly planSize: { readonly width: number; readonly height: number };
  /** Whether the plan is on screen (a PNG is drawn from it). */
  readonly planShown: boolean;
}

/** Print, CSV, PNG and plot-file actions, in one menu in the editor's header. */
export function PaperworkMenu({ showId, planSize, planShown }: PaperworkMenuProps) {
  const { document, setMessage } = useEditor();
  const [sheet, setSheet] = useState<PrintSheet>('all');
  const [paper, setPaper] = useState<PaperSize>(document.displayUnits === 'imperial' ? 'letter' : 'a4');
  const [scale, setScale] = useState<number>(2);
  const [open, setOpen] = useState(false);
  const menuRef = useRef<HTMLDetailsElement>(null);
  const stem = fileStem(document.name);

  // An open menu closes on Escape or on a press anywhere outside it.
  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (menuRef.current && !menuRef.current.contains(event.target as Node)) setOpen(false);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') setOpen(false);
    };
    window.addEventListener('pointerdown', onPointer);
    window.addEventListener('keydown', onKey);
    return () => {
      window.removeEventListener('pointerdown', onPointer);
      window.removeEventListener('keydown', onKey);
    };
  }, [open]);
  const size = pngSize(planSize.width, planSize.height, scale);

  const savePng = async () => {
    const container = window.document.querySelector<HTMLElement>('[data-testid="plan-canvas"]');
    const blob = container ? await planPngBlob(container, scale) : null;
    if (!blob) {
      setMessage('The plan is not drawn yet: show the plan, then save the PNG.');
      return;
    }
    downloadBlob(blob, `${stem}-plan-${size.width}x${size.height}.png`);
    setMessage(`Saved the plan as a PNG of ${size.width} × ${size.height} px.`);
  };

  return (
    <details
      ref={menuRef}
      className="paperwork-menu"
      open={open}
      onToggle={(event) => setOpen(event.currentTarget.open)}
    >
      <summary>Paperwork</summary>
      <div className="paperwork-panel" role="group" aria-label="Paperwork">
        <section aria-label="Print">
          <h3>Print</h3>
          <div className="paperwork-row">
            <label>
              Sheets{' '}
              <select value={sheet} onChange={(event) => setSheet(event.target.value as PrintSheet)}>
                <option value="all">Plan, schedule and focus chart</option>
                <option value="plot">Plan</option>
                <option value="schedule">Fixture schedule</option>
                <option value="focus">Focus chart</option>
              </select>
            </label>
            <label>
              Paper{' '}
              <select value={paper} onChange={(event) => setPaper(event.target.value as PaperSize)}>
                <option value="a4">A4</option>
                <option value="letter">Letter</option>
              </select>
            </label>
          </div>
          {showId ? (
            <>
              <a
                className="paperwork-action"
                href={printHref(showId, sheet, paper)}
                target="_blank"
                rel="noopener"
              >
                Open print view
              </a>
              <p className="paperwork-hint">
                Prints the last saved revision (edits save within seconds). Use the browser’s print to PDF.
              </p>
            </>
          ) : (
            <p className="paperwork-hint">Printing needs a show stored on the server.</p>
          )}
        </section>
        <section aria-label="Export">
          <h3>Export</h3>
          {CSV_SHEETS.map((entry) => (
            <button
              key={entry.suffix}
              type="button"
              onClick={() => downloadText(entry.csv(document), `${stem}-${entry.suffix}.csv`, CSV_TYPE)}
            >
              {entry.label}
            </button>
          ))}
          <div className="paperwork-row">
            <label>
              Plan PNG at{' '}
              <select value={scale} onChange={(event) => setScale(Number(event.target.value))}>
                {PNG_SCALES.map((option) => (
                  <option key={option} value={option}>
                    {option}×
                  </option>
                ))}
              </select>
            </label>
            <button type="button" onClick={() => void savePng()} disabled={!planShown}>
              Save PNG
            </button>
          </div>
          <p className="paperwork-hint" data-testid="png-size">
            {planShown
              ? `${size.width} × ${size.height} px: the plan as it is on screen, at ${scale}×.`
              : 'Show the plan to save it as a PNG.'}
          </p>
        </section>
        <section aria-label="Plot file">
          <h3>Plot file</h3>
          <button
            type="button"
            onClick={() =>
              downloadText(savePlotText(document), `${stem}.throwline.json`, 'application/json;charset=utf-8')
            }
          >
            Save plot file (.json)
          </button>
          <PlotFileImport />
        </section>
      </div>
    </details>
  );
}
