// @vitest-environment jsdom
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { FixtureTypesDialog } from '@/components/library/FixtureTypesDialog';
import { readPhotometryFile } from '@/lib/formats';
import { type FixtureType, measuredTypeDraft } from '@/lib/plot';
import { cosinePower, range, writeLm63 } from '../../lib/formats/synthetic';
import { tinyPlot } from '../../lib/plot/tinyPlot';
import { renderWithEditor } from '../panels/renderWithEditor';

const realCreate = URL.createObjectURL;
const realRevoke = URL.revokeObjectURL;
afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
  vi.useRealTimers();
  URL.createObjectURL = realCreate;
  URL.revokeObjectURL = realRevoke;
});

function measuredType(id: string, fileName: string, keepText: boolean): FixtureType {
  // Windows line ends, a keyword line with non-ASCII text and trailing spaces: all must survive as they are.
  const text = writeLm63({
    vertical: range(0, 90, 5),
    horizontal: [0],
    intensity: cosinePower(800, 3),
  }).replace('[MORE] written by the tests from a formula', '[MORE] Prüfung — °, trailing   ');
  const type = { ...measuredTypeDraft(readPhotometryFile(text, fileName), { name: fileName }), id };
  if (type.photometry.kind !== 'measured') throw new Error('not measured');
  if (!keepText) type.photometry.file.originalText = null;
  return type;
}

function readBlob(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error);
    reader.readAsText(blob, 'utf-8');
  });
}

describe('exporting a measured type’s original file', () => {
  it('downloads the stored text unchanged under its file name', async () => {
    vi.useFakeTimers();
    const kept = measuredType('type-kept', 'wash cos3.ies', true);
    const plot = tinyPlot();
    renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, {
      ...plot,
      fixtureTypes: [...plot.fixtureTypes, kept],
    });
    const blobs: Blob[] = [];
    URL.createObjectURL = vi.fn((blob: Blob) => {
      blobs.push(blob);
      return 'blob:throwline/export-1';
    });
    URL.revokeObjectURL = vi.fn();
    const clicked: { href: string; download: string; attached: boolean }[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicked.push({ href: this.href, download: this.download, attached: this.isConnected });
    });

    const row = document.querySelector('[data-type-id="type-kept"]') as HTMLElement;
    fireEvent.click(within(row).getByRole('button', { name: 'Export wash cos3.ies' }));

    expect(clicked).toEqual([{ href: 'blob:throwline/export-1', download: 'wash cos3.ies', attached: true }]);
    expect(blobs).toHaveLength(1);
    const stored = kept.photometry.kind === 'measured' ? kept.photometry.file.originalText : null;
    expect(stored).toContain('Prüfung — °, trailing   \r\n');
    // The link is gone and its URL released once the click has been handled.
    expect(document.querySelector('a[download]')).toBeNull();
    expect(URL.revokeObjectURL).not.toHaveBeenCalled();
    vi.runAllTimers();
    expect(URL.revokeObjectURL).toHaveBeenCalledWith('blob:throwline/export-1');
    vi.useRealTimers();
    expect(blobs[0].type).toBe('text/plain;charset=utf-8');
    expect(await readBlob(blobs[0])).toBe(stored);
  });

  it('says plainly when the original was too large to keep', () => {
    const plot = tinyPlot();
    renderWithEditor(<FixtureTypesDialog initial={null} onClose={() => {}} />, {
      ...plot,
      fixtureTypes: [...plot.fixtureTypes, measuredType('type-big', 'big.ies', false)],
    });
    const row = document.querySelector('[data-type-id="type-big"]') as HTMLElement;
    expect(within(row).queryByRole('button', { name: /^Export/ })).toBeNull();
    expect(row.querySelector('[data-export-original="unavailable"]')?.textContent).toBe(
      'The original file was too large to keep (over 600,000 characters), so it cannot be exported; the show keeps only its candela grid.',
    );
    expect(screen.getAllByText(/too large to keep/)).toHaveLength(1);
  });
});
