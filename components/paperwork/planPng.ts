/**
 * The plan canvas as a PNG at a chosen scale: Konva draws the stage again at `pixelRatio`, and the
 * result is laid on the canvas's background colour (the layers themselves are transparent).
 */
import { palette } from '../canvas/palette';

/** Scales offered for a PNG of the plan. */
export const PNG_SCALES = [1, 2, 4] as const;

/** Pixel size of a PNG of a canvas `width` × `height` CSS px at `scale` (Konva rounds to whole px). */
export function pngSize(width: number, height: number, scale: number): { width: number; height: number } {
  return { width: Math.round(width * scale), height: Math.round(height * scale) };
}

/** Render the Konva stage inside `container` as a PNG blob at `scale`; null when there is no stage. */
export async function planPngBlob(container: HTMLElement, scale: number): Promise<Blob | null> {
  const Konva = (await import('konva')).default;
  const stage = Konva.stages.find((candidate) => container.contains(candidate.container()));
  if (!stage) return null;
  const drawn = stage.toCanvas({ pixelRatio: scale });
  const canvas = document.createElement('canvas');
  canvas.width = drawn.width;
  canvas.height = drawn.height;
  const context = canvas.getContext('2d');
  if (!context) return null;
  context.fillStyle = palette.background;
  context.fillRect(0, 0, canvas.width, canvas.height);
  context.drawImage(drawn, 0, 0);
  return new Promise((resolve) => canvas.toBlob((blob) => resolve(blob), 'image/png'));
}
