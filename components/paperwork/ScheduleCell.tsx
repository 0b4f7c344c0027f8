'use client';

import { type CommitOutcome, useFieldDraft } from '../inputs/useFieldDraft';

/**
 * A schedule cell edited in place: Enter or leaving commits, Escape restores. A refusal (from the
 * parse or from the command) stays in the cell with its message, and the document is unchanged.
 */
export function ScheduleCell({
  label,
  shown,
  onCommit,
  numeric,
  wide,
}: {
  label: string;
  shown: string;
  onCommit: (text: string) => CommitOutcome;
  numeric?: boolean;
  /** Room for a sentence (purpose, notes). */
  wide?: boolean;
}) {
  const field = useFieldDraft(shown, onCommit);
  return (
    <div className={field.error ? 'schedule-cell schedule-cell-invalid' : 'schedule-cell'}>
      <input
        type="text"
        className={`schedule-input${numeric ? ' schedule-input-number' : ''}${wide ? ' schedule-input-wide' : ''}`}
        aria-label={label}
        inputMode={numeric ? 'decimal' : undefined}
        autoComplete="off"
        value={field.text}
        onChange={field.onChange}
        onBlur={field.onBlur}
        onKeyDown={field.onKeyDown}
        aria-invalid={field.error ? true : undefined}
      />
      {field.error ? (
        <p className="schedule-cell-error" role="alert">
          {field.error}
        </p>
      ) : null}
    </div>
  );
}
