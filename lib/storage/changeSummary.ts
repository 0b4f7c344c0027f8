/**
 * A short account of what changed between two revisions of a plot, for the revision list:
 * "3 fixtures moved, 1 added; 1 subject moved; show renamed". Items are matched by id.
 */
import type { PlotDocument } from '@/lib/plot';
import { sameJson } from '@/lib/plot/sameJson';

interface Keyed {
  readonly id: string;
}

/** Counts of what happened to one collection; `moved` and `aimed` only where they apply. */
interface CollectionChange {
  added: number;
  removed: number;
  moved: number;
  aimed: number;
  changed: number;
}

/** Which fields make a change a "move" or a "re-aim" rather than some other edit. */
interface Classifier<Item> {
  readonly moved?: (before: Item, after: Item) => boolean;
  readonly aimed?: (before: Item, after: Item) => boolean;
}

function compareCollection<Item extends Keyed>(
  before: readonly Item[],
  after: readonly Item[],
  classify: Classifier<Item> = {},
): CollectionChange {
  const counts: CollectionChange = { added: 0, removed: 0, moved: 0, aimed: 0, changed: 0 };
  const earlier = new Map(before.map((item) => [item.id, item]));
  const later = new Set(after.map((item) => item.id));
  for (const item of after) {
    const old = earlier.get(item.id);
    if (old === undefined) {
      counts.added += 1;
      continue;
    }
    if (sameJson(old, item)) continue;
    const moved = classify.moved?.(old, item) ?? false;
    const aimed = classify.aimed?.(old, item) ?? false;
    if (moved) counts.moved += 1;
    if (aimed) counts.aimed += 1;
    if (!moved && !aimed) counts.changed += 1;
  }
  for (const item of before) if (!later.has(item.id)) counts.removed += 1;
  return counts;
}

/** "3 fixtures moved, 1 added" — the noun once, in the first phrase's number. */
function describeCollection(counts: CollectionChange, singular: string, plural: string): string | null {
  const phrases: [number, string][] = [
    [counts.moved, 'moved'],
    [counts.aimed, 're-aimed'],
    [counts.changed, 'changed'],
    [counts.added, 'added'],
    [counts.removed, 'removed'],
  ];
  const parts = phrases.filter(([count]) => count > 0);
  if (parts.length === 0) return null;
  return parts
    .map(([count, verb], index) =>
      index === 0 ? `${count} ${count === 1 ? singular : plural} ${verb}` : `${count} ${verb}`,
    )
    .join(', ');
}

function showSettingsChange(before: PlotDocument, after: PlotDocument): string[] {
  const notes: string[] = [];
  if (before.name !== after.name) notes.push('show renamed');
  const settingsChanged =
    before.venue !== after.venue ||
    before.notes !== after.notes ||
    before.displayUnits !== after.displayUnits ||
    before.focusPlaneHeightM !== after.focusPlaneHeightM ||
    before.mainViewpointId !== after.mainViewpointId;
  if (settingsChanged) notes.push('show settings changed');
  if (!sameJson(before.stage.outline, after.stage.outline)) notes.push('stage outline changed');
  return notes;
}

/** What changed from `before` to `after`; "no changes" when they are equal. */
export function summarizeChange(before: PlotDocument, after: PlotDocument): string {
  const moved = <Item extends { mount: unknown; positionId: unknown }>(a: Item, b: Item) =>
    !sameJson(a.mount, b.mount) || a.positionId !== b.positionId;
  const parts = [
    describeCollection(
      compareCollection(before.fixtures, after.fixtures, {
        moved,
        aimed: (a, b) => !sameJson(a.focus, b.focus),
      }),
      'fixture',
      'fixtures',
    ),
    describeCollection(compareCollection(before.positions, after.positions), 'position', 'positions'),
    describeCollection(
      compareCollection(before.fixtureTypes, after.fixtureTypes),
      'fixture type',
      'fixture types',
    ),
    describeCollection(
      compareCollection(before.subjects, after.subjects, { moved: (a, b) => !sameJson(a.mark, b.mark) }),
      'subject',
      'subjects',
    ),
    describeCollection(compareCollection(before.viewpoints, after.viewpoints), 'viewpoint', 'viewpoints'),
    describeCollection(
      compareCollection(before.stage.acting, after.stage.acting),
      'acting area',
      'acting areas',
    ),
    ...showSettingsChange(before, after),
  ].filter((part): part is string => part !== null);
  return parts.length === 0 ? 'no changes' : parts.join('; ');
}
