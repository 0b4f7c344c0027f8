/** How items are named in the lists and headings. */
import type { Fixture, HangingPosition, PlotDocument } from '@/lib/plot';

/** Where a unit hangs: "Front pipe #3", or "Free-standing fx-7" for a unit on no position. */
export function unitPlace(fixture: Fixture, position: HangingPosition | undefined): string {
  if (!position) return `Free-standing ${fixture.id}`;
  return `${position.name} #${fixture.unit ?? '?'}`;
}

/** A function naming units as "Position #unit — type, ch N" for one document. */
export function fixtureLabeller(document: PlotDocument): (fixture: Fixture) => string {
  const positions = new Map(document.positions.map((position) => [position.id, position]));
  const types = new Map(document.fixtureTypes.map((type) => [type.id, type.name]));
  return (fixture) => {
    const place = unitPlace(
      fixture,
      fixture.positionId === null ? undefined : positions.get(fixture.positionId),
    );
    const type = types.get(fixture.typeId) ?? `missing type ${fixture.typeId}`;
    return `${place} — ${type}${fixture.channel === null ? '' : `, ch ${fixture.channel}`}`;
  };
}

/**
 * Units in the order a crew reads them: by position (in plot order), then unit number; free-standing
 * units last, in plot order.
 */
export function fixturesInHangingOrder(document: PlotDocument): Fixture[] {
  const rank = new Map(document.positions.map((position, index) => [position.id, index]));
  const order = (fixture: Fixture) =>
    fixture.positionId === null ? Number.POSITIVE_INFINITY : (rank.get(fixture.positionId) ?? 0);
  return document.fixtures
    .map((fixture, index) => ({ fixture, index }))
    .sort(
      (a, b) =>
        order(a.fixture) - order(b.fixture) ||
        (a.fixture.unit ?? 0) - (b.fixture.unit ?? 0) ||
        a.index - b.index,
    )
    .map((entry) => entry.fixture);
}
