/**
 * Fixture glyphs of our own design, as outlines in glyph units (1 = the glyph's length), pointing
 * along +x (the beam's bearing) with the lens end at +x. The canvas scales and turns them.
 */
import type { FixtureType } from '@/lib/plot';

export type GlyphOutline = readonly number[];

const glyphs: Record<FixtureType['category'], GlyphOutline> = {
  // Profile: a long body with a narrowing barrel toward the lens.
  profile: [-0.5, -0.18, 0.05, -0.18, 0.5, -0.1, 0.5, 0.1, 0.05, 0.18, -0.5, 0.18],
  // Fresnel: a short, deep body with a square front.
  fresnel: [-0.32, -0.26, 0.32, -0.26, 0.32, 0.26, -0.32, 0.26],
  // PAR-type: a can with a rounded front (eight-point arc).
  par: [-0.4, -0.22, 0.2, -0.22, 0.33, -0.16, 0.4, -0.06, 0.4, 0.06, 0.33, 0.16, 0.2, 0.22, -0.4, 0.22],
  // Wash: a squat body with bevelled corners.
  wash: [-0.3, -0.2, 0.18, -0.3, 0.4, -0.3, 0.4, 0.3, 0.18, 0.3, -0.3, 0.2],
  // Follow spot: a very long body.
  followspot: [-0.7, -0.14, 0.2, -0.14, 0.6, -0.09, 0.6, 0.09, 0.2, 0.14, -0.7, 0.14],
  // Soft source: a wide, thin panel square to the beam, with a short yoke behind.
  soft: [-0.3, -0.04, 0.05, -0.04, 0.05, -0.5, 0.15, -0.5, 0.15, 0.5, 0.05, 0.5, 0.05, 0.04, -0.3, 0.04],
  // Anything else: a lozenge.
  other: [-0.4, 0, 0, -0.25, 0.4, 0, 0, 0.25],
};

/** Outline of a category's glyph (closed polygon, flat x/y pairs). */
export function glyphOutline(category: FixtureType['category']): GlyphOutline {
  return glyphs[category];
}

/** Konva rotation (degrees, clockwise on screen) that turns +x along a pan bearing (0° = downstage). */
export function glyphRotationDeg(panDeg: number): number {
  // Pan 0° points to the audience: screen down (+90° from screen +x); +90° pan (stage left) is screen +x.
  return 90 - panDeg;
}

/** Colour of a unit on the plot: its filter's display colour, or a pale open-white. */
export function unitColour(filterColour: string | undefined): string {
  return filterColour ?? '#f1e9d6';
}
