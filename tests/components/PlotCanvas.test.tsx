// @vitest-environment jsdom
import { act, cleanup, render, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import PlotCanvas from '@/components/PlotCanvas';

type ResizeCallback = (entries: { contentRect: { width: number; height: number } }[]) => void;

const observers: ResizeCallback[] = [];

class FakeResizeObserver {
  constructor(private readonly callback: ResizeCallback) {
    observers.push(callback);
  }
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {
    const index = observers.indexOf(this.callback);
    if (index >= 0) observers.splice(index, 1);
  }
}

function resizeContainer(width: number, height: number): void {
  act(() => {
    for (const callback of observers) callback([{ contentRect: { width, height } }]);
  });
}

beforeEach(() => {
  vi.stubGlobal('ResizeObserver', FakeResizeObserver);
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  observers.length = 0;
});

describe('PlotCanvas', () => {
  it('is labelled as the stage plan with its size and grid', () => {
    render(<PlotCanvas />);
    const plan = screen.getByRole('img', { name: /stage plan: 8 m wide by 6 m deep on a 1 m grid/i });
    expect(plan).toBeTruthy();
  });

  it('draws nothing until the container has been measured', () => {
    const { container } = render(<PlotCanvas />);
    expect(container.querySelector('canvas')).toBeNull();
  });

  it('draws a canvas the size of its container', () => {
    const { container } = render(<PlotCanvas />);
    resizeContainer(640.7, 480.2);
    const canvas = container.querySelector('canvas');
    expect(canvas).not.toBeNull();
    expect(canvas?.style.width).toBe('640px');
    expect(canvas?.style.height).toBe('480px');
  });

  it('follows the container when it is resized', () => {
    const { container } = render(<PlotCanvas />);
    resizeContainer(640, 480);
    resizeContainer(300, 200);
    const canvas = container.querySelector('canvas');
    expect(canvas?.style.width).toBe('300px');
    expect(canvas?.style.height).toBe('200px');
  });

  it('stops observing the container when unmounted', () => {
    const { unmount } = render(<PlotCanvas />);
    expect(observers).toHaveLength(1);
    unmount();
    expect(observers).toHaveLength(0);
  });
});
