/**
 * The plan drawn as SVG for print: stage, acting areas, centre and setting lines, positions, units
 * (our glyphs, turned along their aim, with unit number and channel), beam pools, subjects, a scale
 * bar and the audience arrow. Drawn from the same geometry as the canvas (plan m, +x stage left,
 * +y upstage; the audience is at the bottom of the sheet), so it prints as crisp vectors without a GPU.
 */
import type { DerivedPlot, PlotDocument } from '@/lib/plot';
import { METRES_PER_FOOT } from '@/lib/units';
import { glyphOutline, glyphRotationDeg, unitColour } from '../canvas/glyphs';

/** Glyph length on paper, m of plan (a unit drawn about 0.5 m long reads at 1:50–1:100). */
const GLYPH_M = 0.5;

type Pt = { readonly x: number; readonly y: number };

/** Plan point → SVG point (y flipped so upstage is up the sheet). */
const svg = (point: Pt) => ({ x: point.x, y: -point.y });
const pointsText = (points: readonly Pt[]) =>
  points.map((point) => `${svg(point).x.toFixed(3)},${svg(point).y.toFixed(3)}`).join(' ');

/** A round scale-bar length near a quarter of the drawing's width: 1, 2, 5, 10 … m or ft. */
function scaleBar(widthM: number, units: PlotDocument['displayUnits']) {
  const unitM = units === 'metric' ? 1 : METRES_PER_FOOT;
  const target = widthM / 4 / unitM;
  const steps = [1, 2, 5, 10, 20, 50, 100];
  const count = steps.filter((step) => step <= target).pop() ?? 1;
  return { lengthM: count * unitM, label: units === 'metric' ? `${count} m` : `${count} ft`, count };
}

/** The drawing's extent, m: stage, positions, units, their focus points and subjects (not far-off viewpoints). */
function drawingBounds(document: PlotDocument, marginM: number) {
  const points: Pt[] = [...document.stage.outline];
  for (const position of document.positions) {
    if (position.shape.kind === 'line') points.push(position.shape.start, position.shape.end);
    else points.push(position.shape.at);
  }
  for (const unit of document.fixtures) points.push(unit.mount, unit.focus);
  for (const person of document.subjects) points.push(person.mark);
  if (points.length === 0) points.push({ x: -4, y: 0 }, { x: 4, y: 6 });
  const xs = points.map((point) => point.x);
  const ys = points.map((point) => point.y);
  return {
    minX: Math.min(...xs) - marginM,
    maxX: Math.max(...xs) + marginM,
    minY: Math.min(...ys) - marginM,
    maxY: Math.max(...ys) + marginM,
  };
}

