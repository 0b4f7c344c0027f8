import { describe, expect, it } from 'vitest';
import { fixtureFocus, fixtureIlluminanceLx, subjectFaceLight } from '@/lib/analysis';
import { readPhotometryFile } from '@/lib/formats';
import { vec3 } from '@/lib/geometry';
import { relativeIntensity } from '@/lib/photometry';
import {
  type FixtureType,
  LIBRARY,
  addFixtureType,
  addLibraryFixtureType,
  deleteFixtureType,
  duplicateFixtureType,
  fixtureType,
  fixtureTypeRuleProblems,
  loadPlotText,
  measuredTypeDraft,
  resolveFixture,
  resolveRig,
  retypeFixtures,
  savePlotText,
  subjectPlacements,
  mainViewpointPosition,
} from '@/lib/plot';
import { lopsided, range, writeLm63 } from '../formats/synthetic';
import { expectRefused, expectUndoableChange } from './commandHarness';
import { profileType, tinyPlot, unit } from './tinyPlot';

// The tiny plot's 26°/40°, 20 000 cd profile written out as a measured file on a 0.25° grid: the
// measured path must give the beam model's own figures (same distribution, two routes).
const beamModelFile = readPhotometryFile(
  writeLm63({
    vertical: range(0, 90, 0.25),
    horizontal: [0],
    intensity: (gamma) => (gamma >= 90 ? 0 : 20000 * relativeIntensity(gamma, 26, 40)),
  }),
  'beam-model.ies',
);
const measuredType: FixtureType = { ...measuredTypeDraft(beamModelFile), id: 'type-measured' };

describe('a measured fixture type in the document', () => {
  it('is a valid type, and a plot holding one saves and loads unchanged', () => {
    expect(fixtureType.safeParse(measuredType).success).toBe(true);
    expect(measuredType.photometry.kind === 'measured' && measuredType.photometry.file.originalText).toBe(
      beamModelFile.originalText,
    );
    const plot = tinyPlot({ fixtureTypes: [profileType, measuredType] });
    const loaded = loadPlotText(savePlotText(plot));
    expect(loaded.ok && loaded.document).toEqual(plot);
  });

  it('a broken grid is named with its path', () => {
    const broken = structuredClone(measuredType) as any;
    broken.photometry.grid.verticalAnglesDeg[3] = 0;
    const plot = tinyPlot({ fixtureTypes: [profileType, broken] });
    const result = loadPlotText(JSON.stringify(plot));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors[0]).toBe(
        'fixtureTypes[1].photometry.grid: verticalAnglesDeg[3]: must be greater than the angle before it (ascending order)',
      );
    }
    expect(fixtureTypeRuleProblems(broken)).toHaveLength(1);
  });
});

