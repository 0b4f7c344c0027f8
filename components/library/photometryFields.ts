/** Small shared pieces of the type photometry forms. */
import type { CommitOutcome } from '@/components/inputs/useFieldDraft';
import type { SoftPhotometry } from '@/lib/plot';

/** Commit a whole new photometry; returns a refusal message or null. */
export type Commit<P> = (next: P) => CommitOutcome;

/** The emitting area of a soft source, m². */
export function softAreaM2(shape: SoftPhotometry['shape']): number {
  return shape.kind === 'disc' ? Math.PI * shape.radiusM ** 2 : shape.widthM * shape.heightM;
}
