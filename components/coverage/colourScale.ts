/**
 * The light map's colours: a perceptual scale (d3's magma) over stops relative to the target, from
 * 3 stops under (dark) to 2 stops over (bright). Cells under 0.1 lx are left clear.
 */
import { interpolateMagma } from 'd3-scale-chromatic';

export const STOPS_UNDER = 3;
export const STOPS_OVER = 2;

/** Position 0–1 on the scale for an illuminance and a target (both lx). */
export function scalePosition(valueLx: number, targetLx: number): number {
  const stops = Math.log2(valueLx / targetLx);
  return Math.min(1, Math.max(0, (stops + STOPS_UNDER) / (STOPS_UNDER + STOPS_OVER)));
}

/** RGB of a scale position (d3 gives `#rrggbb` or `rgb(r, g, b)`). */
export function scaleColour(position: number): [number, number, number] {
  const colour = interpolateMagma(0.08 + 0.92 * position);
  const hex = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(colour);
  if (hex) return [parseInt(hex[1], 16), parseInt(hex[2], 16), parseInt(hex[3], 16)];
  const rgb = /rgb\((\d+),\s*(\d+),\s*(\d+)\)/.exec(colour);
  if (rgb) return [Number(rgb[1]), Number(rgb[2]), Number(rgb[3])];
  throw new Error(`unexpected colour ${colour}`);
}

/** RGBA pixels (row 0 = the grid's first row, i.e. downstage) for a light map. */
export function mapPixels(values: Float64Array, targetLx: number, alpha = 190): Uint8ClampedArray {
  const palette = Array.from({ length: 256 }, (_, index) => scaleColour(index / 255));
  const pixels = new Uint8ClampedArray(values.length * 4);
  for (let index = 0; index < values.length; index += 1) {
    const value = values[index];
    if (!(value >= 0.1)) continue;
    const [red, green, blue] = palette[Math.round(scalePosition(value, targetLx) * 255)];
    pixels[index * 4] = red;
    pixels[index * 4 + 1] = green;
    pixels[index * 4 + 2] = blue;
    pixels[index * 4 + 3] = alpha;
  }
  return pixels;
}
