'use client';

import type { ReactNode } from 'react';
import { FieldFrame, describedBy } from './FieldFrame';
import { type CommitOutcome, useFieldDraft } from './useFieldDraft';
import { useFieldIds } from './useFieldIds';

interface TextInputProps {
  readonly label: ReactNode;
  readonly value: string;
  readonly onCommit: (text: string) => CommitOutcome;
  /** A text area for notes: leaving it or Ctrl/Cmd+Enter commits. */
  readonly multiline?: boolean;
  readonly hint?: ReactNode;
  readonly placeholder?: string;
}

/** Free text (names, notes); the command that takes it checks its length and shape. */
export function TextInput({ label, value, onCommit, multiline, hint, placeholder }: TextInputProps) {
  const ids = useFieldIds();
  const field = useFieldDraft(value, onCommit, { multiline });
  const common = {
    id: ids.inputId,
    placeholder,
    value: field.text,
    onChange: field.onChange,
    onBlur: field.onBlur,
    onKeyDown: field.onKeyDown,
    'aria-invalid': field.error ? true : undefined,
    'aria-describedby': describedBy(ids, hint, field.error),
  };
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={field.error}>
      {multiline ? (
        <textarea className="field-input field-textarea" rows={3} {...common} />
      ) : (
        <input className="field-input" type="text" autoComplete="off" {...common} />
      )}
    </FieldFrame>
  );
}
