// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SelectInput } from '@/components/inputs/SelectInput';
import { TextInput } from '@/components/inputs/TextInput';
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';

afterEach(cleanup);

describe('TextInput', () => {
  it('commits on Enter and shows a refusal in place', () => {
    const onCommit = vi.fn((text: string): CommitOutcome =>
      text.trim() === '' ? 'must not be empty' : null,
    );
    render(<TextInput label="Name" value="Front pipe" onCommit={onCommit} />);
    const input = screen.getByLabelText('Name');
    fireEvent.change(input, { target: { value: '   ' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(screen.getByRole('alert').textContent).toBe('must not be empty');
    fireEvent.change(input, { target: { value: 'FOH bar' } });
    expect(screen.queryByRole('alert')).toBeNull();
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(onCommit).toHaveBeenLastCalledWith('FOH bar');
  });

  it('a multi-line field keeps Enter for new lines and commits with Ctrl+Enter or on leaving', () => {
    const onCommit = vi.fn((_text: string): CommitOutcome => null);
    render(<TextInput label="Notes" value="" multiline onCommit={onCommit} />);
    const area = screen.getByLabelText('Notes');
    expect(area.tagName).toBe('TEXTAREA');
    fireEvent.change(area, { target: { value: 'line one' } });
    fireEvent.keyDown(area, { key: 'Enter' });
    expect(onCommit).not.toHaveBeenCalled();
    fireEvent.keyDown(area, { key: 'Enter', ctrlKey: true });
    expect(onCommit).toHaveBeenCalledWith('line one');
  });
});

describe('SelectInput', () => {
  const options = [
    { value: 'metric', label: 'Metric' },
    { value: 'imperial', label: 'Imperial' },
  ] as const;

  it('commits the chosen value at once', () => {
    const onCommit = vi.fn((_value: 'metric' | 'imperial'): CommitOutcome => null);
    render(<SelectInput label="Units" value="metric" options={options} onCommit={onCommit} />);
    fireEvent.change(screen.getByLabelText('Units'), { target: { value: 'imperial' } });
    expect(onCommit).toHaveBeenCalledWith('imperial');
  });

  it('shows a refusal beside the choice', () => {
    render(<SelectInput label="Units" value="metric" options={options} onCommit={() => 'not now'} />);
    fireEvent.change(screen.getByLabelText('Units'), { target: { value: 'imperial' } });
    expect(screen.getByRole('alert').textContent).toBe('not now');
    expect(screen.getByLabelText('Units').getAttribute('aria-invalid')).toBe('true');
  });

  it('offers a disabled placeholder when no single value applies', () => {
    render(
      <SelectInput
        label="Units"
        value={null}
        placeholder="(mixed)"
        options={options}
        onCommit={() => null}
      />,
    );
    const select = screen.getByLabelText('Units') as HTMLSelectElement;
    expect(select.value).toBe('');
    expect(select.options[0].textContent).toBe('(mixed)');
    expect(select.options[0].disabled).toBe(true);
  });
});
