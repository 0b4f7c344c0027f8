/** The canvas tools: what a click or drag on the plan does. */
export type Tool =
  /** Select, drag units along their positions, drag focus points, subjects and viewpoints. */
  | { readonly kind: 'select' }
  /** Click a position to hang a unit of this type there. */
  | { readonly kind: 'hang'; readonly typeId: string }
  /** Click to place a subject. */
  | { readonly kind: 'subject' }
  /** Drag to measure a plan distance. */
  | { readonly kind: 'measure' };
