// @vitest-environment jsdom
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { ScheduleTable } from '@/components/paperwork/ScheduleTable';
import type { PlotDocument } from '@/lib/plot';
import { tinyPlot, unit } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from '../panels/renderWithEditor';

afterEach(cleanup);

/** Three units on the tiny plot's pipe, with circuits that only sort right in natural order. */
function threeUnits(): PlotDocument {
  return tinyPlot({
    fixtures: [
      unit,
      { ...unit, id: 'fx-2', unit: 2, channel: 12, circuit: 'A10', purpose: 'Box "A", 上手', levelPct: 50 },
      {
        ...unit,
        id: 'fx-3',
        unit: 3,
        channel: 3,
        circuit: 'A2',
        purpose: 'wash left',
        notes: 'check shutter',
      },
    ],
  });
}

/** The fixture ids of the table's rows, top to bottom. */
function rowOrder(): (string | null)[] {
  return [...document.querySelectorAll('tbody tr')].map((row) => row.getAttribute('data-fixture-id'));
}

function sortBy(column: string) {
  fireEvent.click(screen.getByRole('button', { name: new RegExp(`^${column}`) }));
}

function enter(label: string, text: string): HTMLElement {
  const input = screen.getByLabelText(label);
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
  return input;
}

describe('fixture schedule table', () => {
  it('lists every unit in hanging order, sorts by a column both ways and back', () => {
    renderWithEditor(<ScheduleTable />, threeUnits());
    expect(rowOrder()).toEqual(['fx-1', 'fx-2', 'fx-3']);
    // Natural order, as a crew reads circuit labels (common practice, no source): A1, A2, A10.
    sortBy('Circuit');
    expect(rowOrder()).toEqual(['fx-1', 'fx-3', 'fx-2']);
    expect(screen.getByRole('columnheader', { name: /Circuit/ }).getAttribute('aria-sort')).toBe('ascending');
    sortBy('Circuit');
    expect(rowOrder()).toEqual(['fx-2', 'fx-3', 'fx-1']);
    sortBy('Circuit');
    expect(rowOrder()).toEqual(['fx-1', 'fx-2', 'fx-3']);
    // Channels as numbers, not text: 1, 3, 12.
    sortBy('Channel');
    expect(rowOrder()).toEqual(['fx-1', 'fx-3', 'fx-2']);
  });

  it('filters by words in any cell, non-Latin text too', () => {
    renderWithEditor(<ScheduleTable />, threeUnits());
    const filter = screen.getByLabelText(/Filter/);
    fireEvent.change(filter, { target: { value: '上手' } });
    expect(rowOrder()).toEqual(['fx-2']);
    expect(screen.getByRole('status').textContent).toBe('1 of 3 units');
    fireEvent.change(filter, { target: { value: 'shutter wash' } });
    expect(rowOrder()).toEqual(['fx-3']);
    fireEvent.change(filter, { target: { value: '' } });
    expect(rowOrder()).toEqual(['fx-1', 'fx-2', 'fx-3']);
  });

  it('edits in place through the fixture command', () => {
    const view = renderWithEditor(<ScheduleTable />, threeUnits());
    enter('Level of Front pipe unit 2', '40');
    expect(view.document().fixtures[1].levelPct).toBe(40);
    enter('Purpose of Front pipe unit 1', 'Box "B", 下手');
    expect(view.document().fixtures[0].purpose).toBe('Box "B", 下手');
    enter('Circuit of Front pipe unit 3', '');
    expect(view.document().fixtures[2].circuit).toBeNull();
    expect(view.editor().store.undoLabels()).toEqual(['Edit fixture', 'Edit fixture', 'Edit fixture']);
  });

  it('a refused edit shows the schema message at the cell and leaves the document unchanged', () => {
    const view = renderWithEditor(<ScheduleTable />, threeUnits());
    const before = view.document();
    const input = enter('Channel of Front pipe unit 1', '2.5');
    const cell = input.closest('td');
    if (!cell) throw new Error('no cell');
    // The schema (lib/plot/schema/fixture.ts): a channel must be a whole number.
    expect(within(cell).getByRole('alert').textContent).toMatch(/channel: must be a whole number/);
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect((input as HTMLInputElement).value).toBe('2.5');
    expect(view.document()).toBe(before);
    const level = enter('Level of Front pipe unit 2', '150');
    expect(within(level.closest('td') as HTMLElement).getByRole('alert').textContent).toMatch(
      /levelPct: must be between 0 and 100/,
    );
    enter('Channel of Front pipe unit 3', 'twelve');
    expect(screen.getByText('"twelve" is not a number')).toBeTruthy();
    expect(view.document()).toBe(before);
    expect(view.editor().store.canUndo()).toBe(false);
  });
});
