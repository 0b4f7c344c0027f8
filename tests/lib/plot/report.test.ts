import { describe, expect, it } from 'vitest';
import { buildReport, formatReportText } from '@/lib/plot';
import { beamIlluminanceLx } from '@/lib/photometry';
import { tinyPlot, unit } from './tinyPlot';

// The tiny plot by hand: unit at (0, −2, 6) aimed at a face at (0, 2, 1.6); 26°/40°, 20 000 cd.
// Offsets 4 m in plan and 4.4 m drop → throw √(4² + 4.4²) = √35.36 = 5.946 427 m (Pythagoras).
describe('the report on a hand-computed plot', () => {
  const report = buildReport(tinyPlot());
  const fixture = report.fixtures[0];

  it('throw, pan and tilt', () => {
    expect(fixture.throwM).toBeCloseTo(5.946427, 6);
    expect(fixture.panDeg).toBeCloseTo(180, 9); // aimed straight upstage
    expect(fixture.tiltDeg).toBeCloseTo(47.726311, 6); // atan(4.4 / 4)
  });

  it('beam and field diameters at the throw: 2·d·tan(a/2) (REFERENCE-CHECKS §3)', () => {
    expect(fixture.beamDiameterM).toBeCloseTo(2.745682, 6);
    expect(fixture.fieldDiameterM).toBeCloseTo(4.328645, 6);
  });

  it('centre illuminance square to the beam: 20 000 cd / 35.36 m² = 565.61 lx (inverse-square law)', () => {
    expect(fixture.centreLx).toBeCloseTo(565.6109, 4);
  });

  it('the beam pool on the 1.6 m focus plane by the tilted-cone formulas of REFERENCE-CHECKS §3', () => {
    // h = 4.4 m, β = atan(4/4.4), α = 13°: near = h·tan(β−α), far = h·tan(β+α).
    expect(fixture.footprint).toMatchObject({ open: false, state: 'closed' });
    expect(fixture.footprint?.nearM).toBeCloseTo(2.466509, 6);
    expect(fixture.footprint?.farM).toBeCloseTo(6.348176, 6);
    expect(fixture.footprint?.widthM).toBeCloseTo(2.808229, 6);
    expect(fixture.footprint?.areaM2).toBeCloseTo(8.561321, 5);
  });

  it('light on the face toward the house: I·cos i / d² = 20 000 × (4 / 5.946) / 35.36 = 380.47 lx', () => {
    const subject = report.subjects[0];
    expect(subject.judgedToward).toBe('viewpoint');
    expect(subject.sources).toEqual([{ fixtureId: 'fx-1', faceLx: expect.closeTo(380.471, 3) }]);
    expect(subject.totalFaceLx).toBeCloseTo(380.471, 3);
  });

  it('a square-law unit at 50 % through a 50 % filter gives 1/8 of the light', () => {
    const dimmed = tinyPlot({
      fixtureTypes: tinyPlot().fixtureTypes.map((type) => ({ ...type, dimmingCurve: 'square' as const })),
      fixtures: [
        {
          ...unit,
          levelPct: 50,
          filter: { name: 'half', transmission: 0.5, miredShift: 0, displayColour: '#ffffff' },
        },
      ],
    });
    expect(buildReport(dimmed).subjects[0].totalFaceLx).toBeCloseTo(380.471 / 8, 3);
  });

  it('a unit with zero throw is reported, not computed into NaN', () => {
    const broken = tinyPlot({ fixtures: [{ ...unit, focus: unit.mount }] });
    const entry = buildReport(broken).fixtures[0];
    expect(entry.problem).toMatch(/zero throw/);
    expect([entry.throwM, entry.centreLx, entry.footprint]).toEqual([null, null, null]);
    expect(buildReport(broken).subjects[0].totalFaceLx).toBe(0);
  });

  it('a unit aimed above the horizon reports an open or missing pool', () => {
    const upward = tinyPlot({ fixtures: [{ ...unit, focus: { x: 0, y: 20, z: 12 } }] }); // 15.3° above the horizon, beam half-angle 13°
    expect(buildReport(upward).fixtures[0].footprint).toMatchObject({
      open: true,
      state: 'misses',
      farM: null,
    });
  });

  it('prints in imperial units with feet and foot-candles and never NaN', () => {
    const text = formatReportText(report, 'imperial');
    expect(text).toContain(`19' 6"`); // 5.946 m = 19.51 ft
    expect(text).toContain('52.5 fc'); // 565.61 lx / 10.7639
    expect(text).not.toMatch(/NaN|undefined|Infinity/);
    expect(formatReportText(report, 'metric')).toContain('566 lx');
  });
});

