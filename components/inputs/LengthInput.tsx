'use client';

import type { ReactNode } from 'react';
import { type LengthUnitSystem, formatLength, parseLength } from '@/lib/units';
import { FieldFrame, describedBy } from './FieldFrame';
import { type CommitOutcome, useFieldDraft } from './useFieldDraft';
import { useFieldIds } from './useFieldIds';

interface LengthInputProps {
  readonly label: ReactNode;
  /** Metres; null shows an empty field. */
  readonly valueM: number | null;
  /** Display units; a bare number is read in these (metres, or feet). */
  readonly units: LengthUnitSystem;
  readonly onCommit: (valueM: number) => CommitOutcome;
  readonly hint?: ReactNode;
  readonly placeholder?: string;
}

/**
 * A length typed in any common form (`12'6"`, `3.8 m`, `381 cm`, or a bare number in the display
 * units). A value that cannot be read is refused with the reason; nothing is rounded into range.
 */
export function LengthInput({ label, valueM, units, onCommit, hint, placeholder }: LengthInputProps) {
  const ids = useFieldIds();
  const shown = valueM === null ? '' : formatLength(valueM, units);
  const field = useFieldDraft(shown, (text) => {
    const parsed = parseLength(text, units);
    return parsed.ok ? onCommit(parsed.valueM) : parsed.message;
  });
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={field.error}>
      <input
        id={ids.inputId}
        className="field-input field-input-length"
        type="text"
        autoComplete="off"
        spellCheck={false}
        placeholder={placeholder ?? (units === 'metric' ? 'e.g. 3.8 m' : `e.g. 12' 6"`)}
        value={field.text}
        onChange={field.onChange}
        onBlur={field.onBlur}
        onKeyDown={field.onKeyDown}
        aria-invalid={field.error ? true : undefined}
        aria-describedby={describedBy(ids, hint, field.error)}
      />
    </FieldFrame>
  );
}
