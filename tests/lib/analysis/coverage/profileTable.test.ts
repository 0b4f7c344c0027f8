import { describe, expect, it } from 'vitest';
import { profileTable, tableProfile } from '@/lib/analysis';

/**
 * The beam model written out here, independently of lib/photometry (PHYSICS.md, REFERENCE-CHECKS §3):
 * I/I0 = exp(−ln2·(θ/hb)^p), p = ln(ln10/ln2)/ln(hf/hb), ending where it falls to 0.1 % of peak
 * (θe = hb·(ln1000/ln2)^(1/p)) or at 90°, whichever comes first.
 */
function closedForm(theta: number, beamHalf: number, fieldHalf: number): number {
  const p = Math.log(Math.log(10) / Math.log(2)) / Math.log(fieldHalf / beamHalf);
  return Math.exp(-Math.log(2) * (theta / beamHalf) ** p);
}

function edgeOf(beamHalf: number, fieldHalf: number): number {
  const p = Math.log(Math.log(10) / Math.log(2)) / Math.log(fieldHalf / beamHalf);
  return Math.min(beamHalf * (Math.log(1000) / Math.log(2)) ** (1 / p), Math.PI / 2);
}

const degree = Math.PI / 180;

/** Angles over [0, θe): evenly spaced, crowded toward the axis and toward the edge, and pseudo-random. */
function anglesUpTo(edge: number): number[] {
  const angles: number[] = [0];
  for (let index = 1; index < 4000; index += 1) angles.push((edge * index) / 4000);
  for (let power = 1; power <= 12; power += 1) angles.push(edge * 10 ** -power, edge * (1 - 10 ** -power));
  let state = 12345;
  for (let index = 0; index < 4000; index += 1) {
    state = (state * 1103515245 + 12345) % 2147483648;
    angles.push((edge * state) / 2147483648);
  }
  return angles.filter((theta) => theta < edge);
}

describe('the coverage profile table', () => {
  // Beam angles from 2° to 120° and field/beam from 1.05 (p ≈ 24.6) to 10 (p ≈ 0.52).
  const beams = [2, 5, 10, 19, 36, 60, 90, 120];
  const ratios = [1.05, 1.2, 1.35, 1.5, 1.7, 2, 3, 5, 10];
  for (const beam of beams) {
    it(`follows the closed-form profile within 1e-10 relative over the whole beam, ${beam}° beams, field/beam 1.05–10`, () => {
      for (const ratio of ratios) {
        const field = beam * ratio;
        if (field >= 180) continue;
        const beamHalf = (beam / 2) * degree;
        const fieldHalf = (field / 2) * degree;
        const table = profileTable(beamHalf, fieldHalf);
        const edge = edgeOf(beamHalf, fieldHalf);
        let worst = 0;
        for (const theta of anglesUpTo(edge)) {
          const exact = closedForm(theta, beamHalf, fieldHalf);
          if (exact < 1e-3 * (1 + 1e-9)) continue; // at the edge itself the model ends
          worst = Math.max(worst, Math.abs(tableProfile(table, Math.cos(theta), theta) - exact) / exact);
        }
        expect(worst, `${beam}°/${field}°`).toBeLessThan(1e-10);
      }
    });
  }

  it('gives no light at or beyond the edge (the model ends at 0.1 % of peak), and ≥ 50 % inside the beam angle', () => {
    const beamHalf = 13 * degree;
    const fieldHalf = 20 * degree;
    const table = profileTable(beamHalf, fieldHalf);
    const edge = edgeOf(beamHalf, fieldHalf);
    expect(tableProfile(table, Math.cos(edge * 1.000001), edge * 1.000001)).toBe(0);
    expect(tableProfile(table, Math.cos(Math.PI / 2), Math.PI / 2)).toBe(0);
    expect(tableProfile(table, Math.cos(edge * 0.999), edge * 0.999)).toBeGreaterThan(1e-3);
    // At the beam half-angle the model gives exactly half of peak (definition of beam angle).
    expect(tableProfile(table, Math.cos(beamHalf), beamHalf)).toBeCloseTo(0.5, 10);
    expect(table.cosBeam).toBe(Math.cos(beamHalf));
  });
});
