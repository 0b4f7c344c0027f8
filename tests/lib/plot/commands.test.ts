import { describe, expect, it } from 'vitest';
import {
  addActingArea,
  addFixtureType,
  addPosition,
  addSubject,
  addViewpoint,
  aimFixture,
  deleteActingArea,
  deleteFixtureType,
  deleteFixtures,
  deletePosition,
  deleteSubjects,
  deleteViewpoint,
  duplicateFixtures,
  hangFixture,
  moveFixture,
  movePosition,
  moveSubject,
  retypeFixtures,
  setFixtureLevel,
  setMainViewpoint,
  setStageOutline,
  updateActingArea,
  updateFixture,
  updateFixtureType,
  updatePosition,
  updateShow,
  updateSubject,
  updateViewpoint,
} from '@/lib/plot';
import { expectRefused, expectUndoableChange } from './commandHarness';
import { profileType, tinyPlot, unit } from './tinyPlot';

const plot = tinyPlot();
const cameraSettings = {
  iso: 800,
  shutter: { kind: 'angle', angleDeg: 180, framesPerSecond: 25 },
  fNumber: 2.8,
  meterConstant: 250,
} as const;

describe('every command applies, undoes and redoes exactly', () => {
  it('hangFixture numbers the new unit next on its position', () => {
    const after = expectUndoableChange(plot, hangFixture, {
      typeId: 'type-profile',
      positionId: 'pos-1',
      mount: { x: 1, y: -2, z: 6 },
      focus: { x: 1, y: 1, z: 1.6 },
    });
    expect(after.fixtures[1]).toMatchObject({ id: 'fx-2', unit: 2, levelPct: 100, positionId: 'pos-1' });
  });

  it('moveFixture and aimFixture change only the mount or the focus', () => {
    expect(
      expectUndoableChange(plot, moveFixture, { id: 'fx-1', mount: { x: 2, y: -2, z: 6 } }).fixtures[0].focus,
    ).toEqual(unit.focus);
    expect(
      expectUndoableChange(plot, aimFixture, { id: 'fx-1', focus: { x: 1, y: 3, z: 1.6 } }).fixtures[0].mount,
    ).toEqual(unit.mount);
  });

  it('retypeFixtures changes the type and keeps the aim', () => {
    const after = expectUndoableChange(plot, retypeFixtures, { ids: ['fx-1'], typeId: 'type-zoom' });
    expect(after.fixtures[0]).toMatchObject({ typeId: 'type-zoom', focus: unit.focus });
  });

  it('setFixtureLevel, updateFixture, duplicateFixtures, deleteFixtures', () => {
    expect(
      expectUndoableChange(plot, setFixtureLevel, { ids: ['fx-1'], levelPct: 55 }).fixtures[0].levelPct,
    ).toBe(55);
    expect(
      expectUndoableChange(plot, updateFixture, { id: 'fx-1', changes: { channel: 12, circuit: 'B4' } })
        .fixtures[0],
    ).toMatchObject({
      channel: 12,
      circuit: 'B4',
    });
    const duplicated = expectUndoableChange(plot, duplicateFixtures, {
      ids: ['fx-1'],
      offset: { x: 0.5, y: 0 },
    });
    expect(duplicated.fixtures[1]).toMatchObject({ id: 'fx-2', unit: 2, mount: { x: 0.5, y: -2, z: 6 } });
    expect(expectUndoableChange(plot, deleteFixtures, { ids: ['fx-1'] }).fixtures).toEqual([]);
  });

  it('positions: add, update (a trim change moves its units), move (units travel), delete', () => {
    const added = expectUndoableChange(plot, addPosition, {
      name: 'Boom SL',
      kind: 'boom',
      shape: { kind: 'point', at: { x: 5, y: 2 } },
      heightM: 3,
      ratedLoadKg: null,
      loadKind: 'point',
      notes: '',
    });
    expect(added.positions[1].id).toBe('pos-2');
    const flown = expectUndoableChange(plot, updatePosition, { id: 'pos-1', changes: { heightM: 6.5 } });
    expect(flown.fixtures[0].mount.z).toBeCloseTo(6.5, 12);
    const moved = expectUndoableChange(plot, movePosition, { id: 'pos-1', offset: { x: 0, y: -1 } });
    expect(moved.fixtures[0].mount).toEqual({ x: 0, y: -3, z: 6 });
    expect(moved.fixtures[0].focus).toEqual(unit.focus);
    const freed = expectUndoableChange(plot, deletePosition, { id: 'pos-1', units: 'leave-units-free' });
    expect(freed.fixtures[0]).toMatchObject({ positionId: null, unit: null, mount: unit.mount });
    expect(
      expectUndoableChange(plot, deletePosition, { id: 'pos-1', units: 'delete-units' }).fixtures,
    ).toEqual([]);
  });

  it('subjects and viewpoints', () => {
    expect(
      expectUndoableChange(plot, addSubject, {
        name: 'Ben',
        mark: { x: 1, y: 3 },
        faceHeightM: 1.7,
        facingDeg: 0,
        notes: '',
      }).subjects[1].id,
    ).toBe('sub-2');
    expect(
      expectUndoableChange(plot, moveSubject, { id: 'sub-1', mark: { x: -1, y: 2 } }).subjects[0].mark,
    ).toEqual({ x: -1, y: 2 });
    expect(
      expectUndoableChange(plot, updateSubject, { id: 'sub-1', changes: { facingDeg: 90 } }).subjects[0]
        .facingDeg,
    ).toBe(90);
    expect(expectUndoableChange(plot, deleteSubjects, { ids: ['sub-1'] }).subjects).toEqual([]);
    const withCamera = expectUndoableChange(plot, addViewpoint, {
      name: 'Cam A',
      kind: 'camera',
      position: { x: 0, y: -5, z: 1.5 },
      camera: cameraSettings,
    });
    expect(withCamera.viewpoints[1].id).toBe('vp-2');
    expect(
      expectUndoableChange(plot, updateViewpoint, { id: 'vp-1', changes: { name: 'Row F' } }).viewpoints[0]
        .name,
    ).toBe('Row F');
    expect(expectUndoableChange(withCamera, setMainViewpoint, { id: 'vp-2' }).mainViewpointId).toBe('vp-2');
    expect(expectUndoableChange(plot, deleteViewpoint, { id: 'vp-1' }).mainViewpointId).toBeNull();
  });

  it('show settings, stage, acting areas and fixture types', () => {
    expect(expectUndoableChange(plot, updateShow, { displayUnits: 'imperial' }).displayUnits).toBe(
      'imperial',
    );
    const square = [
      { x: -5, y: 0 },
      { x: 5, y: 0 },
      { x: 5, y: 7 },
      { x: -5, y: 7 },
    ];
    expect(expectUndoableChange(plot, setStageOutline, { outline: square }).stage.outline).toEqual(square);
    const withArea = expectUndoableChange(plot, addActingArea, { name: 'DSC', outline: square });
    expect(
      expectUndoableChange(withArea, updateActingArea, { id: 'area-1', changes: { name: 'Down centre' } })
        .stage.acting[0].name,
    ).toBe('Down centre');
    expect(expectUndoableChange(withArea, deleteActingArea, { id: 'area-1' }).stage.acting).toEqual([]);
    const { id: _id, ...typeFields } = profileType;
    expect(
      expectUndoableChange(plot, addFixtureType, { ...typeFields, name: 'Profile copy' }).fixtureTypes[2].id,
    ).toBe('type-1');
    expect(
      expectUndoableChange(plot, updateFixtureType, { id: 'type-profile', changes: { powerW: 600 } })
        .fixtureTypes[0].powerW,
    ).toBe(600);
    expect(expectUndoableChange(plot, deleteFixtureType, { id: 'type-zoom' }).fixtureTypes).toHaveLength(1);
  });

  it('a zoomed unit keeps its zoom within a narrowed range when its type changes', () => {
    const zoomed = tinyPlot({ fixtures: [{ ...unit, typeId: 'type-zoom', zoomBeamDeg: 28 }] });
    const narrowed = expectUndoableChange(zoomed, updateFixtureType, {
      id: 'type-zoom',
      changes: {
        photometry: {
          ...(zoomed.fixtureTypes[1].photometry as any),
          zoom: { minBeamDeg: 15, maxBeamDeg: 25, fieldPerBeam: 1.5 },
        },
      },
    });
    expect(narrowed.fixtures[0].zoomBeamDeg).toBe(25);
    expect(
      expectUndoableChange(zoomed, retypeFixtures, { ids: ['fx-1'], typeId: 'type-profile' }).fixtures[0]
        .zoomBeamDeg,
    ).toBeNull();
  });
});

