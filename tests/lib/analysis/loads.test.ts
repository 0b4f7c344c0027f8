import { describe, expect, it } from 'vitest';
import {
  type LoadSupplyInput,
  type LoadUnitInput,
  currentOf,
  loadFlag,
  neutralCurrent,
  phaseImbalancePct,
  supplyLoad,
} from '@/lib/analysis';

const unitOn = (
  id: string,
  circuit: string | null,
  powerW: number | null,
  levelPct = 100,
): LoadUnitInput => ({
  id,
  circuit,
  powerW,
  levelPct,
});

const three = (circuits: LoadSupplyInput['circuits'], feeders: LoadSupplyInput['feeders'] = []) => ({
  system: 'three' as const,
  phaseVoltageV: 230,
  continuousLimitPct: 80,
  feeders,
  circuits,
});

describe('single-phase arithmetic', () => {
  it('I = P / V and P = V · I (SI definition of the watt: 1 W = 1 V · 1 A, resistive load)', () => {
    // By hand: 2300 W at 230 V is 10 A; 10 A at 120 V is 1200 W.
    expect(currentOf(2300, 230)).toBeCloseTo(10, 12);
    expect(120 * currentOf(1200, 120)).toBeCloseTo(1200, 12);
    expect(currentOf(500, 0)).toBe(0); // impossible by schema: a defined 0, never NaN
  });

  it('sums the nameplate power of the units on a circuit, its current and share of the rating', () => {
    const load = supplyLoad(
      {
        system: 'single',
        phaseVoltageV: 230,
        continuousLimitPct: 80,
        feeders: [],
        circuits: [{ address: 'A1', ratingA: 16, feederId: null, phase: 'L1' }],
      },
      [
        unitOn('u1', 'A1', 750, 50),
        unitOn('u2', 'A1', 1000, 0),
        unitOn('u3', 'B9', 500),
        unitOn('u4', null, 300),
      ],
    );
    const circuit = load.circuits[0];
    // By hand: 750 + 1000 = 1750 W; 1750 / 230 = 7.608696 A; 7.608696 / 16 = 47.554 %.
    expect(circuit.powerW).toBe(1750);
    expect(circuit.currentA).toBeCloseTo(7.608696, 6);
    expect(circuit.ratingPct).toBeCloseTo(47.554348, 5);
    expect(circuit.flag).toBe('ok');
    // At the current levels (rough): 750 · 0.5 + 1000 · 0 = 375 W.
    expect(circuit.atLevelW).toBe(375);
    expect(load.unlisted).toEqual([{ address: 'B9', unitIds: ['u3'], powerW: 500, currentA: 500 / 230 }]);
    expect(load.noCircuitUnitIds).toEqual(['u4']);
    // Every unit together: 750 + 1000 + 500 + 300 = 2550 W; the listed circuits only 1750 W.
    expect(load.allUnitsPowerW).toBe(2550);
    expect(load.totalPowerW).toBe(1750);
    // Single phase: the neutral carries the phase current; no line voltage, no imbalance.
    expect(load.neutralCurrentA).toBeCloseTo(1750 / 230, 12);
    expect(load.lineVoltageV).toBeNull();
    expect(load.imbalancePct).toBeNull();
  });

  it('counts units of unknown power as 0 W and names them', () => {
    const load = supplyLoad(three([{ address: 'A1', ratingA: 16, feederId: null, phase: 'L1' }]), [
      unitOn('u1', 'A1', null),
      unitOn('u2', 'A1', 0),
      unitOn('u3', 'A1', 100),
    ]);
    expect(load.circuits[0].powerW).toBe(100);
    expect(load.unknownPowerUnitIds).toEqual(['u1', 'u2']);
  });

  it('empty lists give zeros, never NaN', () => {
    const load = supplyLoad(three([]), []);
    expect(load.totalPowerW).toBe(0);
    expect(load.neutralCurrentA).toBe(0);
    expect(load.imbalancePct).toBeNull();
    expect(load.phases.map((phase) => phase.currentA)).toEqual([0, 0, 0]);
  });
});

describe('flags exactly at the thresholds (rule: over means strictly above; at the threshold is within it)', () => {
  // 16 A at 230 V: rating 3680 W; 80 % continuous limit 2944 W (by hand).
  it('continuous limit: 2944 W is within it, 2944.01 W is over it', () => {
    expect(loadFlag(2944, 16, 230, 80)).toBe('ok');
    expect(loadFlag(2944.01, 16, 230, 80)).toBe('over-limit');
    expect(loadFlag(2943.99, 16, 230, 80)).toBe('ok');
  });

  it('rating: 3680 W is at the rating (over the limit only), 3680.01 W is over the rating', () => {
    expect(loadFlag(3680, 16, 230, 80)).toBe('over-limit');
    expect(loadFlag(3680.01, 16, 230, 80)).toBe('over-rating');
  });

  it('a sum of unit powers equal to the limit is not flagged by rounding (0.1 + 0.2 style sums)', () => {
    // 10 units of 294.4 W sum to 2944 W in floating point only approximately.
    const units = Array.from({ length: 10 }, (_, index) => unitOn(`u${index}`, 'A1', 294.4));
    const load = supplyLoad(three([{ address: 'A1', ratingA: 16, feederId: null, phase: 'L1' }]), units);
    expect(load.circuits[0].flag).toBe('ok');
    const more = supplyLoad(three([{ address: 'A1', ratingA: 16, feederId: null, phase: 'L1' }]), [
      ...units,
      unitOn('extra', 'A1', 0.05),
    ]);
    expect(more.circuits[0].flag).toBe('over-limit');
  });
});

