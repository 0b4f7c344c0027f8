'use client';

import { useId } from 'react';
import type { FieldIds } from './FieldFrame';

/** Stable ids for a field's control, hint and error message. */
export function useFieldIds(): FieldIds {
  const base = useId();
  return { inputId: `${base}-input`, hintId: `${base}-hint`, errorId: `${base}-error` };
}
