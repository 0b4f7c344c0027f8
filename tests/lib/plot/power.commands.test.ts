import { describe, expect, it } from 'vitest';
import {
  type PlotDocument,
  addCircuit,
  addFeeder,
  deleteCircuit,
  deleteFeeder,
  updateCircuit,
  updateFeeder,
  updateRigging,
  updateSupply,
} from '@/lib/plot';
import { expectRefused, expectUndoableChange } from './commandHarness';
import { tinyPlot } from './tinyPlot';

/** The tiny plot on a three-phase supply with one feeder and two circuits; its unit is on A1. */
function powered(): PlotDocument {
  const plot = tinyPlot();
  return {
    ...plot,
    power: {
      system: 'three',
      phaseVoltageV: 230,
      continuousLimitPct: 80,
      feeders: [{ id: 'feed-1', name: 'Distro', ratingA: 32 }],
      circuits: [
        { address: 'A1', ratingA: 16, feederId: 'feed-1', phase: 'L1' },
        { address: 'A2', ratingA: 10, feederId: null, phase: 'L2' },
      ],
    },
  };
}

describe('supply commands', () => {
  it('updateSupply changes the system, voltage and limit', () => {
    const after = expectUndoableChange(tinyPlot(), updateSupply, {
      system: 'three',
      phaseVoltageV: 120,
      continuousLimitPct: 100,
    });
    expect(after.power).toMatchObject({ system: 'three', phaseVoltageV: 120, continuousLimitPct: 100 });
  });

  it('updateSupply refuses out-of-range values naming the field', () => {
    expectRefused(tinyPlot(), updateSupply, { phaseVoltageV: 0 }, /phaseVoltageV.*between 50 and 1000 V/);
    expectRefused(
      tinyPlot(),
      updateSupply,
      { continuousLimitPct: 0 },
      /continuousLimitPct.*between 1 and 100/,
    );
    expectRefused(tinyPlot(), updateSupply, { continuousLimitPct: 101 }, /continuousLimitPct/);
  });

  it('updateSupply refuses single phase while a circuit is on L2 or L3', () => {
    expectRefused(powered(), updateSupply, { system: 'single' }, /power\.system: move every circuit to L1/);
  });
});

describe('feeder commands', () => {
  it('addFeeder, updateFeeder, deleteFeeder (its circuits keep going, fed from no named feeder)', () => {
    const added = expectUndoableChange(powered(), addFeeder, { name: 'Floor', ratingA: 16 });
    expect(added.power.feeders[1]).toMatchObject({ name: 'Floor', ratingA: 16 });
    expect(
      expectUndoableChange(powered(), updateFeeder, { id: 'feed-1', changes: { ratingA: 63 } }).power
        .feeders[0],
    ).toEqual({
      id: 'feed-1',
      name: 'Distro',
      ratingA: 63,
    });
    const deleted = expectUndoableChange(powered(), deleteFeeder, { id: 'feed-1' });
    expect(deleted.power.feeders).toEqual([]);
    expect(deleted.power.circuits[0].feederId).toBeNull();
  });

  it('refuses bad feeders naming the field', () => {
    expectRefused(
      powered(),
      addFeeder,
      { name: 'Floor', ratingA: 0 },
      /new feeder\.ratingA.*greater than 0 A/,
    );
    expectRefused(powered(), addFeeder, { name: '', ratingA: 16 }, /new feeder\.name/);
    expectRefused(
      powered(),
      updateFeeder,
      { id: 'feed-1', changes: { ratingA: 20000 } },
      /feeder feed-1\.ratingA.*10 000 A/,
    );
    expectRefused(
      powered(),
      updateFeeder,
      { id: 'nope', changes: { ratingA: 20 } },
      /no feeder with id "nope"/,
    );
    expectRefused(powered(), deleteFeeder, { id: 'nope' }, /nope/);
  });
});

describe('circuit commands', () => {
  it('addCircuit lists a circuit', () => {
    const after = expectUndoableChange(powered(), addCircuit, {
      address: 'B7',
      ratingA: 20,
      feederId: 'feed-1',
      phase: 'L3',
    });
    expect(after.power.circuits[2]).toEqual({ address: 'B7', ratingA: 20, feederId: 'feed-1', phase: 'L3' });
  });

  it('updateCircuit renaming the address renames it on the units that use it', () => {
    const after = expectUndoableChange(powered(), updateCircuit, {
      address: 'A1',
      changes: { address: 'A9', ratingA: 20 },
    });
    expect(after.power.circuits[0]).toMatchObject({ address: 'A9', ratingA: 20 });
    expect(after.fixtures[0].circuit).toBe('A9');
  });

  it('deleteCircuit removes it from the list; units keep the address written on them', () => {
    const after = expectUndoableChange(powered(), deleteCircuit, { address: 'A1' });
    expect(after.power.circuits.map((entry) => entry.address)).toEqual(['A2']);
    expect(after.fixtures[0].circuit).toBe('A1');
  });

  it('refuses bad circuits naming the field', () => {
    const base = { address: 'B7', ratingA: 16, feederId: null, phase: 'L1' } as const;
    expectRefused(
      powered(),
      addCircuit,
      { ...base, address: 'A1' },
      /new circuit\.address: there is already a circuit "A1"/,
    );
    expectRefused(
      powered(),
      addCircuit,
      { ...base, address: '  ' },
      /new circuit\.address.*must not be empty/,
    );
    expectRefused(powered(), addCircuit, { ...base, ratingA: -5 }, /new circuit\.ratingA.*greater than 0 A/);
    expectRefused(
      powered(),
      addCircuit,
      { ...base, feederId: 'feed-9' },
      /new circuit\.feederId: there is no feeder/,
    );
    expectRefused(
      tinyPlot(),
      addCircuit,
      { ...base, phase: 'L2' },
      /new circuit\.phase: must be L1 on a single-phase supply/,
    );
    expectRefused(
      powered(),
      updateCircuit,
      { address: 'A1', changes: { address: 'A2' } },
      /circuit A1\.address: there is already/,
    );
    expectRefused(powered(), updateCircuit, { address: 'Z1', changes: { ratingA: 10 } }, /no circuit "Z1"/);
    expectRefused(powered(), deleteCircuit, { address: 'Z1' }, /no circuit "Z1"/);
  });
});

describe('rigging allowance', () => {
  it('updateRigging sets the allowance per unit, and refuses negatives naming the field', () => {
    expect(expectUndoableChange(tinyPlot(), updateRigging, { allowancePerUnitKg: 2.5 }).rigging).toEqual({
      allowancePerUnitKg: 2.5,
    });
    expectRefused(
      tinyPlot(),
      updateRigging,
      { allowancePerUnitKg: -1 },
      /rigging\.allowancePerUnitKg.*between 0 and 100 kg/,
    );
  });
});