describe('computations with a measured unit', () => {
  const modelUnit = resolveFixture(unit, profileType);
  const measuredUnit = resolveFixture({ ...unit, typeId: measuredType.id }, measuredType);

  it('the measured route reads back the beam model: 26°, 40°, 20 000 cd, the same pools and centre level', () => {
    expect(beamModelFile.beamAngleDeg).toBeCloseTo(26, 2);
    expect(beamModelFile.fieldAngleDeg).toBeCloseTo(40, 2);
    expect(beamModelFile.peakCd).toBeCloseTo(20000, 6);
    const model = fixtureFocus(modelUnit, 1.6);
    const measured = fixtureFocus(measuredUnit, 1.6);
    expect(measured.problem).toBeNull();
    expect(measured.angles?.beamAngleDeg).toBeCloseTo(26, 2);
    expect(measured.angles?.beamAngleCrossDeg).toBeNull();
    expect(measured.centreLx).toBeCloseTo(model.centreLx ?? NaN, 6);
    expect(measured.beamDiameterM).toBeCloseTo(model.beamDiameterM ?? NaN, 3);
    for (const key of ['nearM', 'farM', 'widthM', 'areaM2'] as const) {
      const expected = model.beamPool?.[key] ?? NaN;
      expect(Math.abs((measured.beamPool?.[key] ?? NaN) / expected - 1)).toBeLessThan(0.01);
      const expectedField = model.fieldPool?.[key] ?? NaN;
      expect(Math.abs((measured.fieldPool?.[key] ?? NaN) / expectedField - 1)).toBeLessThan(0.01);
    }
  });

  it('gives the same light on a face and on the floor, scaled by level through the dimming curve', () => {
    const plot = tinyPlot({ fixtureTypes: [profileType, measuredType] });
    const face = (document: typeof plot) =>
      subjectFaceLight(subjectPlacements(document)[0], mainViewpointPosition(document), resolveRig(document))
        .totalFaceLx;
    const modelLx = face(plot);
    const measuredPlot = { ...plot, fixtures: [{ ...unit, typeId: measuredType.id }] };
    // Linear interpolation of a 0.25° sampling: within 1e-4 of the model.
    expect(Math.abs(face(measuredPlot) / modelLx - 1)).toBeLessThan(1e-4);
    const halfPlot = { ...plot, fixtures: [{ ...unit, typeId: measuredType.id, levelPct: 50 }] };
    expect(face(halfPlot)).toBeCloseTo(face(measuredPlot) / 2, 9); // linear dimming curve: 50 % → half
    const floorPoint = vec3(0.8, 1.5, 0);
    const up = vec3(0, 0, 1);
    expect(
      Math.abs(
        fixtureIlluminanceLx(measuredUnit, floorPoint, up) / fixtureIlluminanceLx(modelUnit, floorPoint, up) -
          1,
      ),
    ).toBeLessThan(1e-4);
  });

  it('C0 lies along the beam frame u (+x for a unit aimed straight down) and C90 along −v (+y)', () => {
    const file = readPhotometryFile(
      writeLm63({ vertical: range(0, 90, 5), horizontal: range(0, 360, 15), intensity: lopsided }),
      'lopsided.ies',
    );
    const type: FixtureType = { ...measuredTypeDraft(file), id: 'type-lop' };
    const down = resolveFixture({ ...unit, mount: vec3(0, 0, 5), focus: vec3(0, 0, 0) }, type);
    const gamma = 30;
    const offset = 5 * Math.tan((gamma * Math.PI) / 180);
    const distance = 5 / Math.cos((gamma * Math.PI) / 180);
    const expected = (c: number) =>
      (file.intensityCd(gamma, c) * Math.cos((gamma * Math.PI) / 180)) / distance ** 2;
    const up = vec3(0, 0, 1);
    expect(fixtureIlluminanceLx(down, vec3(offset, 0, 0), up)).toBeCloseTo(expected(0), 9);
    expect(fixtureIlluminanceLx(down, vec3(0, offset, 0), up)).toBeCloseTo(expected(90), 9);
    expect(fixtureIlluminanceLx(down, vec3(-offset, 0, 0), up)).toBeCloseTo(expected(180), 9);
    expect(expected(0)).not.toBeCloseTo(expected(90), 3);
  });

  it('a source that never falls to 50 % has angles but no diameters or closed pools, and no NaN', () => {
    const iso = readPhotometryFile(
      writeLm63({ vertical: range(0, 180, 10), horizontal: [0], intensity: () => 100 }),
      'iso.ies',
    );
    const focus = fixtureFocus(resolveFixture(unit, { ...measuredTypeDraft(iso), id: 't' }), 1.6);
    expect(focus.angles?.beamAngleDeg).toBe(360);
    expect(focus.beamDiameterM).toBeNull();
    expect(focus.beamPool?.open).toBe(true);
    expect(focus.centreLx).toBeCloseTo(100 / (focus.aim?.throwM ?? NaN) ** 2, 9);
  });
});

describe('fixture type commands', () => {
  const plot = tinyPlot();

  it('duplicateFixtureType copies a type under a new id and name', () => {
    const changed = expectUndoableChange(plot, duplicateFixtureType, { id: profileType.id });
    const copy = changed.fixtureTypes[2];
    expect(copy).toEqual({ ...profileType, id: 'type-1', name: 'Profile 26° copy' });
  });

  it('addLibraryFixtureType adds a library entry as a show type', () => {
    const changed = expectUndoableChange(plot, addLibraryFixtureType, {
      libraryId: 'fresnel-1k',
      id: 'type-f',
    });
    expect(changed.fixtureTypes[2].name).toBe('Fresnel 1 kW, spot–flood');
    expectRefused(plot, addLibraryFixtureType, { libraryId: 'nothing' }, /no library type "nothing"/);
  });

  it('an imported measured type can be added, hung on a unit and deleted once unused', () => {
    const added = expectUndoableChange(plot, addFixtureType, measuredTypeDraft(beamModelFile));
    const retyped = expectUndoableChange(added, retypeFixtures, { ids: [unit.id], typeId: 'type-1' });
    expectRefused(retyped, deleteFixtureType, { id: 'type-1' }, /used by 1 fixture/);
    expectUndoableChange(added, deleteFixtureType, { id: 'type-1' });
  });
});

describe('the built-in library', () => {
  it.each(LIBRARY.map((entry) => [entry.libraryId, entry] as const))(
    '%s is a valid type marked as typical values',
    (_id, entry) => {
      const type = { ...entry.type, id: 'type-x' };
      expect(fixtureType.safeParse(type).success).toBe(true);
      expect(fixtureTypeRuleProblems(type)).toEqual([]);
      expect(type.notes).toMatch(/Typical values, from memory; not any maker’s data/);
    },
  );

  it('covers the families users start from', () => {
    const categories = new Set(LIBRARY.map((entry) => entry.type.category));
    expect([...categories].sort()).toEqual(['followspot', 'fresnel', 'par', 'profile', 'soft', 'wash']);
    expect(new Set(LIBRARY.map((entry) => entry.libraryId)).size).toBe(LIBRARY.length);
  });
});
