import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadPlotText, replacePlot, savePlotText } from '@/lib/plot';
import { expectRefused, expectUndoableChange } from './commandHarness';
import { tinyPlot } from './tinyPlot';

const conference = () => {
  const loaded = loadPlotText(readFileSync(path.join('public', 'demo', 'conference.json'), 'utf8'));
  if (!loaded.ok) throw new Error(loaded.errors.join('\n'));
  return loaded.document;
};

describe('plot file export and import', () => {
  it('export → import gives back the same document (conference demo and a plot with awkward text)', () => {
    const awkward = tinyPlot();
    awkward.fixtures[0].purpose = 'Box "A", 上手';
    awkward.fixtures[0].notes = 'line one\nline two';
    for (const document of [conference(), awkward]) {
      const loaded = loadPlotText(savePlotText(document));
      expect(loaded.ok).toBe(true);
      if (loaded.ok) expect(loaded.document).toEqual(document);
    }
  });

  it('a bad file names the path of each problem and gives no document', () => {
    const file = JSON.parse(savePlotText(tinyPlot()));
    file.fixtures[0].levelPct = 'full';
    file.positions[0].kind = 'rope';
    const loaded = loadPlotText(JSON.stringify(file));
    expect(loaded.ok).toBe(false);
    if (!loaded.ok) {
      expect(loaded.errors).toContain('fixtures[0].levelPct: must be a number');
      expect(loaded.errors.some((line) => line.startsWith('positions[0].kind: must be one of'))).toBe(true);
    }
    expect(loadPlotText('{ not json').ok).toBe(false);
  });

  it('replacing the plot with an imported one is one undoable step', () => {
    const replaced = expectUndoableChange(tinyPlot(), replacePlot, { document: conference() });
    expect(replaced).toEqual(conference());
  });

  it('a document that is not valid is refused with its path and the plot is unchanged', () => {
    const broken = { ...tinyPlot(), focusPlaneHeightM: -1 };
    expectRefused(tinyPlot(), replacePlot, { document: broken }, /plot file\.focusPlaneHeightM/);
  });
});
