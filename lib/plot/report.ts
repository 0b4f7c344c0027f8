/**
 * The plot report: the numbers a crew needs, per fixture and per subject, as plain data with stable
 * names (scripts and outside verification read them; keep them stable). SI units throughout.
 */
import {
  createCoverageService,
  fixtureFocus,
  gridOver,
  subjectFaceLight,
  subjectLighting,
} from '../analysis';
import type { Footprint } from '../geometry';
import type { PlotDocument } from './schema/document';
import { mainViewpointPosition, resolveRig, subjectPlacements } from './resolve';
import { type SubjectExposure, subjectExposure } from './cameraExposure';
import { type ReportPower, type ReportWeight, reportPower, reportWeight } from './powerReport';

export interface ReportFootprint {
  readonly open: boolean;
  readonly state: string;
  readonly nearM: number | null;
  readonly farM: number | null;
  readonly widthM: number | null;
  readonly areaM2: number | null;
}

export interface ReportFixture {
  readonly id: string;
  readonly unit: number | null;
  /** Position name, or null for a free-standing unit. */
  readonly position: string | null;
  readonly type: string;
  readonly channel: number | null;
  readonly levelPct: number;
  readonly throwM: number | null;
  readonly panDeg: number | null;
  readonly tiltDeg: number | null;
  readonly beamAngleDeg: number | null;
  readonly fieldAngleDeg: number | null;
  readonly beamDiameterM: number | null;
  readonly fieldDiameterM: number | null;
  readonly centreLx: number | null;
  /** The beam pool on the focus plane. */
  readonly footprint: ReportFootprint | null;
  /** The field pool on the focus plane. */
  readonly fieldFootprint: ReportFootprint | null;
  readonly problem: string | null;
}

export interface ReportSubject {
  readonly id: string;
  readonly name: string;
  /** 'viewpoint' when the face is judged toward the main viewpoint, 'facing' otherwise. */
  readonly judgedToward: 'viewpoint' | 'facing';
  readonly totalFaceLx: number;
  /** Every source's light on the face, largest first. */
  readonly sources: readonly { readonly fixtureId: string; readonly faceLx: number }[];
  /**
   * Each source's role on this subject (key, fill, back, side, top): the user's where given
   * (`overridden` true), else the rule's in subjectLighting; `ruleRole` is always the rule's.
   */
  readonly roles: readonly {
    readonly fixtureId: string;
    readonly role: string;
    readonly ruleRole: string;
    readonly overridden: boolean;
  }[];
  readonly keyLx: number;
  readonly fillLx: number;
  readonly backLightLx: number;
  /** log2(key / fill), or null without fill. */
  readonly keyToFillStops: number | null;
  /** (key + fill) : fill as one number, or null without fill. */
  readonly lightingRatio: number | null;
  /** log2(back / key), or null. */
  readonly backToKeyStops: number | null;
  readonly cylindricalLx: number;
  readonly semiCylindricalLx: number;
  /** When the main viewpoint is a camera: what it needs and how the key light sits against it. */
  readonly exposure: SubjectExposure | null;
}

export interface ReportCoverage {
  /** Horizontal plane at this height, m. */
  readonly planeHeightM: number;
  readonly spacingM: number;
  readonly targetLx: number;
  readonly toleranceStops: number;
  readonly areas: readonly {
    readonly id: string;
    readonly name: string;
    readonly minLx: number;
    readonly averageLx: number;
    readonly maxLx: number;
    /** E min / E avg. */
    readonly uniformityMinToAverage: number;
    /** E min / E max. */
    readonly uniformityMinToMax: number;
    /** Share of the area within the target band, 0–1. */
    readonly withinTarget: number;
  }[];
  readonly regions: readonly {
    readonly kind: 'hot' | 'dark';
    readonly reason: string;
    readonly centre: { readonly x: number; readonly y: number };
    readonly areaM2: number;
    readonly extremeLx: number;
    readonly fixtures: readonly { readonly fixtureId: string; readonly lx: number }[];
  }[];
}

export interface ReportOptions {
  /** Target level for the coverage figures, lx (default 500). */
  readonly targetLx?: number;
  /** Grid spacing for the coverage figures, m (default 0.1). */
  readonly spacingM?: number;
}

export interface PlotReport {
  readonly show: string;
  readonly venue: string;
  readonly focusPlaneHeightM: number;
  readonly mainViewpoint: string | null;
  readonly fixtures: readonly ReportFixture[];
  readonly subjects: readonly ReportSubject[];
  /** The show's level sets; `chosen` marks the one whose levels the fixtures have now (at most one). */
  readonly levelSets: readonly {
    readonly id: string;
    readonly name: string;
    readonly chosen: boolean;
    /** Level of each unit in the set, %, by fixture id (a unit not named is at 0 % in it). */
    readonly levels: Readonly<Record<string, number>>;
  }[];
  readonly coverage: ReportCoverage;
  /** Loads per circuit, phase and feeder (powerReport.ts). */
  readonly power: ReportPower;
  /** Weight per hanging position (powerReport.ts). */
  readonly weight: ReportWeight;
}

function reportFootprint(footprint: Footprint | null): ReportFootprint | null {
  if (!footprint) return null;
  const { open, state, nearM, farM, widthM, areaM2 } = footprint;
  return { open, state, nearM, farM, widthM, areaM2 };
}

