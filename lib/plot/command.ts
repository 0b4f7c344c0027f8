/**
 * A command is the only way the document changes: a named function that edits an immer draft,
 * registered once and called by toolbar, shortcut, panel and context menu alike through
 * `store.dispatch(command, args)`. A command that cannot do what it is asked throws CommandRefused
 * with a message for the user; the store then leaves the document exactly as it was.
 */
import type { Draft } from 'immer';
import type { z } from 'zod';
import type { PlotDocument } from './schema/document';
import { describeIssues } from './issues';

export interface Command<Args> {
  /** Stable identifier, e.g. `fixture.aim`. */
  readonly name: string;
  /** What the undo history shows, e.g. "Aim fixture". */
  readonly label: (args: Args) => string;
  readonly apply: (draft: Draft<PlotDocument>, args: Args) => void;
}

/** Thrown by a command that must refuse; the message is shown to the user as it is. */
export class CommandRefused extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CommandRefused';
  }
}

export function defineCommand<Args>(command: Command<Args>): Command<Args> {
  return command;
}

/** Validate `value` with `schema` or refuse, naming `where` in each message. */
export function checked<T>(schema: z.ZodType<T>, value: unknown, where: string): T {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const lines = describeIssues(result.error.issues).map((line) =>
    line.startsWith('(the file)') ? `${where}${line.slice(10)}` : `${where}.${line}`,
  );
  throw new CommandRefused(lines.join('\n'));
}

/** Find an item by id in a draft collection or refuse. */
export function findOrRefuse<T extends { id: string }>(items: T[], id: string, what: string): T {
  const found = items.find((item) => item.id === id);
  if (!found) throw new CommandRefused(`There is no ${what} with id "${id}".`);
  return found;
}

/** Every item with an id in the document (ids are unique across all of them). */
function itemsWithIds(document: PlotDocument): readonly { readonly id: string }[] {
  return [
    ...document.stage.acting,
    ...document.positions,
    ...document.fixtureTypes,
    ...document.fixtures,
    ...document.subjects,
    ...document.viewpoints,
    ...document.levelSets,
    ...document.power.feeders,
  ];
}

/** A fresh id `prefix-N` with N one more than any id of that form in the document. */
export function nextId(document: PlotDocument, prefix: string): string {
  const all = itemsWithIds(document);
  const pattern = new RegExp(`^${prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}-(\\d+)$`);
  let highest = 0;
  for (const item of all) {
    const match = pattern.exec(item.id);
    if (match) highest = Math.max(highest, Number(match[1]));
  }
  return `${prefix}-${highest + 1}`;
}

/** Refuse when an id is already used anywhere in the document. */
export function requireFreeId(document: PlotDocument, id: string): void {
  if (itemsWithIds(document).some((item) => item.id === id))
    throw new CommandRefused(`The id "${id}" is already used in this plot.`);
}
