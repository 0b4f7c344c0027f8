'use client';

import { type ReactNode, useId } from 'react';

/** A titled part of a panel: an <h3> that also names the region. */
export function PanelSection({ title, children }: { title: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <section className="panel-section" aria-labelledby={headingId}>
      <h3 id={headingId}>{title}</h3>
      {children}
    </section>
  );
}
