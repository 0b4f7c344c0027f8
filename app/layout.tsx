import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import './globals.css';

export const metadata: Metadata = {
  title: 'Throwline — stage and studio lighting plots',
  description:
    'Plan stage and studio lighting on a 2D plan of the stage, with real beam photometry: throw, spread and light levels where people stand.',
};

export const viewport: Viewport = {
  themeColor: '#12161d',
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body>{children}</body>
    </html>
  );
}
