// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NumberInput } from '@/components/inputs/NumberInput';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';

afterEach(cleanup);

function enter(label: string, text: string) {
  const input = screen.getByLabelText(label);
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
  return input as HTMLInputElement;
}

describe('NumberInput', () => {
  it('shows its value and the allowed range as its description', () => {
    render(<NumberInput label="Level" value={80} unit="%" min={0} max={100} onCommit={() => null} />);
    const input = screen.getByLabelText('Level') as HTMLInputElement;
    expect(input.value).toBe('80');
    const hint = document.getElementById(input.getAttribute('aria-describedby') ?? '');
    expect(hint?.textContent).toBe('0–100 %');
  });

  it('commits a value in range', () => {
    const onCommit = vi.fn((_value: number): CommitOutcome => null);
    render(<NumberInput label="Level" value={80} unit="%" min={0} max={100} onCommit={onCommit} />);
    enter('Level', '55 %');
    expect(onCommit).toHaveBeenCalledWith(55);
  });

  it('refuses 120 with a message naming the range, and does not commit', () => {
    const onCommit = vi.fn((_value: number): CommitOutcome => null);
    render(<NumberInput label="Level" value={80} unit="%" min={0} max={100} onCommit={onCommit} />);
    const input = enter('Level', '120');
    expect(onCommit).not.toHaveBeenCalled();
    expect(screen.getByRole('alert').textContent).toBe(
      '120 % is out of range: enter a number from 0 to 100 %.',
    );
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(input.value).toBe('120');
  });

  it('refuses text that is not a number', () => {
    const onCommit = vi.fn((_value: number): CommitOutcome => null);
    render(<NumberInput label="Level" value={80} unit="%" min={0} max={100} onCommit={onCommit} />);
    enter('Level', 'full');
    expect(onCommit).not.toHaveBeenCalled();
    expect(screen.getByRole('alert').textContent).toContain('from 0 to 100 %');
  });

  it('an optional field commits null when emptied', () => {
    const onCommit = vi.fn((_value: number | null): CommitOutcome => null);
    render(
      <NumberInput label="Channel" value={12} min={1} max={99999} integer optional onCommit={onCommit} />,
    );
    enter('Channel', '');
    expect(onCommit).toHaveBeenCalledWith(null);
  });

  it('a required field refuses empty text', () => {
    const onCommit = vi.fn((_value: number): CommitOutcome => null);
    render(<NumberInput label="Level" value={80} unit="%" min={0} max={100} onCommit={onCommit} />);
    enter('Level', '');
    expect(onCommit).not.toHaveBeenCalled();
    expect(screen.getByRole('alert').textContent).toBe('Enter a number from 0 to 100 %.');
  });

  it('Escape puts the value back', () => {
    render(<NumberInput label="Level" value={80} unit="%" min={0} max={100} onCommit={() => null} />);
    const input = enter('Level', '120');
    fireEvent.keyDown(input, { key: 'Escape' });
    expect(input.value).toBe('80');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('shows a value through its own format and reads fractions when allowed', () => {
    const onCommit = vi.fn((_value: number): CommitOutcome => null);
    render(
      <NumberInput
        label="Shutter time"
        value={0.02}
        unit="s"
        min={0}
        minExclusive
        max={60}
        allowFraction
        format={(seconds) => `1/${Math.round(1 / seconds)}`}
        onCommit={onCommit}
      />,
    );
    expect((screen.getByLabelText('Shutter time') as HTMLInputElement).value).toBe('1/50');
    enter('Shutter time', '1/100');
    expect(onCommit).toHaveBeenCalledWith(0.01);
  });
});
