/**
 * The print view of a stored show: a title block of our own on every sheet, then the plan, the
 * fixture schedule and the focus chart, each starting on a new page. Rendered on the server as plain
 * HTML and SVG, so the browser's print to PDF gives crisp pages without a GPU.
 */
import { type PlotDocument, createPlotDeriver } from '@/lib/plot';
import { FocusCards } from './FocusCards';
import { PlanDrawing } from './PlanDrawing';
import { PrintButton } from './PrintButton';
import { ScheduleSheet } from './ScheduleSheet';
import { type PaperSize, type PrintSheet, PAPER_PAGE_SIZES, SHEETS_IN } from './printOptions';
import './print.css';

export interface PrintViewProps {
  readonly document: PlotDocument;
  readonly revision: number;
  readonly sheet: PrintSheet;
  readonly paper: PaperSize;
  /** When the view was made, ISO 8601 UTC. */
  readonly printedAt: string;
  /** Where "Back to the editor" goes. */
  readonly editorHref: string;
}

const SHEET_TITLES = { plan: 'Plan', schedule: 'Fixture schedule', focus: 'Focus chart' } as const;

/** "2 Dec 2026, 00:41 UTC" from an ISO time. */
function printedText(iso: string): string {
  const date = new Date(iso);
  const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
  const pad = (value: number) => String(value).padStart(2, '0');
  return `${date.getUTCDate()} ${months[date.getUTCMonth()]} ${date.getUTCFullYear()}, ${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())} UTC`;
}

function TitleBlock({
  document,
  revision,
  printedAt,
  title,
}: {
  document: PlotDocument;
  revision: number;
  printedAt: string;
  title: string;
}) {
  return (
    <header className="title-block" data-testid="title-block">
      <div className="title-block-main">
        <p className="title-block-sheet">{title}</p>
        <p className="title-block-show">{document.name}</p>
        <p className="title-block-venue">{document.venue || 'Venue not given'}</p>
      </div>
      <dl className="title-block-facts">
        <dt>Revision</dt>
        <dd data-testid="title-revision">{revision}</dd>
        <dt>Printed</dt>
        <dd>{printedText(printedAt)}</dd>
        <dt>Fixtures</dt>
        <dd>{document.fixtures.length}</dd>
        <dt>Measures</dt>
        <dd>{document.displayUnits === 'metric' ? 'metres' : 'feet and inches'}</dd>
      </dl>
    </header>
  );
}

/** The cautions printed under the sheets the crew works from on the rig. */
const SHEET_CAUTIONS = {
  schedule:
    'Power and weight are the fixture types’ planning figures. A qualified electrician and a qualified rigger check the rig against the local codes and the positions’ own ratings; every hung unit needs its safety cable.',
  focus:
    'Focus only from safe access, with the unit’s clamp and safety cable secure. Keep hot units at the maker’s minimum distance from scenery, drapes and people.',
} as const;

export function PrintView({ document, revision, sheet, paper, printedAt, editorHref }: PrintViewProps) {
  const derived = createPlotDeriver()(document);
  const pageSize = PAPER_PAGE_SIZES[paper];
  const sheets = SHEETS_IN[sheet];
  return (
    <div className="print-view" data-paper={paper}>
      {/* Page size follows the paper asked for; the plan sheet is landscape. */}
      <style>{`@page { size: ${pageSize} portrait; margin: 12mm; } @page plan-page { size: ${pageSize} landscape; margin: 10mm; }`}</style>
      <nav className="print-toolbar" aria-label="Print">
        <a href={editorHref}>Back to the editor</a>
        <PrintButton />
        <span>
          Paper: {paper === 'a4' ? 'A4' : 'Letter'}. Prints the saved revision {revision}; choose “Save as
          PDF” in the print dialog for a file.
        </span>
      </nav>
      {sheets.map((name) => (
        <section key={name} className={`print-sheet print-sheet-${name}`} aria-label={SHEET_TITLES[name]}>
          <TitleBlock
            document={document}
            revision={revision}
            printedAt={printedAt}
            title={SHEET_TITLES[name]}
          />
          {name === 'plan' ? <PlanDrawing document={document} derived={derived} /> : null}
          {name === 'schedule' ? <ScheduleSheet document={document} /> : null}
          {name === 'focus' ? <FocusCards document={document} /> : null}
          {name === 'plan' ? null : <p className="print-caution">{SHEET_CAUTIONS[name]}</p>}
        </section>
      ))}
    </div>
  );
}
