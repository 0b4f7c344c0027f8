/** Replace the whole plot with another (opening a plot file over the current one), as one undoable step. */
import type { Draft } from 'immer';
import { checked, defineCommand } from '../command';
import { type PlotDocument, plotDocument } from '../schema/document';

/** Put every part of `document` in place of the current plot's; undo brings the old plot back whole. */
export const replacePlot = defineCommand<{ document: PlotDocument }>({
  name: 'plot.replace',
  label: ({ document }) => `Replace the plot with ${document.name}`,
  apply(draft, { document }) {
    const next = checked(plotDocument, document, 'plot file') as Draft<PlotDocument>;
    const target = draft as unknown as Record<string, unknown>;
    for (const key of Object.keys(target)) if (!(key in next)) delete target[key];
    Object.assign(draft, next);
  },
});