export function PlanDrawing({ document, derived }: { document: PlotDocument; derived: DerivedPlot }) {
  const core = drawingBounds(document, 1.2);
  // Room on the right for the names of line positions, which are written past their right end.
  const longestName = Math.max(0, ...document.positions.map((position) => position.name.length));
  const nameText = Math.max(0.22, Math.min(core.maxX - core.minX, core.maxY - core.minY) / 45);
  const bounds = { ...core, maxX: core.maxX + longestName * nameText * 0.55 };
  // Room below for the audience arrow and scale bar.
  const footM = Math.max(1.2, (bounds.maxY - bounds.minY) * 0.1);
  const width = bounds.maxX - bounds.minX;
  const height = bounds.maxY - bounds.minY + footM;
  const viewBox = `${bounds.minX} ${-bounds.maxY} ${width} ${height}`;
  const text = Math.max(0.22, Math.min(width, height) / 45);
  const line = text / 8;
  const bar = scaleBar(width, document.displayUnits);
  const footY = -bounds.minY + footM * 0.55;
  const clipId = `plan-clip-${document.name.length}-${derived.units.length}`;
  const positions = new Map(document.positions.map((position) => [position.id, position]));
  return (
    <svg
      className="plan-drawing"
      viewBox={viewBox}
      role="img"
      aria-label={`Plan of ${document.name}`}
      preserveAspectRatio="xMidYMid meet"
    >
      <defs>
        <clipPath id={clipId}>
          <rect x={bounds.minX} y={-bounds.maxY} width={width} height={bounds.maxY - bounds.minY} />
        </clipPath>
      </defs>
      <polygon
        points={pointsText(document.stage.outline)}
        fill="#f4f4f2"
        stroke="#222"
        strokeWidth={line * 2}
      />
      {document.stage.acting.map((area) => (
        <polygon
          key={area.id}
          points={pointsText(area.outline)}
          fill="none"
          stroke="#6a7d93"
          strokeWidth={line}
          strokeDasharray={`${line * 6} ${line * 4}`}
        />
      ))}
      {/* Centre line and setting line. */}
      <line
        x1={0}
        y1={-bounds.maxY}
        x2={0}
        y2={-bounds.minY}
        stroke="#3a6f9c"
        strokeWidth={line}
        strokeDasharray={`${line * 12} ${line * 4} ${line * 2} ${line * 4}`}
      />
      <line
        x1={bounds.minX}
        y1={0}
        x2={bounds.maxX}
        y2={0}
        stroke="#b07a12"
        strokeWidth={line}
        strokeDasharray={`${line * 10} ${line * 5}`}
      />
      <text x={0} y={-bounds.maxY + text * 1.1} fontSize={text * 0.8} textAnchor="middle" fill="#3a6f9c">
        CL
      </text>
      <text
        x={bounds.maxX - text * 0.3}
        y={-text * 0.3}
        fontSize={text * 0.8}
        textAnchor="end"
        fill="#b07a12"
      >
        setting line
      </text>
      {/* Pools, clipped to the drawing: an open pool (its edge reaches the horizon) is outlined only. */}
      <g clipPath={`url(#${clipId})`}>
        {derived.units.map((unit) => {
          const pool = unit.focus.beamPool;
          if (!pool || pool.state === 'misses' || pool.polygon.length < 3) return null;
          return (
            <polygon
              key={`pool-${unit.fixture.id}`}
              points={pointsText(pool.polygon)}
              fill={pool.open ? 'none' : unitColour(unit.fixture.filter?.displayColour)}
              fillOpacity={0.18}
              stroke="#8a7a50"
              strokeOpacity={pool.open ? 0.35 : 0.6}
              strokeWidth={line * 0.8}
              strokeDasharray={pool.open ? `${line * 4} ${line * 4}` : undefined}
            />
          );
        })}
      </g>
      {document.positions.map((position) => {
        const shape = position.shape;
        if (shape.kind === 'line') {
          const start = svg(shape.start);
          const end = svg(shape.end);
          const rightmost = start.x > end.x ? start : end;
          return (
            <g key={position.id}>
              <line x1={start.x} y1={start.y} x2={end.x} y2={end.y} stroke="#111" strokeWidth={line * 3} />
              <text x={rightmost.x + text * 0.4} y={rightmost.y + text * 0.35} fontSize={text} fill="#111">
                {position.name}
              </text>
            </g>
          );
        }
        const at = svg(shape.at);
        return (
          <g key={position.id}>
            <circle cx={at.x} cy={at.y} r={text * 0.35} fill="none" stroke="#111" strokeWidth={line * 2} />
            <text
              x={at.x}
              y={at.y + GLYPH_M * 0.6 + text * 1.1}
              fontSize={text}
              textAnchor="middle"
              fill="#111"
            >
              {position.name}
            </text>
          </g>
        );
      })}
      {derived.units.map((unit) => {
        const { fixture } = unit;
        const mount = svg(fixture.mount);
        const focus = svg(fixture.focus);
        const outline = glyphOutline(unit.type.category);
        const points: string[] = [];
        for (let index = 0; index < outline.length; index += 2)
          points.push(
            `${(outline[index] * GLYPH_M).toFixed(3)},${(outline[index + 1] * GLYPH_M).toFixed(3)}`,
          );
        const free = fixture.positionId === null || !positions.has(fixture.positionId);
        return (
          <g key={fixture.id}>
            <line
              x1={mount.x}
              y1={mount.y}
              x2={focus.x}
              y2={focus.y}
              stroke="#555"
              strokeWidth={line * 0.7}
              strokeDasharray={`${line * 3} ${line * 3}`}
            />
            <circle cx={focus.x} cy={focus.y} r={line * 2.5} fill="#555" />
            <g
              transform={`translate(${mount.x} ${mount.y}) rotate(${glyphRotationDeg(unit.focus.aim?.panDeg ?? 0)})`}
            >
              <polygon
                points={points.join(' ')}
                fill={unitColour(fixture.filter?.displayColour)}
                stroke="#111"
                strokeWidth={line}
              />
            </g>
            <text
              x={mount.x}
              y={mount.y + text * 0.32}
              fontSize={text * 0.85}
              textAnchor="middle"
              fontWeight={700}
              fill="#111"
            >
              {fixture.unit ?? (free ? '·' : '')}
            </text>
            {fixture.channel !== null ? (
              <g>
                <circle
                  cx={mount.x}
                  cy={mount.y - GLYPH_M * 0.9}
                  r={text * 0.62}
                  fill="#fff"
                  stroke="#111"
                  strokeWidth={line}
                />
                <text
                  x={mount.x}
                  y={mount.y - GLYPH_M * 0.9 + text * 0.3}
                  fontSize={text * 0.8}
                  textAnchor="middle"
                  fill="#111"
                >
                  {fixture.channel}
                </text>
              </g>
            ) : null}
          </g>
        );
      })}
      {document.subjects.map((person) => {
        const mark = svg(person.mark);
        return (
          <g key={person.id}>
            <circle cx={mark.x} cy={mark.y} r={text * 0.45} fill="#b04a9c" stroke="#fff" strokeWidth={line} />
            <text x={mark.x + text * 0.6} y={mark.y + text * 0.3} fontSize={text * 0.85} fill="#7a2f6b">
              {person.name}
            </text>
          </g>
        );
      })}
      {/* Audience arrow: the house is downstage (−y), at the bottom of the sheet. */}
      <g>
        <line x1={0} y1={footY - text * 1.6} x2={0} y2={footY} stroke="#111" strokeWidth={line * 2} />
        <polygon
          points={`${-text * 0.45},${footY - text * 0.5} ${text * 0.45},${footY - text * 0.5} 0,${footY + text * 0.2}`}
          fill="#111"
        />
        <text x={text * 0.7} y={footY} fontSize={text} fill="#111">
          Audience
        </text>
      </g>
      <g>
        {Array.from({ length: bar.count > 5 ? 2 : bar.count }, (_, index) => {
          const parts = bar.count > 5 ? 2 : bar.count;
          const partM = bar.lengthM / parts;
          return (
            <rect
              key={index}
              x={bounds.minX + text + index * partM}
              y={footY - text * 0.4}
              width={partM}
              height={text * 0.4}
              fill={index % 2 === 0 ? '#111' : '#fff'}
              stroke="#111"
              strokeWidth={line}
            />
          );
        })}
        <text x={bounds.minX + text} y={footY + text * 1.1} fontSize={text * 0.85} fill="#111">
          0
        </text>
        <text
          x={bounds.minX + text + bar.lengthM}
          y={footY + text * 1.1}
          fontSize={text * 0.85}
          textAnchor="middle"
          fill="#111"
        >
          {bar.label}
        </text>
      </g>
    </svg>
  );
}
