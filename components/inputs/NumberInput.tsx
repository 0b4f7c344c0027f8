'use client';

import type { ReactNode } from 'react';
import { FieldFrame, describedBy } from './FieldFrame';
import { type NumberRule, formatNumberText, parseNumberText, rangeHint } from './numberText';
import { type CommitOutcome, useFieldDraft } from './useFieldDraft';
import { useFieldIds } from './useFieldIds';

interface NumberInputCommon extends Omit<NumberRule, 'optional'> {
  readonly label: ReactNode;
  /** null shows an empty field (no value, or several different values). */
  readonly value: number | null;
  /** Places shown (default 2; trailing zeros dropped). */
  readonly decimals?: number;
  /** How the value is shown when not the plain number (e.g. 1/50 for a shutter time). */
  readonly format?: (value: number) => string;
  readonly placeholder?: string;
  /** Extra words after the range in the hint. */
  readonly hint?: string;
}

type NumberInputProps = NumberInputCommon &
  (
    | { readonly optional?: false; readonly onCommit: (value: number) => CommitOutcome }
    | { readonly optional: true; readonly onCommit: (value: number | null) => CommitOutcome }
  );

/**
 * A number field with its unit and allowed range. Out-of-range or non-numeric text is refused with a
 * message naming the range (nothing is clamped); Enter or leaving the field commits, Escape restores.
 */
export function NumberInput(props: NumberInputProps) {
  const { label, value, decimals, format, placeholder, hint, ...rule } = props;
  const ids = useFieldIds();
  const shown = value === null ? '' : format ? format(value) : formatNumberText(value, decimals);
  const field = useFieldDraft(shown, (text) => {
    const parsed = parseNumberText(text, rule);
    if (!parsed.ok) return parsed.message;
    if (props.optional) return props.onCommit(parsed.value);
    return parsed.value === null ? null : props.onCommit(parsed.value);
  });
  const hintText = hint ? `${rangeHint(rule)}. ${hint}` : rangeHint(rule);
  return (
    <FieldFrame ids={ids} label={label} hint={hintText} suffix={rule.unit} error={field.error}>
      <input
        id={ids.inputId}
        className="field-input field-input-number"
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        placeholder={placeholder}
        value={field.text}
        onChange={field.onChange}
        onBlur={field.onBlur}
        onKeyDown={field.onKeyDown}
        aria-invalid={field.error ? true : undefined}
        aria-describedby={describedBy(ids, hintText, field.error)}
      />
    </FieldFrame>
  );
}
