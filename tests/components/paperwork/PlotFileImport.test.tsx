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
  await pick(new File([text], name, { type: 'application/json' }));
}

async function pick(file: File) {
  const input = screen.getByLabelText('Open plot file…');
  await act(async () => {
    fireEvent.change(input, { target: { files: [file] } });
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

  it('a file that cannot be read says so by name and changes nothing (no unhandled rejection)', async () => {
    const view = renderWithEditor(<PlotFileImport />, tinyPlot());
    const before = view.document();
    const file = new File(['{}'], 'gone.json', { type: 'application/json' });
    // As when the file was moved or its permissions changed after it was picked.
    Object.defineProperty(file, 'text', {
      value: () => Promise.reject(new DOMException('The file could not be read.', 'NotReadableError')),
    });
    await pick(file);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('gone.json cannot be opened; nothing was changed');
    expect(alert.textContent).toContain('could not read gone.json: The file could not be read.');
    expect(view.document()).toBe(before);
    expect(view.editor().store.canUndo()).toBe(false);
  });

  it('a refused replacement shows why, changes nothing and keeps the choice open', async () => {
    const view = renderWithEditor(<PlotFileImport />, tinyPlot());
    const before = view.document();
    await pickFile(savePlotText(tinyPlot({ name: 'Other show' })), 'other.json');
    vi.spyOn(window, 'confirm').mockReturnValue(true);
    // The store refuses the command (as it does for any command that fails its checks).
    const dispatch = vi
      .spyOn(view.editor().store, 'dispatch')
      .mockReturnValueOnce({ ok: false, message: 'plot file: fixtures[0].levelPct: must be a number' });
    fireEvent.click(screen.getByRole('button', { name: 'Replace this plot…' }));
    expect(dispatch).toHaveBeenCalledTimes(1);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The plot was not replaced; nothing was changed');
    expect(alert.textContent).toContain('plot file: fixtures[0].levelPct: must be a number');
    expect(view.document()).toBe(before);
    expect(screen.getByRole('button', { name: 'Open as a new show' })).toBeTruthy();
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