/** Coverage on the focus plane over the stage: statistics per acting area and hot spots / dark gaps. */
export function reportCoverage(document: PlotDocument, options: ReportOptions = {}): ReportCoverage {
  const targetLx = options.targetLx ?? 500;
  const spacingM = options.spacingM ?? 0.1;
  const toleranceStops = 0.5;
  const xs = document.stage.outline.map((point) => point.x);
  const ys = document.stage.outline.map((point) => point.y);
  const response = createCoverageService().handle({
    spec: {
      grid: gridOver(
        { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) },
        spacingM,
      ),
      plane: { kind: 'horizontal', heightM: document.focusPlaneHeightM },
    },
    fixtures: resolveRig(document),
    stage: { id: 'stage', name: 'Whole stage', outline: document.stage.outline },
    areas: document.stage.acting.map((area) => ({ id: area.id, name: area.name, outline: area.outline })),
    band: { targetLx, toleranceStops },
    rules: { hotStops: 1, darkStops: 1, maxOverlaps: 4, minimumAreaM2: 0.05 },
  });
  return {
    planeHeightM: document.focusPlaneHeightM,
    spacingM,
    targetLx,
    toleranceStops,
    areas: response.statistics.flatMap((row) =>
      row.figures
        ? [
            {
              id: row.id,
              name: row.name,
              minLx: row.figures.minLx,
              averageLx: row.figures.averageLx,
              maxLx: row.figures.maxLx,
              uniformityMinToAverage: row.figures.uniformityMinToAverage,
              uniformityMinToMax: row.figures.uniformityMinToMax,
              withinTarget: row.figures.withinTarget,
            },
          ]
        : [],
    ),
    regions: response.regions.map((region) => ({
      kind: region.kind,
      reason: region.reason,
      centre: region.centre,
      areaM2: region.areaM2,
      extremeLx: region.extremeLx,
      fixtures: region.fixtures,
    })),
  };
}

/** Build the report of a valid document. */
export function buildReport(document: PlotDocument, options: ReportOptions = {}): PlotReport {
  const rig = resolveRig(document);
  const rigById = new Map(rig.map((fixture) => [fixture.id, fixture]));
  const types = new Map(document.fixtureTypes.map((type) => [type.id, type]));
  const positions = new Map(document.positions.map((position) => [position.id, position]));
  const fixtures = document.fixtures.flatMap((unit): ReportFixture[] => {
    const resolved = rigById.get(unit.id);
    if (!resolved) return [];
    const focus = fixtureFocus(resolved, document.focusPlaneHeightM);
    return [
      {
        id: unit.id,
        unit: unit.unit,
        position: unit.positionId === null ? null : (positions.get(unit.positionId)?.name ?? null),
        type: types.get(unit.typeId)?.name ?? unit.typeId,
        channel: unit.channel,
        levelPct: unit.levelPct,
        throwM: focus.aim?.throwM ?? null,
        panDeg: focus.aim?.panDeg ?? null,
        tiltDeg: focus.aim?.tiltDeg ?? null,
        beamAngleDeg: focus.angles?.beamAngleDeg ?? null,
        fieldAngleDeg: focus.angles?.fieldAngleDeg ?? null,
        beamDiameterM: focus.beamDiameterM,
        fieldDiameterM: focus.fieldDiameterM,
        centreLx: focus.centreLx,
        footprint: reportFootprint(focus.beamPool),
        fieldFootprint: reportFootprint(focus.fieldPool),
        problem: focus.problem,
      },
    ];
  });
  const viewpoint = mainViewpointPosition(document);
  const camera = document.viewpoints.find((view) => view.id === document.mainViewpointId)?.camera ?? null;
  const subjects = subjectPlacements(document).map((placement, index): ReportSubject => {
    const light = subjectFaceLight(placement, viewpoint, rig);
    const lighting = subjectLighting(placement, viewpoint, rig, document.subjects[index].roleOverrides);
    return {
      id: placement.id,
      name: document.subjects[index].name,
      judgedToward: light.judgedToward,
      totalFaceLx: light.totalFaceLx,
      sources: light.sources,
      roles: lighting.sources.map((source) => ({
        fixtureId: source.fixtureId,
        role: source.role,
        ruleRole: source.ruleRole,
        overridden: source.overridden,
      })),
      keyLx: lighting.keyLx,
      fillLx: lighting.fillLx,
      backLightLx: lighting.backLightLx,
      keyToFillStops: lighting.keyToFillStops,
      lightingRatio: lighting.lightingRatio,
      backToKeyStops: lighting.backToKeyStops,
      cylindricalLx: lighting.totals.cylindricalLx,
      semiCylindricalLx: lighting.totals.semiCylindricalLx,
      exposure: camera ? subjectExposure(camera, lighting.keyLx) : null,
    };
  });
  return {
    show: document.name,
    venue: document.venue,
    focusPlaneHeightM: document.focusPlaneHeightM,
    mainViewpoint: document.viewpoints.find((view) => view.id === document.mainViewpointId)?.name ?? null,
    fixtures,
    subjects,
    levelSets: document.levelSets.map((set) => ({
      id: set.id,
      name: set.name,
      chosen: set.id === document.activeLevelSetId,
      levels: set.levels,
    })),
    coverage: reportCoverage(document, options),
    power: reportPower(document),
    weight: reportWeight(document),
  };
}
