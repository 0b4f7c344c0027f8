// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { LengthInput } from '@/components/inputs/LengthInput';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';

afterEach(cleanup);

/** A LengthInput over local state, reporting each commit to `onCommit` (which may refuse). */
function Harness({
  initialM,
  units,
  onCommit,
}: {
  initialM: number;
  units: 'metric' | 'imperial';
  onCommit: (valueM: number) => CommitOutcome;
}) {
  const [valueM, setValueM] = useState(initialM);
  return (
    <LengthInput
      label="Trim"
      valueM={valueM}
      units={units}
      onCommit={(next) => {
        const outcome = onCommit(next);
        if (outcome === null) setValueM(next);
        return outcome;
      }}
    />
  );
}

function field(): HTMLInputElement {
  return screen.getByLabelText('Trim') as HTMLInputElement;
}

function typeAndPress(text: string, key = 'Enter') {
  fireEvent.change(field(), { target: { value: text } });
  fireEvent.keyDown(field(), { key });
}

describe('LengthInput', () => {
  it('shows metres or feet and inches', () => {
    render(<Harness initialM={3.81} units="metric" onCommit={() => null} />);
    expect(field().value).toBe('3.81 m');
    cleanup();
    render(<Harness initialM={3.81} units="imperial" onCommit={() => null} />);
    // 3.81 m / 0.0254 = 150 in = 12 ft 6 in
    expect(field().value).toBe(`12' 6"`);
  });

  it.each([
    [`12'6"`, 'metric', 3.81], // 12 × 0.3048 + 6 × 0.0254 = 3.6576 + 0.1524
    ['3.8 m', 'imperial', 3.8],
    ['381 cm', 'metric', 3.81],
    ['2.5', 'metric', 2.5], // bare number: metres
    ['10', 'imperial', 3.048], // bare number: feet, 10 × 0.3048
  ] as const)('commits %j typed in %s as %j m on Enter', (text, units, expectedM) => {
    const onCommit = vi.fn((_valueM: number): CommitOutcome => null);
    render(<Harness initialM={1} units={units} onCommit={onCommit} />);
    typeAndPress(text);
    expect(onCommit).toHaveBeenCalledTimes(1);
    expect(onCommit.mock.calls[0][0]).toBeCloseTo(expectedM, 12);
    expect(field().getAttribute('aria-invalid')).toBeNull();
  });

  it('commits when the field is left', () => {
    const onCommit = vi.fn((_valueM: number): CommitOutcome => null);
    render(<Harness initialM={1} units="metric" onCommit={onCommit} />);
    fireEvent.change(field(), { target: { value: '2 m' } });
    fireEvent.blur(field());
    expect(onCommit).toHaveBeenCalledWith(2);
    expect(field().value).toBe('2.00 m');
  });

  it.each(['abc', '12 6', '', '3 m 2'])('refuses %j in place and does not commit', (text) => {
    const onCommit = vi.fn((_valueM: number): CommitOutcome => null);
    render(<Harness initialM={1} units="metric" onCommit={onCommit} />);
    typeAndPress(text);
    expect(onCommit).not.toHaveBeenCalled();
    const alert = screen.getByRole('alert');
    expect(alert.textContent).not.toBe('');
    expect(field().getAttribute('aria-invalid')).toBe('true');
    expect(field().getAttribute('aria-describedby')).toContain(alert.id);
    expect(field().value).toBe(text);
  });

  it('says why "12 6" is not a length', () => {
    render(<Harness initialM={1} units="metric" onCommit={() => null} />);
    typeAndPress('12 6');
    expect(screen.getByRole('alert').textContent).toBe('"12 6" is not a length: give a unit for "6"');
  });

  it('shows a refusal from the commit handler in place and keeps the typed text', () => {
    render(<Harness initialM={1} units="metric" onCommit={() => 'must be within 1 km'} />);
    typeAndPress('2000 m');
    expect(screen.getByRole('alert').textContent).toBe('must be within 1 km');
    expect(field().value).toBe('2000 m');
  });

  it('does not offer the same refused text again when the field is then left', () => {
    const onCommit = vi.fn((_valueM: number): CommitOutcome => 'refused');
    render(<Harness initialM={1} units="metric" onCommit={onCommit} />);
    typeAndPress('2 m');
    fireEvent.blur(field());
    expect(onCommit).toHaveBeenCalledTimes(1);
  });

  it('Escape restores the shown value and clears the message', () => {
    const onCommit = vi.fn((_valueM: number): CommitOutcome => null);
    render(<Harness initialM={1} units="metric" onCommit={onCommit} />);
    typeAndPress('abc');
    fireEvent.keyDown(field(), { key: 'Escape' });
    expect(field().value).toBe('1.00 m');
    expect(screen.queryByRole('alert')).toBeNull();
    expect(field().getAttribute('aria-invalid')).toBeNull();
    fireEvent.blur(field());
    expect(onCommit).not.toHaveBeenCalled();
  });

  it('never commits text the user did not change, so a rounded display moves nothing', () => {
    const onCommit = vi.fn((_valueM: number): CommitOutcome => null);
    render(<Harness initialM={3.8123} units="imperial" onCommit={onCommit} />);
    fireEvent.focus(field());
    fireEvent.keyDown(field(), { key: 'Enter' });
    fireEvent.blur(field());
    expect(onCommit).not.toHaveBeenCalled();
  });
});
