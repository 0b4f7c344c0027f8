// @vitest-environment jsdom
import { act, cleanup, fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { PlotFileImport } from '@/components/paperwork/PlotFileImport';
import { savePlotText } from '@/lib/plot';
import { tinyPlot } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from '../panels/renderWithEditor';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: vi.fn() }) }));

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

async function pickFile(text: string, name: string) {
  const input = screen.getByLabelText('Open plot file…');
  await act(async () => {
    fireEvent.change(input, { target: { files: [new File([text], name, { type: 'application/json' })] } });
  });
}

describe('opening a plot file in the editor', () => {
  it('a bad file lists its problems by path and changes nothing', async () => {
    const view = renderWithEditor(<PlotFileImport />, tinyPlot());
    const before = view.document();
    const file = JSON.parse(savePlotText(tinyPlot()));
    file.fixtures[0].levelPct = 'full';
    await pickFile(JSON.stringify(file), 'broken.json');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('broken.json cannot be opened; nothing was changed');
    expect(alert.textContent).toContain('fixtures[0].levelPct: must be a number');
    expect(view.document()).toBe(before);
    expect(view.editor().store.canUndo()).toBe(false);
  });

  it('replaces the plot only after asking, as one undoable step', async () => {
    const view = renderWithEditor(<PlotFileImport />, tinyPlot());
    const before = view.document();
    const other = tinyPlot({ name: 'Other show 上手' });
    await pickFile(savePlotText(other), 'other.json');
    const confirm = vi.spyOn(window, 'confirm').mockReturnValueOnce(false);
    fireEvent.click(screen.getByRole('button', { name: 'Replace this plot…' }));
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(view.document()).toBe(before);
    confirm.mockReturnValueOnce(true);
    fireEvent.click(screen.getByRole('button', { name: 'Replace this plot…' }));
    expect(view.document()).toEqual(other);
    act(() => {
      view.editor().store.undo();
    });
    expect(view.document()).toEqual(before);
  });
});
