'use client';

import { useEffect } from 'react';
import { aimFixture, deleteFixtures, deleteSubjects, duplicateFixtures, moveSubject } from '@/lib/plot';
import type { EditorApi } from './EditorContext';

/** Nudge step for arrow keys, m (Shift: ×5). */
const NUDGE_M = 0.1;

function typingInField(target: EventTarget | null): boolean {
  const element = target as HTMLElement | null;
  return (
    !!element &&
    (element.tagName === 'INPUT' ||
      element.tagName === 'TEXTAREA' ||
      element.tagName === 'SELECT' ||
      element.isContentEditable)
  );
}

/**
 * Keyboard: Ctrl/Cmd+Z undo, Ctrl/Cmd+Shift+Z or Ctrl+Y redo, Delete removes the selected units and
 * subjects, Ctrl/Cmd+D duplicates selected units, arrows nudge selected focus points and subjects
 * (Shift for bigger steps), Escape clears the selection.
 */
export function useShortcuts(editor: EditorApi): void {
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (typingInField(event.target)) return;
      const command = event.ctrlKey || event.metaKey;
      const key = event.key.toLowerCase();
      const { document, selection, store, run } = editor;
      const fixtures = selection.filter((id) => document.fixtures.some((unit) => unit.id === id));
      const subjects = selection.filter((id) => document.subjects.some((person) => person.id === id));
      if (command && key === 'z') {
        event.preventDefault();
        if (event.shiftKey) store.redo();
        else store.undo();
      } else if (command && key === 'y') {
        event.preventDefault();
        store.redo();
      } else if (command && key === 'd') {
        event.preventDefault();
        if (fixtures.length > 0) run(duplicateFixtures, { ids: fixtures, offset: { x: 0.5, y: 0 } });
      } else if (key === 'delete' || key === 'backspace') {
        if (fixtures.length === 0 && subjects.length === 0) return;
        event.preventDefault();
        store.beginGesture(`Delete ${selection.length} item${selection.length === 1 ? '' : 's'}`);
        if (fixtures.length > 0) run(deleteFixtures, { ids: fixtures });
        if (subjects.length > 0) run(deleteSubjects, { ids: subjects });
        store.endGesture();
        editor.select([]);
      } else if (key === 'escape') {
        editor.select([]);
      } else if (key.startsWith('arrow') && (fixtures.length > 0 || subjects.length > 0)) {
        event.preventDefault();
        const step = NUDGE_M * (event.shiftKey ? 5 : 1);
        const dx = key === 'arrowleft' ? -step : key === 'arrowright' ? step : 0;
        const dy = key === 'arrowup' ? step : key === 'arrowdown' ? -step : 0;
        store.beginGesture('Nudge');
        for (const id of fixtures) {
          const unit = document.fixtures.find((item) => item.id === id);
          if (unit)
            run(aimFixture, { id, focus: { x: unit.focus.x + dx, y: unit.focus.y + dy, z: unit.focus.z } });
        }
        for (const id of subjects) {
          const person = document.subjects.find((item) => item.id === id);
          if (person) run(moveSubject, { id, mark: { x: person.mark.x + dx, y: person.mark.y + dy } });
        }
        store.endGesture();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [editor]);
}
