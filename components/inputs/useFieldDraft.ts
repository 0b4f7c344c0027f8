'use client';

import { type ChangeEvent, type KeyboardEvent, useState } from 'react';

/** What a commit handler returns: null when the value was taken, else the message to show at the field. */
export type CommitOutcome = string | null;

export interface FieldDraftOptions {
  /** Enter commits (single-line fields); in a multi-line field Ctrl/Cmd+Enter commits instead. */
  readonly multiline?: boolean;
}

export interface FieldDraft {
  /** The text in the field: the user's draft while editing, else the shown value. */
  readonly text: string;
  /** The message for the last refused commit, or null. */
  readonly error: string | null;
  readonly onChange: (event: ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => void;
  readonly onBlur: () => void;
  readonly onKeyDown: (event: KeyboardEvent<HTMLInputElement | HTMLTextAreaElement>) => void;
}

/**
 * The edit cycle every typed field shares. The field shows `shown` until the user types; Enter or
 * leaving the field hands the draft to `accept`, which either takes it (returns null: the field shows
 * the new value) or refuses with a message (the draft and the message stay). Escape drops the draft.
 * Text the user did not change is never committed, so a rounded display cannot move anything.
 */
export function useFieldDraft(
  shown: string,
  accept: (text: string) => CommitOutcome,
  options: FieldDraftOptions = {},
): FieldDraft {
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  const revert = (): boolean => {
    const hadSomething = draft !== null || error !== null;
    setDraft(null);
    setError(null);
    return hadSomething;
  };

  const commit = () => {
    if (draft === null || draft === shown) {
      revert();
      return;
    }
    // The same refused text is not offered again (Enter, then leaving the field).
    if (error !== null) return;
    const problem = accept(draft);
    if (problem === null) {
      setDraft(null);
      setError(null);
    } else {
      setError(problem);
    }
  };

  return {
    text: draft ?? shown,
    error,
    onChange(event) {
      setDraft(event.target.value);
      setError(null);
    },
    onBlur: commit,
    onKeyDown(event) {
      if (event.key === 'Escape') {
        if (revert()) {
          event.preventDefault();
          event.stopPropagation();
        }
        return;
      }
      if (event.key !== 'Enter') return;
      if (options.multiline && !(event.ctrlKey || event.metaKey)) return;
      event.preventDefault();
      commit();
    },
  };
}