describe('three-phase arithmetic (star supply, unity power factor)', () => {
  it('balanced load: total P = √3 · V_LL · I (published three-phase power formula)', () => {
    // Phase 230 V, 10 A on each phase: per phase 2300 W, 6900 W in all; V_LL = √3 · 230 = 398.37 V.
    const circuits = (['L1', 'L2', 'L3'] as const).map((phase) => ({
      address: phase,
      ratingA: 16,
      feederId: null,
      phase,
    }));
    const load = supplyLoad(
      three(circuits),
      circuits.map((entry) => unitOn(entry.address, entry.address, 2300)),
    );
    expect(load.lineVoltageV).toBeCloseTo(398.371686, 5);
    expect(load.totalPowerW).toBe(6900);
    // √3 · V_LL · I with the engine's line voltage and 10 A a phase gives the engine's total back.
    expect(Math.sqrt(3) * (load.lineVoltageV ?? 0) * 10).toBeCloseTo(load.totalPowerW, 9);
    // Balanced: the phasors cancel, no neutral current, no imbalance.
    expect(load.neutralCurrentA).toBeCloseTo(0, 12);
    expect(load.imbalancePct).toBeCloseTo(0, 12);
  });

  it('neutral current: phasor sum |I1 + I2·e^(−j120°) + I3·e^(+j120°)| = √(a² + b² + c² − ab − bc − ca)', () => {
    // Only one phase loaded: the neutral carries that phase's current.
    expect(neutralCurrent(12, 0, 0)).toBeCloseTo(12, 12);
    // Hand-worked: 10, 20, 30 A → √((100 + 400 + 900) − (200 + 600 + 300)) = √300 = 17.3205 A.
    expect(neutralCurrent(10, 20, 30)).toBeCloseTo(Math.sqrt(300), 12);
    // The same by complex phasors (cos/sin of ∓120°), worked independently of the closed form.
    const re = 10 + 20 * Math.cos((-2 * Math.PI) / 3) + 30 * Math.cos((2 * Math.PI) / 3);
    const im = 20 * Math.sin((-2 * Math.PI) / 3) + 30 * Math.sin((2 * Math.PI) / 3);
    expect(neutralCurrent(10, 20, 30)).toBeCloseTo(Math.hypot(re, im), 12);
  });

  it('phase imbalance: largest deviation from the mean phase current over the mean (NEMA-style)', () => {
    // 10, 20, 30 A: mean 20, largest deviation 10 → 50 %. One phase only: mean a/3, deviation 2a/3 → 200 %.
    expect(phaseImbalancePct([10, 20, 30])).toBeCloseTo(50, 12);
    expect(phaseImbalancePct([9, 0, 0])).toBeCloseTo(200, 12);
    expect(phaseImbalancePct([0, 0, 0])).toBeNull();
  });

  it('per phase and per feeder totals, with the feeder flagged per phase against its rating', () => {
    const supply = three(
      [
        { address: 'A1', ratingA: 16, feederId: 'f1', phase: 'L1' },
        { address: 'A2', ratingA: 16, feederId: 'f1', phase: 'L1' },
        { address: 'B1', ratingA: 16, feederId: 'f1', phase: 'L2' },
        { address: 'C1', ratingA: 16, feederId: null, phase: 'L3' },
      ],
      [{ id: 'f1', name: 'Distro', ratingA: 20 }],
    );
    const load = supplyLoad(supply, [
      unitOn('u1', 'A1', 2300),
      unitOn('u2', 'A2', 2300),
      unitOn('u3', 'B1', 1150),
      unitOn('u4', 'C1', 4600),
    ]);
    // L1: 4600 W → 20 A, exactly the feeder's 20 A rating: over its 80 % limit (16 A), not over the rating.
    const feeder = load.feeders[0];
    expect(feeder.phases.map((phase) => phase.currentA)).toEqual([20, 5, 0]);
    expect(feeder.phases.map((phase) => phase.flag)).toEqual(['over-limit', 'ok', 'ok']);
    expect(feeder.flag).toBe('over-limit');
    // Feeder neutral for 20, 5, 0 A: √(400 + 25 − 100) = √325.
    expect(feeder.neutralCurrentA).toBeCloseTo(Math.sqrt(325), 12);
    // Whole supply: 20, 5, 20 A → √(400 + 25 + 400 − 100 − 100 − 400) = √225 = 15 A.
    expect(load.phases.map((phase) => phase.currentA)).toEqual([20, 5, 20]);
    expect(load.neutralCurrentA).toBeCloseTo(15, 12);
    // C1: 4600 W on 16 A → 20 A, over its rating.
    expect(load.circuits[3].flag).toBe('over-rating');
    expect(load.circuits[3].ratingPct).toBeCloseTo(125, 12);
  });
});
