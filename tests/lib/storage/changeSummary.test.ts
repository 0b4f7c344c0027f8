import { describe, expect, it } from 'vitest';
import { summarizeChange } from '@/lib/storage/changeSummary';
import { demoDocument, withFixtureMoved } from './support/documents';

const base = demoDocument();

describe('summarizeChange', () => {
  it('equal documents are "no changes"', () => {
    expect(summarizeChange(base, structuredClone(base))).toBe('no changes');
  });

  it('counts moved and added fixtures with the noun once: "3 fixtures moved, 1 added"', () => {
    let after = withFixtureMoved(base, 0, 0.5);
    after = withFixtureMoved(after, 1, -0.5);
    after = withFixtureMoved(after, 2, 0.25);
    const added = { ...base.fixtures[0], id: 'fx-new-1' };
    after = { ...after, fixtures: [...after.fixtures, added] };
    expect(summarizeChange(base, after)).toBe('3 fixtures moved, 1 added');
  });

  it('a re-aimed, a removed and a renamed show are each named', () => {
    const [first, second, ...rest] = base.fixtures;
    const after = {
      ...base,
      name: 'Renamed',
      fixtures: [{ ...first, focus: { ...first.focus, x: first.focus.x + 1 } }, ...rest],
    };
    expect(second).toBeDefined();
    expect(summarizeChange(base, after)).toBe('1 fixture re-aimed, 1 removed; show renamed');
  });

  it('a level change is "changed", a subject move is "moved"', () => {
    const subject = base.subjects[0];
    const after = {
      ...base,
      fixtures: base.fixtures.map((unit, index) =>
        index === 0 ? { ...unit, levelPct: unit.levelPct / 2 } : unit,
      ),
      subjects: base.subjects.map((person) =>
        person.id === subject.id ? { ...person, mark: { x: person.mark.x + 1, y: person.mark.y } } : person,
      ),
    };
    expect(summarizeChange(base, after)).toBe('1 fixture changed; 1 subject moved');
  });

  it('key order inside items does not count as a change', () => {
    const reordered = {
      ...base,
      fixtures: base.fixtures.map(
        (unit) => Object.fromEntries(Object.entries(unit).reverse()) as typeof unit,
      ),
    };
    expect(summarizeChange(base, reordered)).toBe('no changes');
  });
});
