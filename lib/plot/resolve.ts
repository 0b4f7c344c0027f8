/**
 * From the document to the analysis engines' plain inputs: each fixture's spread after its zoom,
 * and its output after level (through the type's dimming curve) and filter. A measured type keeps
 * its candela grid (absolute cd at full) and gets the same output fraction as a scale.
 */
import type { RigFixture, LightSource, SubjectPlacement } from '../analysis';
import { type BeamSpread, beamSolidAngleSr, lightFractionAtLevel, luminanceFromLumens } from '../photometry';
import { assertNever } from '../numeric';
import type { PlotDocument } from './schema/document';
import type { Fixture } from './schema/fixture';
import type { BeamPhotometry, FixtureType, SoftPhotometry } from './schema/fixtureType';

/** The spread a unit of a beam type has at its zoom setting (field = beam × fieldPerBeam on a zoom). */
export function spreadAtZoom(photometry: BeamPhotometry, zoomBeamDeg: number | null): BeamSpread {
  const nominal = photometry.spread;
  if (zoomBeamDeg === null || photometry.zoom === null) return nominal;
  const fieldPerBeam = photometry.zoom.fieldPerBeam;
  if (nominal.kind === 'round') {
    return { kind: 'round', beamAngleDeg: zoomBeamDeg, fieldAngleDeg: zoomBeamDeg * fieldPerBeam };
  }
  // An oval zoom keeps its proportions: both axes scale with the X beam angle.
  const factor = zoomBeamDeg / nominal.beamAngleXDeg;
  return {
    ...nominal,
    beamAngleXDeg: zoomBeamDeg,
    fieldAngleXDeg: zoomBeamDeg * fieldPerBeam,
    beamAngleYDeg: nominal.beamAngleYDeg * factor,
    fieldAngleYDeg: nominal.beamAngleYDeg * factor * fieldPerBeam,
  };
}

/**
 * Peak intensity at full of a beam type at a spread, cd. Output given as lumens is kept across the
 * zoom; output given as peak candela is the peak at the nominal spread, converted through lumens.
 */
export function peakAtFullCd(photometry: BeamPhotometry, spread: BeamSpread): number {
  const lumens =
    photometry.output.kind === 'lumens'
      ? photometry.output.lumens
      : photometry.output.peakCd * beamSolidAngleSr(photometry.spread);
  return lumens / beamSolidAngleSr(spread);
}

/** Luminance at full of a soft type, cd/m². */
export function softLuminanceAtFull(photometry: SoftPhotometry): number {
  if (photometry.output.kind === 'luminance') return photometry.output.cdPerM2;
  const shape = photometry.shape;
  const areaM2 = shape.kind === 'disc' ? Math.PI * shape.radiusM ** 2 : shape.widthM * shape.heightM;
  return luminanceFromLumens(photometry.output.lumens, areaM2);
}

/** Fraction of full output a unit gives: dimming curve at its level × filter transmission. */
export function outputFraction(unit: Fixture, type: FixtureType): number {
  return lightFractionAtLevel(unit.levelPct, type.dimmingCurve) * (unit.filter?.transmission ?? 1);
}

/** One unit as the analysis engines see it. */
export function resolveFixture(unit: Fixture, type: FixtureType): RigFixture {
  const fraction = outputFraction(unit, type);
  return { id: unit.id, mount: unit.mount, focus: unit.focus, source: lightSource(type, unit, fraction) };
}

function lightSource(type: FixtureType, unit: Fixture, fraction: number): LightSource {
  const photometry = type.photometry;
  switch (photometry.kind) {
    case 'beam': {
      const spread = spreadAtZoom(photometry, unit.zoomBeamDeg);
      return { kind: 'beam', spread, peakCd: peakAtFullCd(photometry, spread) * fraction };
    }
    case 'soft':
      return {
        kind: 'soft',
        shape: photometry.shape,
        luminanceCdPerM2: softLuminanceAtFull(photometry) * fraction,
      };
    case 'measured':
      // The grid is the document's own (immutable) object, so figures memoised on it stay valid.
      return { kind: 'measured', grid: photometry.grid, scale: fraction };
    default:
      return assertNever(photometry);
  }
}

/** Every unit of a (valid) document as the analysis engines see it, in document order. */
export function resolveRig(document: PlotDocument): RigFixture[] {
  const types = new Map(document.fixtureTypes.map((type) => [type.id, type]));
  return document.fixtures.flatMap((unit) => {
    const type = types.get(unit.typeId);
    return type ? [resolveFixture(unit, type)] : [];
  });
}

/** Subjects as placements for the engines. */
export function subjectPlacements(document: PlotDocument): SubjectPlacement[] {
  return document.subjects.map((person) => ({
    id: person.id,
    mark: person.mark,
    faceHeightM: person.faceHeightM,
    facingDeg: person.facingDeg,
  }));
}

/** The main viewpoint's position, or null. */
export function mainViewpointPosition(document: PlotDocument) {
  return document.viewpoints.find((view) => view.id === document.mainViewpointId)?.position ?? null;
}
