/**
 * What the store does after every command, inside the same undo step: the chosen level set keeps
 * the fixtures' levels, and level sets and role overrides forget units that no longer exist.
 * Commands therefore need not know about level sets or overrides to keep the document valid.
 */
import type { Draft } from 'immer';
import type { PlotDocument } from './schema/document';

export function tidyReferences(draft: Draft<PlotDocument>): void {
  const levels = new Map(draft.fixtures.map((unit) => [unit.id, unit.levelPct]));
  for (const set of draft.levelSets) {
    const active = set.id === draft.activeLevelSetId;
    for (const fixtureId of Object.keys(set.levels)) {
      if (!levels.has(fixtureId)) delete set.levels[fixtureId];
    }
    if (!active) continue;
    for (const [fixtureId, level] of levels) {
      // Written only where it differs, so a command that changes no level records no patch here.
      if (set.levels[fixtureId] !== level) set.levels[fixtureId] = level;
    }
  }
  for (const person of draft.subjects) {
    for (const fixtureId of Object.keys(person.roleOverrides)) {
      if (!levels.has(fixtureId)) delete person.roleOverrides[fixtureId];
    }
  }
  if (draft.activeLevelSetId !== null && !draft.levelSets.some((set) => set.id === draft.activeLevelSetId))
    draft.activeLevelSetId = null;
}