describe('the report’s coverage figures', () => {
  it('gives each acting area its levels and finds the pool as a hot spot caused by the unit', () => {
    const plot = tinyPlot({
      stage: {
        outline: tinyPlot().stage.outline,
        acting: [
          {
            id: 'area-c',
            name: 'Centre',
            outline: [
              { x: -1, y: 1 },
              { x: 1, y: 1 },
              { x: 1, y: 3 },
              { x: -1, y: 3 },
            ],
          },
        ],
      },
    });
    const coverage = buildReport(plot, { targetLx: 100 }).coverage;
    expect(coverage.areas.map((area) => area.name)).toEqual(['Whole stage', 'Centre']);
    const centre = coverage.areas[1];
    // Cross-check with the exact point-source function on the same 0.1 m cell centres inside the area.
    let sum = 0;
    let max = 0;
    for (let row = 0; row < 60; row += 1) {
      for (let column = 0; column < 80; column += 1) {
        const x = -4 + (column + 0.5) * 0.1;
        const y = (row + 0.5) * 0.1;
        if (x < -1 || x > 1 || y < 1 || y > 3) continue;
        const lux = beamIlluminanceLx({
          mount: unit.mount,
          axis: { x: 0, y: 4, z: -4.4 },
          peakCd: 20000,
          spread: { kind: 'round', beamAngleDeg: 26, fieldAngleDeg: 40 },
          point: { x, y, z: 1.6 },
          normal: { x: 0, y: 0, z: 1 },
        });
        sum += lux;
        max = Math.max(max, lux);
      }
    }
    expect(centre.averageLx).toBeCloseTo(sum / 400, 2);
    expect(centre.maxLx).toBeCloseTo(max, 2);
    expect(coverage.regions[0]).toMatchObject({ kind: 'hot', reason: 'over target' });
    expect(coverage.regions[0].fixtures[0].fixtureId).toBe('fx-1');
  });
});

describe('the report on roles set by hand and level sets', () => {
  it('marks a role set by hand beside the rule’s, and lists the level sets with the chosen one', () => {
    // The tiny plot's one unit is the key by the rule (the only front source); the user calls it fill.
    const plot = tinyPlot({
      subjects: [{ ...tinyPlot().subjects[0], roleOverrides: { [unit.id]: 'fill' } }],
      levelSets: [
        { id: 'look-1', name: 'Scene 1', levels: { [unit.id]: 100 } },
        { id: 'look-2', name: 'Blackout', levels: {} },
      ],
      activeLevelSetId: 'look-1',
    });
    const report = buildReport(plot);
    expect(report.subjects[0].roles).toEqual([
      { fixtureId: unit.id, role: 'fill', ruleRole: 'key', overridden: true },
    ]);
    // The sums follow the final role: all 380.47 lx is fill, none key.
    expect(report.subjects[0].keyLx).toBe(0);
    expect(report.subjects[0].fillLx).toBeCloseTo(380.471, 3);
    expect(report.levelSets).toEqual([
      { id: 'look-1', name: 'Scene 1', chosen: true, levels: { [unit.id]: 100 } },
      { id: 'look-2', name: 'Blackout', chosen: false, levels: {} },
    ]);
    const text = formatReportText(report, 'metric');
    expect(text).toContain('fill (set by hand; rule: key)');
    expect(text).toContain('Scene 1 (chosen: the levels above): Front pipe #1 100 %');
    expect(text).toContain('Blackout: every unit at 0 %');
  });
});
