'use client';

import { type RefObject, useEffect, useRef, useState } from 'react';

export interface ContainerSize {
  readonly width: number;
  readonly height: number;
}

/** The pixel size of a container element, following resizes (null until measured). */
export function useContainerSize(): [RefObject<HTMLDivElement | null>, ContainerSize | null] {
  const containerRef = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState<ContainerSize | null>(null);
  useEffect(() => {
    const container = containerRef.current;
    if (container === null) return;
    const observer = new ResizeObserver((entries) => {
      const box = entries[entries.length - 1]?.contentRect;
      if (box === undefined) return;
      const width = Math.floor(box.width);
      const height = Math.floor(box.height);
      setSize((previous) =>
        previous !== null && previous.width === width && previous.height === height
          ? previous
          : { width, height },
      );
    });
    observer.observe(container);
    return () => observer.disconnect();
  }, []);
  return [containerRef, size];
}
