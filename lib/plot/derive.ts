/**
 * Derived figures for the views, memoised so a drag recomputes only what changed. Immer keeps
 * unchanged fixtures and types as the same objects, so per-unit results are cached by identity.
 */
import { type FixtureFocus, type RigFixture, fixtureFocus } from '../analysis';
import type { PlotDocument } from './schema/document';
import type { Fixture } from './schema/fixture';
import type { FixtureType } from './schema/fixtureType';
import { resolveFixture } from './resolve';

export interface DerivedUnit {
  readonly fixture: Fixture;
  readonly type: FixtureType;
  readonly rig: RigFixture;
  readonly focus: FixtureFocus;
}

export interface DerivedPlot {
  readonly document: PlotDocument;
  /** Every unit whose type exists, in document order. */
  readonly units: readonly DerivedUnit[];
  readonly byId: ReadonlyMap<string, DerivedUnit>;
  readonly rig: readonly RigFixture[];
}

/** A deriver remembers per-unit results between calls; make one per open document view. */
export function createPlotDeriver(): (document: PlotDocument) => DerivedPlot {
  let cache = new WeakMap<Fixture, { type: FixtureType; planeZ: number; unit: DerivedUnit }>();
  let last: DerivedPlot | null = null;
  return (document) => {
    if (last && last.document === document) return last;
    const types = new Map(document.fixtureTypes.map((type) => [type.id, type]));
    const nextCache = new WeakMap<Fixture, { type: FixtureType; planeZ: number; unit: DerivedUnit }>();
    const units: DerivedUnit[] = [];
    for (const fixture of document.fixtures) {
      const type = types.get(fixture.typeId);
      if (!type) continue;
      const cached = cache.get(fixture);
      let unit: DerivedUnit;
      if (cached && cached.type === type && cached.planeZ === document.focusPlaneHeightM) {
        unit = cached.unit;
      } else {
        const rig = resolveFixture(fixture, type);
        unit = { fixture, type, rig, focus: fixtureFocus(rig, document.focusPlaneHeightM) };
      }
      nextCache.set(fixture, { type, planeZ: document.focusPlaneHeightM, unit });
      units.push(unit);
    }
    cache = nextCache;
    last = {
      document,
      units,
      byId: new Map(units.map((unit) => [unit.fixture.id, unit])),
      rig: units.map((unit) => unit.rig),
    };
    return last;
  };
}
