'use client';

import { type RefObject, useEffect, useRef, useState } from 'react';
import { Layer, Line, Rect, Stage, Text } from 'react-konva';
import { type StageSize, fitPlanView, gridLinesM, planToScreen } from './planView';

const stage: StageSize = { widthM: 8, depthM: 6 };
const marginM = 1;

const colours = {
  grid: '#2b3544',
  outline: '#9fb0c4',
  settingLine: '#f0b541',
  centreLine: '#7fb8e6',
  label: '#8d9bad',
};

interface CanvasSize {
  readonly width: number;
  readonly height: number;
}

function useContainerSize(): [RefObject<HTMLDivElement | null>, CanvasSize | null] {
  const containerRef = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState<CanvasSize | null>(null);

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

/** The plan of an empty 8 m × 6 m stage on a 1 m grid, with the setting line and the centre line. */
export default function PlotCanvas() {
  const [containerRef, size] = useContainerSize();

  return (
    <div
      ref={containerRef}
      className="plot-canvas"
      role="img"
      aria-label={`Stage plan: ${stage.widthM} m wide by ${stage.depthM} m deep on a 1 m grid, audience at the bottom`}
    >
      {size !== null && size.width > 0 && size.height > 0 ? <StagePlan size={size} /> : null}
    </div>
  );
}

function StagePlan({ size }: { size: CanvasSize }) {
  const view = fitPlanView({ widthPx: size.width, heightPx: size.height, stage, marginM });
  const grid = gridLinesM(stage);
  const halfWidthM = stage.widthM / 2;
  const toScreen = (xM: number, yM: number): number[] => {
    const point = planToScreen(view, { xM, yM });
    return [point.x, point.y];
  };
  const upstageRightCorner = planToScreen(view, { xM: -halfWidthM, yM: stage.depthM });
  const labelFontPx = Math.max(10, Math.min(14, view.pixelsPerM * 0.22));
  const settingLineEnd = planToScreen(view, { xM: halfWidthM, yM: 0 });
  const centreLineTop = planToScreen(view, { xM: 0, yM: stage.depthM });

  return (
    <Stage width={size.width} height={size.height}>
      <Layer listening={false}>
        {grid.xM.map((xM) => (
          <Line
            key={`x${xM}`}
            points={[...toScreen(xM, 0), ...toScreen(xM, stage.depthM)]}
            stroke={colours.grid}
            strokeWidth={1}
          />
        ))}
        {grid.yM.map((yM) => (
          <Line
            key={`y${yM}`}
            points={[...toScreen(-halfWidthM, yM), ...toScreen(halfWidthM, yM)]}
            stroke={colours.grid}
            strokeWidth={1}
          />
        ))}
        <Rect
          x={upstageRightCorner.x}
          y={upstageRightCorner.y}
          width={stage.widthM * view.pixelsPerM}
          height={stage.depthM * view.pixelsPerM}
          stroke={colours.outline}
          strokeWidth={2}
        />
        <Line
          points={[...toScreen(0, -marginM * 0.6), ...toScreen(0, stage.depthM + marginM * 0.4)]}
          stroke={colours.centreLine}
          strokeWidth={1.5}
          dash={[10, 5, 2, 5]}
        />
        <Line
          points={[...toScreen(-halfWidthM - marginM * 0.4, 0), ...toScreen(halfWidthM + marginM * 0.4, 0)]}
          stroke={colours.settingLine}
          strokeWidth={2.5}
        />
        <Text
          x={settingLineEnd.x - 120}
          y={settingLineEnd.y + 6}
          width={120}
          align="right"
          text="Setting line"
          fontSize={labelFontPx}
          fill={colours.settingLine}
        />
        <Text
          x={centreLineTop.x + 6}
          y={centreLineTop.y - labelFontPx - 6}
          text="Centre line"
          fontSize={labelFontPx}
          fill={colours.centreLine}
        />
        <Text
          x={0}
          y={size.height - labelFontPx - 8}
          width={size.width}
          align="center"
          text="Audience"
          fontSize={labelFontPx}
          fill={colours.label}
        />
      </Layer>
    </Stage>
  );
}
