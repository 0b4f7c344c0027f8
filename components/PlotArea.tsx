'use client';

import dynamic from 'next/dynamic';

// Konva needs the browser's canvas, so the plan is rendered on the client only.
const PlotCanvas = dynamic(() => import('./PlotCanvas'), {
  ssr: false,
  loading: () => <div className="plot-canvas plot-canvas--loading">Loading the stage plan…</div>,
});

/** The client-only island that holds the stage plan. */
export default function PlotArea() {
  return <PlotCanvas />;
}
