import { describe, expect, it } from 'vitest';
import { mapPixels, scaleColour, scalePosition } from '@/components/coverage/colourScale';

describe('the light map colour scale', () => {
  it('places levels by stops from the target: −3 stops at 0, the target at 0.6, +2 stops at 1', () => {
    expect(scalePosition(500 / 8, 500)).toBeCloseTo(0, 12);
    expect(scalePosition(500, 500)).toBeCloseTo(0.6, 12);
    expect(scalePosition(2000, 500)).toBeCloseTo(1, 12);
    expect(scalePosition(1e6, 500)).toBe(1);
  });

  it('runs from dark to bright (magma), never black at the bright end', () => {
    const dark = scaleColour(0);
    const bright = scaleColour(1);
    const luminance = ([red, green, blue]: number[]) => 0.2126 * red + 0.7152 * green + 0.0722 * blue;
    expect(luminance(bright)).toBeGreaterThan(luminance(dark) + 100);
    for (let step = 0; step < 10; step += 1) {
      expect(luminance(scaleColour((step + 1) / 10))).toBeGreaterThan(luminance(scaleColour(step / 10)));
    }
  });

  it('leaves cells under 0.1 lx clear', () => {
    const pixels = mapPixels(new Float64Array([0.05, 500]), 500);
    expect(Array.from(pixels.slice(0, 4))).toEqual([0, 0, 0, 0]);
    expect(pixels[7]).toBeGreaterThan(0);
    expect(pixels[4] + pixels[5] + pixels[6]).toBeGreaterThan(0);
  });
});
