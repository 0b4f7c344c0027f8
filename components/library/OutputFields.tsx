'use client';

import { NumberInput } from '@/components/inputs/NumberInput';
import { SelectInput } from '@/components/inputs/SelectInput';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';

/** One way a type's output can be given: its kind, how the choice and the field read, its limit. */
export interface OutputOption<Kind extends string> {
  readonly kind: Kind;
  readonly choiceLabel: string;
  readonly fieldLabel: string;
  readonly unit: string;
  readonly max: number;
  readonly hint: string;
}

/**
 * The output of a type, given one of two ways: a choice of how, and the number. Switching the
 * choice converts the number (`onSwitch`), so the light stays the same.
 */
export function OutputFields<Kind extends string>({
  options,
  kind,
  value,
  switchHint,
  onSwitch,
  onValue,
}: {
  options: readonly [OutputOption<Kind>, OutputOption<Kind>];
  kind: Kind;
  value: number;
  switchHint: string;
  onSwitch: (kind: Kind) => CommitOutcome;
  onValue: (value: number) => CommitOutcome;
}) {
  const current = options.find((option) => option.kind === kind) ?? options[0];
  return (
    <>
      <SelectInput<Kind>
        label="Output given as"
        value={kind}
        options={options.map((option) => ({ value: option.kind, label: option.choiceLabel }))}
        hint={switchHint}
        onCommit={(next) => (next === kind ? null : onSwitch(next))}
      />
      <NumberInput
        key={current.kind}
        label={current.fieldLabel}
        unit={current.unit}
        min={0}
        max={current.max}
        minExclusive
        decimals={0}
        value={value}
        hint={current.hint}
        onCommit={onValue}
      />
    </>
  );
}
