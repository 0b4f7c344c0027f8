// @vitest-environment jsdom
import { act, cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ListsPanel } from '@/components/panels/ListsPanel';
import { type PlotDocument, updatePosition } from '@/lib/plot';
import { tinyPlot, unit } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from './renderWithEditor';

afterEach(cleanup);

/** The tiny plot with a second pipe and three units: two on the front pipe (hung out of order), one free. */
function rigPlot(): PlotDocument {
  const plot = tinyPlot();
  return {
    ...plot,
    positions: [...plot.positions, { ...plot.positions[0], id: 'pos-2', name: 'Mid pipe', heightM: 5.5 }],
    fixtures: [
      { ...unit, id: 'fx-2', unit: 2, channel: 12 },
      unit,
      { ...unit, id: 'fx-3', positionId: null, unit: null, channel: null, typeId: 'type-zoom' },
    ],
  };
}

function fixtureList() {
  return within(screen.getByRole('listbox', { name: /Fixtures/ }));
}

describe('ListsPanel', () => {
  it('has a heading for the panel and for each list', () => {
    renderWithEditor(<ListsPanel />, rigPlot());
    expect(screen.getByRole('heading', { level: 2 }).textContent).toBe('In this plot');
    const lists = screen.getAllByRole('heading', { level: 3 }).map((heading) => heading.textContent);
    expect(lists).toEqual([
      'Fixtures (3)',
      'Positions (2)',
      'Subjects (1)',
      'Viewpoints (1)',
      'Acting areas (0)',
    ]);
    expect(screen.getByText('No acting areas drawn yet.')).toBeTruthy();
  });

  it('names units by position and unit number, type and channel, in hanging order', () => {
    renderWithEditor(<ListsPanel />, rigPlot());
    expect(
      fixtureList()
        .getAllByRole('option')
        .map((option) => option.textContent),
    ).toEqual([
      'Front pipe #1 — Profile 26°, ch 1',
      'Front pipe #2 — Profile 26°, ch 12',
      'Free-standing fx-3 — Zoom profile',
    ]);
    const positions = within(screen.getByRole('listbox', { name: /Positions/ }));
    expect(positions.getAllByRole('option').map((option) => option.textContent)).toEqual([
      'Front pipe — pipe, 6.00 m, 2 units',
      'Mid pipe — pipe, 5.50 m, 0 units',
    ]);
    const viewpoints = within(screen.getByRole('listbox', { name: /Viewpoints/ }));
    expect(viewpoints.getByRole('option').textContent).toBe('House centre — audience, main');
  });

  it('a click selects one item; Ctrl or Cmd+click adds to and takes from the selection', () => {
    const view = renderWithEditor(<ListsPanel />, rigPlot());
    const [first, second] = fixtureList().getAllByRole('option');
    fireEvent.click(first);
    expect(view.editor().selection).toEqual(['fx-1']);
    expect(first.getAttribute('aria-selected')).toBe('true');
    expect(second.getAttribute('aria-selected')).toBe('false');
    fireEvent.click(second, { ctrlKey: true });
    expect(view.editor().selection).toEqual(['fx-1', 'fx-2']);
    fireEvent.click(screen.getByRole('option', { name: /^Ada/ }), { metaKey: true });
    expect(view.editor().selection).toEqual(['fx-1', 'fx-2', 'sub-1']);
    fireEvent.click(first, { ctrlKey: true });
    expect(view.editor().selection).toEqual(['fx-2', 'sub-1']);
    fireEvent.click(screen.getByRole('option', { name: /^Mid pipe/ }));
    expect(view.editor().selection).toEqual(['pos-2']);
  });

  it('each list is one Tab stop, on its selected item when it has one', () => {
    const view = renderWithEditor(<ListsPanel />, rigPlot());
    const tabStops = () =>
      fixtureList()
        .getAllByRole('option')
        .map((option) => option.tabIndex);
    expect(tabStops()).toEqual([0, -1, -1]);
    view.select(['fx-2']);
    expect(tabStops()).toEqual([-1, 0, -1]);
  });

  it('arrow keys, Home and End move through a list and select as they go', () => {
    const view = renderWithEditor(<ListsPanel />, rigPlot());
    const options = fixtureList().getAllByRole('option');
    options[0].focus();
    fireEvent.keyDown(options[0], { key: 'ArrowDown' });
    expect(document.activeElement).toBe(options[1]);
    expect(view.editor().selection).toEqual(['fx-2']);
    fireEvent.keyDown(options[1], { key: 'End' });
    expect(document.activeElement).toBe(options[2]);
    expect(view.editor().selection).toEqual(['fx-3']);
    fireEvent.keyDown(options[2], { key: 'ArrowDown' });
    expect(document.activeElement).toBe(options[2]);
    fireEvent.keyDown(options[2], { key: 'Home' });
    expect(view.editor().selection).toEqual(['fx-1']);
    fireEvent.keyDown(options[0], { key: 'ArrowUp' });
    expect(document.activeElement).toBe(options[0]);
  });

  it('Enter and Space select; with Ctrl the arrows only move and Space toggles', () => {
    const view = renderWithEditor(<ListsPanel />, rigPlot());
    const options = fixtureList().getAllByRole('option');
    fireEvent.keyDown(options[1], { key: 'Enter' });
    expect(view.editor().selection).toEqual(['fx-2']);
    fireEvent.keyDown(options[1], { key: 'ArrowDown', ctrlKey: true });
    expect(document.activeElement).toBe(options[2]);
    expect(view.editor().selection).toEqual(['fx-2']);
    fireEvent.keyDown(options[2], { key: ' ', ctrlKey: true });
    expect(view.editor().selection).toEqual(['fx-2', 'fx-3']);
    fireEvent.keyDown(options[2], { key: ' ', ctrlKey: true });
    expect(view.editor().selection).toEqual(['fx-2']);
    fireEvent.keyDown(options[0], { key: ' ' });
    expect(view.editor().selection).toEqual(['fx-1']);
  });

  it('keeps its keys from reaching the editor’s window shortcuts', () => {
    renderWithEditor(<ListsPanel />, rigPlot());
    const windowKeys = vi.fn();
    window.addEventListener('keydown', windowKeys);
    try {
      const options = fixtureList().getAllByRole('option');
      fireEvent.keyDown(options[0], { key: 'ArrowDown' });
      fireEvent.keyDown(options[1], { key: 'Enter' });
      expect(windowKeys).not.toHaveBeenCalled();
      fireEvent.keyDown(options[1], { key: 'Delete' });
      expect(windowKeys).toHaveBeenCalledTimes(1);
    } finally {
      window.removeEventListener('keydown', windowKeys);
    }
  });

  it('follows the document: a renamed position relabels its units', () => {
    const view = renderWithEditor(<ListsPanel />, rigPlot());
    act(() => {
      view.editor().run(updatePosition, { id: 'pos-1', changes: { name: 'FOH bar' } });
    });
    expect(fixtureList().getAllByRole('option')[0].textContent).toBe('FOH bar #1 — Profile 26°, ch 1');
    expect(screen.getByRole('option', { name: /^FOH bar — pipe/ })).toBeTruthy();
  });
});
