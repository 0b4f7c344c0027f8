// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, screen } from '@testing-library/react';
import { BalancePanel } from '@/components/balance/BalancePanel';
import { renderWithEditor } from '../panels/renderWithEditor';
import { setLevels } from '@/lib/plot';
import { tinyPlot } from '../../lib/plot/tinyPlot';
import { twoKeysOneFill } from '../../lib/plot/twoKeysOneFill';

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
    expect(alert.textContent).toMatch(
      /use a \d+\.\d° instead of a 26\.0° beam \(field \d+\.\d°; a smaller pool\)/,
    );
    // What the figures assume, and the caution about moving a hot unit closer.
    expect(alert.textContent).toContain('if the face stays at the beam centre');
    expect(alert.textContent).toContain(
      'a narrower beam of the same lumens has a higher peak but gives a smaller pool',
    );
    expect(alert.textContent).toContain('the maker’s minimum distance to people and to scenery');
  });

  it('a lighting ratio that cannot be read is explained, not solved', () => {
    renderWithEditor(<BalancePanel />, tinyPlot());
    fireEvent.change(screen.getByLabelText('Lighting ratio'), { target: { value: 'two' } });
    expect(screen.getByRole('status').textContent).toContain('N of 2 or more');
    expect(screen.queryByRole('table', { name: 'Proposed levels' })).toBeNull();
  });

  it('a lighting ratio below 2:1 or negative stops is refused: the key is the brighter side by definition', () => {
    renderWithEditor(<BalancePanel />, tinyPlot());
    const ratio = screen.getByLabelText('Lighting ratio');
    // 1.5:1 would be key = half the fill (common practice: 2:1 is key = fill, the least).
    fireEvent.change(ratio, { target: { value: '1.5:1' } });
    const said = 'The lighting ratio must be 2:1 or more: the key is the brighter side by definition';
    expect(screen.getByRole('status').textContent).toContain(said);
    expect(ratio.getAttribute('aria-invalid')).toBe('true');
    const describedBy = ratio.getAttribute('aria-describedby') ?? '';
    expect(document.getElementById(describedBy)?.textContent).toContain(said);
    fireEvent.change(ratio, { target: { value: '2:1' } });
    expect(ratio.getAttribute('aria-invalid')).toBeNull();
    expect(screen.getByRole('table', { name: 'Proposed levels' })).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Key : fill given as'), { target: { value: 'stops' } });
    typeNumber(/^Key over fill/, '-1');
    expect(
      screen.getByText(/-1 stops is out of range: enter a number from 0 to 6 stops/).getAttribute('role'),
    ).toBe('alert');
    expect(
      screen.getByText(/The key is the brighter side by definition: 0 stops is key = fill/),
    ).toBeTruthy();
  });

  it('keeps the roles the balance used: two key units and one fill at 2:1, shown before Apply, one undo step', () => {
    // See twoKeysOneFill: 512 lx at 2:1 puts F at 80 % and K1 + K2 sharing 512 lx, so by the rule F
    // (the brightest single front unit) would become the key; the proposal keeps the solve's roles.
    const view = renderWithEditor(<BalancePanel />, twoKeysOneFill());
    typeNumber(/^Key light \(lx\)/, '512');
    const kept = screen.getByRole('list', { name: 'Roles kept on Apply' });
    expect(kept.textContent).toContain('Free-standing f kept as fill on Ada');
    expect(kept.textContent).toContain('Free-standing k1 kept as key on Ada');
    expect(kept.textContent).toContain('Free-standing k2 kept as key on Ada');
    const before = view.document();
    fireEvent.click(screen.getByRole('button', { name: 'Apply these levels' }));
    expect(view.document().fixtures.find((unit) => unit.id === 'f')?.levelPct).toBeCloseTo(80, 9);
    expect(view.document().subjects[0].roleOverrides).toEqual({ k1: 'key', k2: 'key', f: 'fill' });
    // Applied: the rule and the balance now agree, nothing left to keep.
    expect(screen.queryByRole('list', { name: 'Roles kept on Apply' })).toBeNull();
    act(() => {
      view.editor().store.undo();
    });
    expect(view.document()).toEqual(before);
  });

  it('choosing a set while the levels are in no set asks first: cancel, keep them as a set first, or choose anyway', () => {
    const view = renderWithEditor(<BalancePanel />, tinyPlot());
    fireEvent.click(screen.getByRole('button', { name: 'Keep these levels as…' }));
    fireEvent.change(screen.getByLabelText('Name of the new level set'), { target: { value: 'Full' } });
    fireEvent.click(screen.getByRole('button', { name: 'Keep' }));
    const full = view.document().levelSets[0].id;
    const choose = (id: string) =>
      fireEvent.change(screen.getByLabelText('Level set'), { target: { value: id } });
    choose('');
    // At the set's levels (100 %): choosing it again needs no question.
    choose(full);
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(view.document().activeLevelSetId).toBe(full);
    choose('');
    act(() => {
      view.editor().store.dispatch(setLevels, { levels: { 'fx-1': 40 } });
    });

    // 40 % is in no set: choosing Full asks; Cancel leaves everything as it is.
    choose(full);
    expect(screen.getByRole('alertdialog').textContent).toContain('These levels are in no set');
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(view.document().fixtures[0].levelPct).toBe(40);
    expect(view.document().activeLevelSetId).toBeNull();

    // Keep them as a set first: the 40 % become a new set, then Full is chosen.
    choose(full);
    fireEvent.click(screen.getByRole('button', { name: 'Keep them as a set first' }));
    fireEvent.change(screen.getByLabelText('Name of the new level set'), { target: { value: 'Dim' } });
    fireEvent.click(screen.getByRole('button', { name: 'Keep' }));
    const sets = view.document().levelSets;
    expect(sets.map((set) => set.name)).toEqual(['Full', 'Dim']);
    expect(sets[1].levels).toEqual({ 'fx-1': 40 });
    expect(view.document().activeLevelSetId).toBe(full);
    expect(view.document().fixtures[0].levelPct).toBe(100);

    // Choose anyway: the unkept levels give way to the set's.
    choose('');
    act(() => {
      view.editor().store.dispatch(setLevels, { levels: { 'fx-1': 25 } });
    });
    choose(full);
    fireEvent.click(screen.getByRole('button', { name: 'Choose anyway' }));
    expect(view.document().fixtures[0].levelPct).toBe(100);
    expect(view.document().activeLevelSetId).toBe(full);
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
