'use client';

import { type KeyboardEvent, type MouseEvent, useId, useRef, useState } from 'react';

export interface ListItem {
  readonly id: string;
  readonly label: string;
}

interface SelectableListProps {
  readonly title: string;
  readonly items: readonly ListItem[];
  /** Said instead of the list when it is empty. */
  readonly emptyText: string;
  /** The whole plot's selection (ids are unique across the plot). */
  readonly selection: readonly string[];
  readonly onSelect: (ids: readonly string[]) => void;
}

const MOVES = new Set(['ArrowDown', 'ArrowUp', 'Home', 'End']);

/**
 * One titled list of plot items, usable from the keyboard: Tab reaches it (on its selected item),
 * arrow keys, Home and End move and select, Enter or Space selects; with Ctrl/Cmd held the arrows
 * only move and Enter, Space or a click add the item to (or take it out of) the selection.
 */
export function SelectableList({ title, items, emptyText, selection, onSelect }: SelectableListProps) {
  const headingId = useId();
  const options = useRef(new Map<string, HTMLLIElement>());
  const [activeId, setActiveId] = useState<string | null>(null);
  const selected = new Set(selection);
  const tabStop =
    items.find((item) => selected.has(item.id))?.id ??
    items.find((item) => item.id === activeId)?.id ??
    items[0]?.id;

  const toggle = (id: string) =>
    onSelect(selected.has(id) ? selection.filter((other) => other !== id) : [...selection, id]);

  const onKeyDown = (event: KeyboardEvent<HTMLUListElement>) => {
    const current = (event.target as HTMLElement).dataset.itemId;
    const index = items.findIndex((item) => item.id === current);
    if (index < 0) return;
    const adding = event.ctrlKey || event.metaKey;
    if (MOVES.has(event.key)) {
      const next =
        event.key === 'Home'
          ? 0
          : event.key === 'End'
            ? items.length - 1
            : Math.min(items.length - 1, Math.max(0, index + (event.key === 'ArrowDown' ? 1 : -1)));
      const target = items[next];
      options.current.get(target.id)?.focus();
      setActiveId(target.id);
      if (!adding) onSelect([target.id]);
    } else if (event.key === 'Enter' || event.key === ' ') {
      if (adding) toggle(items[index].id);
      else onSelect([items[index].id]);
    } else {
      return;
    }
    // The editor's own shortcuts (arrows nudge the selection) must not also act on these keys.
    event.preventDefault();
    event.stopPropagation();
  };

  const onClick = (event: MouseEvent, id: string) => {
    setActiveId(id);
    if (event.ctrlKey || event.metaKey) toggle(id);
    else onSelect([id]);
  };

  return (
    <section className="panel-list" aria-labelledby={headingId}>
      <h3 id={headingId}>
        {title} <span className="panel-count">({items.length})</span>
      </h3>
      {items.length === 0 ? (
        <p className="panel-note">{emptyText}</p>
      ) : (
        <ul
          className="panel-listbox"
          role="listbox"
          aria-labelledby={headingId}
          aria-multiselectable="true"
          onKeyDown={onKeyDown}
        >
          {items.map((item) => (
            <li
              key={item.id}
              ref={(element) => {
                if (element) options.current.set(item.id, element);
                else options.current.delete(item.id);
              }}
              role="option"
              aria-selected={selected.has(item.id)}
              tabIndex={item.id === tabStop ? 0 : -1}
              data-item-id={item.id}
              className="panel-option"
              onClick={(event) => onClick(event, item.id)}
              onFocus={() => setActiveId(item.id)}
            >
              {item.label}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
