'use client';

import type { LoadFlag, WeightFlag } from '@/lib/analysis';
import { loadFlagText, weightFlagText } from '@/lib/plot';

const LOAD_MARK: Record<LoadFlag, string> = { ok: '✓', 'over-limit': '▲', 'over-rating': '✕' };

/** A load flag as words with a mark and our own colour (the words carry the meaning, not the colour). */
export function LoadBadge({ flag, limitPct }: { flag: LoadFlag; limitPct: number }) {
  return (
    <span className={`load-badge load-badge--${flag}`} data-flag={flag}>
      <span aria-hidden="true">{LOAD_MARK[flag]} </span>
      {loadFlagText(flag, limitPct)}
    </span>
  );
}

const WEIGHT_CLASS: Record<WeightFlag, string> = {
  ok: 'ok',
  'no-rating': 'none',
  bunched: 'over-limit',
  'over-rating': 'over-rating',
};
const WEIGHT_MARK: Record<WeightFlag, string> = {
  ok: '✓',
  'no-rating': '?',
  bunched: '▲',
  'over-rating': '✕',
};

export function WeightBadge({ flag }: { flag: WeightFlag }) {
  return (
    <span className={`load-badge load-badge--${WEIGHT_CLASS[flag]}`} data-flag={flag}>
      <span aria-hidden="true">{WEIGHT_MARK[flag]} </span>
      {weightFlagText(flag)}
    </span>
  );
}

/** A bar of the share of a rating, with a tick at the continuous limit. */
export function RatingBar({ pct, limitPct, flag }: { pct: number; limitPct: number; flag: LoadFlag }) {
  const width = Math.min(100, Math.max(0, Number.isFinite(pct) ? pct : 0));
  return (
    <span className="load-bar" aria-hidden="true">
      <span className={`load-bar-fill load-bar-fill--${flag}`} style={{ width: `${width}%` }} />
      <span className="load-bar-limit" style={{ left: `${Math.min(100, limitPct)}%` }} />
    </span>
  );
}
