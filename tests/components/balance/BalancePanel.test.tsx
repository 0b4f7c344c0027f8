// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, screen } from '@testing-library/react';
import { BalancePanel } from '@/components/balance/BalancePanel';
import { renderWithEditor } from '../panels/renderWithEditor';
import { tinyPlot } from '../../lib/plot/tinyPlot';

afterEach(cleanup);

function typeNumber(label: RegExp, value: string) {
  const field = screen.getByLabelText(label);
  fireEvent.change(field, { target: { value } });
  fireEvent.keyDown(field, { key: 'Enter' });
  fireEvent.blur(field);
}

describe('the balance panel', () => {
  it('proposes the level for a key light in lux, shows it before applying, applies it in one undo step', () => {
    // The tiny plot's one unit gives Ada's face 380.471 lx at full toward the house (I·cos i/d², see the
    // report test); linear dimming, so 100 lx needs 100/380.471 = 26.28 %, shown rounded to 26.3 %.
    const view = renderWithEditor(<BalancePanel />, tinyPlot());
    expect((screen.getByRole('checkbox', { name: 'Ada' }) as HTMLInputElement).checked).toBe(true);
    fireEvent.change(screen.getByLabelText('Key : fill given as'), { target: { value: 'none' } });
    // No camera in the plot: the key light is a number of lux.
    typeNumber(/^Key light \(lx\)/, '100');
    const row = screen.getByRole('row', { name: /Front pipe #1/ });
    expect(Number(row.getAttribute('data-proposed'))).toBeCloseTo(26.3, 9);
    expect(row.textContent).toContain('100 %');
    expect(row.textContent).toContain('26.3 %');
    expect(screen.getByRole('list', { name: 'What the proposal gives' }).textContent).toContain('key 100 lx');
    // Nothing changes until Apply.
    expect(view.document().fixtures[0].levelPct).toBe(100);
    fireEvent.click(screen.getByRole('button', { name: 'Apply these levels' }));
    expect(view.document().fixtures[0].levelPct).toBeCloseTo(26.3, 9);
    expect(screen.getByRole('button', { name: 'The units are at these levels' })).toBeTruthy();
    act(() => {
      view.editor().store.undo();
    });
    expect(view.document().fixtures[0].levelPct).toBe(100);
  });

  it('a key light out of reach says so, stays at 100 % and names the throw that would reach it', () => {
    // 1000 lx wanted, 380.471 lx at full: throw now from mount (0, −2, 6) to face (0, 2, 1.6):
    // √(16 + 19.36) = 5.946 m); needed 5.946·√(380.471/1000) = 3.668 m (inverse square, by hand).
    renderWithEditor(<BalancePanel />, tinyPlot());
    fireEvent.change(screen.getByLabelText('Key : fill given as'), { target: { value: 'none' } });
    typeNumber(/^Key light \(lx\)/, '1000');
    const row = screen.getByRole('row', { name: /Front pipe #1/ });
    expect(Number(row.getAttribute('data-proposed'))).toBe(100);
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toContain('Out of reach');
    expect(alert.textContent).toContain('throw of 3.67 m (now 5.95 m)');
    expect(alert.textContent).toMatch(/use a \d+\.\d° instead of a 26\.0° beam/);
  });

  it('a lighting ratio that cannot be read is explained, not solved', () => {
    renderWithEditor(<BalancePanel />, tinyPlot());
    fireEvent.change(screen.getByLabelText('Lighting ratio'), { target: { value: '1:1' } });
    expect(screen.getByRole('status').textContent).toContain('N above 1');
  });

  it('keeps the levels as a named set and chooses it; deleting it leaves the levels', () => {
    const view = renderWithEditor(<BalancePanel />, tinyPlot());
    fireEvent.click(screen.getByRole('button', { name: 'Keep these levels as…' }));
    fireEvent.change(screen.getByLabelText('Name of the new level set'), { target: { value: 'Scene 1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Keep' }));
    expect(view.document().levelSets.map((set) => set.name)).toEqual(['Scene 1']);
    expect(view.document().activeLevelSetId).toBe(view.document().levelSets[0].id);
    fireEvent.click(screen.getByRole('button', { name: 'Delete set' }));
    expect(view.document().levelSets).toEqual([]);
    expect(view.document().fixtures[0].levelPct).toBe(100);
  });
});
