import { describe, expect, it } from 'vitest';
import { peakAtFullCd, resolveFixture, softLuminanceAtFull, spreadAtZoom } from '@/lib/plot';
import { lumensFromPeakCandela } from '@/lib/photometry';
import { profileType, unit, zoomType } from './tinyPlot';

describe('resolving units for the engines', () => {
  it('a zoom sets beam = zoom and field = beam × fieldPerBeam', () => {
    if (zoomType.photometry.kind !== 'beam') throw new Error('test type');
    expect(spreadAtZoom(zoomType.photometry, 20)).toEqual({
      kind: 'round',
      beamAngleDeg: 20,
      fieldAngleDeg: 30,
    });
    expect(spreadAtZoom(zoomType.photometry, null)).toEqual(zoomType.photometry.spread);
  });

  it('a zoom keeps its lumens: the peak at each setting emits the type’s 10 000 lm', () => {
    if (zoomType.photometry.kind !== 'beam') throw new Error('test type');
    for (const beam of [15, 20, 30]) {
      const spread = spreadAtZoom(zoomType.photometry, beam);
      const peak = peakAtFullCd(zoomType.photometry, spread);
      expect(lumensFromPeakCandela(peak, beam, beam * 1.5)).toBeCloseTo(10000, 6);
    }
  });

  it('a type rated in peak candela keeps that peak at its nominal spread', () => {
    if (profileType.photometry.kind !== 'beam') throw new Error('test type');
    expect(peakAtFullCd(profileType.photometry, profileType.photometry.spread)).toBeCloseTo(20000, 9);
  });

  it('level through the dimming curve and the filter scale the peak', () => {
    const resolved = resolveFixture(
      {
        ...unit,
        levelPct: 50,
        filter: { name: 'cut', transmission: 0.4, miredShift: 0, displayColour: '#808080' },
      },
      { ...profileType, dimmingCurve: 'incandescent' },
    );
    // 0.5^3.4 = 0.094732 (REFERENCE-CHECKS §8) × 0.4 transmission × 20 000 cd
    expect(resolved.source.kind === 'beam' && resolved.source.peakCd).toBeCloseTo(
      20000 * 0.5 ** 3.4 * 0.4,
      6,
    );
  });

  it('a soft source given in lumens has L = Φ / (π·A)', () => {
    const luminance = softLuminanceAtFull({
      kind: 'soft',
      shape: { kind: 'rectangle', widthM: 0.6, heightM: 0.9 },
      output: { kind: 'lumens', lumens: 8000 },
    });
    expect(luminance).toBeCloseTo(8000 / (Math.PI * 0.54), 9);
  });
});
