'use client';

import { type ReactNode, useState } from 'react';
import { FieldFrame, describedBy } from './FieldFrame';
import type { CommitOutcome } from './useFieldDraft';
import { useFieldIds } from './useFieldIds';

export interface SelectOption<Value extends string> {
  readonly value: Value;
  readonly label: string;
}

interface SelectInputProps<Value extends string> {
  readonly label: ReactNode;
  /** null when no single value applies (several items with different values). */
  readonly value: Value | null;
  readonly options: readonly SelectOption<Value>[];
  /** Shown as a disabled first choice when value is null, e.g. "(mixed)". */
  readonly placeholder?: string;
  readonly onCommit: (value: Value) => CommitOutcome;
  readonly hint?: ReactNode;
}

/** A choice from a fixed list; commits as soon as it changes, and shows a refusal beside it. */
export function SelectInput<Value extends string>({
  label,
  value,
  options,
  placeholder,
  onCommit,
  hint,
}: SelectInputProps<Value>) {
  const ids = useFieldIds();
  const [error, setError] = useState<string | null>(null);
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error}>
      <select
        id={ids.inputId}
        className="field-input field-select"
        value={value ?? ''}
        onChange={(event) => {
          const chosen = options.find((option) => option.value === event.target.value);
          if (chosen) setError(onCommit(chosen.value));
        }}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(ids, hint, error)}
      >
        {value === null ? (
          <option value="" disabled>
            {placeholder ?? '(choose)'}
          </option>
        ) : null}
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}