describe('commands that must refuse leave the document as it was', () => {
  it('deleting a position that holds units asks for a choice', () => {
    expectRefused(
      plot,
      deletePosition,
      { id: 'pos-1' },
      /Front pipe holds 1 fixture: choose to delete them with it or leave them standing free/,
    );
  });

  it('deleting a type in use names how many use it', () => {
    expectRefused(plot, deleteFixtureType, { id: 'type-profile' }, /Profile 26° is used by 1 fixture/);
  });

  it.each([
    [
      'a level over 100',
      setFixtureLevel,
      { ids: ['fx-1'], levelPct: 120 },
      /levelPct: must be between 0 and 100/,
    ],
    ['a NaN level', setFixtureLevel, { ids: ['fx-1'], levelPct: Number.NaN }, /levelPct/],
    [
      'an unknown fixture',
      aimFixture,
      { id: 'fx-9', focus: { x: 0, y: 0, z: 0 } },
      /There is no fixture with id "fx-9"/,
    ],
    [
      'a focus with a text coordinate',
      aimFixture,
      { id: 'fx-1', focus: { x: 0, y: 'up', z: 0 } },
      /fixture fx-1 focus.y: must be a number/,
    ],
    [
      'hanging a unit of an unknown type',
      hangFixture,
      { typeId: 'nope', positionId: null, mount: { x: 0, y: 0, z: 5 }, focus: { x: 0, y: 1, z: 0 } },
      /no fixture type with id "nope"/,
    ],
    [
      'a zoom outside its range',
      updateFixture,
      { id: 'fx-1', changes: { typeId: 'type-zoom', zoomBeamDeg: 40 } },
      /zoom range 15°–30°/,
    ],
    [
      'a reused id',
      addSubject,
      { id: 'fx-1', name: 'X', mark: { x: 0, y: 0 }, faceHeightM: 1.6, facingDeg: 0, notes: '' },
      /already used/,
    ],
    [
      'a camera with no settings',
      addViewpoint,
      { name: 'Cam', kind: 'camera', position: { x: 0, y: -5, z: 1.5 }, camera: null },
      /exposure settings/,
    ],
    [
      'a field angle narrower than the beam',
      updateFixtureType,
      {
        id: 'type-profile',
        changes: {
          photometry: {
            ...profileType.photometry,
            spread: { kind: 'round', beamAngleDeg: 30, fieldAngleDeg: 20 },
          } as any,
        },
      },
      /must be wider than the beam angle/,
    ],
    ['an empty show name', updateShow, { name: '  ' }, /show.name: must not be empty/],
  ] as const)('%s', (_label, command, args, message) => {
    expectRefused(plot, command as any, args as any, message);
  });
});
