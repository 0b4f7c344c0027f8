'use client';

import type { ReactNode } from 'react';
import '../panels/panels.css';

export interface FieldIds {
  readonly inputId: string;
  readonly hintId: string;
  readonly errorId: string;
}

/** The ids a control needs for its description: the hint and the error, when shown. */
export function describedBy(ids: FieldIds, hint: ReactNode, error: string | null): string | undefined {
  const parts = [hint ? ids.hintId : null, error ? ids.errorId : null].filter((part) => part !== null);
  return parts.length > 0 ? parts.join(' ') : undefined;
}

interface FieldFrameProps {
  readonly ids: FieldIds;
  readonly label: ReactNode;
  readonly hint?: ReactNode;
  /** Shown after the control (e.g. "%"); the hint should name the unit for screen readers. */
  readonly suffix?: string;
  readonly error: string | null;
  readonly children: ReactNode;
}

/** Label, control, unit suffix, hint and error message laid out the same way for every field. */
export function FieldFrame({ ids, label, hint, suffix, error, children }: FieldFrameProps) {
  return (
    <div className={error ? 'field field-invalid' : 'field'}>
      <label className="field-label" htmlFor={ids.inputId}>
        {label}
      </label>
      <div className="field-control">
        {children}
        {suffix ? (
          <span className="field-suffix" aria-hidden="true">
            {suffix}
          </span>
        ) : null}
      </div>
      {hint ? (
        <p className="field-hint" id={ids.hintId}>
          {hint}
        </p>
      ) : null}
      {error ? (
        <p className="field-error" id={ids.errorId} role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}
